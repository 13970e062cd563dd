/**
 * The evidence ladder: where a figure a check uses came from, strongest first. A check takes
 * each figure from the first rung that has it; what the user typed always wins.
 */
export const RUNGS = ['own', 'commodity', 'derived', 'typical', 'entered'] as const;
export type Rung = (typeof RUNGS)[number];

/** The rung in words, as every page, report and export names it. */
export const RUNG_LABELS: Record<Rung, string> = {
  own: "this cultivar's published value",
  commodity: "the commodity's published value",
  derived: 'derived from published values',
  typical: 'typical value of the trade (no single source)',
  entered: 'entered by you',
};

/** Short names for table cells (words, never colour alone). */
export const RUNG_SHORT: Record<Rung, string> = {
  own: 'own',
  commodity: 'commodity',
  derived: 'derived',
  typical: 'typical',
  entered: 'entered',
};

/** How strong the evidence of a rung is: higher is stronger. What the user typed is theirs. */
const STRENGTH: Record<Rung, number> = { own: 4, derived: 3, commodity: 2, typical: 1, entered: 5 };

/** True when rung `a` is stronger evidence than rung `b`. */
export function isStronger(a: Rung, b: Rung): boolean {
  return STRENGTH[a] > STRENGTH[b];
}

/**
 * The weakest rung among the figures a verdict rests on, or null when every figure was typed.
 * A derived figure is as weak as the weakest figure it was derived from (`inputs`).
 */
export function weakestRung(rungs: readonly Rung[]): Rung | null {
  const ranked = rungs.filter((r) => r !== 'entered');
  if (!ranked.length) return null;
  return ranked.reduce((a, b) => (STRENGTH[b] < STRENGTH[a] ? b : a));
}

/** "rests on a commodity value for the bruise threshold" — the verdict's evidence in words. */
export function restsOn(rung: Rung | null, what: string[]): string {
  if (rung === null) return 'rests on the figures you entered';
  if (rung === 'own') return "rests on this cultivar's own published values";
  const kind =
    rung === 'commodity'
      ? 'a commodity value'
      : rung === 'derived'
        ? 'a derived value'
        : 'a typical value of the trade';
  const list = new Intl.ListFormat('en', { style: 'long', type: 'conjunction' }).format(what);
  return `rests on ${kind} for ${list}`;
}

/** Where a used figure came from, in words: its rung, source and note (reports, PDFs, CSVs). */
export function rungText(v: { rung: Rung; source: string | null; note: string | null }): string {
  return [RUNG_LABELS[v.rung], v.source, v.note].filter(Boolean).join(' — ');
}
