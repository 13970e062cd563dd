import type { RevisionValue } from '@/lib/properties/records';
import { QUANTITIES, QUANTITY_KEYS, type Quantity } from '@/lib/properties/quantities';
import { UnitLabel } from './unit-label';
import { ValueCard } from './value-card';

function Heading({ q }: { q: Quantity }) {
  const { label, hint } = QUANTITIES[q];
  return (
    <h3 id={`q-${q}`} className="flex flex-wrap items-baseline gap-x-2 font-semibold">
      {label}
      <span className="text-sm font-normal text-stone-500">
        <UnitLabel q={q} />
        {hint ? ` · ${hint}` : ''}
      </span>
    </h3>
  );
}

/**
 * Every quantity of the catalogue: those with published values in full, in the catalogue's
 * order, then the rest in a compact list that says, for each, "no published value".
 */
export function QuantityList({ values }: { values: RevisionValue[] }) {
  const given = QUANTITY_KEYS.filter((q) => values.some((v) => v.quantity === q));
  const missing = QUANTITY_KEYS.filter((q) => !given.includes(q));
  return (
    <div className="space-y-5">
      {given.map((q) => (
        <section key={q} aria-labelledby={`q-${q}`} data-testid={`quantity-${q}`}>
          <Heading q={q} />
          <ul className="mt-2 space-y-2">
            {values
              .filter((v) => v.quantity === q)
              .map((v) => (
                <ValueCard key={v.id} value={v} />
              ))}
          </ul>
        </section>
      ))}
      {missing.length ? (
        <section aria-labelledby="q-missing">
          <h3 id="q-missing" className="font-semibold">
            Not yet published for this cultivar
          </h3>
          <ul className="mt-2 grid gap-x-6 gap-y-1 rounded-md border border-dashed border-stone-300 bg-white p-3 text-sm sm:grid-cols-2">
            {missing.map((q) => (
              <li key={q} data-testid={`quantity-${q}`} className="text-stone-600">
                <span className="font-medium text-stone-800">{QUANTITIES[q].label}</span> (
                <UnitLabel q={q} />
                ): no published value
              </li>
            ))}
          </ul>
        </section>
      ) : null}
    </div>
  );
}
