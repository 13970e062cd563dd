import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, publishRevision, submitDraft, updateDraft } from '@/lib/data/revisions';
import { userId } from '../support/db';

/** The app's own origin in unit tests (tests/support/setup-env.ts sets APP_URL to it). */
export const OWN_ORIGIN = 'http://tenderline.test';

export function request(
  method: string,
  url: string,
  body?: unknown,
  headers: Record<string, string> = {},
): Request {
  const write = method !== 'GET';
  return new Request(new URL(url, OWN_ORIGIN), {
    method,
    headers: {
      ...(write ? { 'content-type': 'application/json', origin: OWN_ORIGIN } : {}),
      ...headers,
    },
    body: write ? JSON.stringify(body ?? {}) : undefined,
  });
}

export const params = <T>(p: T) => ({ params: Promise.resolve(p) });

export const actorOf = async (email: string): Promise<Actor> =>
  (await getActiveActor(await userId(email)))!;

/** A commodity of our own, so the filters are checked against names we chose. */
export async function createTestCommodity(slug: string, name: string) {
  const [row] = await db('commodities')
    .insert({ slug, name, family: 'Test family', created_at: new Date() })
    .returning('id');
  return typeof row === 'object' ? Number(row.id) : Number(row);
}

/** A source inserted directly, as an editor's typo or a hostile import might leave it. */
export async function createTestSource(source: {
  key: string;
  title: string;
  authors?: string | null;
  year?: number | null;
}) {
  await db('sources').insert({
    kind: 'demo',
    authors: null,
    year: null,
    note: 'Inserted by a test.',
    created_at: new Date(),
    ...source,
  });
}

/** A cultivar with one revision published through the real workflow (author ≠ publisher). */
export async function publishTestCultivar(
  commodityId: number,
  slug: string,
  name: string,
  values: Record<string, unknown>[],
  people: { author: Actor; publisher: Actor },
) {
  await db('cultivars').insert({
    commodity_id: commodityId,
    slug,
    name,
    is_type: false,
    created_at: new Date(),
  });
  const { id } = await createDraft(people.author, slug);
  await updateDraft(people.author, id, { summary: 'Test values', values });
  await submitDraft(people.author, id);
  await publishRevision(people.publisher, id);
  return id;
}

/** RFC 4180 reading of a CSV text (CRLF rows) into rows of unquoted cells. */
export function parseCsv(text: string): string[][] {
  const rows: string[][] = [];
  let row: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < text.length; i++) {
    const ch = text[i];
    if (quoted && ch === '"' && text[i + 1] === '"') {
      cell += '"';
      i++;
    } else if (ch === '"') {
      quoted = !quoted;
    } else if (!quoted && ch === ',') {
      row.push(cell);
      cell = '';
    } else if (!quoted && ch === '\r' && text[i + 1] === '\n') {
      rows.push([...row, cell]);
      row = [];
      cell = '';
      i++;
    } else {
      cell += ch;
    }
  }
  if (cell || row.length) rows.push([...row, cell]);
  return rows;
}
