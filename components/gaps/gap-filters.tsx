import { GAP_RUNGS, type GapRung, type GapSort } from '@/lib/checks/gaps';
import { RUNG_FILTER_LABELS } from './rung-words';

const SELECT =
  'mt-1 block w-full rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600';

/** Plain GET controls: the view lives in the address, so a link opens the same view. */
export function GapFilters({
  commodities,
  query,
}: {
  commodities: { slug: string; name: string }[];
  query: { sort: GapSort; commodity?: string; rung?: GapRung };
}) {
  return (
    <form method="get" className="flex flex-wrap items-end gap-3" data-testid="gap-filters">
      <div className="min-w-36 flex-1 text-sm sm:flex-none">
        <label htmlFor="gaps-sort">Sort by</label>
        <select id="gaps-sort" name="sort" defaultValue={query.sort} className={SELECT}>
          <option value="name">Name</option>
          <option value="own">Most own values</option>
        </select>
      </div>
      <div className="min-w-36 flex-1 text-sm sm:flex-none">
        <label htmlFor="gaps-commodity">Commodity</label>
        <select
          id="gaps-commodity"
          name="commodity"
          defaultValue={query.commodity ?? ''}
          className={SELECT}
        >
          <option value="">All</option>
          {commodities.map((c) => (
            <option key={c.slug} value={c.slug}>
              {c.name}
            </option>
          ))}
        </select>
      </div>
      <div className="min-w-36 flex-1 text-sm sm:flex-none">
        <label htmlFor="gaps-rung">With a cell on</label>
        <select id="gaps-rung" name="rung" defaultValue={query.rung ?? ''} className={SELECT}>
          <option value="">Any rung</option>
          {GAP_RUNGS.map((r) => (
            <option key={r} value={r}>
              {RUNG_FILTER_LABELS[r]}
            </option>
          ))}
        </select>
      </div>
      <button
        type="submit"
        className="rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium text-stone-800 hover:bg-stone-100 focus-visible:ring-2 focus-visible:ring-leaf-600"
      >
        Show
      </button>
    </form>
  );
}
