import { formatDateTime } from '@/lib/dates';
import Link from 'next/link';
import { PageTitle } from '@/components/ui/page-title';
import { can } from '@/lib/auth/roles';
import { requirePageActor } from '@/lib/auth/session';
import { CHECKS } from '@/lib/checks/registry';
import { CHECK_NAMES_LIST } from '@/lib/validation/check-names';
import { listAssessments } from '@/lib/data/assessments';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('assessments:manage-own', 'Assessments');

const SORTS = {
  newest: (a: { id: number }, b: { id: number }) => b.id - a.id,
  title: (a: { title: string }, b: { title: string }) => a.title.localeCompare(b.title),
  margin: (a: { margin: number | null }, b: { margin: number | null }) =>
    (a.margin ?? Infinity) - (b.margin ?? Infinity),
} as const;

type Search = { check?: string; cultivar?: string; sort?: string };

export default async function AssessmentsPage({ searchParams }: { searchParams: Promise<Search> }) {
  const actor = await requirePageActor('assessments:manage-own');
  const q = await searchParams;
  const check = CHECK_NAMES_LIST.find((c) => c === q.check);
  const all = await listAssessments(actor, { check, cultivar: q.cultivar || undefined });
  const rows = all.map((a) => ({
    ...a,
    // Read through the check's own result schema, like the report.
    margin: CHECKS[a.check].show(a.results).margin?.value ?? null,
  }));
  const sort = (Object.keys(SORTS) as (keyof typeof SORTS)[]).find((s) => s === q.sort) ?? 'newest';
  rows.sort(SORTS[sort] as (a: (typeof rows)[number], b: (typeof rows)[number]) => number);
  const cultivars = [
    ...new Map(
      all.filter((a) => a.cultivarSlug).map((a) => [a.cultivarSlug!, a.cultivarName!]),
    ).entries(),
  ];
  const everyone = can(actor.role, 'assessments:read-all');
  return (
    <section>
      <PageTitle title="Assessments">
        Saved checks. Each keeps the property revision it used, so its report reads the same
        forever; when newer data is published it says so and offers a re-run beside it.
        {everyone ? ' As an admin you see everyone’s.' : ''}
      </PageTitle>
      <form className="mb-4 flex flex-wrap items-end gap-3 text-sm" method="get">
        <label>
          Check
          <select
            name="check"
            defaultValue={check ?? ''}
            className="ml-2 rounded-md border border-stone-300 bg-white px-2 py-1"
          >
            <option value="">all</option>
            {CHECK_NAMES_LIST.map((c) => (
              <option key={c} value={c}>
                {c}
              </option>
            ))}
          </select>
        </label>
        <label>
          Cultivar
          <select
            name="cultivar"
            defaultValue={q.cultivar ?? ''}
            className="ml-2 rounded-md border border-stone-300 bg-white px-2 py-1"
          >
            <option value="">all</option>
            {cultivars.map(([slug, name]) => (
              <option key={slug} value={slug}>
                {name}
              </option>
            ))}
          </select>
        </label>
        <label>
          Sort
          <select
            name="sort"
            defaultValue={sort}
            className="ml-2 rounded-md border border-stone-300 bg-white px-2 py-1"
          >
            <option value="newest">newest first</option>
            <option value="title">title</option>
            <option value="margin">smallest margin first</option>
          </select>
        </label>
        <button type="submit" className="rounded-md border border-stone-300 bg-white px-3 py-1">
          Apply
        </button>
      </form>
      {rows.length === 0 ? (
        <p
          className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600"
          data-testid="assessments-empty"
        >
          No saved assessments
          {check || q.cultivar ? ' match these filters' : ' yet: run a check and save it'}.
        </p>
      ) : (
        <form action="/assessments/compare" method="get" className="space-y-2">
          <ul
            className="divide-y divide-stone-200 rounded-lg border border-stone-200 bg-white"
            data-testid="assessments-list"
          >
            {rows.map((a) => (
              <li
                key={a.id}
                className="flex flex-wrap items-baseline justify-between gap-2 p-3 text-sm"
              >
                <div className="min-w-0">
                  {a.check === 'squeeze' ? (
                    <input
                      type="checkbox"
                      name="ids"
                      value={a.id}
                      aria-label={`Compare ${a.title}`}
                      className="mr-2"
                    />
                  ) : null}
                  <Link
                    href={`/assessments/${a.id}`}
                    className="font-medium text-leaf-700 underline [overflow-wrap:anywhere]"
                  >
                    {a.title}
                  </Link>
                  <span className="ml-2 text-xs text-stone-500">
                    {a.check} check · version {a.version}
                    {a.cultivarName
                      ? ` · ${a.cultivarName}, revision ${a.revisionNumber}`
                      : ' · custom values'}
                    {everyone ? ` · ${a.ownerName}` : ''}
                  </span>
                  {a.newerRevision ? (
                    <span className="ml-2 rounded bg-amber-100 px-1.5 text-xs text-amber-900">
                      newer data: revision {a.newerRevision.number}
                    </span>
                  ) : null}
                  {a.newerCommodityRevision ? (
                    <span className="ml-2 rounded bg-amber-100 px-1.5 text-xs text-amber-900">
                      newer commodity data: revision {a.newerCommodityRevision.number}
                    </span>
                  ) : null}
                </div>
                <div className="num text-right">
                  {a.margin === null ? '—' : `margin ${a.margin.toFixed(2)}`}
                  <span className="block text-xs text-stone-500">
                    {formatDateTime(a.createdAt)}
                  </span>
                </div>
              </li>
            ))}
          </ul>
          <button
            type="submit"
            className="rounded-md border border-stone-300 bg-white px-3 py-1 text-sm"
          >
            Compare the ticked squeeze checks
          </button>
        </form>
      )}
    </section>
  );
}
