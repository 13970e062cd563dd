'use client';

import { useEffect, useState } from 'react';
import type { SearchResponse } from '@/lib/search/types';

export type SearchState =
  | { status: 'idle' }
  | { status: 'loading' }
  | { status: 'done'; response: SearchResponse }
  | { status: 'error'; message: string };

const DEBOUNCE_MS = 120;

/** Results for the typed query from GET /api/search, debounced, the stale request aborted. */
export function useSearch(query: string): SearchState {
  const [state, setState] = useState<SearchState>({ status: 'idle' });
  const trimmed = query.trim();
  useEffect(() => {
    if (!trimmed) return;
    const controller = new AbortController();
    const timer = setTimeout(async () => {
      setState({ status: 'loading' });
      try {
        const res = await fetch(`/api/search?q=${encodeURIComponent(trimmed)}`, {
          signal: controller.signal,
          headers: { accept: 'application/json' },
        });
        const body = await res.json();
        if (!res.ok) {
          setState({
            status: 'error',
            message: body?.fieldErrors?.q?.[0] ?? body?.message ?? 'Search failed.',
          });
          return;
        }
        setState({ status: 'done', response: body as SearchResponse });
      } catch (error) {
        if ((error as Error).name !== 'AbortError') {
          setState({ status: 'error', message: 'Search is not reachable just now.' });
        }
      }
    }, DEBOUNCE_MS);
    return () => {
      clearTimeout(timer);
      controller.abort();
    };
  }, [trimmed]);
  return trimmed ? state : { status: 'idle' };
}
