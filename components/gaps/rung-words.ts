import { RUNG_LABELS } from '@/lib/evidence/rungs';
import type { GapCell, GapRung } from '@/lib/checks/gaps';

/** The rung of a cell in a word or two, as the matrix shows it (never colour alone). */
export function cellWord(cell: GapCell): string {
  return cell.rung === 'derived' && cell.fromOwn ? 'derived (own)' : cell.rung;
}

/** The rung in a sentence, for a cell's title and accessible name. */
export function cellSentence(cell: GapCell, isCommodityRecord: boolean): string {
  if (cell.note) return cell.note;
  if (cell.rung === 'missing') return 'No value on any rung.';
  if (cell.rung === 'own' && isCommodityRecord)
    return "The commodity record's own published value.";
  const from = cell.rung === 'derived' && cell.fromOwn ? ', from own values only' : '';
  const words = `${RUNG_LABELS[cell.rung]}${from}.`;
  return words[0].toUpperCase() + words.slice(1);
}

/** Colour adds to the word: strong evidence green, inherited blue, typical amber, none red. */
export const RUNG_TONE: Record<GapRung, string> = {
  own: 'bg-leaf-50 text-leaf-900',
  derived: 'bg-emerald-50 text-emerald-900',
  commodity: 'bg-sky-50 text-sky-900',
  typical: 'bg-amber-50 text-amber-900',
  missing: 'bg-red-50 text-red-800',
};

export const RUNG_FILTER_LABELS: Record<GapRung, string> = {
  own: 'own',
  commodity: 'commodity',
  derived: 'derived',
  typical: 'typical',
  missing: 'missing',
};
