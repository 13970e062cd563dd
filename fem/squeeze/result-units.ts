import type { BodyModel } from '../types';

/**
 * Unit and meaning of every key of the squeeze JSON (see squeezeResultJson), per model: the
 * plane-strain slice gives forces and masses per metre of slice length, and its keys say so.
 */
export function resultUnits(model: BodyModel): Record<string, string> {
  const slice = model === 'plane-strain';
  const perM = slice ? ' per metre of slice' : '';
  const force = slice ? 'N/m' : 'N';
  const contact = slice ? 'contact half-width' : 'contact radius';
  return {
    model: "text: 'axisymmetric' (body of revolution) or 'plane-strain' (slice, per metre)",
    input: 'object: the inputs as used, defaults filled in',
    units: 'object: unit and meaning of every key',
    mesh: 'object: the finite-element mesh of the increments and the final state',
    grip_mesh: 'object or null: the mesh the grip was found on, when the run regraded for it',
    steps: 'list: one state per load increment',
    final: 'object: the state at the full travel',
    profile: 'list: contact pressure at each contact point at the full travel',
    liftability: 'object or null: the two-pad friction grip (needs density and friction)',
    grip: 'object or null: the least travel that lifts the fruit, with its margins',
    hertz: 'object: closed-form Hertz figures for comparison',
    at_travel: 'object or null: Hertz at the same travel (point contact only)',
    at_force: 'object: Hertz at the same pad force',
    warnings: 'list of {code, message}: limits of the result, in plain words',
    code: 'text: stable warning code',
    message: 'text: the warning in plain words',
    level: "text: mesh level, 'sparse', 'balanced' or 'dense'",
    nodes: 'count: mesh nodes',
    dofs: 'count: degrees of freedom',
    contact_nodes: 'count: candidate contact nodes on the surface',
    graded_contact_radius_mm: 'mm: contact radius the mesh near the pole is graded to',
    edge_band_spacing_mm: "mm or null: node spacing of the refined band at the pad's edge",
    increments: 'count: load increments from zero to the full travel',
    equatorial_radius_mm: 'mm: fruit radius across the squeeze axis',
    axial_radius_mm: 'mm: fruit radius along the squeeze axis',
    modulus_mpa: "MPa: Young's modulus of the flesh",
    poisson: "ratio: Poisson's ratio of the flesh",
    travel_per_pad_mm:
      "mm: travel of each pad toward the fruit's centre (the pads close by twice it)",
    pad_diameter_mm: 'mm or null: overall pad face diameter (null: a flat plate)',
    edge_radius_mm: "mm or null: radius of the pad's rounded edge",
    facing_modulus_mpa: "MPa or null: Young's modulus of the pad's facing layer",
    facing_thickness_mm: "mm or null: thickness of the pad's facing layer",
    facing_poisson: "ratio or null: Poisson's ratio of the facing layer",
    density_kg_m3: 'kg/m³ or null: flesh density',
    friction: 'ratio or null: pad–skin Coulomb friction coefficient',
    safety_factor: 'ratio or null: safety factor on the weight',
    accel_g: 'g or null: upward acceleration of the lift, in units of standard gravity',
    bruise_threshold_kpa: 'kPa or null: static bruise-threshold contact pressure',
    failure_shear_kpa: 'kPa or null: failure shear stress of the flesh',
    [slice ? 'force_n_per_m' : 'force_n']: `${force}: normal force of one pad${perM}`,
    [slice ? 'contact_half_width_mm' : 'contact_radius_mm']: `mm: ${contact}`,
    peak_pressure_kpa: 'kPa: largest contact pressure',
    mean_pressure_kpa: `kPa: pad force over the contact ${slice ? 'width' : 'area'}`,
    max_shear_kpa: 'kPa or null: largest subsurface Tresca shear under the contact',
    max_shear_depth_mm: 'mm or null: depth of that shear below the surface',
    max_shear_unavailable: 'text or null: why the shear could not be sampled',
    lift_ratio: 'ratio or null: 2μF / (SF·m·(g + a)); the fruit lifts at 1',
    contact_points: 'count: mesh points in contact',
    facing_strain: 'ratio or null: largest compression of the facing over its thickness',
    r_mm: `mm: distance of the contact point from the squeeze axis`,
    pressure_kpa: 'kPa: contact pressure (compressive positive)',
    [slice ? 'mass_kg_per_m' : 'mass_kg']: `kg${slice ? '/m' : ''}: fruit mass${perM}`,
    [slice ? 'hold_load_n_per_m' : 'hold_load_n']: `${force}: design load SF·m·(g + a)${perM}`,
    [slice ? 'required_force_n_per_m' : 'required_force_n']:
      `${force}: pad normal force the grip needs, hold load / 2μ${perM}`,
    grip_reason: 'text or null: why there is no grip',
    bruise_margin: 'ratio or null: bruise threshold / peak pressure at the grip (> 1 is safe)',
    shear_margin: 'ratio or null: failure shear / largest shear at the grip (> 1 is safe)',
    approach_mm: 'mm or null: Hertz approach of each pad',
  };
}
