import Link from 'next/link';
import type { MemoryValue } from '@/lib/evidence/memory-values';
import { formatMeasure, type UnitSystem } from '@/lib/units';

/** Published values that rest on memory, each to be checked against its original. */
export function FromMemoryList({ values, system }: { values: MemoryValue[]; system: UnitSystem }) {
  if (!values.length) {
    return (
      <p className="text-sm text-stone-600" data-testid="from-memory-empty">
        No published value rests on memory.
      </p>
    );
  }
  return (
    <ul className="space-y-2 text-sm" data-testid="from-memory">
      {values.map((v, i) => (
        <li
          key={`${v.slug}:${v.figure}:${i}`}
          className="flex flex-col gap-x-3 rounded-md border border-stone-200 bg-white px-3 py-2 sm:flex-row sm:items-baseline"
          data-testid="from-memory-value"
        >
          <span className="shrink-0 font-medium text-stone-900">
            <Link href={`/properties/${v.slug}`} className="text-leaf-700 underline">
              {v.record}
            </Link>
          </span>
          <span>
            {v.figure}: <span className="num">{formatMeasure(v.value, v.unit, system)}</span>{' '}
            <span className="text-stone-600">· {v.from}</span>
          </span>
        </li>
      ))}
    </ul>
  );
}
