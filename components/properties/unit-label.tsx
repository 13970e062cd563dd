'use client';

import { useUnits } from '@/components/units/units-provider';
import type { Quantity } from '@/lib/properties/quantities';
import { unitLabel } from '@/lib/properties/view-csv';

/** A quantity's unit in the reader's system (`MPa` or `psi`), in words where it has none. */
export function UnitLabel({ q }: { q: Quantity }) {
  const { system } = useUnits();
  return <>{unitLabel(q, system)}</>;
}
