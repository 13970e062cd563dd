import Link from 'next/link';
import { z } from 'zod';
import { FromMemoryList } from '@/components/gaps/from-memory-list';
import { GapFilters } from '@/components/gaps/gap-filters';
import { GapMatrix } from '@/components/gaps/gap-matrix';
import { GapSummary } from '@/components/gaps/gap-summary';
import { MostWanted } from '@/components/gaps/most-wanted';
import { RUNG_TONE } from '@/components/gaps/rung-words';
import { StartDraftTarget } from '@/components/gaps/start-draft-target';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { checkSummaries, dataGaps, GAP_RUNGS, mostWanted, selectRows } from '@/lib/checks/gaps';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { listEditorQueue } from '@/lib/data/editor-queue';
import { getUnitSystem } from '@/lib/data/users';
import { valuesFromMemory } from '@/lib/evidence/memory-values';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('editor:use', 'Data gaps');

// Unknown or malformed parameters fall back to the plain view rather than failing the page.
const querySchema = z.object({
  sort: z.enum(['name', 'own']).catch('name'),
  commodity: z
    .string()
    .regex(/^[a-z0-9-]{1,80}$/)
    .optional()
    .catch(undefined),
  rung: z.enum(GAP_RUNGS).optional().catch(undefined),
});

const LEGEND = [
  ['own', "the record's own published value (a commodity record's too)"],
  ['derived', 'derived from published values; "derived (own)" from the record\'s own only'],
  ['commodity', "inherited from the commodity record's published value"],
  ['typical', 'a typical value of the trade, no single source'],
  ['missing', 'no value on any rung'],
] as const;

export default async function DataGapsPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const actor = await requirePageActor('editor:use');
  const raw = await searchParams;
  const query = querySchema.parse({
    sort: raw.sort,
    commodity: raw.commodity || undefined,
    rung: raw.rung || undefined,
  });
  const [records, queue, system] = await Promise.all([
    listPublishedCultivars(actor),
    listEditorQueue(actor),
    getUnitSystem(actor),
  ]);
  const gaps = dataGaps(records);
  // The actor's newest open draft of each record (the queue lists the newest first).
  const drafts = new Map<string, number>();
  for (const r of queue.mine)
    if ((r.status === 'draft' || r.status === 'returned') && !drafts.has(r.cultivarSlug))
      drafts.set(r.cultivarSlug, r.id);
  const commodities = [...new Map(records.map((r) => [r.commodity.slug, r.commodity])).values()];
  const rows = selectRows(gaps.rows, query);
  return (
    <div>
      <p className="mb-2 text-sm">
        <Link href="/editor" className="text-leaf-700 underline-offset-2 hover:underline">
          ← Editor
        </Link>
      </p>
      <PageTitle title="Data gaps">
        Where each figure the squeeze, drop and stack checks take comes from, for every published
        record, with nothing typed but the machine: the same evidence ladder the checks climb. A
        cell opens your draft of the record, or starts one.
      </PageTitle>
      <section aria-labelledby="per-check" className="mb-8">
        <h2 id="per-check" className="mb-3 font-semibold">
          Cultivars per check
        </h2>
        <GapSummary summaries={checkSummaries(gaps.rows)} />
      </section>
      <section aria-labelledby="most-wanted" className="mb-8">
        <h2 id="most-wanted" className="mb-1 font-semibold">
          Most wanted measurements
        </h2>
        <p className="mb-3 max-w-3xl text-sm text-stone-600">
          Figures that are not yet a record&apos;s own, ranked by how many check inputs a
          measurement would make own data: each check taking the figure counts once, and a commodity
          record&apos;s gap also counts for every cultivar that falls to a typical value or nothing
          for it.
        </p>
        <MostWanted wanted={mostWanted(gaps.rows, 15)} />
      </section>
      <section aria-labelledby="from-memory-heading" className="mb-8">
        <h2 id="from-memory-heading" className="mb-1 font-semibold">
          Values from memory, to check
        </h2>
        <p className="mb-3 max-w-3xl text-sm text-stone-600">
          Published values that rest on a source recalled but not re-read, or on a typical value
          recalled. Check each against the original and revise the record, or replace it with a
          measured value.
        </p>
        <FromMemoryList values={valuesFromMemory(records)} system={system} />
      </section>
      <section aria-labelledby="matrix">
        <h2 id="matrix" className="mb-3 font-semibold">
          Records and figures
        </h2>
        <GapFilters commodities={commodities} query={query} />
        <ul className="my-3 flex flex-wrap gap-x-4 gap-y-1 text-xs text-stone-700" aria-label="Key">
          {LEGEND.map(([rung, words]) => (
            <li key={rung}>
              <span className={`rounded px-1.5 py-0.5 font-medium ${RUNG_TONE[rung]}`}>{rung}</span>{' '}
              {words}
            </li>
          ))}
        </ul>
        <p className="mb-2 text-sm text-stone-600" data-testid="gap-count">
          {rows.length} of {gaps.rows.length} records
        </p>
        <StartDraftTarget />
        <GapMatrix figures={gaps.figures} rows={rows} drafts={drafts} />
      </section>
    </div>
  );
}
