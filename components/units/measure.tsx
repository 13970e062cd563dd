'use client';

import { useUnits } from './units-provider';

/** A stored SI value shown in the reader's units, e.g. `<Measure value={607} unit="kPa" />`. */
export function Measure({ value, unit }: { value: number; unit: string }) {
  const { show } = useUnits();
  return <span className="num">{show(value, unit)}</span>;
}
