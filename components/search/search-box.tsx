'use client';

import { useRouter } from 'next/navigation';
import {
  useCallback,
  useEffect,
  useId,
  useMemo,
  useRef,
  useState,
  type KeyboardEvent,
} from 'react';
import { MAX_QUERY_LENGTH, type SearchHit } from '@/lib/search/types';
import { optionId, SearchResults } from './search-results';
import { useSearch, type SearchState } from './use-search';

/** `/` or Ctrl-K (⌘-K) from anywhere but a text field puts the cursor in the search box. */
function useShortcut(focus: () => void) {
  useEffect(() => {
    const onKey = (e: globalThis.KeyboardEvent) => {
      const target = e.target as HTMLElement | null;
      const typing =
        target?.isContentEditable ||
        ['INPUT', 'TEXTAREA', 'SELECT'].includes(target?.tagName ?? '');
      const ctrlK = (e.ctrlKey || e.metaKey) && e.key.toLowerCase() === 'k';
      if (ctrlK || (e.key === '/' && !typing && !e.altKey && !e.ctrlKey && !e.metaKey)) {
        e.preventDefault();
        focus();
      }
    };
    window.addEventListener('keydown', onKey);
    return () => window.removeEventListener('keydown', onKey);
  }, [focus]);
}

function Message({ state, query }: { state: SearchState; query: string }) {
  const text =
    state.status === 'idle'
      ? 'Type to search commodities, cultivars, article sections and sources.'
      : state.status === 'loading'
        ? 'Searching…'
        : state.status === 'error'
          ? state.message
          : `Nothing matches “${query.trim()}”. Check the spelling or try fewer words.`;
  return (
    <p role="status" className="px-3 py-3 text-sm text-stone-600">
      {text}
    </p>
  );
}

/** The one search box of the header: a combobox over GET /api/search with grouped results. */
export function SearchBox() {
  const router = useRouter();
  const listboxId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [query, setQuery] = useState('');
  const [open, setOpen] = useState(false);
  const [activeId, setActiveId] = useState<string | null>(null);
  const state = useSearch(query);
  const hits = useMemo(
    () => (state.status === 'done' ? state.response.groups.flatMap((g) => g.hits) : []),
    [state],
  );
  const active = hits.find((h) => h.id === activeId) ?? null;
  const focusInput = useCallback(() => input.current?.focus(), []);
  useShortcut(focusInput);

  const pick = (hit: SearchHit | null) => {
    if (!hit?.href) return;
    setOpen(false);
    input.current?.blur();
    router.push(hit.href);
  };
  const move = (step: number) => {
    if (!hits.length) return;
    const at = active ? hits.indexOf(active) : -1;
    setActiveId(hits[(at + step + hits.length) % hits.length].id);
  };
  const onKeyDown = (e: KeyboardEvent<HTMLInputElement>) => {
    if (e.key === 'ArrowDown' || e.key === 'ArrowUp') {
      e.preventDefault();
      setOpen(true);
      move(e.key === 'ArrowDown' ? 1 : -1);
    } else if (e.key === 'Enter') {
      e.preventDefault();
      pick(active ?? hits[0] ?? null);
    } else if (e.key === 'Escape') {
      e.preventDefault();
      if (open && query) setOpen(false);
      else {
        setQuery('');
        input.current?.blur();
      }
    }
  };
  const showResults = state.status === 'done' && hits.length > 0;

  return (
    <div
      className="relative w-full sm:w-72"
      onBlur={(e) => {
        if (!e.currentTarget.contains(e.relatedTarget as Node | null)) setOpen(false);
      }}
    >
      <input
        ref={input}
        type="search"
        role="combobox"
        aria-label="Search the Atlas and the property data"
        aria-expanded={open}
        aria-controls={listboxId}
        aria-autocomplete="list"
        aria-activedescendant={open && active ? optionId(active) : undefined}
        maxLength={MAX_QUERY_LENGTH}
        placeholder="Search  ( / or Ctrl K )"
        value={query}
        onChange={(e) => {
          setQuery(e.target.value);
          setActiveId(null);
          setOpen(true);
        }}
        onFocus={() => setOpen(true)}
        onKeyDown={onKeyDown}
        data-testid="site-search"
        className="w-full rounded-md border border-leaf-900/30 bg-white/95 px-3 py-1.5 text-sm text-stone-900 placeholder:text-stone-500 focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-100"
      />
      <p className="sr-only" aria-live="polite">
        {state.status === 'done' ? `${hits.length} results shown` : ''}
      </p>
      {open ? (
        <div className="absolute right-0 z-50 mt-1 max-h-[70vh] w-full overflow-y-auto rounded-md border border-stone-200 bg-white text-stone-900 shadow-lg sm:w-[28rem]">
          {showResults ? (
            <SearchResults
              listboxId={listboxId}
              response={state.response}
              active={active}
              onPick={pick}
              onHover={(hit) => setActiveId(hit.id)}
            />
          ) : (
            <>
              <div id={listboxId} role="listbox" aria-label="Search results" />
              <Message state={state} query={query} />
            </>
          )}
        </div>
      ) : null}
    </div>
  );
}
