/**
 * Pad facings offered as presets. Rubber moduli follow from typical Shore A hardness of the
 * product class by Gent's relation between indentation hardness and Young's modulus (A. N. Gent,
 * Trans. Inst. Rubber Ind. 34:46, 1958 [from memory]): about 1.1 MPa at 30 Shore A, 3.6 MPa at
 * 60. The foam is a typical closed-cell polyethylene pad. All are typical values, not
 * measurements of a named product: check the actual facing.
 */
export const FACING_PRESETS = {
  rigid: {
    label: 'Rigid pad (no facing)',
    modulusMpa: null,
    thicknessMm: null,
    poisson: null,
    basis: 'Metal or hard plastic face.',
  },
  'soft-silicone': {
    label: 'Soft silicone, 3 mm (≈ 30 Shore A)',
    modulusMpa: 1.1,
    thicknessMm: 3,
    poisson: 0.48,
    basis: 'Typical: 30 Shore A by Gent (1958) ≈ 1.1 MPa.',
  },
  neoprene: {
    label: 'Neoprene, 3 mm (≈ 60 Shore A)',
    modulusMpa: 3.6,
    thicknessMm: 3,
    poisson: 0.48,
    basis: 'Typical: 60 Shore A by Gent (1958) ≈ 3.6 MPa.',
  },
  'pe-foam': {
    label: 'Closed-cell PE foam, 5 mm',
    modulusMpa: 0.3,
    thicknessMm: 5,
    poisson: 0.3,
    basis: 'Typical value for a low-density polyethylene foam pad (0.1–0.5 MPa).',
  },
  custom: {
    label: 'Custom facing',
    modulusMpa: null,
    thicknessMm: null,
    poisson: null,
    basis: 'Entered by you.',
  },
} as const;

export type FacingPreset = keyof typeof FACING_PRESETS;
export const FACING_KEYS = Object.keys(FACING_PRESETS) as FacingPreset[];

/** Surfaces whose published friction applies to a pad of this facing, in preference order. */
export function frictionSurfacesFor(facing: FacingPreset): string[] {
  if (facing === 'rigid')
    return [
      'stainless steel',
      'steel',
      'aluminium',
      'mild steel',
      'galvanised steel',
      'hard plastic',
      'plastic',
    ];
  if (facing === 'pe-foam') return ['foam', 'padded surface', 'belt rubber', 'rubber'];
  return ['belt rubber', 'rubber', 'padded surface', 'foam'];
}
