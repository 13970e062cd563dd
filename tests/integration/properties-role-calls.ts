import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import type { Role } from '@/lib/auth/roles';
import { createDraft, submitDraft } from '@/lib/data/revisions';
import * as cultivars from '@/app/api/cultivars/route';
import * as cultivar from '@/app/api/cultivars/[slug]/route';
import * as revisions from '@/app/api/cultivars/[slug]/revisions/route';
import * as follow from '@/app/api/cultivars/[slug]/follow/route';
import * as revision from '@/app/api/revisions/[id]/route';
import * as submit from '@/app/api/revisions/[id]/submit/route';
import * as returned from '@/app/api/revisions/[id]/return/route';
import * as publish from '@/app/api/revisions/[id]/publish/route';
import * as rebase from '@/app/api/revisions/[id]/rebase/route';
import { ACCOUNTS } from '../support/accounts';
import {
  actorOf,
  createTestCommodity,
  createTestSource,
  params,
  publishTestCultivar,
  request,
} from './properties-fixtures';

export type Who = Role | 'signed-out';
type Headers = Record<string, string>;
/** Sets up what the call needs for this identity, then returns the request to time and check. */
export type Prepare = (who: Who) => Promise<(headers?: Headers) => Promise<Response>>;

const SLUG = 'test-rowan-role-table';
const VALUE = { quantity: 'density', value: 900, sourceKey: 'test-role-source' };

/**
 * The calls of the role table, each on its own test cultivar, so every allowed write meets a
 * state it accepts (a fresh draft of one's own, another editor's revision in review) and every
 * "wrong state" row meets the state it names.
 */
export async function setUpRoleCalls(): Promise<Record<string, Prepare>> {
  const [admin, editor, editor2] = await Promise.all(
    [ACCOUNTS.admin, ACCOUNTS.editor, 'editor2@kestrelvale.example'].map(actorOf),
  );
  const commodity = await createTestCommodity('test-rowan', 'Test rowan');
  await createTestSource({ key: 'test-role-source', title: 'Role table', authors: 'Test, A.' });
  // Authored by editor2, so both admin and editor may review it (nobody reviews their own).
  const first = await publishTestCultivar(commodity, SLUG, 'Role table', [VALUE], {
    author: editor2,
    publisher: editor,
  });
  const writes = (who: Who) => who === 'admin' || who === 'editor';
  const self = (who: Who) => (who === 'admin' ? admin : editor);
  const other = (who: Who) => (who === 'admin' ? editor : editor2);
  const draftBy = async (a: Actor) => (await createDraft(a, SLUG)).id;
  const inReviewBy = async (a: Actor) => {
    const id = await draftBy(a);
    await submitDraft(a, id);
    return id;
  };
  const published = async () =>
    Number((await db('cultivars').where({ slug: SLUG }).first()).published_revision_id);
  // Refused roles are stopped before the revision is read: any revision stands in.
  const stand = await draftBy(editor);
  const pick = async (who: Who, own: (who: Who) => Promise<number>) =>
    writes(who) ? own(who) : stand;

  const slugUrl = (tail = '') => [`/api/cultivars/${SLUG}${tail}`, params({ slug: SLUG })] as const;
  const onRevision =
    (
      handler: (r: Request, c: ReturnType<typeof params<{ id: string }>>) => Promise<Response>,
      method: string,
      tail: string,
      body: unknown,
      id: number,
    ) =>
    (h?: Headers) =>
      handler(request(method, `/api/revisions/${id}${tail}`, body, h), params({ id: String(id) }));

  return {
    'GET /api/cultivars': async () => (h) =>
      cultivars.GET(request('GET', '/api/cultivars', undefined, h), params({})),
    'GET /api/cultivars/[slug]': async () => (h) =>
      cultivar.GET(request('GET', slugUrl()[0], undefined, h), slugUrl()[1]),
    'GET /api/cultivars/[slug]/revisions': async () => (h) =>
      revisions.GET(request('GET', slugUrl('/revisions')[0], undefined, h), slugUrl()[1]),
    'POST /api/cultivars/[slug]/revisions': async () => (h) =>
      revisions.POST(request('POST', slugUrl('/revisions')[0], {}, h), slugUrl()[1]),
    'GET /api/cultivars/[slug]/follow': async () => (h) =>
      follow.GET(request('GET', slugUrl('/follow')[0], undefined, h), slugUrl()[1]),
    'PUT /api/cultivars/[slug]/follow': async () => (h) =>
      follow.PUT(request('PUT', slugUrl('/follow')[0], { follow: true }, h), slugUrl()[1]),
    'GET /api/revisions/[id]': async () =>
      onRevision(revision.GET, 'GET', '', undefined, await published()),
    'PUT /api/revisions/[id]': async (who) =>
      onRevision(
        revision.PUT,
        'PUT',
        '',
        { values: [VALUE] },
        await pick(who, (w) => draftBy(self(w))),
      ),
    'POST /api/revisions/[id]/submit': async (who) =>
      onRevision(submit.POST, 'POST', '/submit', {}, await pick(who, (w) => draftBy(self(w)))),
    'POST /api/revisions/[id]/return': async (who) =>
      onRevision(
        returned.POST,
        'POST',
        '/return',
        { comment: 'Cite the page, please.' },
        await pick(who, (w) => inReviewBy(other(w))),
      ),
    'POST /api/revisions/[id]/publish': async (who) =>
      onRevision(
        publish.POST,
        'POST',
        '/publish',
        {},
        await pick(who, (w) => inReviewBy(other(w))),
      ),
    'POST /api/revisions/[id]/rebase': async (who) =>
      onRevision(rebase.POST, 'POST', '/rebase', {}, await pick(who, (w) => draftBy(self(w)))),
    'POST /api/revisions/[id]/submit, already in review': async (who) =>
      onRevision(submit.POST, 'POST', '/submit', {}, await pick(who, (w) => inReviewBy(self(w)))),
    'POST /api/revisions/[id]/publish, still a draft': async (who) =>
      onRevision(publish.POST, 'POST', '/publish', {}, await pick(who, (w) => draftBy(other(w)))),
    'POST /api/revisions/[id]/return, long published': async (who) =>
      onRevision(
        returned.POST,
        'POST',
        '/return',
        { comment: 'Too late.' },
        await pick(who, async () => first),
      ),
  };
}

/** What the write guards may change, to show a refused request changed nothing. */
export async function snapshot() {
  const count = async (t: string) => Number((await db(t).count({ n: '*' }))[0].n);
  return {
    revisions: await db('property_revisions').orderBy('id').select('id', 'status', 'based_on_id'),
    published: await db('cultivars').orderBy('id').select('id', 'published_revision_id'),
    values: await count('revision_values'),
    follows: await count('follows'),
    audit: await count('audit_log'),
  };
}
