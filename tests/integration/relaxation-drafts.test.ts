import fs from 'node:fs';
// First: the session stand-in must be in place before any module that reads the session loads.
import '../support/session';
import { beforeAll, describe, expect, it } from 'vitest';
import { userId } from '../support/db';
import { PELEG, pelegCsv } from '../support/peleg-curve';
import { db } from '@/lib/db';
import * as uploads from '@/app/api/cultivars/[slug]/relaxation-tests/route';
import * as one from '@/app/api/relaxation-tests/[id]/route';
import { submitDraft, publishRevision } from '@/lib/data/revisions';
import { getActiveActor } from '@/lib/data/users';
import {
  as,
  FIELDS,
  ids,
  ORIGIN,
  params,
  prepareUploadTests,
  SLUG,
  startDraft,
  storedState,
  upload,
  type Who,
} from './relaxation-tests-support';

const GOOD = pelegCsv({ ...PELEG, noise: 0.05, seed: 1 });
const DEMO = fs.readFileSync('public/samples/relaxation-demo.csv');
const FULL = {
  ...FIELDS,
  specimen: 'flesh cylinder between flat plates',
  loadingRate: '20 mm/min',
  temperatureC: '21.5',
};
const getOne = (id: number | string) =>
  one.GET(new Request('http://tenderline.test/api'), params({ id: String(id) }));

/** The draft's values with their sources. */
const draftValues = (revisionId: number) =>
  db('revision_values as v')
    .leftJoin('sources as s', 's.id', 'v.source_id')
    .where('v.revision_id', revisionId)
    .select('v.*', 's.kind', 's.title', 's.key');

const publishedCount = async () =>
  Number(
    (await db('cultivars as c')
      .join('revision_values as v', 'v.revision_id', 'c.published_revision_id')
      .where('c.slug', SLUG)
      .count({ n: '*' })
      .first())!.n,
  );

describe('relaxation tests: reading one, roles, drafts', () => {
  prepareUploadTests();

  it('GET gives the figures, every reading, the fitted curve and the force kept', async () => {
    as('editor');
    const { body: created } = await upload(GOOD);
    const body = await (await getOne(created.test.id)).json();
    expect(body.test.cultivar.slug).toBe(SLUG);
    expect([body.test.deformationMm, body.test.specimen]).toEqual([5, FIELDS.specimen]);
    expect(body.readings).toHaveLength(241);
    expect(body.readings[2]).toEqual({ timeS: 1, forceN: expect.any(Number) });
    expect(body.fittedCurve[0].timeS).toBe(0);
    expect(body.fittedCurve.at(-1).timeS).toBe(120);
    expect(body.test.pointsUsed).toBe(240);
    // Kept share 1 − t ÷ (k₁ + k₂·t) with the inputs k₁ = 8 s, k₂ = 1.6, by hand: 0.8958, 0.6875,
    // 0.4643. With k₁ within 5 % and k₂ within 1 % of them (the fit's tolerances), each share
    // moves by at most ≈0.0094 (at 5 s: 5/16² · 0.4 s + 25/16² · 0.016), so 0.01.
    const byHand = { 1: 0.8958, 5: 0.6875, 30: 0.4643 } as Record<number, number>;
    expect(body.retained.map((r: { timeS: number }) => r.timeS)).toEqual([1, 5, 30]);
    for (const r of body.retained) expect(Math.abs(r.share - byHand[r.timeS])).toBeLessThan(0.01);
  });

  it('an unknown test is 404, a malformed id 400', async () => {
    as('editor');
    expect((await getOne(999999)).status).toBe(404);
    expect((await getOne('0x1')).status).toBe(400);
  });

  describe('role table: each route answers what the capability table says, written out', () => {
    // lib/auth/roles.ts: lab-tests:upload and revisions:edit are both held by admin and editor;
    // engineers and buyers are refused (403), a signed-out request is 401.
    const table: [string, Record<Who, number>, () => Promise<number>][] = [
      [
        'POST /api/cultivars/[slug]/relaxation-tests',
        { 'signed-out': 401, admin: 201, editor: 201, engineer: 403, buyer: 403 },
        async () => (await upload(GOOD)).status,
      ],
      [
        'GET /api/cultivars/[slug]/relaxation-tests',
        { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
        async () =>
          (await uploads.GET(new Request('http://tenderline.test/api'), params({ slug: SLUG })))
            .status,
      ],
      [
        'GET /api/relaxation-tests/[id]',
        { 'signed-out': 401, admin: 200, editor: 200, engineer: 403, buyer: 403 },
        async () => (await getOne(testId)).status,
      ],
      [
        'POST /api/relaxation-tests/[id]/draft',
        { 'signed-out': 401, admin: 201, editor: 201, engineer: 403, buyer: 403 },
        async () => (await startDraft(testId)).status,
      ],
    ];
    let testId = 0;
    beforeAll(async () => {
      as('editor');
      testId = (await upload(GOOD)).body.test.id;
    });
    for (const [name, expected, call] of table) {
      for (const who of Object.keys(expected) as Who[]) {
        it(`${name} as ${who} → ${expected[who]}`, async () => {
          as(who);
          const before = await storedState();
          expect(await call()).toBe(expected[who]);
          // A refused upload stores nothing.
          if (expected[who] >= 400) expect(await storedState()).toEqual(before);
        });
      }
    }

    it('a foreign Origin is refused with 403 and stores nothing', async () => {
      as('admin');
      const before = await storedState();
      const foreign = { origin: 'http://127.0.0.1:4999' };
      expect((await upload(GOOD, FIELDS, foreign)).status).toBe(403);
      expect((await startDraft(testId, foreign)).status).toBe(403);
      expect(await storedState()).toEqual(before);
    });

    it('a JSON body to the upload is refused with 415', async () => {
      as('admin');
      const request = new Request('http://tenderline.test/api', {
        method: 'POST',
        headers: { 'content-type': 'application/json', ...ORIGIN },
        body: JSON.stringify({ ...FIELDS, file: 'time_s,force_n' }),
      });
      expect((await uploads.POST(request, params({ slug: SLUG }))).status).toBe(415);
    });
  });

  describe('a draft from a test', () => {
    it('holds the published values plus k₁ and k₂, both citing the test as one source', async () => {
      as('editor');
      const { body: created } = await upload(GOOD, FULL);
      const id = created.test.id;
      const published = await publishedCount();
      const response = await startDraft(id);
      expect(response.status).toBe(201);
      const { revision, created: isNew } = await response.json();
      expect([revision.href, isNew]).toEqual([`/editor/revisions/${revision.id}`, true]);
      const row = await db('property_revisions').where({ id: revision.id }).first();
      expect([row.status, row.author_id]).toEqual(['draft', ids.editor]);
      const values = await draftValues(revision.id);
      expect(values).toHaveLength(published + 2);
      const fromTest = values.filter((v) => v.key === `relax-test-${id}`);
      expect(fromTest.map((v) => [v.quantity, v.variant, v.unit])).toEqual([
        ['relaxation_k1', '', 's'],
        ['relaxation_k2', '', '–'],
      ]);
      const [k1, k2] = fromTest;
      // The stored constants to 4 significant digits, and near the curve's inputs (tolerances
      // as in the fit test: 5 % and 1 %).
      const stored = await db('relaxation_tests').where({ id }).first();
      expect([k1.value, k2.value]).toEqual([
        Number(stored.k1_s.toPrecision(4)),
        Number(stored.k2.toPrecision(4)),
      ]);
      expect(Math.abs(k1.value / 8 - 1)).toBeLessThan(0.05);
      expect(Math.abs(k2.value / 1.6 - 1)).toBeLessThan(0.01);
      expect(k1.source_id).toBe(k2.source_id);
      for (const v of fromTest) {
        expect(v.method).toBe('Stress relaxation at held deformation, Peleg fit');
        expect([v.probe, v.loading_rate, v.temperature, v.samples]).toEqual([
          'flesh cylinder between flat plates',
          '20 mm/min',
          '21.5 °C',
          1,
        ]);
        // R² to 4 decimals: at least 0.99 (noise ±0.05 N against a fall of several N), or 1.0000.
        expect(v.note).toMatch(
          /^Held at 5 mm plate travel; F₀ = 30 N; R² = (0\.99\d\d|1\.0000) \(force\), (0\.99\d\d|1\.0000) \(linear form\), 240 points\.$/,
        );
      }
      const date = new Date().toISOString().slice(0, 10);
      expect([k1.kind, k1.title]).toEqual([
        'report',
        `In-house stress-relaxation test #${id}, ${date}, uploaded by Tomas Reyn`,
      ]);
      expect(stored.draft_revision_id).toBe(revision.id);
      const audit = await db('audit_log')
        .where({ action: 'relaxation-test.draft' })
        .orderBy('id', 'desc')
        .first();
      expect([audit.entity_id, JSON.parse(audit.detail).revision]).toEqual([
        String(id),
        revision.id,
      ]);

      // The same editor asking again gets the same open draft, and nothing new is made.
      const revisions = await db('property_revisions').count({ n: '*' }).first();
      const again = await startDraft(id);
      expect([again.status, (await again.json()).revision.id]).toEqual([200, revision.id]);
      expect(await db('property_revisions').count({ n: '*' }).first()).toEqual(revisions);
    });

    it('another editor asking gets a draft of their own', async () => {
      as('editor');
      const id = (await upload(GOOD)).body.test.id;
      const first = (await (await startDraft(id)).json()).revision.id;
      as('admin');
      const response = await startDraft(id);
      const { revision } = await response.json();
      expect(response.status).toBe(201);
      expect(revision.id).not.toBe(first);
      expect((await db('property_revisions').where({ id: revision.id }).first()).author_id).toBe(
        ids.admin,
      );
    });

    it('a demo upload cites a demo source', async () => {
      as('editor');
      const id = (await upload(DEMO, FIELDS, undefined, 'relaxation-demo.csv')).body.test.id;
      const { revision } = await (await startDraft(id)).json();
      const values = (await draftValues(revision.id)).filter((v) => v.key === `relax-test-${id}`);
      expect(values.map((v) => v.kind)).toEqual(['demo', 'demo']);
    });

    it('a second draft after publishing replaces the pair from the same test', async () => {
      as('editor');
      const id = (await upload(GOOD)).body.test.id;
      const first = (await (await startDraft(id)).json()).revision.id;
      await submitDraft((await getActiveActor(ids.editor!))!, first);
      const reviewer = await getActiveActor(await userId('editor2@kestrelvale.example'));
      await publishRevision(reviewer!, first);
      const response = await startDraft(id);
      expect(response.status).toBe(201);
      const second = (await response.json()).revision.id;
      expect(second).not.toBe(first);
      const fromTest = (await draftValues(second)).filter((v) => v.key === `relax-test-${id}`);
      expect(fromTest.map((v) => v.quantity)).toEqual(['relaxation_k1', 'relaxation_k2']);
      expect(await db('sources').where({ key: `relax-test-${id}` })).toHaveLength(1);
    });
  });
});
