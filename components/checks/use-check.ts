'use client';

import { useEffect, useRef, useState } from 'react';
import { FIELD_UNITS } from './field-units';

export interface CheckState<R> {
  result: R | null;
  pending: boolean;
  message: string | null;
  fieldErrors: Record<string, string[]>;
}

/**
 * Runs a check route as the inputs change: debounced, the previous result kept on screen while
 * the next one computes, stale answers dropped (each request aborts the one before).
 */
export function useCheck<R>(endpoint: string, body: Record<string, unknown>, delayMs = 350) {
  const [state, setState] = useState<CheckState<R>>({
    result: null,
    pending: false,
    message: null,
    fieldErrors: {},
  });
  const controller = useRef<AbortController | null>(null);
  const key = JSON.stringify(body);

  useEffect(() => {
    const timer = setTimeout(async () => {
      controller.current?.abort();
      const mine = new AbortController();
      controller.current = mine;
      setState((s) => ({ ...s, pending: true }));
      try {
        const res = await fetch(endpoint, {
          method: 'POST',
          headers: { 'content-type': 'application/json' },
          body: key,
          signal: mine.signal,
        });
        const json = await res.json();
        if (mine.signal.aborted) return;
        setState((s) =>
          res.ok
            ? { result: json.result as R, pending: false, message: null, fieldErrors: {} }
            : {
                ...s,
                pending: false,
                message: json.message ?? 'The check failed.',
                fieldErrors: json.fieldErrors ?? {},
              },
        );
      } catch (error) {
        if ((error as Error).name === 'AbortError') return;
        setState((s) => ({
          ...s,
          pending: false,
          message: 'The server could not be reached.',
          fieldErrors: {},
        }));
      }
    }, delayMs);
    return () => clearTimeout(timer);
  }, [endpoint, key, delayMs]);

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
  text: Record<string, string>,
  fromDisplay: (value: number, unit: string) => number,
  keep: (key: string) => boolean = () => true,
): Record<string, unknown> {
  const out: Record<string, unknown> = {};
  for (const [key, value] of Object.entries(text)) {
    if (keep(key))
      out[key] = numberOrUndefined(value, (v) => fromDisplay(v, FIELD_UNITS[key] ?? '–'));
  }
  return out;
}
