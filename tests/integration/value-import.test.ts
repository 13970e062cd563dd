import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import { getActiveActor } from '@/lib/data/users';
import { createDraft } from '@/lib/data/revisions';
import * as importRoute from '@/app/api/revisions/[id]/import/route';
import * as templateRoute from '@/app/api/revisions/import-template/route';

const SLUG = 'apple-jonathan';
const URL_BASE = 'http://tenderline.test/api/revisions';
const HEADER =
  'quantity,variant,value,unit,low,high,sd,samples,method,ripeness,stage,observation,temperature,storage,loading_rate,probe,note,typical,typical_basis,source_key';
type Who = 'admin' | 'editor' | 'engineer' | 'buyer';
const ids = {} as Record<Who, number>;
let draftId = 0;

const modulus = (value: number | string, extra = '') =>
  `youngs_modulus,flesh,${value},MPa,,,,12,Flesh cylinders,,${extra},,,,,,,no,,shahabasi-1979`;
const csv = (...rows: string[]) => [HEADER, ...rows].join('\r\n') + '\r\n';

function multipart(text: string, headers: Record<string, string> = {}) {
  const form = new FormData();
  form.set('file', new File([text], 'values.csv', { type: 'text/csv' }));
  return { body: form, headers };
}

async function post(
  who: Who,
  body: { body: BodyInit; headers: Record<string, string> },
  id = draftId,
) {
  signInAs(ids[who]);
  const request = new Request(`${URL_BASE}/${id}/import`, {
    method: 'POST',
    body: body.body,
    headers: body.headers,
  });
  const response = await importRoute.POST(request, { params: Promise.resolve({ id: String(id) }) });
  return { status: response.status, body: await response.json() };
}

const stored = async () => ({
  values: (await db('revision_values').where({ revision_id: draftId }).count({ n: '*' }))[0].n,
  audits: (await db('audit_log').where({ action: 'revision.import' }).count({ n: '*' }))[0].n,
});

describe('importing values into a draft from CSV', () => {
  beforeAll(async () => {
    await freshDatabase();
    for (const who of ['admin', 'editor', 'engineer', 'buyer'] as const)
      ids[who] = await userId(ACCOUNTS[who]);
    const editor = (await getActiveActor(ids.editor))!;
    draftId = (await createDraft(editor, SLUG)).id;
  });

  it('a good file is appended to the draft in one write, audited', async () => {
    const before = await stored();
    const answer = await post(
      'editor',
      multipart(csv(modulus(2.61, 'firm'), modulus(2.62, 'ripe'), modulus('2.63'))),
    );
    expect(answer).toMatchObject({ status: 200, body: { import: { imported: 3 } } });
    const after = await stored();
    expect(Number(after.values)).toBe(Number(before.values) + 3);
    expect(Number(after.audits)).toBe(Number(before.audits) + 1);
    const last = await db('revision_values')
      .where({ revision_id: draftId })
      .orderBy('position', 'desc')
      .first();
    expect(last).toMatchObject({ quantity: 'youngs_modulus', value: 2.63, unit: 'MPa' });
  });

  it('takes the file as a text/csv body too', async () => {
    const answer = await post('editor', {
      body: csv(modulus(2.64)),
      headers: { 'content-type': 'text/csv' },
    });
    expect(answer.status).toBe(200);
  });

  const REFUSED: [string, () => string, Record<string, RegExp>][] = [
    [
      'wrong and missing columns',
      () => 'quantity,variant,value,colour\nyoungs_modulus,flesh,3,red\n',
      { 'line 1': /Unknown column: "colour".*Missing column: unit\./s },
    ],
    [
      'a unit that does not match',
      () => csv(modulus(2.7), modulus(2.8).replace(',MPa,', ',kPa,')),
      { 'line 3': /unit "kPa" does not match Young's modulus: use MPa\./ },
    ],
    [
      'an unknown source',
      () => csv(modulus(2.7).replace('shahabasi-1979', 'nobody-2099')),
      { 'line 2': /no source with the key "nobody-2099"/ },
    ],
    [
      'a duplicate row',
      () => csv(modulus(2.9), modulus(3.0), modulus(2.9)),
      { 'line 4': /lines 2 and 4 repeat each other/ },
    ],
    [
      'a value the draft already holds',
      () => csv(modulus(2.61, 'firm')),
      { 'line 2': /already holds this value/ },
    ],
    [
      '10 000 rows',
      () => csv(...Array.from({ length: 10_000 }, (_, i) => modulus(1 + i / 10_000))),
      { 'line 2002': /10000 rows of values; at most 2000/ },
    ],
  ];
  for (const [name, text, expected] of REFUSED) {
    it(`${name}: 400 with line-numbered errors, nothing stored`, async () => {
      const before = await stored();
      const started = Date.now();
      const answer = await post('editor', multipart(text()));
      expect(Date.now() - started).toBeLessThan(5000);
      expect(answer.status).toBe(400);
      for (const [line, pattern] of Object.entries(expected))
        expect(answer.body.fieldErrors[line].join(' ')).toMatch(pattern);
      expect(answer.body.message).toMatch(/nothing was imported|^One line|lines have errors/);
      expect(await stored()).toEqual(before);
    });
  }

  it('engineers and buyers are refused (403), and nothing is stored', async () => {
    const before = await stored();
    for (const who of ['engineer', 'buyer'] as const) {
      const answer = await post(who, multipart(csv(modulus(3.3))));
      expect(answer.status).toBe(403);
    }
    expect(await stored()).toEqual(before);
  });

  it('only the draft’s author imports into it, as for every draft edit', async () => {
    const answer = await post('admin', multipart(csv(modulus(3.4))));
    expect(answer).toMatchObject({ status: 403, body: { message: /Only the author/ } });
  });

  it('a write from a foreign origin is refused before anything is read', async () => {
    const before = await stored();
    const answer = await post(
      'editor',
      multipart(csv(modulus(3.5)), { origin: 'https://attacker.example' }),
    );
    expect(answer.status).toBe(403);
    expect(answer.body.message).toMatch(/attacker\.example/);
    expect(await stored()).toEqual(before);
  });

  it('a published revision cannot be imported into', async () => {
    const published = await db('cultivars').where({ slug: SLUG }).first();
    const answer = await post(
      'editor',
      multipart(csv(modulus(3.6))),
      published.published_revision_id,
    );
    expect(answer.status).toBe(403);
  });

  it('the template is CSV with the header and an example row naming a real source', async () => {
    signInAs(ids.editor);
    const response = await templateRoute.GET(
      new Request(`${URL_BASE}/import-template`),
      undefined as never,
    );
    expect(response.headers.get('content-type')).toMatch(/^text\/csv/);
    const [header, example] = (await response.text()).split('\r\n');
    expect(header).toBe(HEADER);
    const key = example.split(',').at(-1);
    expect(await db('sources').where({ key }).first()).toBeTruthy();
    signInAs(ids.buyer);
    const refused = await templateRoute.GET(
      new Request(`${URL_BASE}/import-template`),
      undefined as never,
    );
    expect(refused.status).toBe(403);
  });
});
