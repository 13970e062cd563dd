import type { SqueezeState } from './05-shear';
import type { GripPoint, Liftability } from './06-liftability';
import type { MeshSummary, SqueezeResult } from './07-run';
import type { HertzFigures } from './hertz';
import { resultUnits } from './result-units';

type Num = number | null;

/** Options of squeezeResultJson. */
export interface ResultJsonOptions {
  /** significant figures of every number (margins one fewer); default 4 */
  digits?: number;
}

/**
 * The squeeze result as the JSON the CLI (`--json`) and the app's API give: display units (mm,
 * MPa, kPa) named in every key, plane-strain forces and masses per metre (`force_n_per_m`,
 * `mass_kg_per_m`, …) and its contact as `contact_half_width_mm`, `travel_per_pad_mm`,
 * `bruise_margin`, and a `units` block that gives the unit and meaning of every key. Numbers
 * are rounded to `digits` significant figures for display; non-finite values become null.
 */
export function squeezeResultJson(result: SqueezeResult, options: ResultJsonOptions = {}) {
  const digits = options.digits ?? 4;
  const round = (v: Num, d = digits): Num =>
    v === null || !Number.isFinite(v) ? null : Number(v.toPrecision(d));
  const scaled = (v: Num, f: number): Num => (v === null ? null : round(v * f));
  const mm = (m: Num) => scaled(m, 1e3);
  const kpa = (pa: Num) => scaled(pa, 1e-3);
  const slice = result.input.model === 'plane-strain';
  const key = (base: string) => (slice ? `${base}_per_m` : base);
  const withLift = result.liftability !== null;

  const state = (s: SqueezeState) => ({
    travel_per_pad_mm: mm(s.travel),
    [key('force_n')]: round(s.force),
    [slice ? 'contact_half_width_mm' : 'contact_radius_mm']: mm(s.contactRadius),
    peak_pressure_kpa: kpa(s.peakPressure),
    mean_pressure_kpa: kpa(s.meanPressure),
    max_shear_kpa: kpa(s.maxShear),
    max_shear_depth_mm: mm(s.maxShearDepth),
    max_shear_unavailable: s.maxShearUnavailable,
    contact_points: s.activeNodes,
    facing_strain: round(s.facingStrain),
    ...(withLift ? { lift_ratio: round(s.liftRatio) } : {}),
  });
  const grip = (g: GripPoint | null) =>
    g && {
      ...state(g),
      bruise_margin: round(g.bruiseMargin, digits - 1),
      shear_margin: round(g.shearMargin, digits - 1),
    };
  const liftability = (l: Liftability) => ({
    [key('mass_kg')]: round(l.mass),
    [key('hold_load_n')]: round(l.holdLoad),
    [key('required_force_n')]: round(l.requiredForce),
    grip: grip(l.grip),
    grip_reason: l.reason,
  });
  const hertz = (h: HertzFigures | null) =>
    h && {
      [key('force_n')]: round(h.force),
      [slice ? 'contact_half_width_mm' : 'contact_radius_mm']: mm(h.contactRadius),
      peak_pressure_kpa: kpa(h.peakPressure),
      mean_pressure_kpa: kpa(h.meanPressure),
      approach_mm: mm(h.approach),
      max_shear_kpa: kpa(h.maxShear),
      max_shear_depth_mm: mm(h.maxShearDepth),
    };
  const mesh = (m: MeshSummary | null) =>
    m && {
      level: m.level,
      nodes: m.nodes,
      dofs: m.dofs,
      contact_nodes: m.contactNodes,
      graded_contact_radius_mm: mm(m.gradedContactRadius),
      edge_band_spacing_mm: mm(m.edgeBandSpacing),
    };
  return {
    model: result.input.model,
    input: inputJson(result, round),
    units: resultUnits(result.input.model),
    mesh: mesh(result.mesh),
    grip_mesh: mesh(result.gripMesh),
    steps: result.steps.map(state),
    final: state(result.final),
    profile: result.profile.map((p) => ({ r_mm: mm(p.r), pressure_kpa: kpa(p.pressure) })),
    liftability: result.liftability && liftability(result.liftability),
    hertz: { at_travel: hertz(result.hertz.atTravel), at_force: hertz(result.hertz.atForce) },
    warnings: result.warnings.map((w) => ({ code: w.code, message: w.message })),
  };
}

/** The inputs as used, in display units. */
function inputJson(result: SqueezeResult, round: (v: Num) => Num) {
  const c = result.input;
  const f = (v: Num, k: number) => (v === null ? null : round(v * k));
  return {
    model: c.model,
    level: c.mesh,
    increments: c.steps,
    equatorial_radius_mm: f(c.equatorialRadius, 1e3),
    axial_radius_mm: f(c.axialRadius, 1e3),
    modulus_mpa: f(c.modulus, 1e-6),
    poisson: round(c.poisson),
    travel_per_pad_mm: f(c.travel, 1e3),
    pad_diameter_mm: f(c.pad.diameter, 1e3),
    edge_radius_mm: f(c.pad.edgeRadius, 1e3),
    facing_modulus_mpa: f(c.facing?.modulus ?? null, 1e-6),
    facing_thickness_mm: f(c.facing?.thickness ?? null, 1e3),
    facing_poisson: round(c.facing?.poisson ?? null),
    density_kg_m3: round(c.lift?.density ?? null),
    friction: round(c.lift?.friction ?? null),
    safety_factor: round(c.lift?.safetyFactor ?? null),
    accel_g: round(c.lift?.accelG ?? null),
    bruise_threshold_kpa: f(c.lift?.bruiseThreshold ?? null, 1e-3),
    failure_shear_kpa: f(c.lift?.failureShear ?? null, 1e-3),
  };
}

/** The JSON shape of a squeeze result (see squeezeResultJson). */
export type SqueezeResultJson = ReturnType<typeof squeezeResultJson>;
