'use client';

import { conditionIn } from '@/lib/properties/condition-units';
import { useUnits } from '@/components/units/units-provider';

/** A measuring condition as the source words it, its measures in the reader's units. */
export function ConditionText({ text }: { text: string }) {
  const { system } = useUnits();
  return <>{conditionIn(text, system)}</>;
}
