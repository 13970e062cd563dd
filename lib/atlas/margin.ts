/**
 * The verdict words for a bruise margin (threshold ÷ peak contact pressure). The bands are the
 * product's own screening convention, stated wherever a verdict is shown.
 */
export const MARGIN_BANDS = { comfortable: 1.5, tight: 1.0 } as const;

export type MarginVerdict = 'comfortable' | 'tight' | 'bruise risk';

export function marginVerdict(margin: number): MarginVerdict | null {
  if (!Number.isFinite(margin) || margin <= 0) return null;
  if (margin >= MARGIN_BANDS.comfortable) return 'comfortable';
  if (margin >= MARGIN_BANDS.tight) return 'tight';
  return 'bruise risk';
}

const one = (x: number) => x.toFixed(1);
export const MARGIN_BANDS_TEXT =
  `Margins of ${one(MARGIN_BANDS.comfortable)} or more are comfortable, ` +
  `${one(MARGIN_BANDS.tight)} to ${one(MARGIN_BANDS.comfortable)} tight, ` +
  `below ${one(MARGIN_BANDS.tight)} a bruise risk.`;
