/**
 * CLI for the numerical core: `npm run --silent fem -- squeeze [options] [--json]`.
 * A thin I/O layer: display units in (mm, MPa, kPa, g), SI to fem, display units out.
 * Bad options print one line to stderr and exit 2.
 */
import { parseArgs } from 'node:util';
import { FemConvergenceError, FemInputError, runSqueeze } from '../fem';
import type { SqueezeInput, SqueezeResult, SqueezeState } from '../fem';

const OPTIONS = {
  json: { type: 'boolean' },
  'diameter-mm': { type: 'string' },
  'axial-mm': { type: 'string' },
  'equatorial-mm': { type: 'string' },
  'modulus-mpa': { type: 'string' },
  poisson: { type: 'string' },
  'travel-mm': { type: 'string' },
  steps: { type: 'string' },
  'pad-diameter-mm': { type: 'string' },
  'edge-radius-mm': { type: 'string' },
  'facing-modulus-mpa': { type: 'string' },
  'facing-thickness-mm': { type: 'string' },
  mesh: { type: 'string' },
  model: { type: 'string' },
  density: { type: 'string' },
  friction: { type: 'string' },
  'safety-factor': { type: 'string' },
  'accel-g': { type: 'string' },
  'threshold-kpa': { type: 'string' },
  'failure-shear-kpa': { type: 'string' },
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

function required(values: Values, name: string, factor = 1): number {
  const v = num(values, name, factor);
  if (v === undefined) throw new UsageError(`--${name} is required`);
  return v;
}

function toInput(values: Values): SqueezeInput {
  const mm = 1e-3;
  const diameter = num(values, 'diameter-mm', mm);
  const axial = num(values, 'axial-mm', mm);
  const equatorial = num(values, 'equatorial-mm', mm);
  if (diameter !== undefined && (axial !== undefined || equatorial !== undefined)) {
    throw new UsageError('give --diameter-mm (sphere) or --axial-mm and --equatorial-mm, not both');
  }
  if (diameter === undefined && (axial === undefined || equatorial === undefined)) {
    throw new UsageError('give --diameter-mm, or both --axial-mm and --equatorial-mm');
  }
  const mesh = values.mesh;
  if (mesh !== undefined && mesh !== 'coarse' && mesh !== 'normal' && mesh !== 'fine') {
    throw new UsageError(`--mesh must be coarse, normal or fine, got '${mesh}'`);
  }
  const model = values.model;
  if (model !== undefined && model !== 'axisymmetric' && model !== 'plane-strain') {
    throw new UsageError(`--model must be axisymmetric or plane-strain, got '${model}'`);
  }
  return {
    model,
    equatorialRadius: diameter !== undefined ? diameter / 2 : (equatorial as number) / 2,
    axialRadius: diameter !== undefined ? diameter / 2 : (axial as number) / 2,
    modulus: required(values, 'modulus-mpa', 1e6),
    poisson: required(values, 'poisson'),
    travel: required(values, 'travel-mm', mm),
    steps: num(values, 'steps'),
    mesh,
    padDiameter: num(values, 'pad-diameter-mm', mm),
    edgeRadius: num(values, 'edge-radius-mm', mm),
    facingModulus: num(values, 'facing-modulus-mpa', 1e6),
    facingThickness: num(values, 'facing-thickness-mm', mm),
    density: num(values, 'density'),
    friction: num(values, 'friction'),
    safetyFactor: num(values, 'safety-factor'),
    accelG: num(values, 'accel-g'),
    bruiseThreshold: num(values, 'threshold-kpa', 1e3),
    failureShear: num(values, 'failure-shear-kpa', 1e3),
  };
}

// Display rounding only; the core keeps full precision.
const round = (v: number | null, digits = 4): number | null =>
  v === null ? null : Number(v.toPrecision(digits));

function stepJson(s: SqueezeState, withLift: boolean) {
  return {
    travel_mm: round(s.travel * 1e3),
    force_n: round(s.force),
    contact_radius_mm: round(s.contactRadius * 1e3),
    peak_pressure_kpa: round(s.peakPressure / 1e3),
    mean_pressure_kpa: round(s.meanPressure / 1e3),
    max_shear_kpa: round(s.maxShear === null ? null : s.maxShear / 1e3),
    max_shear_depth_mm: round(s.maxShearDepth === null ? null : s.maxShearDepth * 1e3),
    ...(withLift ? { lift_ratio: round(s.liftRatio) } : {}),
  };
}

function toJson(values: Values, result: SqueezeResult) {
  const lift = result.liftability;
  const withLift = lift !== null;
  const hertz = (h: SqueezeResult['hertz']['atForce'] | null) =>
    h && {
      force_n: round(h.force),
      contact_radius_mm: round(h.contactRadius * 1e3),
      peak_pressure_kpa: round(h.peakPressure / 1e3),
      mean_pressure_kpa: round(h.meanPressure / 1e3),
      approach_mm: round(h.approach === null ? null : h.approach * 1e3),
      max_shear_kpa: round(h.maxShear === null ? null : h.maxShear / 1e3),
      max_shear_depth_mm: round(h.maxShearDepth === null ? null : h.maxShearDepth * 1e3),
    };
  const { json: _json, ...input } = values;
  void _json;
  return {
    input: {
      ...input,
      model: result.input.model,
      mesh: result.input.mesh,
      steps: result.input.steps,
    },
    units: { force: result.input.model === 'axisymmetric' ? 'N' : 'N/m' },
    steps: result.steps.map((s) => stepJson(s, withLift)),
    final: stepJson(result.final, withLift),
    profile: result.profile.map((p) => ({
      r_mm: round(p.r * 1e3),
      pressure_kpa: round(p.pressure / 1e3),
    })),
    ...(withLift
      ? {
          grip: lift.grip && {
            travel_mm: round(lift.grip.travel * 1e3),
            force_n: round(lift.grip.force),
            peak_pressure_kpa: round(lift.grip.peakPressure / 1e3),
            margin: round(lift.grip.bruiseMargin, 3),
            shear_margin: round(lift.grip.shearMargin, 3),
            lift_ratio: round(lift.grip.liftRatio),
          },
          grip_reason: lift.reason,
          mass_kg: round(lift.mass),
          required_force_n: round(lift.requiredForce),
        }
      : {}),
    hertz: { at_travel: hertz(result.hertz.atTravel), at_force: hertz(result.hertz.atForce) },
    mesh: { level: result.mesh.level, nodes: result.mesh.nodes, dofs: result.mesh.dofs },
    warnings: result.warnings,
  };
}

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

const fmt = (v: number | null, width: number) => (v === null ? '—' : String(v)).padStart(width);

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
  try {
    const { values, positionals } = parseArgs({
      args: joinNegatives(argv),
      options: OPTIONS,
      strict: true,
      allowPositionals: true,
    });
    if (positionals.length !== 1 || positionals[0] !== 'squeeze') {
      throw new UsageError('usage: fem squeeze [options] [--json]');
    }
    const data = toJson(values, runSqueeze(toInput(values)));
    process.stdout.write((values.json ? JSON.stringify(data, null, 2) : pretty(data)) + '\n');
    return 0;
  } catch (err) {
    const code = (err as { code?: unknown }).code;
    const parseError = typeof code === 'string' && code.startsWith('ERR_PARSE_ARGS');
    const known = err instanceof UsageError || err instanceof FemInputError || parseError;
    if (known || err instanceof FemConvergenceError) {
      process.stderr.write(`fem: ${(err as Error).message.split('\n')[0]}\n`);
      return known ? 2 : 1;
    }
    throw err;
  }
}

process.exitCode = main(process.argv.slice(2));
