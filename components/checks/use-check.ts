'use client';

import { keepPreviousData, useQuery } from '@tanstack/react-query';
import { useEffect, useState } from 'react';
import { FIELD_UNITS } from '@/lib/checks/field-units';
import { formEntries, type FormText } from './initial-text';

export interface CheckState<R> {
  result: R | null;
  pending: boolean;
  message: string | null;
  fieldErrors: Record<string, string[]>;
}

/** A refusal of a check route: its message and the messages of each field. */
export class CheckRequestError extends Error {
  constructor(
    message: string,
    readonly fieldErrors: Record<string, string[]> = {},
  ) {
    super(message);
  }
}

/** POST a check's inputs; the answer's `result`, or a CheckRequestError with field messages. */
export async function postCheck<R>(endpoint: string, body: string, signal?: AbortSignal) {
  let res: Response;
  try {
    res = await fetch(endpoint, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body,
      signal,
    });
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    throw new CheckRequestError('The server could not be reached.');
  }
  const json = await res.json().catch(() => ({}));
  if (!res.ok) throw new CheckRequestError(json.message ?? 'The check failed.', json.fieldErrors);
  return json.result as R;
}

/** `value`, once it has stayed the same for `delayMs`. */
function useDebounced<T>(value: T, delayMs: number): T {
  const [settled, setSettled] = useState(value);
  useEffect(() => {
    const timer = setTimeout(() => setSettled(value), delayMs);
    return () => clearTimeout(timer);
  }, [value, delayMs]);
  return settled;
}

/**
 * Runs a check route as the inputs change (TanStack Query): debounced, the previous result kept
 * on screen while the next one computes, and a superseded request aborted — its signal reaches
 * the server, which stops the model run.
 */
export function useCheck<R>(endpoint: string, body: Record<string, unknown>, delayMs = 350) {
  const key = useDebounced(JSON.stringify(body), delayMs);
  const query = useQuery({
    queryKey: ['check', endpoint, key],
    queryFn: ({ signal }) => postCheck<R>(endpoint, key, signal),
    placeholderData: keepPreviousData,
    retry: false,
    staleTime: Infinity,
  });
  // After a refusal the last good result stays on screen beside the message, as before.
  // (React's pattern for state derived from an earlier render: set during render, not in an effect.)
  const [last, setLast] = useState<R | null>(null);
  if (query.data !== undefined && query.data !== last) setLast(query.data);
  const error = query.error instanceof CheckRequestError ? query.error : null;
  const state: CheckState<R> = {
    result: query.data ?? last,
    pending: query.isFetching,
    message: error?.message ?? (query.error ? 'The check failed.' : null),
    fieldErrors: error?.fieldErrors ?? {},
  };
  return state;
}

/**
 * Form text in the user's units → the SI number the route expects; empty means "use the
 * published value"; text that is not a number goes through so the route names the field.
 */
export function numberOrUndefined(
  text: string,
  toSI: (value: number) => number = (v) => v,
): number | undefined | string {
  const trimmed = text.trim();
  if (trimmed === '') return undefined;
  const n = Number(trimmed);
  return Number.isFinite(n) ? toSI(n) : trimmed;
}

/** The form's figures (text in the reader's units) as the SI numbers the route takes. */
export function siFields(
  text: FormText,
  fromDisplay: (value: number, unit: string) => number,
  keep: (key: string) => boolean = () => true,
): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of formEntries(text)) {
    if (keep(key)) out[key] = numberOrUndefined(value, (v) => fromDisplay(v, FIELD_UNITS[key]));
  }
  return out;
}
