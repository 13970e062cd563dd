import { PropertiesTable } from '@/components/properties/properties-table';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { parseTableQuery, tableQueryString } from '@/lib/properties/table-query';
import { toTableRows } from '@/lib/properties/table-rows';

export const metadata = { title: 'Properties' };

type Props = { searchParams: Promise<Record<string, string | string[] | undefined>> };

export default async function PropertiesPage({ searchParams }: Props) {
  const actor = await requirePageActor('properties:read-published');
  const [cultivars, query] = await Promise.all([
    listPublishedCultivars(actor),
    searchParams.then(parseTableQuery),
  ]);
  const full = new URLSearchParams({ format: 'csv' });
  if (query.commodity) full.set('commodity', query.commodity);
  return (
    <section>
      <PageTitle title="Properties">
        Published, sourced values for each cultivar, in the unit each column names. Focus or hover a
        value for its source and the conditions it was measured under; open a cultivar for full
        citations. A dash means no published value.
      </PageTitle>
      {/* The view lives in the address: a navigation to another address remounts the table. */}
      <PropertiesTable key={tableQueryString(query)} rows={toTableRows(cultivars)} />
      <p className="mt-4 text-sm text-stone-600">
        Every published value with its conditions, one row per value:{' '}
        <a href={`/api/cultivars?${full}`} download className="text-leaf-700 underline">
          full CSV{query.commodity ? ' of this commodity' : ''}
        </a>
        .
      </p>
    </section>
  );
}
