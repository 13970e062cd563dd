'use client';

import { usePathname, useSearchParams } from 'next/navigation';
import { useEffect, useState } from 'react';
import { checkQuery, figuresFromQuery } from '@/lib/checks/check-url';
import { useUnits } from '@/components/units/units-provider';
import type { FormText } from './initial-text';
import { startingText, typedText, type FieldsState } from './measure-fields';
import { siFields, useCheck } from './use-check';

/** A choice of a check form (surface, facing) as the page's address holds it, else the fallback. */
export function useAddressChoice<T extends string>(
  key: string,
  allowed: readonly T[],
  fallback: T,
) {
  const address = useSearchParams();
  const v = address.get(key);
  return useState<T>(allowed.includes(v as T) ? (v as T) : fallback);
}

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
  const address = useSearchParams();
  const pathname = usePathname();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [stage, setStage] = useState(address.get('stage') ?? '');
  const [gradeRule, setGradeRule] = useState(address.get('gradeRule') ?? '');
  // The address's figures (SI) over the defaults, then shown in the reader's units.
  const [text, setText] = useState<FormText>(() =>
    startingText(defaults, figuresFromQuery(address), units.system),
  );
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    ...choices,
    ...(cultivar && { cultivar }),
    ...(cultivar && stage && { stage }),
    ...(cultivar && gradeRule && { gradeRule }),
    ...siFields(typedText(text), units.fromDisplay, keep),
  };
  const state = useCheck<R>(endpoint, body, delayMs);
  // The inputs follow into the address (replaced, not pushed: back leaves the check, and returning
  // or reloading finds the same figures). An emptied field is kept as empty.
  const query = checkQuery({
    ...body,
    ...Object.fromEntries(
      Object.entries(text)
        .filter(([, v]) => v.trim() === '')
        .map(([k]) => [k, '']),
    ),
  });
  // The browser's own history entry is replaced (the App Router keeps useSearchParams in step
  // with it): no server round trip, and a link followed meanwhile is never pulled back here.
  useEffect(() => {
    const timer = setTimeout(() => {
      if (window.location.pathname !== pathname) return;
      if (window.location.search.replace(/^\?/, '') !== query)
        window.history.replaceState(window.history.state, '', `${pathname}?${query}`);
    }, 400);
    return () => clearTimeout(timer);
  }, [query, pathname]);
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
