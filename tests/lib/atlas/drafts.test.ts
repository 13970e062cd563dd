import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import '../../support/session';
import { freshDatabase, userId } from '../../support/db';
import { ACCOUNTS } from '../../support/accounts';
import type { Role } from '@/lib/auth/roles';
import { getActiveActor } from '@/lib/data/users';
import { getAtlasArticle, listAtlasFamilies } from '@/lib/atlas/entries';

/** Who reads a draft article, written out by hand: editors and admins only. */
const READS_DRAFTS: Record<Role, boolean> = {
  admin: true,
  editor: true,
  engineer: false,
  buyer: false,
};

describe('draft articles', () => {
  let dir = '';
  beforeAll(async () => {
    await freshDatabase();
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'atlas-drafts-'));
    const source = path.join(process.cwd(), 'content/atlas/kiwifruit.mdx');
    const text = fs.readFileSync(source, 'utf8').replace('status: published', 'status: draft');
    fs.writeFileSync(path.join(dir, 'kiwifruit.mdx'), text);
    process.env.ATLAS_CONTENT_DIR = dir;
  });
  afterAll(() => {
    delete process.env.ATLAS_CONTENT_DIR;
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it.each(Object.entries(READS_DRAFTS))('%s: page and index entry', async (role, reads) => {
    const actor = (await getActiveActor(await userId(ACCOUNTS[role as Role])))!;
    const found = await getAtlasArticle(actor, 'kiwifruit');
    expect(found !== null).toBe(reads);
    const entry = (await listAtlasFamilies(actor))
      .flatMap((f) => f.entries)
      .find((e) => e.commodity.slug === 'kiwifruit')!;
    // Without the draft, kiwifruit is listed as "article in preparation" (article null).
    expect(entry.article?.frontmatter.status ?? null).toBe(reads ? 'draft' : null);
  });

  it('an unknown commodity has no article for anyone', async () => {
    const admin = (await getActiveActor(await userId(ACCOUNTS.admin)))!;
    expect(await getAtlasArticle(admin, 'no-such-fruit')).toBeNull();
  });
});
