'use client';

import Link from 'next/link';
import { useUnits } from '@/components/units/units-provider';
import { QUANTITIES, type Quantity } from '@/lib/properties/quantities';
import { rangeAcross, type TableRow } from '@/lib/properties/table-rows';
import { ConditionText } from './condition-text';
import { ValueButton } from './value-button';

/** Shown where no source gives the quantity: a dash to the eye, the words to a screen reader. */
export function NoValue() {
  return (
    <span className="text-stone-400">
      <span aria-hidden="true">—</span>
      <span className="sr-only">no published value</span>
    </span>
  );
}

const SHOWN = 2;

/** A quantity's published values in one cultivar: the first two, then "+n" with the range. */
export function ValueCell({ row, quantity }: { row: TableRow; quantity: Quantity }) {
  const { system } = useUnits();
  const values = row.values[quantity];
  if (!values.length) return <NoValue />;
  const label = QUANTITIES[quantity].label;
  const more = values.length - SHOWN;
  return (
    <ul className="space-y-0.5">
      {values.slice(0, SHOWN).map((v, i) => (
        <li key={i} className="flex flex-wrap items-baseline gap-x-1">
          <ValueButton label={label} value={v} />
          {v.variant ? (
            <span className="text-xs text-stone-500">
              <ConditionText text={v.variant} />
            </span>
          ) : null}
          {v.isTypicalDefault ? (
            <span className="rounded bg-clay-50 px-1 text-xs text-clay-700">typical</span>
          ) : null}
        </li>
      ))}
      {more > 0 ? (
        <li className="text-xs text-stone-500">
          <Link href={`/properties/${row.slug}`} className="underline">
            +{more} more
          </Link>{' '}
          (<span className="num">{rangeAcross(values, system)}</span> across sources)
        </li>
      ) : null}
    </ul>
  );
}
