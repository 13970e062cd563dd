import { MARGIN_BANDS_TEXT, marginVerdict, type MarginVerdict } from '@/lib/atlas/margin';

const LOOK: Record<MarginVerdict, string> = {
  comfortable: 'border-leaf-600 bg-leaf-50 text-leaf-900',
  tight: 'border-amber-500 bg-amber-50 text-amber-900',
  'bruise risk': 'border-red-600 bg-red-50 text-red-900',
};

const BASIS = { static: 'static load', impact: 'impact' } as const;

/** A bruise margin (threshold ÷ peak pressure) with its verdict word and the bands in words. */
export function MarginBadge({
  margin,
  basis = 'static',
}: {
  margin: number;
  basis?: keyof typeof BASIS;
}) {
  const verdict = marginVerdict(Number(margin));
  const basisText = BASIS[basis] ?? BASIS.static;
  if (!verdict) {
    return (
      <span className="rounded border border-stone-300 px-1.5 py-0.5 text-xs text-stone-600">
        no margin given
      </span>
    );
  }
  const shown = Number(margin).toFixed(2);
  return (
    <span
      className={`inline-flex items-baseline gap-1.5 rounded border px-1.5 py-0.5 text-xs font-medium whitespace-nowrap ${LOOK[verdict]}`}
      title={MARGIN_BANDS_TEXT}
      data-testid="margin-badge"
    >
      <span aria-hidden="true" className="num">
        ×{shown}
      </span>
      <span aria-hidden="true">{verdict}</span>
      <span className="sr-only">
        Bruise margin {shown} ({basisText}): {verdict}. {MARGIN_BANDS_TEXT}
      </span>
    </span>
  );
}
