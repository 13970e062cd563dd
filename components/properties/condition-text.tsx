'use client';

import { useUnits } from '@/components/units/units-provider';
import { MEASURED_CONDITIONS, conditionIn } from '@/lib/properties/condition-units';

/**
 * A measuring condition or probe name with its measures in the reader's units; given a label of
 * prose (method, note), the words exactly as written, marked as quoted prose.
 */
export function ConditionText({ text, label }: { text: string; label?: string }) {
  const { system } = useUnits();
  if (label !== undefined && !MEASURED_CONDITIONS.includes(label)) {
    return <span data-prose="">{text}</span>;
  }
  return <>{conditionIn(text, system)}</>;
}
