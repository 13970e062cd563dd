/**
 * Published relations that derive one property of a fruit from others of the same fruit. Each is
 * one named function with its source and an `exponents` map: the power of each input in the
 * relation, so the spread of a derived value follows its inputs' spreads to first order
 * (relative SD² = Σ (exponentᵢ · relative SDᵢ)², Taylor J.R., An Introduction to Error Analysis,
 * 2nd ed., 1997, eq. 3.47 for a product of powers).
 */

export interface Relation<K extends string> {
  id: string;
  /** What the relation says, in words. */
  statement: string;
  /** The published source of the relation (author, title, year, equation or page). */
  source: string;
  /** Power of each input in the relation (for the spread). */
  exponents: Record<K, number>;
}

/** Standard gravity, m/s² (CGPM 1901; ISO 80000-3). */
export const G0 = 9.80665;

/**
 * Volume of a fruit taken as a spheroid, m³: V = π/6 · D² · A for equatorial diameter D and axial
 * diameter A (a sphere when A = D). Mohsenin N.N., Physical Properties of Plant and Animal
 * Materials, 2nd ed., 1986, ch. 2 (fruit volume from the principal diameters as an ellipsoid)
 * [from memory for the chapter].
 */
export function spheroidVolumeM3(equatorialMm: number, axialMm: number): number {
  return (Math.PI / 6) * (equatorialMm / 1000) ** 2 * (axialMm / 1000);
}

export const MASS_FROM_SIZE: Relation<'density' | 'equatorial' | 'axial'> = {
  id: 'mass-from-size',
  statement: 'mass = density × volume of the spheroid of the fruit’s diameters (π/6 · D² · A)',
  source: 'Mohsenin 1986, Physical Properties of Plant and Animal Materials, ch. 2 (from memory)',
  exponents: { density: 1, equatorial: 2, axial: 1 },
};

/** Mass, g, of a fruit of the given diameters (mm) and density (kg/m³). */
export function massFromSize(densityKgM3: number, equatorialMm: number, axialMm: number): number {
  return densityKgM3 * spheroidVolumeM3(equatorialMm, axialMm) * 1000;
}

export const DENSITY_FROM_MASS: Relation<'mass' | 'equatorial' | 'axial'> = {
  id: 'density-from-mass',
  statement: 'density = mass ÷ volume of the spheroid of the fruit’s diameters',
  source: MASS_FROM_SIZE.source,
  exponents: { mass: 1, equatorial: -2, axial: -1 },
};

/** Density, kg/m³, of a fruit of the given mass (g) and diameters (mm). */
export function densityFromMass(massG: number, equatorialMm: number, axialMm: number): number {
  return massG / 1000 / spheroidVolumeM3(equatorialMm, axialMm);
}

export const MASS_SCALED: Relation<'mass' | 'size'> = {
  id: 'mass-scaled-by-size',
  statement:
    'mass at another size = published mass × (size ÷ published size)³ (fruit of one shape and density)',
  source: 'Geometric similarity of the spheroid volume, Mohsenin 1986 ch. 2 (from memory)',
  exponents: { mass: 1, size: 3 },
};

/** A published mass (g at `atMm`) scaled to a fruit of `toMm`, same shape and density. */
export function massScaled(massG: number, atMm: number, toMm: number): number {
  return massG * (toMm / atMm) ** 3;
}

export const HEIGHT_FROM_ENERGY: Relation<'energy' | 'mass'> = {
  id: 'drop-height-from-energy',
  statement: 'drop height = impact energy ÷ (mass × g): the fruit’s potential energy at release',
  source:
    'Potential energy of a free fall, E = m·g·h; as used for drop thresholds by Pathare, Al-Dairi & Al Mahdouri, Arab Gulf J. Sci. Res., 2023 (20/40/60 cm = 129.6/259.2/388.8 mJ)',
  exponents: { energy: 1, mass: -1 },
};

/** Drop height, mm, that gives a fruit of `massG` the impact energy `energyJ`. */
export function heightFromEnergy(energyJ: number, massG: number): number {
  return (energyJ / ((massG / 1000) * G0)) * 1000;
}

export const ENERGY_FROM_HEIGHT: Relation<'height' | 'mass'> = {
  id: 'impact-energy-from-height',
  statement: 'impact energy = mass × g × drop height',
  source: HEIGHT_FROM_ENERGY.source,
  exponents: { height: 1, mass: 1 },
};

/** Impact energy, J, of a fruit of `massG` dropped from `heightMm`. */
export function energyFromHeight(heightMm: number, massG: number): number {
  return (massG / 1000) * G0 * (heightMm / 1000);
}

export const THRESHOLD_FROM_BIOYIELD: Relation<'bioyield'> = {
  id: 'static-threshold-from-bioyield',
  statement:
    'static bruise threshold = bioyield stress: the bioyield point marks the first failure of cells, where a bruise begins',
  source:
    'ASAE S368 (compression test of food materials of convex shape), definition of the bioyield point; Mohsenin 1986 ch. 5 (from memory)',
  exponents: { bioyield: 1 },
};

/** A static bruise threshold, kPa, from a bioyield stress, kPa (taken equal: see the relation). */
export function thresholdFromBioyield(bioyieldKpa: number): number {
  return bioyieldKpa;
}

/**
 * The relative SD of a derived value from its inputs' relative SDs (null where an input has no
 * spread, which then counts as exact), to first order for a product of powers.
 */
export function propagateRelativeSd<K extends string>(
  relation: Relation<K>,
  relativeSd: Partial<Record<K, number | null>>,
): number | null {
  let sum = 0;
  let any = false;
  for (const key of Object.keys(relation.exponents) as K[]) {
    const r = relativeSd[key];
    if (r === null || r === undefined) continue;
    any = true;
    sum += (relation.exponents[key] * r) ** 2;
  }
  return any ? Math.sqrt(sum) : null;
}

export const AXIAL_BY_SHAPE: Relation<'axial' | 'equatorial' | 'size'> = {
  id: 'axial-by-shape',
  statement:
    'axial diameter at another size = published axial × (size ÷ published equatorial): the fruit keeps its shape',
  source: 'Geometric similarity (the aspect ratio of the published fruit), Mohsenin 1986 ch. 2',
  exponents: { axial: 1, equatorial: -1, size: 1 },
};

/** The axial diameter of a fruit of equatorial `sizeMm` with the published fruit's aspect ratio. */
export function axialByShape(axialMm: number, equatorialMm: number, sizeMm: number): number {
  return (axialMm * sizeMm) / equatorialMm;
}

/**
 * A bulk of like spheres poured loosely into a container fills about 60 % of its volume (random
 * loose packing 0.60; random close packing 0.637): Scott G.D., "Packing of spheres", Nature 188,
 * 908–909, 1960 [from memory]. Used only for a typical bulk density: published fruit bulk
 * densities sit below it (0.32–0.55 of the fruit's density).
 */
export const PACKING_FRACTION = { value: 0.6, low: 0.55, high: 0.64 } as const;

/**
 * The ratio of horizontal to vertical pressure in a bulk at rest, K₀ = 1 − sin φ, for a
 * cohesionless bulk of internal friction angle φ: Jáky J., "The coefficient of earth pressure at
 * rest", Journal of the Society of Hungarian Architects and Engineers, 1944 [from memory]. For a
 * free-flowing bulk the angle of repose is taken as φ (an approximation; the silo code
 * EN 1991-4:2006, Annex D, sets K = 1.1 (1 − sin φ) for wall loads [from memory]). The exponent
 * for the spread is the relation's local elasticity, d ln K / d ln φ = −φ cos φ / (1 − sin φ),
 * so it is set per angle by `lateralRatioRelation`.
 */
export const LATERAL_RATIO_FROM_REPOSE: Relation<'repose'> = {
  id: 'lateral-ratio-from-repose',
  statement:
    'lateral pressure ratio K = 1 − sin φ, φ the angle of repose of the fruit (a bulk at rest)',
  source:
    'Jáky J., The coefficient of earth pressure at rest, J. Soc. Hungarian Architects and Engineers, 1944 (from memory)',
  exponents: { repose: 1 },
};

/** Janssen's lateral pressure ratio of a bulk whose angle of repose is `degrees`. */
export function lateralRatioFromRepose(degrees: number): number {
  return 1 - Math.sin((degrees * Math.PI) / 180);
}

/** The relation at one angle, its exponent the local elasticity (for the spread). */
export function lateralRatioRelation(degrees: number): Relation<'repose'> {
  const phi = (degrees * Math.PI) / 180;
  return {
    ...LATERAL_RATIO_FROM_REPOSE,
    exponents: { repose: (-phi * Math.cos(phi)) / (1 - Math.sin(phi)) },
  };
}
