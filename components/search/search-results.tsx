'use client';

import type { SearchHit, SearchResponse } from '@/lib/search/types';
import { Highlight } from './highlight';

export const optionId = (hit: SearchHit) =>
  `search-option-${hit.id.replace(/[^a-zA-Z0-9_-]/g, '_')}`;

/** The result groups as one listbox: groups by kind, options by hit, one of them active. */
export function SearchResults({
  listboxId,
  response,
  active,
  onPick,
  onHover,
}: {
  listboxId: string;
  response: SearchResponse;
  active: SearchHit | null;
  onPick: (hit: SearchHit) => void;
  onHover: (hit: SearchHit) => void;
}) {
  return (
    <div role="listbox" id={listboxId} aria-label="Search results" className="py-1">
      {response.groups.map((group) => (
        <div key={group.kind} role="group" aria-labelledby={`${listboxId}-${group.kind}`}>
          <div
            id={`${listboxId}-${group.kind}`}
            role="presentation"
            className="px-3 pt-2 pb-1 text-xs font-semibold tracking-wide text-stone-500 uppercase"
          >
            {group.label}
          </div>
          {group.hits.map((hit) => (
            <div
              key={hit.id}
              id={optionId(hit)}
              role="option"
              aria-selected={active?.id === hit.id}
              aria-disabled={hit.href ? undefined : true}
              onMouseDown={(e) => e.preventDefault()}
              onMouseEnter={() => onHover(hit)}
              onClick={() => onPick(hit)}
              className={`cursor-pointer px-3 py-1.5 text-sm ${active?.id === hit.id ? 'bg-leaf-50' : ''} ${hit.href ? '' : 'cursor-default opacity-80'}`}
            >
              <div className="font-medium text-stone-900">
                <Highlight text={hit.title} ranges={hit.titleRanges} />
              </div>
              <div className="truncate text-xs text-stone-500">{hit.subtitle}</div>
              {hit.snippet ? (
                <div className="mt-0.5 line-clamp-2 text-xs text-stone-600">
                  <Highlight text={hit.snippet} ranges={hit.snippetRanges} />
                </div>
              ) : null}
            </div>
          ))}
        </div>
      ))}
    </div>
  );
}
