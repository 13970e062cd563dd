import { AtlasCard } from '@/components/atlas/atlas-card';
import { PageTitle } from '@/components/ui/page-title';
import { listAtlasFamilies } from '@/lib/atlas/entries';
import { headingId } from '@/lib/atlas/sections';
import { requirePageActor } from '@/lib/auth/session';

export const metadata = { title: 'Atlas' };

export default async function AtlasPage() {
  const actor = await requirePageActor('atlas:read');
  const families = await listAtlasFamilies(actor);
  return (
    <section>
      <PageTitle title="Atlas">
        How each commodity bruises and how to handle it at every stage of the line, with the
        published values behind the advice. Each article has a printable handling sheet.
      </PageTitle>
      {families.length === 0 ? (
        <p className="text-sm text-stone-600">No commodities are in the property database yet.</p>
      ) : null}
      {families.map(({ family, entries }) => (
        <section key={family} aria-labelledby={`family-${headingId(family)}`} className="mb-10">
          <h2
            id={`family-${headingId(family)}`}
            className="mb-3 text-lg font-semibold text-stone-800"
          >
            {family}
          </h2>
          <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3">
            {entries.map((entry) => (
              <AtlasCard key={entry.commodity.slug} entry={entry} />
            ))}
          </ul>
        </section>
      ))}
    </section>
  );
}
