'use client';

import { useState } from 'react';
import { useUnits } from '@/components/units/units-provider';
import { initialText, type FormText } from './initial-text';
import type { FieldsState } from './measure-fields';
import { siFields, useCheck } from './use-check';

/**
 * A check form's state: the cultivar, the figures as typed (starting from SI defaults shown in
 * the reader's units), the route's body in SI, and the check run on it as the figures change.
 */
export function useCheckForm<R>({
  endpoint,
  initialCultivar,
  defaults,
  choices,
  keep,
  delayMs,
}: {
  endpoint: string;
  initialCultivar: string;
  /** Starting figures, in SI. */
  defaults: FormText;
  /** The form's other choices (surface, facing), sent as they are. */
  choices: Record<string, unknown>;
  /** Which typed fields to send (a hidden field's text stays, unsent). */
  keep?: (key: string) => boolean;
  delayMs?: number;
}) {
  const units = useUnits();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [stage, setStage] = useState('');
  const [gradeRule, setGradeRule] = useState('');
  const [text, setText] = useState<FormText>(() => initialText(defaults, units.toDisplay));
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    ...choices,
    ...(cultivar && { cultivar }),
    ...(cultivar && stage && { stage }),
    ...(cultivar && gradeRule && { gradeRule }),
    ...siFields(text, units.fromDisplay, keep),
  };
  const state = useCheck<R>(endpoint, body, delayMs);
  const fields: FieldsState = { text, set, fieldErrors: state.fieldErrors };
  return {
    cultivar,
    setCultivar,
    stage,
    setStage,
    grade: { value: gradeRule, onChange: setGradeRule },
    text,
    set,
    body,
    state,
    fields,
  };
}
