import 'server-only';
import { db } from '@/lib/db';
import { seesDrafts } from '@/lib/atlas/access';
import { listArticles } from '@/lib/atlas/articles';
import type { Actor } from '@/lib/auth/actor';
import { assertCan } from '@/lib/auth/actor';
import { createSearchIndex, type SearchIndex } from './engine';
import { dataFingerprint } from './fingerprint';
import { loadSearchRecords, type IndexClass } from './records';

/** A safety net behind the fingerprint (say, a source edited in place): rebuild at least this often. */
const TTL_MS = 5 * 60_000;

interface Entry {
  index: SearchIndex;
  fingerprint: string;
  builtAt: number;
}

const globalCache = globalThis as unknown as { tenderlineSearch?: Map<IndexClass, Promise<Entry>> };
const cache = (globalCache.tenderlineSearch ??= new Map());

export function indexClassOf(actor: Actor): IndexClass {
  return seesDrafts(actor.role) ? 'editorial' : 'published';
}

async function build(cls: IndexClass, fingerprint: string): Promise<Entry> {
  const articles = listArticles({ includeDrafts: cls === 'editorial' });
  const records = await loadSearchRecords(db, cls, articles);
  return { index: createSearchIndex(records), fingerprint, builtAt: Date.now() };
}

/** Articles can change on disk outside production; their times join the fingerprint there. */
function articleStamp(): string {
  return listArticles({ includeDrafts: true })
    .map((a) => `${a.slug}:${a.mtimeMs}`)
    .join(',');
}

/**
 * The search index of the actor's role class, built once per class and kept in memory. Each
 * request checks the data fingerprint (one aggregate query), so a newly published revision is
 * found on the next search; the index is also rebuilt after five minutes whatever happens.
 */
export async function getSearchIndex(actor: Actor): Promise<SearchIndex> {
  assertCan(actor, 'atlas:read');
  const cls = indexClassOf(actor);
  const fingerprint = `${await dataFingerprint(db)}|${articleStamp()}`;
  const cached = cache.get(cls);
  const entry = cached ? await cached.catch(() => null) : null;
  if (entry && entry.fingerprint === fingerprint && Date.now() - entry.builtAt < TTL_MS) {
    return entry.index;
  }
  const fresh = build(cls, fingerprint);
  cache.set(cls, fresh);
  return (await fresh).index;
}
