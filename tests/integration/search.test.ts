import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Role } from '@/lib/auth/roles';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, publishRevision, submitDraft, updateDraft } from '@/lib/data/revisions';
import { getSearchIndex } from '@/lib/search/index-cache';
import type { SearchResponse } from '@/lib/search/types';
import * as search from '@/app/api/search/route';

const EDITOR2 = 'editor2@kestrelvale.example';
const ids: Record<Role | 'editor2', number> = {
  admin: 0,
  editor: 0,
  engineer: 0,
  buyer: 0,
  editor2: 0,
};
let contentDir = '';

async function ask(who: keyof typeof ids | null, q: string) {
  signInAs(who ? ids[who] : null);
  const res = await search.GET(
    new Request(`http://tenderline.test/api/search?q=${encodeURIComponent(q)}`),
    {},
  );
  return {
    status: res.status,
    body: (await res.json()) as SearchResponse & { fieldErrors: Record<string, string[]> },
  };
}

const titles = (body: SearchResponse, kind: string) =>
  body.groups.find((g) => g.kind === kind)?.hits.map((h) => h.title) ?? [];
const hrefs = (body: SearchResponse) => body.groups.flatMap((g) => g.hits.map((h) => h.href));
const actor = async (email: string): Promise<Actor> => (await getActiveActor(await userId(email)))!;

/**
 * Editor-only material, made up for this test: a draft article (a copy of the real ones beside
 * it), a cultivar with nothing published, a draft revision and a source cited only by that draft.
 */
async function addEditorOnlyItems() {
  contentDir = fs.mkdtempSync(path.join(os.tmpdir(), 'atlas-search-'));
  for (const name of ['apple.mdx', 'kiwifruit.mdx']) {
    fs.copyFileSync(path.join(process.cwd(), 'content/atlas', name), path.join(contentDir, name));
  }
  const draft = fs
    .readFileSync(path.join(contentDir, 'kiwifruit.mdx'), 'utf8')
    .replace('status: published', 'status: draft')
    .replace('## How kiwifruit bruises', '## How kiwifruit bruises\n\nZephyrine marker paragraph.');
  fs.writeFileSync(path.join(contentDir, 'kiwifruit.mdx'), draft);
  process.env.ATLAS_CONTENT_DIR = contentDir;

  const apple = await db('commodities').where({ slug: 'apple' }).first();
  await db('cultivars').insert({
    commodity_id: apple.id,
    slug: 'apple-wombat-russet',
    name: 'Wombat Russet',
    is_type: false,
    created_at: new Date(),
  });
  await db('sources').insert({
    key: 'quibble-2031-draft-only',
    kind: 'demo',
    authors: 'Quibble, Q.',
    year: 2031,
    title: 'An invented source cited by a draft only',
    note: 'Test data.',
    created_at: new Date(),
  });
  const editor = await actor(ACCOUNTS.editor);
  const { id } = await createDraft(editor, 'apple-wombat-russet', 'Quokka calibration draft');
  await updateDraft(editor, id, {
    summary: 'Quokka calibration draft',
    values: [{ quantity: 'density', value: 850, sourceKey: 'quibble-2031-draft-only' }],
  });
  return id;
}

describe('GET /api/search', () => {
  let draftId = 0;
  beforeAll(async () => {
    await freshDatabase();
    for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const) {
      ids[role] = await userId(ACCOUNTS[role]);
    }
    ids.editor2 = await userId(EDITOR2);
    draftId = await addEditorOnlyItems();
  });
  afterAll(() => {
    delete process.env.ATLAS_CONTENT_DIR;
    fs.rmSync(contentDir, { recursive: true, force: true });
  });

  it('finds a cultivar by a misspelt name, with the match marked', async () => {
    const { status, body } = await ask('buyer', 'Jonathn');
    expect(status).toBe(200);
    const hit = body.groups.find((g) => g.kind === 'cultivar')!.hits[0];
    expect(hit).toMatchObject({ title: 'Jonathan', href: '/properties/apple-jonathan' });
    expect(hit.titleRanges.length).toBeGreaterThan(0);
  });

  it('finds a commodity by a partial word, and article sections by a phrase', async () => {
    expect(titles((await ask('buyer', 'kiwi')).body, 'commodity')).toContain('Kiwifruit');
    const phrase = (await ask('buyer', 'no bruise below')).body;
    expect(hrefs(phrase)).toContain('/atlas/apple#how-apples-bruise');
    const stage = (await ask('buyer', 'bin tiping')).body;
    expect(stage.groups[0].hits[0].href).toBe('/atlas/apple#receiving-and-bin-tipping');
  });

  it('finds a source by its author, linked to the bibliography that cites it', async () => {
    const { body } = await ask('buyer', 'Shahabasi');
    const hit = body.groups.find((g) => g.kind === 'source')!.hits[0];
    expect(hit).toMatchObject({
      title: 'Shahabasi, 1979',
      href: '/atlas/apple#source-shahabasi-1979',
    });
    expect(titles((await ask('buyer', 'Wang')).body, 'source')).toContain('Wang et al., 2024');
  });

  it("a buyer's index contains no drafts or editor-only items", async () => {
    const index = await getSearchIndex(await actor(ACCOUNTS.buyer));
    const ids = index.records.map((r) => r.id);
    expect(ids.filter((id) => id.startsWith('revision:'))).toEqual([]);
    expect(ids).not.toContain('cultivar:apple-wombat-russet');
    expect(ids).not.toContain('source:quibble-2031-draft-only');
    expect(ids.filter((id) => id.startsWith('section:kiwifruit'))).toEqual([]);
    expect(index.records.map((r) => r.text).join(' ')).not.toContain('Zephyrine');
  });

  /** Who finds each editor-only item, written out by hand from the role table. */
  const FINDS: Record<string, Record<Role, boolean>> = {
    'Quokka calibration': { admin: true, editor: true, engineer: false, buyer: false },
    'Wombat Russet': { admin: true, editor: true, engineer: false, buyer: false },
    Quibble: { admin: true, editor: true, engineer: false, buyer: false },
    Zephyrine: { admin: true, editor: true, engineer: false, buyer: false },
  };
  it.each(Object.entries(FINDS))('"%s" is found by editors and admins only', async (q, who) => {
    for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const) {
      const { body } = await ask(role, q);
      expect({ role, found: body.total > 0 }).toEqual({ role, found: who[role] });
    }
  });

  it('a newly published revision is found on the next search (the index is rebuilt)', async () => {
    expect(titles((await ask('buyer', 'Wombat Russet')).body, 'cultivar')).toEqual([]);
    await submitDraft(await actor(ACCOUNTS.editor), draftId);
    await publishRevision(await actor(EDITOR2), draftId);
    expect(titles((await ask('buyer', 'Wombat Russet')).body, 'cultivar')).toContain(
      'Wombat Russet',
    );
    expect(titles((await ask('buyer', 'Quibble')).body, 'source')).toEqual(['Quibble, 2031']);
  });

  it('refuses a query over 100 characters with a field message; odd queries are harmless', async () => {
    const long = await ask('buyer', 'a'.repeat(101));
    expect(long.status).toBe(400);
    expect(long.body.fieldErrors.q).toEqual(['Search for at most 100 characters.']);
    expect((await ask('buyer', 'a'.repeat(100))).status).toBe(200);
    for (const q of ['__proto__', 'constructor', '{"$where":1}', '   ', '%00<script>']) {
      const { status, body } = await ask('buyer', q);
      expect(status).toBe(200);
      expect(Array.isArray(body.groups)).toBe(true);
    }
    expect((await ask('buyer', '')).body).toEqual({ query: '', total: 0, groups: [] });
  });

  it('answers 401 when signed out', async () => {
    expect((await ask(null, 'apple')).status).toBe(401);
  });
});
