/**
 * CLI for the numerical core: `tenderline squeeze [options] [--json]` (built by
 * `npm run build:cli` into dist/tenderline.mjs; `npm run --silent fem -- squeeze …` runs the source).
 * A thin I/O layer: display units in (mm, MPa, kPa), SI to fem, display units out.
 * Bad options print one line to stderr, naming the option as typed, and exit 2.
 */
import { parseArgs } from 'node:util';
import { FemConvergenceError, FemInputError, runSqueeze, squeezeResultJson } from '../fem';
import type { MeshLevel, SqueezeInput, SqueezeResultJson } from '../fem';
import { helpText, wantsHelp } from './cli-help';

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
  'facing-poisson': ['facingPoisson', 1],
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

type Json = SqueezeResultJson;
type StateJson = Json['final'];

const fmt = (v: unknown, width: number) =>
  (v === null || v === undefined ? '—' : String(v)).padStart(width);

/** The force key of the model's JSON (per metre in plane strain). */
const forceKey = (data: Json) => (data.model === 'plane-strain' ? 'force_n_per_m' : 'force_n');
const contactKey = (data: Json) =>
  data.model === 'plane-strain' ? 'contact_half_width_mm' : 'contact_radius_mm';

function stepLine(data: Json, s: StateJson): string {
  const v = s as Record<string, unknown>;
  return (
    `  ${fmt(v.travel_per_pad_mm, 9)} ${fmt(v[forceKey(data)], 9)} ${fmt(v[contactKey(data)], 7)} ` +
    `${fmt(v.peak_pressure_kpa, 10)} ${fmt(v.mean_pressure_kpa, 10)} ${fmt(v.max_shear_kpa, 11)}` +
    ('lift_ratio' in v ? ` ${fmt(v.lift_ratio, 6)}` : '')
  );
}

function pretty(data: Json): string {
  const force = data.model === 'plane-strain' ? 'N/m' : 'N';
  const lines = [
    `Squeeze (${data.model}, mesh ${data.mesh?.level}: ${data.mesh?.nodes} nodes, ${data.mesh?.dofs} DOFs)`,
    `  travel mm  force ${force.padEnd(3)}    a mm   peak kPa   mean kPa   shear kPa` +
      ('lift_ratio' in data.final ? '   lift' : ''),
    ...data.steps.map((s) => stepLine(data, s)),
  ];
  const h = data.hertz.at_force as Record<string, unknown> | null;
  if (h) {
    lines.push(
      `Hertz at the same force: a = ${h[contactKey(data)]} mm, p0 = ${h.peak_pressure_kpa} kPa`,
    );
  }
  const lift = data.liftability as Record<string, unknown> | null;
  if (lift) {
    const grip = lift.grip as Record<string, unknown> | null;
    lines.push(
      grip
        ? `Grip at ${grip.travel_per_pad_mm} mm per pad: force ${grip[forceKey(data)]} ${force}, ` +
            `peak ${grip.peak_pressure_kpa} kPa, bruise margin ${grip.bruise_margin ?? 'n/a'}`
        : `No grip: ${lift.grip_reason}`,
    );
  }
  for (const w of data.warnings) lines.push(`Warning: ${w.message}`);
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
  if (wantsHelp(argv)) {
    process.stdout.write(helpText());
    return 0;
  }
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
      throw new UsageError('usage: tenderline squeeze [options] [--json] (--help lists them)');
    }
    const data = squeezeResultJson(runSqueeze(toInput(values)));
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
