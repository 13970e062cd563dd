import type { RevisionSummary } from '@/lib/properties/records';
import { STATUS_LABELS, pairAround } from '@/lib/properties/revision-labels';

const SELECT =
  'num block w-full rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm shadow-sm focus:border-leaf-600 focus:outline-none focus:ring-1 focus:ring-leaf-600';

/** Pick two revisions; a plain GET form, so it works before the page's script has loaded. */
export function CompareForm({
  slug,
  revisions,
  from,
  to,
}: {
  slug: string;
  revisions: RevisionSummary[];
  from?: number;
  to?: number;
}) {
  const pair = pairAround(
    revisions.map((r) => r.number),
    { from, to },
  );
  if (!pair) return <p className="text-sm text-stone-600">No revision to compare yet.</p>;
  const field = (name: 'from' | 'to', label: string, chosen: number) => (
    <div className="min-w-0 space-y-1">
      <label htmlFor={`compare-${name}`} className="block text-sm font-medium text-stone-800">
        {label}
      </label>
      <select
        // Keyed by what it shows: moving to another cultivar or pair without a full load (Back,
        // a link) must not keep the previous selection or fall back to the first, newest, option.
        key={`${slug}:${chosen}`}
        id={`compare-${name}`}
        name={name}
        defaultValue={chosen}
        className={SELECT}
      >
        {revisions.map((r) => (
          <option key={r.id} value={r.number}>
            Revision {r.number} · {STATUS_LABELS[r.status].toLowerCase()}
          </option>
        ))}
      </select>
    </div>
  );
  return (
    <form
      action={`/properties/${slug}/compare`}
      method="get"
      className="grid items-end gap-3 rounded-lg border border-stone-200 bg-white p-3 sm:grid-cols-[1fr_1fr_auto]"
      data-testid="compare-form"
    >
      {field('from', 'Older (before)', pair.from)}
      {field('to', 'Newer (after)', pair.to)}
      <button
        type="submit"
        className="rounded-md bg-leaf-700 px-3 py-1.5 text-sm font-medium text-white hover:bg-leaf-900 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600"
      >
        Compare revisions
      </button>
    </form>
  );
}
