/**
 * The quantities a property revision may hold, each stored in one canonical unit (shown with
 * every number) and, where it matters, a variant: which kind of modulus, which diameter, which
 * surface a friction coefficient or drop threshold belongs to.
 */
export const QUANTITIES = {
  youngs_modulus: {
    label: "Young's modulus",
    unit: 'MPa',
    variants: ['apparent', 'flesh'],
    hint: 'apparent = whole fruit between plates or under a probe; flesh = excised specimen',
  },
  poisson_ratio: { label: "Poisson's ratio", unit: '–', variants: [''], hint: '' },
  density: { label: 'Density', unit: 'kg/m³', variants: [''], hint: 'of the whole fruit or flesh' },
  diameter: {
    label: 'Diameter',
    unit: 'mm',
    variants: ['', 'equatorial', 'axial'],
    hint: 'typical size',
  },
  mass: { label: 'Mass', unit: 'g', variants: [''], hint: 'typical fruit' },
  static_bruise_threshold: {
    label: 'Static bruise threshold',
    unit: 'kPa',
    variants: [''],
    hint: 'contact pressure below which a held load leaves no bruise',
  },
  failure_stress: { label: 'Tissue failure stress', unit: 'kPa', variants: [''], hint: '' },
  bioyield_stress: {
    label: 'Bioyield stress',
    unit: 'kPa',
    variants: [''],
    hint: 'stress at the bioyield point, where cells begin to fail (force flattens as it deforms)',
  },
  penetrometer_firmness: {
    label: 'Penetrometer firmness',
    unit: 'N',
    variants: 'probe',
    hint: 'peak force of a flat-ended probe pushed into the flesh; the probe diameter is the variant',
  },
  impact_threshold_energy: {
    label: 'Impact bruise threshold (energy)',
    unit: 'J',
    variants: 'surface',
    hint: 'onto the named surface',
  },
  drop_threshold_height: {
    label: 'Drop bruise threshold (height)',
    unit: 'mm',
    variants: 'surface',
    hint: 'onto the named surface',
  },
  friction_coefficient: {
    label: 'Friction coefficient',
    unit: '–',
    variants: 'surface',
    hint: 'static, against the named surface',
  },
  bulk_density: { label: 'Bulk density', unit: 'kg/m³', variants: [''], hint: 'fruit in a bin' },
  lateral_pressure_ratio: {
    label: 'Lateral pressure ratio (bin)',
    unit: '–',
    variants: [''],
    hint: "Janssen's K",
  },
  bruise_susceptibility: {
    label: 'Bruise susceptibility (volume per impact energy)',
    unit: 'mm³/J',
    variants: 'surface-or-none',
    hint: 'slope of bruise volume against impact energy; the onset energy of the same fit is an impact threshold (energy) of the same source',
  },
  relaxation_k1: {
    label: 'Relaxation constant k₁ (Peleg)',
    unit: 's',
    variants: [''],
    hint: 'force held at a fixed deformation decays as 1 − t ÷ (k₁ + k₂ t); 1 ÷ k₁ is the initial rate',
  },
  relaxation_k2: {
    label: 'Relaxation constant k₂ (Peleg)',
    unit: '–',
    variants: [''],
    hint: '1 ÷ k₂ is the share of the held force that finally relaxes (give k₁ from the same test)',
  },
  angle_of_repose: {
    label: 'Angle of repose',
    unit: '°',
    variants: [''],
    hint: 'of a free-standing heap of the fruit (emptying or filling method)',
  },
} as const satisfies Record<
  string,
  {
    label: string;
    unit: string;
    variants: readonly string[] | 'surface' | 'surface-or-none' | 'probe';
    hint: string;
  }
>;

export type Quantity = keyof typeof QUANTITIES;
export const QUANTITY_KEYS = Object.keys(QUANTITIES) as Quantity[];

/** Named surfaces for friction and drop thresholds (a variant outside the list is refused). */
export const SURFACES = [
  'steel',
  'galvanised steel',
  'mild steel',
  'stainless steel',
  'aluminium',
  'glass',
  'plywood',
  'wood',
  'hard plastic',
  'belt rubber',
  'foam',
  'padded surface',
  'carton',
  'ground',
  'fruit',
  'rubber',
  'plastic',
  'concrete',
  'rigid plate',
] as const;

/** Probe diameters of the penetrometers quality labs use (Magness–Taylor 7.9 and 11.1 mm). */
export const PROBES = [
  '2 mm',
  '3 mm',
  '5 mm',
  '6 mm',
  '7.9 mm',
  '8 mm',
  '11.1 mm',
  '12 mm',
] as const;

/**
 * Ripeness stages a value may be staged by: a cultivar's firm (harvest), firm-ripe and ripe
 * (eating) fruit can differ two- or three-fold in modulus and threshold.
 */
export const STAGES = ['firm', 'firm-ripe', 'ripe'] as const;
export type Stage = (typeof STAGES)[number];
export const STAGE_LABELS: Record<Stage, string> = {
  firm: 'firm (harvest)',
  'firm-ripe': 'firm-ripe',
  ripe: 'ripe (eating)',
};

/**
 * What kind of observation a drop or impact figure is: the height or energy that left no bruise
 * (a threshold), the height or energy at which fruit did bruise (an upper bound: the safe value
 * lies below it), or a recommended maximum of a handling guide.
 */
export const OBSERVATIONS = ['no-bruise', 'bruised-at', 'recommended-max'] as const;
export type Observation = (typeof OBSERVATIONS)[number];
export const OBSERVATION_LABELS: Record<Observation, string> = {
  'no-bruise': 'no bruise at this level (threshold)',
  'bruised-at': 'fruit bruised at this level (upper bound)',
  'recommended-max': 'recommended maximum',
};
/** Quantities whose values must say what kind of observation they are. */
export const OBSERVED_QUANTITIES = ['drop_threshold_height', 'impact_threshold_energy'] as const;

/** Why a typical value is trusted at all: the trade's common practice, or recalled from memory. */
export const TYPICAL_BASES = ['common practice', 'from memory'] as const;
export type TypicalBasis = (typeof TYPICAL_BASES)[number];

const isOneOf =
  <T extends string>(list: readonly T[]) =>
  (v: string | null): T | null =>
    v !== null && (list as readonly string[]).includes(v) ? (v as T) : null;

/** A stored stage, observation or typical basis, or null when the column holds something else. */
export const asStage = isOneOf(STAGES);
export const asObservation = isOneOf(OBSERVATIONS);
export const asTypicalBasis = isOneOf(TYPICAL_BASES);

export function isQuantity(value: unknown): value is Quantity {
  return typeof value === 'string' && Object.hasOwn(QUANTITIES, value);
}

/** The variants a quantity accepts. */
export function variantsOf(quantity: Quantity): readonly string[] {
  const v = QUANTITIES[quantity].variants;
  if (v === 'surface') return SURFACES;
  // A surface only where the source names one (a pendulum's impactor often goes unnamed).
  if (v === 'surface-or-none') return ['', ...SURFACES];
  return v === 'probe' ? PROBES : v;
}

export const SOURCE_KINDS = [
  'paper',
  'thesis',
  'standard',
  'handbook',
  'report',
  'secondary',
  'memory',
  'demo',
] as const;
export type SourceKind = (typeof SOURCE_KINDS)[number];

export const REVISION_STATUSES = [
  'draft',
  'in_review',
  'returned',
  'published',
  'superseded',
] as const;
export type RevisionStatus = (typeof REVISION_STATUSES)[number];
