'use client';

import { parseNumberText, readerDecimalMark } from '@/lib/number-text';
import { diffRevisions, type DiffValue } from '@/lib/properties/diff';
import { isQuantity, QUANTITIES } from '@/lib/properties/quantities';
import type { ValueFields } from '@/lib/validation/revision-form';
import { RevisionDiff } from './revision-diff';

// Read as the server reads it ("20,5" = 20.5).
const numberOrNull = (text: string) => {
  const n = parseNumberText(text, readerDecimalMark());
  return n.ok ? n.value : null;
};

/** The form's rows as the diff compares them; a row without a quantity or a number is left out. */
function diffValuesOf(rows: ValueFields[]): DiffValue[] {
  return rows.flatMap((f) => {
    const value = numberOrNull(f.value);
    if (!isQuantity(f.quantity) || value === null) return [];
    return [
      {
        quantity: f.quantity,
        variant: f.variant,
        value,
        unit: QUANTITIES[f.quantity].unit,
        low: numberOrNull(f.low),
        high: numberOrNull(f.high),
        sd: numberOrNull(f.sd),
        sourceKey: f.sourceKey || null,
      },
    ];
  });
}

/** The draft as typed, against the newest published revision, updated with every keystroke. */
export function LiveDiff({
  rows,
  published,
  label,
}: {
  rows: ValueFields[];
  published: DiffValue[];
  label: string;
}) {
  const diff = diffRevisions(published, diffValuesOf(rows));
  return (
    <section className="space-y-2" data-testid="live-diff" aria-live="polite">
      <h3 className="text-sm font-semibold">Against the newest published revision ({label})</h3>
      <RevisionDiff rows={diff} baseLabel={label} />
    </section>
  );
}
