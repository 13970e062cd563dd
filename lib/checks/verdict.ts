/**
 * Our own reading of a bruise margin (threshold ÷ load effect): at least 1.5 leaves room for the
 * spread of published values; 1.0 to 1.5 works on paper but not with confidence; below 1.0 the
 * estimate says the fruit bruises. Stated on every page that shows a verdict.
 */
export const VERDICT_BANDS = { comfortable: 1.5, tight: 1.0 } as const;

export type Verdict = 'comfortable' | 'tight' | 'bruise risk';

export function verdictOf(margin: number): Verdict {
  if (margin >= VERDICT_BANDS.comfortable) return 'comfortable';
  if (margin >= VERDICT_BANDS.tight) return 'tight';
  return 'bruise risk';
}

export const VERDICT_RULE =
  'Comfortable: margin 1.5 or more. Tight: 1.0 to 1.5. Bruise risk: below 1.0. These bands are ' +
  "Tenderline's own reading, not a standard.";
