/**
 * CLI for the numerical core: `tenderline squeeze [options] [--json]` (built by
 * `npm run build:cli` into dist/tenderline.mjs; `npm run --silent fem -- squeeze …` runs the source).
 * A thin I/O layer: display units in (mm, MPa, kPa), SI to fem, display units out.
 * Bad options print one line to stderr, naming the option as typed, and exit 2.
 */
import { parseArgs } from 'node:util';
import { FemConvergenceError, FemInputError, runSqueeze } from '../fem';
import type { HertzFigures, MeshLevel, SqueezeInput, SqueezeResult, SqueezeState } from '../fem';

type NumberField = Exclude<
  keyof SqueezeInput,
  'model' | 'mesh' | 'equatorialRadius' | 'axialRadius'
>;

/** Numeric options: the SqueezeInput field each one sets and its factor to SI. */
const NUMBERS: Record<string, [NumberField, number]> = {
  'modulus-mpa': ['modulus', 1e6],
  poisson: ['poisson', 1],
  'travel-mm': ['travel', 1e-3],
  steps: ['steps', 1],
  'pad-diameter-mm': ['padDiameter', 1e-3],
  'edge-radius-mm': ['edgeRadius', 1e-3],
  'facing-modulus-mpa': ['facingModulus', 1e6],
  'facing-thickness-mm': ['facingThickness', 1e-3],
  density: ['density', 1],
  friction: ['friction', 1],
  'safety-factor': ['safetyFactor', 1],
  'accel-g': ['accelG', 1],
  'threshold-kpa': ['bruiseThreshold', 1e3],
  'failure-shear-kpa': ['failureShear', 1e3],
};
const NUMBER_FIELDS = Object.values(NUMBERS).map(([field]) => field);
const REQUIRED = ['modulus-mpa', 'poisson', 'travel-mm'];
const SIZE_OPTIONS = ['diameter-mm', 'axial-mm', 'equatorial-mm', ...Object.keys(NUMBERS)];

const OPTIONS = {
  json: { type: 'boolean' },
  mesh: { type: 'string' },
  model: { type: 'string' },
  ...Object.fromEntries(SIZE_OPTIONS.map((name) => [name, { type: 'string' as const }])),
} as const;

class UsageError extends Error {}

type Values = Record<string, string | boolean | undefined>;

function num(values: Values, name: string, factor = 1): number | undefined {
  const raw = values[name];
  if (raw === undefined) return undefined;
  const v = typeof raw === 'string' && raw.trim() !== '' ? Number(raw) : NaN;
  if (!Number.isFinite(v)) throw new UsageError(`--${name} must be a finite number, got '${raw}'`);
  return v * factor;
}

/** Equatorial and axial radius (m) from --diameter-mm, or from --equatorial-mm and --axial-mm. */
function radii(values: Values): Pick<SqueezeInput, 'equatorialRadius' | 'axialRadius'> {
  const diameter = num(values, 'diameter-mm', 1e-3);
  const axial = num(values, 'axial-mm', 1e-3);
  const equatorial = num(values, 'equatorial-mm', 1e-3);
  if (diameter !== undefined && (axial !== undefined || equatorial !== undefined)) {
    throw new UsageError('give --diameter-mm (sphere) or --axial-mm and --equatorial-mm, not both');
  }
  if (diameter !== undefined) return { equatorialRadius: diameter / 2, axialRadius: diameter / 2 };
  if (axial === undefined || equatorial === undefined) {
    throw new UsageError('give --diameter-mm, or both --axial-mm and --equatorial-mm');
  }
  return { equatorialRadius: equatorial / 2, axialRadius: axial / 2 };
}

function toInput(values: Values): SqueezeInput {
  for (const name of REQUIRED) {
    if (values[name] === undefined) throw new UsageError(`--${name} is required`);
  }
  const input: Partial<Record<NumberField, number>> = {};
  for (const [name, [field, factor]] of Object.entries(NUMBERS)) {
    input[field] = num(values, name, factor);
  }
  // fem checks the mesh and model names (and names the option in its error, see flagged()).
  const { mesh, model } = values as { mesh?: MeshLevel; model?: SqueezeInput['model'] };
  return { ...(input as Omit<SqueezeInput, 'model' | 'mesh'>), ...radii(values), mesh, model };
}

/** The option that set each SqueezeInput field, for error messages. */
function optionOf(field: string, values: Values): string {
  if (field === 'equatorialRadius' || field === 'axialRadius') {
    if (values['diameter-mm'] !== undefined) return '--diameter-mm';
    return field === 'axialRadius' ? '--axial-mm' : '--equatorial-mm';
  }
  const name = Object.keys(NUMBERS).find((n) => NUMBERS[n][0] === field);
  return `--${name ?? field}`;
}

/** A FemInputError's message with the input fields it names replaced by the options. */
function flagged(err: FemInputError, values: Values): string {
  // Any numeric field anywhere ("density is needed with friction"); mesh and model only where the
  // message opens with them, since "model" is also a plain word ("small-strain model").
  const numeric = new Set<string>(['equatorialRadius', 'axialRadius', ...NUMBER_FIELDS]);
  return err.message.replace(/\b[a-zA-Z]+\b/g, (w, at: number) =>
    numeric.has(w) || (at === 0 && w === err.field) ? optionOf(w, values) : w,
  );
}

// Display rounding only; the core keeps full precision.
const round = (v: number | null, digits = 4): number | null =>
  v === null ? null : Number(v.toPrecision(digits));
const kpa = (pa: number | null) => round(pa === null ? null : pa / 1e3);
const mm = (m: number | null) => round(m === null ? null : m * 1e3);

function stepJson(s: SqueezeState, withLift: boolean) {
  return {
    travel_mm: mm(s.travel),
    force_n: round(s.force),
    contact_radius_mm: mm(s.contactRadius),
    peak_pressure_kpa: kpa(s.peakPressure),
    mean_pressure_kpa: kpa(s.meanPressure),
    max_shear_kpa: kpa(s.maxShear),
    max_shear_depth_mm: mm(s.maxShearDepth),
    ...(withLift ? { lift_ratio: round(s.liftRatio) } : {}),
  };
}

function hertzJson(h: HertzFigures | null) {
  return (
    h && {
      force_n: round(h.force),
      contact_radius_mm: mm(h.contactRadius),
      peak_pressure_kpa: kpa(h.peakPressure),
      mean_pressure_kpa: kpa(h.meanPressure),
      approach_mm: mm(h.approach),
      max_shear_kpa: kpa(h.maxShear),
      max_shear_depth_mm: mm(h.maxShearDepth),
    }
  );
}

function liftJson(lift: NonNullable<SqueezeResult['liftability']>) {
  const grip = lift.grip;
  return {
    grip: grip && {
      travel_mm: mm(grip.travel),
      force_n: round(grip.force),
      peak_pressure_kpa: kpa(grip.peakPressure),
      margin: round(grip.bruiseMargin, 3),
      shear_margin: round(grip.shearMargin, 3),
      lift_ratio: round(grip.liftRatio),
    },
    grip_reason: lift.reason,
    mass_kg: round(lift.mass),
    required_force_n: round(lift.requiredForce),
  };
}

function toJson(values: Values, result: SqueezeResult) {
  const lift = result.liftability;
  const { json: _json, ...options } = values;
  void _json;
  const { model, mesh, steps } = result.input;
  return {
    input: { ...options, model, mesh, steps },
    units: { force: model === 'axisymmetric' ? 'N' : 'N/m' },
    steps: result.steps.map((s) => stepJson(s, lift !== null)),
    final: stepJson(result.final, lift !== null),
    profile: result.profile.map((p) => ({ r_mm: mm(p.r), pressure_kpa: kpa(p.pressure) })),
    ...(lift !== null ? liftJson(lift) : {}),
    hertz: {
      at_travel: hertzJson(result.hertz.atTravel),
      at_force: hertzJson(result.hertz.atForce),
    },
    mesh: { level: result.mesh.level, nodes: result.mesh.nodes, dofs: result.mesh.dofs },
    warnings: result.warnings,
  };
}

const fmt = (v: number | null, width: number) => (v === null ? '—' : String(v)).padStart(width);

function pretty(data: ReturnType<typeof toJson>): string {
  const f = data.final;
  const lines = [
    `Squeeze (${data.input.model}, mesh ${data.mesh.level}: ${data.mesh.nodes} nodes, ${data.mesh.dofs} DOFs)`,
    `  travel mm   force ${data.units.force}   a mm   peak kPa   mean kPa   shear kPa` +
      ('lift_ratio' in f ? '   lift' : ''),
    ...data.steps.map(
      (s) =>
        `  ${fmt(s.travel_mm, 9)} ${fmt(s.force_n, 7)} ${fmt(s.contact_radius_mm, 7)} ${fmt(s.peak_pressure_kpa, 10)} ` +
        `${fmt(s.mean_pressure_kpa, 10)} ${fmt(s.max_shear_kpa, 11)}` +
        ('lift_ratio' in s ? ` ${fmt(s.lift_ratio ?? null, 6)}` : ''),
    ),
  ];
  const h = data.hertz.at_force;
  if (h)
    lines.push(
      `Hertz at the same force: a = ${h.contact_radius_mm} mm, p0 = ${h.peak_pressure_kpa} kPa`,
    );
  if ('grip' in data) {
    lines.push(
      data.grip
        ? `Grip at ${data.grip.travel_mm} mm: force ${data.grip.force_n} N, peak ${data.grip.peak_pressure_kpa} kPa, margin ${data.grip.margin ?? 'n/a'}`
        : `No grip: ${data.grip_reason}`,
    );
  }
  for (const w of data.warnings) lines.push(`Warning: ${w}`);
  lines.push('Screening estimate from a linear-elastic model; not a substitute for bruise tests.');
  return lines.join('\n');
}

/** `--x -3` → `--x=-3`, so a negative number reaches validation and gets its specific message. */
const joinNegatives = (argv: string[]) =>
  argv.flatMap((arg, i) =>
    /^-\d|^-\.\d/.test(arg) && argv[i - 1]?.startsWith('--') && !argv[i - 1].includes('=')
      ? []
      : /^--[a-z-]+$/.test(arg) && /^-\d|^-\.\d/.test(argv[i + 1] ?? '')
        ? [`${arg}=${argv[i + 1]}`]
        : [arg],
  );

function main(argv: string[]): number {
  let values: Values = {};
  try {
    const parsed = parseArgs({
      args: joinNegatives(argv),
      options: OPTIONS,
      strict: true,
      allowPositionals: true,
    });
    values = parsed.values;
    if (parsed.positionals.length !== 1 || parsed.positionals[0] !== 'squeeze') {
      throw new UsageError('usage: tenderline squeeze [options] [--json]');
    }
    const data = toJson(values, runSqueeze(toInput(values)));
    process.stdout.write((values.json ? JSON.stringify(data, null, 2) : pretty(data)) + '\n');
    return 0;
  } catch (err) {
    const code = (err as { code?: unknown }).code;
    const parseError = typeof code === 'string' && code.startsWith('ERR_PARSE_ARGS');
    const known = err instanceof UsageError || err instanceof FemInputError || parseError;
    if (known || err instanceof FemConvergenceError) {
      const message = err instanceof FemInputError ? flagged(err, values) : (err as Error).message;
      process.stderr.write(`tenderline: ${message.split('\n')[0]}\n`);
      return known ? 2 : 1;
    }
    throw err;
  }
}

process.exitCode = main(process.argv.slice(2));
