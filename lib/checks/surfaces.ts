/**
 * Counterfaces a fruit lands on. Values for steel are handbook figures; those for hard plastic
 * and belt rubber are typical engineering values for the material class (no single source),
 * marked as such on the page. Foam and padded surfaces are entered by the user.
 */
export const DROP_SURFACES = {
  steel: {
    label: 'Steel',
    modulusMpa: 200_000,
    poisson: 0.3,
    basis: 'Handbook value for structural steel (E ≈ 200 GPa, ν ≈ 0.3).',
    // A rigid plate, concrete or aluminium is as hard as steel beside a fruit: their figures apply.
    thresholdVariants: [
      'steel',
      'stainless steel',
      'mild steel',
      'galvanised steel',
      'aluminium',
      'rigid plate',
      'concrete',
    ],
  },
  'hard plastic': {
    label: 'Hard plastic (polyethylene)',
    modulusMpa: 1000,
    poisson: 0.42,
    basis:
      'Typical value for high-density polyethylene (E ≈ 0.8–1.2 GPa); not from a single source.',
    thresholdVariants: ['hard plastic', 'plastic'],
  },
  'belt rubber': {
    label: 'Conveyor belt rubber',
    modulusMpa: 5,
    poisson: 0.49,
    basis:
      'Typical value for a belt cover rubber of about 60 Shore A (E ≈ 3–8 MPa); not from a single source.',
    thresholdVariants: ['belt rubber', 'rubber'],
  },
  foam: {
    label: 'Foam or padded surface',
    modulusMpa: null,
    poisson: 0.3,
    basis: 'Entered by you: the modulus and thickness of the padding.',
    thresholdVariants: ['foam', 'padded surface'],
  },
  fruit: {
    label: 'Another fruit',
    modulusMpa: null,
    poisson: null,
    basis: 'The same fruit, held still (the struck fruit does not recoil — the harsher case).',
    thresholdVariants: ['fruit'],
  },
} as const;

export type DropSurface = keyof typeof DROP_SURFACES;
export const DROP_SURFACE_KEYS = Object.keys(DROP_SURFACES) as DropSurface[];
