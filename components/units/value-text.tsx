'use client';

import { formatValueIn } from '@/lib/properties/format-units';
import { useUnits } from './units-provider';

/** A stored value with its spread, in the reader's units. */
export function ValueText({
  value,
}: {
  value: {
    value: number;
    unit: string;
    low: number | null;
    high: number | null;
    sd: number | null;
  };
}) {
  const { system } = useUnits();
  return <>{formatValueIn(value, system)}</>;
}
