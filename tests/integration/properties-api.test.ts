import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { startTestCatcher } from '../support/mail';
import { ACCOUNTS } from '../support/accounts';
import type { Actor } from '@/lib/auth/actor';
import { createDraft } from '@/lib/data/revisions';
import * as cultivars from '@/app/api/cultivars/route';
import * as cultivar from '@/app/api/cultivars/[slug]/route';
import * as revisions from '@/app/api/cultivars/[slug]/revisions/route';
import * as follow from '@/app/api/cultivars/[slug]/follow/route';
import {
  actorOf,
  createTestCommodity,
  createTestSource,
  params,
  parseCsv,
  publishTestCultivar,
  request,
} from './properties-fixtures';
import { setUpRoleCalls, snapshot, type Prepare, type Who } from './properties-role-calls';

type Json = Record<string, unknown> & { cultivars: Record<string, unknown>[] };
const list = async (query = '') => {
  const response = await cultivars.GET(request('GET', `/api/cultivars${query}`), params({}));
  return { status: response.status, body: (await response.json()) as Json };
};
const slugs = (body: Json) => body.cultivars.map((c) => c.slug);
const FORMULA = '=HYPERLINK("http://attacker.example/","open me")';

let editor: Actor, editor2: Actor;
const ids: Record<string, number> = {};

beforeAll(async () => {
  await freshDatabase();
  for (const [role, email] of Object.entries(ACCOUNTS)) ids[role] = await userId(email);
  editor = await actorOf(ACCOUNTS.editor);
  editor2 = await actorOf('editor2@kestrelvale.example');
  // Names with LIKE wildcards, and a source whose title a spreadsheet would run as a formula.
  const medlar = await createTestCommodity('test-medlar', 'Test medlar');
  await createTestSource({ key: 'test-formula', title: FORMULA });
  const people = { author: editor, publisher: editor2 };
  await publishTestCultivar(
    medlar,
    'test-medlar-percent',
    'Ninety 100% Red',
    [
      {
        quantity: 'density',
        value: 980,
        sourceKey: 'test-formula',
        method: '@SUM(1+1)',
        ripeness: '+ripe',
        storage: '-2 days',
      },
    ],
    people,
  );
  await publishTestCultivar(
    medlar,
    'test-medlar-underscore',
    'Snake_eye',
    [{ quantity: 'mass', value: 40, sourceKey: 'test-formula' }],
    people,
  );
});

describe('GET /api/cultivars (JSON)', () => {
  it('names every key by its unit, and every value carries its source', async () => {
    signInAs(ids.buyer);
    const { status, body } = await list();
    expect(status).toBe(200);
    const jonathan = body.cultivars.find((c) => c.slug === 'apple-jonathan')!;
    for (const key of [
      'youngs_modulus_mpa',
      'poisson_ratio',
      'density_kg_m3',
      'diameter_mm',
      'mass_g',
      'static_bruise_threshold_kpa',
      'failure_stress_kpa',
      'impact_threshold_energy_j',
      'drop_threshold_height_mm',
      'friction_coefficient',
      'bulk_density_kg_m3',
      'lateral_pressure_ratio',
    ]) {
      expect(jonathan, key).toHaveProperty(key);
    }
    // Shahabasi, Y. (1979), PhD thesis, Michigan State University (abstract): flesh modulus
    // 2.52 MPa on 15 November, 2.36–3.28 MPa over the storage season. Stored as typed: exact.
    expect(jonathan.youngs_modulus_mpa).toBe(2.52);
    const values = jonathan.values as Record<string, never>[];
    const modulus = values.find((v) => v.quantity === 'youngs_modulus')!;
    expect(modulus).toMatchObject({
      key: 'youngs_modulus_mpa',
      variant: 'flesh',
      unit: 'MPa',
      spread: { low: 2.36, high: 3.28 },
      source: { authors: 'Shahabasi, Y.', year: 1979, kind: 'thesis' },
    });
    for (const c of body.cultivars) {
      for (const v of c.values as {
        source: { title: string } | null;
        typical_default: boolean;
      }[]) {
        // A value without a source is allowed only as a labelled typical default.
        if (!v.typical_default) expect(v.source?.title, String(c.slug)).toBeTruthy();
      }
    }
  });

  it('?commodity= keeps that commodity only', async () => {
    signInAs(ids.engineer);
    const { body } = await list('?commodity=test-medlar');
    expect(slugs(body).sort()).toEqual(['test-medlar-percent', 'test-medlar-underscore']);
    const apples = (await list('?commodity=apple')).body;
    expect(slugs(apples)).toContain('apple-jonathan');
    expect(apples.cultivars.every((c) => (c.commodity as { slug: string }).slug === 'apple')).toBe(
      true,
    );
    expect((await list('?commodity=no-such-fruit')).body.cultivars).toEqual([]);
  });

  it('?q= matches names case-blind, with % and _ taken literally', async () => {
    signInAs(ids.engineer);
    expect(slugs((await list('?q=JONATHAN')).body)).toContain('apple-jonathan');
    expect(slugs((await list('?q=%25')).body)).toEqual(['test-medlar-percent']);
    expect(slugs((await list('?q=_')).body)).toEqual(['test-medlar-underscore']);
    expect(slugs((await list('?q=100%25%20red')).body)).toEqual(['test-medlar-percent']);
  });

  it('ignores a __proto__ parameter and refuses a bad one with a field message', async () => {
    signInAs(ids.engineer);
    const polluted = await list('?__proto__=x&constructor=y&q=snake');
    expect(polluted.status).toBe(200);
    expect(slugs(polluted.body)).toEqual(['test-medlar-underscore']);
    const xml = await list('?format=xml');
    expect(xml.status).toBe(400);
    expect(xml.body.fieldErrors).toEqual({ format: ['format is json or csv.'] });
    const long = await list(`?q=${'a'.repeat(101)}`);
    expect(long.status).toBe(400);
    expect(Object.keys(long.body.fieldErrors as object)).toEqual(['q']);
  });
});

describe('GET /api/cultivars?format=csv', () => {
  it('has the header row, the values, and no cell a spreadsheet would run', async () => {
    signInAs(ids.buyer);
    const response = await cultivars.GET(request('GET', '/api/cultivars?format=csv'), params({}));
    expect(response.status).toBe(200);
    expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
    expect(response.headers.get('content-disposition')).toMatch(/^attachment/);
    const text = await response.text();
    const [header, ...rows] = parseCsv(text);
    expect(header).toEqual([
      'commodity',
      'cultivar',
      'revision',
      'quantity',
      'variant',
      'value',
      'unit',
      'low',
      'high',
      'sd',
      'samples',
      'method',
      'ripeness',
      'temperature',
      'storage',
      'typical_default',
      'source_key',
      'source',
    ]);
    const col = (name: string) => header.indexOf(name);
    const jonathan = rows.find(
      (r) => r[col('cultivar')] === 'Jonathan' && r[col('unit')] === 'MPa',
    );
    expect(jonathan?.[col('value')]).toBe('2.52');
    const hostile = rows.find((r) => r[col('source_key')] === 'test-formula')!;
    expect(hostile[col('source')]).toBe(`'${FORMULA}`);
    expect(hostile[col('method')]).toBe("'@SUM(1+1)");
    expect(hostile[col('ripeness')]).toBe("'+ripe");
    expect(hostile[col('storage')]).toBe("'-2 days");
    for (const cell of rows.flat()) {
      if (/^[=+\-@]/.test(cell)) expect(Number.isFinite(Number(cell)), cell).toBe(true);
    }
  });
});

describe('GET /api/cultivars/[slug]', () => {
  const one = async (slug: string) =>
    cultivar.GET(request('GET', `/api/cultivars/${slug}`), params({ slug }));

  it('answers the cultivar, 404 for an unknown one and 400 for a malformed slug', async () => {
    signInAs(ids.buyer);
    const found = await one('apple-jonathan');
    expect(found.status).toBe(200);
    expect((await found.json()).cultivar.slug).toBe('apple-jonathan');
    expect((await one('no-such-cultivar')).status).toBe(404);
    const bad = await one('Bad Slug!');
    expect(bad.status).toBe(400);
    expect(Object.keys((await bad.json()).fieldErrors)).toEqual(['slug']);
    expect((await one('__proto__')).status).toBe(400);
  });
});

describe('GET /api/cultivars/[slug]/revisions', () => {
  const history = async () =>
    revisions.GET(
      request('GET', '/api/cultivars/apple-jonathan/revisions'),
      params({ slug: 'apple-jonathan' }),
    );

  it('refuses a buyer; an engineer sees the published record but no draft', async () => {
    const draft = await createDraft(editor, 'apple-jonathan');
    signInAs(ids.buyer);
    expect((await history()).status).toBe(403);
    signInAs(ids.engineer);
    const seen = (await (await history()).json()).revisions as { id: number; status: string }[];
    expect(seen.length).toBeGreaterThan(0);
    expect(seen.map((r) => r.id)).not.toContain(draft.id);
    expect(seen.every((r) => r.status === 'published' || r.status === 'superseded')).toBe(true);
    signInAs(ids.editor);
    const editors = (await (await history()).json()).revisions as { id: number }[];
    expect(editors.map((r) => r.id)).toContain(draft.id);
  });
});

describe('PUT /api/cultivars/[slug]/follow', () => {
  const slug = 'apple-jonathan';
  const put = (body: unknown, headers?: Record<string, string>) =>
    follow.PUT(request('PUT', `/api/cultivars/${slug}/follow`, body, headers), params({ slug }));
  const get = async () =>
    (await (await follow.GET(request('GET', '/'), params({ slug }))).json()).following;

  it('an engineer follows, then unfollows', async () => {
    signInAs(ids.engineer);
    expect(await (await put({ follow: true })).json()).toEqual({ following: true });
    expect(await get()).toBe(true);
    expect(await (await put({ follow: false })).json()).toEqual({ following: false });
    expect(await get()).toBe(false);
  });

  it('refuses a buyer, a text/plain body, a foreign origin and a non-boolean; stores nothing', async () => {
    const before = await countRows('follows');
    signInAs(ids.buyer);
    expect((await put({ follow: true })).status).toBe(403);
    signInAs(ids.engineer);
    expect((await put({ follow: true }, { 'content-type': 'text/plain' })).status).toBe(415);
    expect((await put({ follow: true }, { origin: 'http://127.0.0.1:4999' })).status).toBe(403);
    const wrong = await put({ follow: 'yes' });
    expect(wrong.status).toBe(400);
    expect(Object.keys((await wrong.json()).fieldErrors)).toEqual(['follow']);
    expect(await countRows('follows')).toBe(before);
  });
});

/**
 * Who may call each property route, written out by hand from the product's role table: any
 * signed-in role reads published values; admin, editor and engineer read history and follow;
 * admin and editor draft and review. An allowed write meets a state it accepts (200/201); the
 * last three rows meet a revision in the wrong state, which an allowed role learns as 409.
 */
const WHO: Who[] = ['signed-out', 'admin', 'editor', 'engineer', 'buyer'];
// prettier-ignore
const EXPECTED: Record<string, [number, number, number, number, number]> = {
  //                                                       signed-out admin editor engineer buyer
  'GET /api/cultivars':                                    [401,       200,  200,   200,     200],
  'GET /api/cultivars/[slug]':                             [401,       200,  200,   200,     200],
  'GET /api/cultivars/[slug]/revisions':                   [401,       200,  200,   200,     403],
  'POST /api/cultivars/[slug]/revisions':                  [401,       201,  201,   403,     403],
  'GET /api/cultivars/[slug]/follow':                      [401,       200,  200,   200,     403],
  'PUT /api/cultivars/[slug]/follow':                      [401,       200,  200,   200,     403],
  'GET /api/revisions/[id]':                               [401,       200,  200,   200,     403],
  'PUT /api/revisions/[id]':                               [401,       200,  200,   403,     403],
  'POST /api/revisions/[id]/submit':                       [401,       200,  200,   403,     403],
  'POST /api/revisions/[id]/return':                       [401,       200,  200,   403,     403],
  'POST /api/revisions/[id]/publish':                      [401,       200,  200,   403,     403],
  'POST /api/revisions/[id]/rebase':                       [401,       200,  200,   403,     403],
  'POST /api/revisions/[id]/submit, already in review':    [401,       409,  409,   403,     403],
  'POST /api/revisions/[id]/publish, still a draft':       [401,       409,  409,   403,     403],
  'POST /api/revisions/[id]/return, long published':       [401,       409,  409,   403,     403],
};

describe('role table of the property routes', () => {
  let catcher: Awaited<ReturnType<typeof startTestCatcher>>;
  let calls: Record<string, Prepare> = {};
  beforeAll(async () => {
    // Publishing mails the followers that the table's own follow calls create.
    catcher = await startTestCatcher();
    calls = await setUpRoleCalls();
  });
  afterAll(() => catcher.close());

  it('covers exactly the calls it names', () => {
    expect(Object.keys(calls).sort()).toEqual(Object.keys(EXPECTED).sort());
  });

  for (const [name, statuses] of Object.entries(EXPECTED)) {
    WHO.forEach((who, i) => {
      it(`${name} as ${who} → ${statuses[i]}`, async () => {
        const send = await calls[name](who);
        signInAs(who === 'signed-out' ? null : ids[who]);
        const before = await snapshot();
        const response = await send();
        expect(response.status, await response.clone().text()).toBe(statuses[i]);
        if (statuses[i] >= 400) expect(await snapshot()).toEqual(before);
      });
    });
  }

  const writes = Object.keys(EXPECTED).filter((n) => !n.startsWith('GET'));
  for (const name of writes) {
    it(`${name} from a foreign Origin → 403, as text/plain → 415, storing nothing`, async () => {
      signInAs(ids.admin);
      for (const [headers, status] of [
        [{ origin: 'http://127.0.0.1:4999' }, 403],
        [{ 'content-type': 'text/plain' }, 415],
      ] as const) {
        const send = await calls[name]('admin');
        const before = await snapshot();
        expect((await send(headers)).status).toBe(status);
        expect(await snapshot()).toEqual(before);
      }
    });
  }
});
