import type { WantedMeasurement } from '@/lib/checks/gaps';

function why(w: WantedMeasurement): string {
  const own = `${w.ownInputs} input${w.ownInputs === 1 ? '' : 's'} of this record`;
  if (!w.inheritingCultivars) return own;
  const heirs = `${w.inheritedInputs} of ${w.inheritingCultivars} cultivar${w.inheritingCultivars === 1 ? '' : 's'} inheriting it`;
  return `${own} + ${heirs}`;
}

/** The measurements that would move the most check inputs to a record's own data. */
export function MostWanted({ wanted }: { wanted: WantedMeasurement[] }) {
  if (!wanted.length) return <p className="text-sm text-stone-600">Nothing is missing.</p>;
  return (
    <ol className="space-y-2 text-sm" data-testid="most-wanted">
      {wanted.map((w) => (
        <li
          key={`${w.slug}:${w.figure}`}
          className="flex flex-col gap-x-3 rounded-md border border-stone-200 bg-white px-3 py-2 sm:flex-row sm:items-baseline"
        >
          <span className="shrink-0 font-semibold tabular-nums text-stone-900">
            {w.score} input{w.score === 1 ? '' : 's'}
          </span>
          <span>
            <strong className="font-medium">{w.figure}</strong> of{' '}
            {w.isCommodityRecord
              ? `the ${w.commodity.toLowerCase()} commodity record`
              : `${w.commodity}, ${w.name}`}{' '}
            <span className="text-stone-600">
              (now {w.rung}; {why(w)})
            </span>
          </span>
        </li>
      ))}
    </ol>
  );
}
