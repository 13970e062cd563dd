import { formatDate } from '@/lib/dates';
import Link from 'next/link';
import type { Actor } from '@/lib/auth/actor';
import { cardRows, type CardRow } from '@/lib/atlas/card-rows';
import { getCultivar } from '@/lib/data/cultivars';
import { getUnitSystem } from '@/lib/data/users';

function Citation({ row, citedKeys }: { row: CardRow; citedKeys: ReadonlySet<string> }) {
  if (!row.citation) return null;
  const text = `(${row.citation})`;
  return row.sourceKey && citedKeys.has(row.sourceKey) ? (
    <a href={`#source-${row.sourceKey}`} className="text-leaf-700 underline underline-offset-2">
      {text}
    </a>
  ) : (
    <span>{text}</span>
  );
}

/**
 * A cultivar's current published values, read from the database on every render, so an article
 * shows the newest published revision as soon as it is published.
 */
export async function LiveValues({
  actor,
  cultivar,
  citedKeys = new Set(),
}: {
  actor: Actor;
  cultivar: string;
  citedKeys?: ReadonlySet<string>;
}) {
  const record = await getCultivar(actor, cultivar);
  const rows = cardRows(record, await getUnitSystem(actor));
  const published = record.published;
  return (
    <aside
      aria-label={`Published values: ${record.name}`}
      data-testid={`live-values-${record.slug}`}
      className="my-6 rounded-lg border border-leaf-100 bg-white p-4 text-sm shadow-sm break-inside-avoid lg:float-right lg:ml-6 lg:w-96"
    >
      <p className="text-xs font-medium tracking-wide text-leaf-700 uppercase">Live values</p>
      <p className="mt-0.5 font-semibold text-stone-900">
        {record.name} <span className="font-normal text-stone-500">· {record.commodity.name}</span>
      </p>
      <p className="text-xs text-stone-500">
        {published
          ? `Revision ${published.number}, published ${formatDate(published.publishedAt)}`
          : 'Nothing published yet'}
        {published?.isDemo ? ' · demo values' : ''}
      </p>
      <dl className="mt-3 divide-y divide-stone-100">
        {rows.map((row, i) => (
          <div key={`${row.quantity}-${i}`} className="py-1.5" data-quantity={row.quantity}>
            <dt className="text-stone-600">{row.label}</dt>
            <dd className={row.value ? 'text-stone-900' : 'text-stone-400 italic'}>
              {row.value ? <span className="num">{row.value}</span> : 'no published value'}{' '}
              <Citation row={row} citedKeys={citedKeys} />
              {row.conditions ? (
                <span className="block text-xs text-stone-500">{row.conditions}</span>
              ) : null}
            </dd>
          </div>
        ))}
      </dl>
      <Link
        href={`/properties/${record.slug}`}
        className="mt-2 inline-block text-leaf-700 underline underline-offset-2"
      >
        All values and conditions for {record.name}
      </Link>
    </aside>
  );
}
