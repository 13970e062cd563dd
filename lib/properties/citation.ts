import { formatDateTime } from '@/lib/dates';
import type { SourceKind } from './quantities';

/**
 * The one wording for a value that rests on memory (a source recalled but not re-read, or a
 * typical value recalled): citations, source notes, the draft form and the data gaps page say it
 * alike.
 */
export const FROM_MEMORY = 'from memory, not yet checked';

/** What kind of source a value rests on, in words a reader can weigh. */
export const SOURCE_KIND_LABELS: Record<SourceKind, string> = {
  paper: 'Peer-reviewed paper',
  thesis: 'Thesis',
  standard: 'Standard',
  handbook: 'Handbook',
  report: 'Report',
  secondary: 'Secondary source (quoted from another work)',
  memory: FROM_MEMORY[0].toUpperCase() + FROM_MEMORY.slice(1),
  demo: 'Demo value (invented, for trying the product)',
};

/** A link only for http(s) addresses: a stored `javascript:` URL is shown as text, never followed. */
export function safeHref(url: string | null): string | null {
  return url && /^https?:\/\//i.test(url) ? url : null;
}

/** The resolver address of a DOI (`10.1234/x` or an address that already holds one). */
export function doiHref(doi: string | null): string | null {
  if (!doi) return null;
  const bare = doi.replace(/^(?:https?:\/\/(?:dx\.)?doi\.org\/|doi:)/i, '');
  return /^10\.\d{4,9}\/\S+$/.test(bare) ? `https://doi.org/${bare}` : null;
}

/** Short date as shown in histories: `2026-12-02 14:05 UTC`, or a dash. */
export function shortDate(iso: string | null): string {
  return formatDateTime(iso);
}
