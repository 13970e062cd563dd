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
} as const satisfies Record<
  string,
  { label: string; unit: string; variants: readonly string[] | 'surface'; hint: string }
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
] as const;

export function isQuantity(value: unknown): value is Quantity {
  return typeof value === 'string' && Object.hasOwn(QUANTITIES, value);
}

/** The variants a quantity accepts. */
export function variantsOf(quantity: Quantity): readonly string[] {
  const v = QUANTITIES[quantity].variants;
  return v === 'surface' ? SURFACES : v;
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
