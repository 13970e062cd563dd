import type { Metadata } from 'next';
import Link from 'next/link';
import { CompareForm } from '@/components/properties/compare-form';
import { RevisionDiff } from '@/components/properties/revision-diff';
import { requirePageActor } from '@/lib/auth/session';
import { getRevision, listRevisions } from '@/lib/data/cultivars';
import { toDiffValue } from '@/lib/data/follows';
import type { SourceRef } from '@/lib/properties/records';
import { diffRevisions } from '@/lib/properties/diff';
import { chosenRevision, pairAround } from '@/lib/properties/revision-labels';
import { titleFor } from '@/lib/page-title';
import { getCultivarOr404 } from '../lookup';

type Props = {
  params: Promise<{ slug: string }>;
  searchParams: Promise<Record<string, string | string[] | undefined>>;
};

export async function generateMetadata(): Promise<Metadata> {
  return titleFor('properties:read-history', 'Compare revisions')();
}

/** The values of any two revisions side by side, changes highlighted (history readers only). */
export default async function ComparePage({ params, searchParams }: Props) {
  const actor = await requirePageActor('properties:read-history');
  const cultivar = await getCultivarOr404(actor, (await params).slug);
  const revisions = await listRevisions(actor, cultivar.slug);
  const query = await searchParams;
  const numbers = revisions.map((r) => r.number);
  const to = chosenRevision(query.to, numbers, pairAround(numbers)?.to ?? null);
  const from = chosenRevision(
    query.from,
    numbers,
    pairAround(numbers, { to: to.number })?.from ?? null,
  );
  const a = revisions.find((r) => r.number === from.number);
  const b = revisions.find((r) => r.number === to.number);
  const [before, after] = await Promise.all(
    [a, b].map((r) => (r ? getRevision(actor, r.id) : null)),
  );
  const sources: Record<string, SourceRef> = {};
  for (const v of [...(before?.values ?? []), ...(after?.values ?? [])]) {
    if (v.source) sources[v.source.key] = v.source;
  }
  const problems = [from.problem, to.problem].filter(Boolean);
  return (
    <article className="space-y-5">
      <header className="border-b border-stone-200 pb-4">
        <Link href={`/properties/${cultivar.slug}`} className="text-sm text-leaf-700 underline">
          ← {cultivar.commodity.name}, {cultivar.name}
        </Link>
        <h1 className="mt-2 text-2xl font-semibold tracking-tight">Compare revisions</h1>
        <p className="mt-1 text-sm text-stone-600">
          {cultivar.commodity.name}, {cultivar.name}: what changed between two revisions.
        </p>
      </header>
      <CompareForm
        slug={cultivar.slug}
        revisions={revisions}
        from={from.number ?? undefined}
        to={to.number ?? undefined}
      />
      {before && after ? (
        <RevisionDiff
          rows={diffRevisions(before.values.map(toDiffValue), after.values.map(toDiffValue))}
          sources={sources}
          before={`Revision ${before.number} (before)`}
          after={`Revision ${after.number} (after)`}
        />
      ) : (
        <p
          role="alert"
          data-testid="compare-problem"
          className="rounded-md bg-red-50 px-3 py-2 text-sm text-red-800"
        >
          {problems.join(' ')} Choose two revisions from the lists.
        </p>
      )}
    </article>
  );
}
