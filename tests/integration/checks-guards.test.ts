import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import * as drop from '@/app/api/checks/drop/route';
import * as stack from '@/app/api/checks/stack/route';
import * as squeeze from '@/app/api/checks/squeeze/route';
import * as probability from '@/app/api/checks/squeeze/probability/route';
import * as assessments from '@/app/api/assessments/route';
import * as rerun from '@/app/api/assessments/[id]/rerun/route';

// The checks and assessments routes as an attacker would try them, each answer written out.
type Post = (request: Request, context: { params: Promise<{ id: string }> }) => Promise<Response>;
const FRUIT = { modulusMpa: 3, poisson: 0.35, diameterMm: 80, massG: 200, staticThresholdKpa: 100 };
// The last figure: the answer to a 300 KB body whose length is declared, as a browser sends it.
const ROUTES: [string, Post, unknown, number][] = [
  ['POST /api/checks/drop', drop.POST as Post, { ...FRUIT, heightMm: 100, surface: 'steel' }, 413],
  [
    'POST /api/checks/stack',
    stack.POST as Post,
    { ...FRUIT, binLengthMm: 1000, binWidthMm: 1000, fillDepthMm: 500 },
    413,
  ],
  [
    'POST /api/checks/squeeze',
    squeeze.POST as Post,
    { ...FRUIT, friction: 0.5, maxTravelMm: 1, sweep: false },
    413,
  ],
  [
    'POST /api/checks/squeeze/probability',
    probability.POST as Post,
    { ...FRUIT, friction: 0.5, maxTravelMm: 1, samples: 50 },
    413,
  ],
  [
    'POST /api/assessments',
    assessments.POST as Post,
    { check: 'drop', title: 'Chute', inputs: { ...FRUIT, heightMm: 100, surface: 'steel' } },
    413,
  ],
  ['POST /api/assessments/[id]/rerun', rerun.POST as Post, {}, 413],
];
const ctx = { params: Promise.resolve({ id: '1' }) };
const request = (body: string, headers: Record<string, string>) =>
  new Request('http://tenderline.test/api', { method: 'POST', headers, body });

describe('checks and assessments refuse what a browser attack would send, storing nothing', () => {
  beforeAll(async () => {
    await freshDatabase();
    signInAs(await userId(ACCOUNTS.engineer));
  });

  for (const [name, post, body, hugeStatus] of ROUTES) {
    it(`${name}: foreign Origin 403, text/plain 415, same-site page 403, 300 KB body ${hugeStatus}`, async () => {
      const before = [await countRows('assessments'), await countRows('audit_log')];
      const json = JSON.stringify(body);
      expect(
        (
          await post(
            request(json, { 'content-type': 'application/json', origin: 'http://127.0.0.1:4999' }),
            ctx,
          )
        ).status,
      ).toBe(403);
      expect((await post(request(json, { 'content-type': 'text/plain' }), ctx)).status).toBe(415);
      expect(
        (
          await post(
            request(json, { 'content-type': 'application/json', 'sec-fetch-site': 'same-site' }),
            ctx,
          )
        ).status,
      ).toBe(403);
      const huge = JSON.stringify({ ...(body as object), pad: 'x'.repeat(300_000) });
      const declared = {
        'content-type': 'application/json',
        'content-length': String(huge.length),
      };
      expect((await post(request(huge, declared), ctx)).status).toBe(hugeStatus);
      expect([await countRows('assessments'), await countRows('audit_log')]).toEqual(before);
    });
  }

  it('parallel saves are each stored once, with their own audit row', async () => {
    const before = await countRows('assessments');
    const saves = await Promise.all(
      Array.from({ length: 8 }, (_, i) =>
        assessments.POST(
          request(JSON.stringify({ ...(ROUTES[4][2] as object), title: `Chute ${i}` }), {
            'content-type': 'application/json',
          }),
          {},
        ),
      ),
    );
    expect(saves.map((r) => r.status)).toEqual(Array(8).fill(201));
    expect((await countRows('assessments')) - before).toBe(8);
  });
});
