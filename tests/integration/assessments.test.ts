import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { countRows, freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import type { Actor } from '@/lib/auth/actor';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, publishRevision, submitDraft, updateDraft } from '@/lib/data/revisions';
import { getRevision } from '@/lib/data/cultivars';
import { toValueInput } from '@/lib/lab-tests/draft-value';
import * as list from '@/app/api/assessments/route';
import * as one from '@/app/api/assessments/[id]/route';
import * as rerun from '@/app/api/assessments/[id]/rerun/route';
import * as curves from '@/app/api/assessments/[id]/curves/route';
import * as report from '@/app/api/assessments/[id]/report/route';
import * as inputsCsv from '@/app/api/assessments/[id]/inputs/route';

const req = (method: string, body?: unknown) =>
  new Request('http://tenderline.test/api/assessments', {
    method,
    headers: { 'content-type': 'application/json' },
    body: body === undefined ? undefined : JSON.stringify(body),
  });
const ctx = (id: number | string) => ({ params: Promise.resolve({ id: String(id) }) });

let editor: Actor, admin: Actor;
/** Publish a revision of the test cultivar with this drop threshold onto steel (illustrative). */
async function publishThreshold(mm: number) {
  const { id } = await createDraft(editor, 'test-pinned');
  await updateDraft(editor, id, {
    values: [
      { quantity: 'youngs_modulus', variant: 'apparent', value: 3, sourceKey: 'shahabasi-1979' },
      { quantity: 'poisson_ratio', value: 0.35, sourceKey: 'shahabasi-1979' },
      { quantity: 'diameter', value: 80, sourceKey: 'shahabasi-1979' },
      { quantity: 'mass', value: 200, sourceKey: 'shahabasi-1979' },
      {
        quantity: 'drop_threshold_height',
        variant: 'steel',
        value: mm,
        observation: 'no-bruise',
        sourceKey: 'shahabasi-1979',
      },
    ],
  });
  await submitDraft(editor, id);
  await publishRevision(admin, id);
  return id;
}
const SAVE = {
  check: 'drop',
  title: 'Transfer drop, line 2',
  notes: 'Before the new chute',
  inputs: { cultivar: 'test-pinned', heightMm: 150, surface: 'steel' },
};

describe('assessments pin their data', () => {
  let first = 0;
  let revision1 = 0;
  beforeAll(async () => {
    await freshDatabase();
    const actor = async (e: string) => (await getActiveActor(await userId(e)))!;
    editor = await actor(ACCOUNTS.editor);
    admin = await actor(ACCOUNTS.admin);
    const [commodity] = await db('commodities').select('id').limit(1);
    await db('cultivars').insert({
      commodity_id: commodity.id,
      slug: 'test-pinned',
      name: 'Test pinned',
      is_type: false,
    });
    revision1 = await publishThreshold(300);
  });

  it('saves a check with the revision it used, computed on the server', async () => {
    signInAs(await userId(ACCOUNTS.engineer));
    const res = await list.POST(req('POST', { ...SAVE, inputs: { ...SAVE.inputs } }), {});
    expect(res.status).toBe(201);
    const { assessment } = await res.json();
    first = assessment.id;
    expect(assessment.revisionId).toBe(revision1);
    // 300 mm allowed ÷ 150 mm = 2.
    expect(assessment.results.margin.value).toBe(2);
    expect(assessment.newerRevision).toBeNull();
  });

  it('after a newer revision it keeps its numbers, says so, and a re-run uses the new data', async () => {
    const revision2 = await publishThreshold(450);
    const before = (await (await one.GET(req('GET'), ctx(first))).json()).assessment;
    expect(before.results.margin.value).toBe(2);
    expect(before.revisionId).toBe(revision1);
    expect(before.newerRevision.id).toBe(revision2);
    const res = await rerun.POST(req('POST', {}), ctx(first));
    expect(res.status).toBe(201);
    const again = (await res.json()).assessment;
    expect(again).toMatchObject({
      version: 2,
      parentId: first,
      revisionId: revision2,
      newerRevision: null,
    });
    expect(again.results.margin.value).toBe(3); // 450 ÷ 150
    // The first is untouched.
    expect(
      (await (await one.GET(req('GET'), ctx(first))).json()).assessment.results.margin.value,
    ).toBe(2);
  });

  it('an assessment that inherited from the commodity record pins it, flags its newer data, and a re-run uses it', async () => {
    // A cultivar with only its own modulus: the stack check inherits the rest (the threshold
    // among them) from the commodity record of its commodity.
    const [commodity] = await db('commodities').select('id').limit(1);
    const type = await db('cultivars').where({ commodity_id: commodity.id, is_type: true }).first();
    await db('cultivars').insert({
      commodity_id: commodity.id,
      slug: 'test-inheriting',
      name: 'Test inheriting',
      is_type: false,
    });
    const own = await createDraft(editor, 'test-inheriting');
    await updateDraft(editor, own.id, {
      values: [
        { quantity: 'youngs_modulus', variant: 'apparent', value: 3, sourceKey: 'shahabasi-1979' },
      ],
    });
    await submitDraft(editor, own.id);
    await publishRevision(admin, own.id);
    signInAs(await userId(ACCOUNTS.engineer));
    const save = {
      check: 'stack',
      title: 'Bin, inherited threshold',
      inputs: {
        cultivar: 'test-inheriting',
        binLengthMm: 1200,
        binWidthMm: 1000,
        fillDepthMm: 600,
      },
    };
    const saved = (await (await list.POST(req('POST', save), {})).json()).assessment;
    expect(saved.results.inputs_used.static_bruise_threshold_kpa.rung).toBe('commodity');
    expect(saved.results.inputs_used.modulus_mpa.rung).toBe('own');
    expect(saved.results.pinned.commodity_record.revision_id).toBe(type.published_revision_id);
    expect(saved.commodityRevisionId).toBe(type.published_revision_id);
    expect(saved.newerCommodityRevision).toBeNull();
    // Publish a new commodity record revision whose threshold is 1.5 × the old one.
    const draft = await createDraft(editor, type.slug);
    const values = (await getRevision(editor, draft.id)).values.map(toValueInput);
    const threshold = values.find((v) => v.quantity === 'static_bruise_threshold')!;
    const old = threshold.value;
    threshold.value = old * 1.5;
    if (threshold.low !== null && threshold.high !== null) {
      threshold.low *= 1.5;
      threshold.high *= 1.5;
    }
    await updateDraft(editor, draft.id, { values });
    await submitDraft(editor, draft.id);
    await publishRevision(admin, draft.id);
    const kept = (await (await one.GET(req('GET'), ctx(saved.id))).json()).assessment;
    expect(kept.results.margin.value).toBe(saved.results.margin.value);
    expect(kept.newerCommodityRevision.id).toBe(draft.id);
    expect(kept.newerRevision).toBeNull();
    const again = (await (await rerun.POST(req('POST', {}), ctx(saved.id))).json()).assessment;
    expect(again.results.inputs_used.static_bruise_threshold_kpa.value).toBeCloseTo(old * 1.5, 6);
    expect(again.commodityRevisionId).toBe(draft.id);
    expect(again.newerCommodityRevision).toBeNull();
    // The stack margin is the threshold over the contact pressure, which the threshold does not
    // change: 1.5 × the margin, to the 3 significant figures a margin is kept to (0.5 %).
    expect(
      Math.abs(again.results.margin.value / (1.5 * saved.results.margin.value) - 1),
    ).toBeLessThan(0.005);
    // The inputs CSV carries each figure's rung and source, and both pinned revisions.
    const csv = await (await inputsCsv.GET(req('GET'), ctx(saved.id))).text();
    const lines = csv.trim().split('\r\n');
    expect(lines[0]).toBe(
      'figure,value,unit,rung,source,note,spread_low,spread_high,spread_sd,spread_basis',
    );
    expect(
      lines.find((l) => l.startsWith("Young's modulus,3,MPa,this cultivar's published value,")),
    ).toBeTruthy();
    expect(
      lines.find(
        (l) =>
          l.startsWith('Static bruise threshold,') && l.includes("the commodity's published value"),
      ),
    ).toBeTruthy();
    expect(lines.find((l) => l.startsWith('commodity record revision,'))).toContain(
      `revision id ${type.published_revision_id}`,
    );
    expect(lines.find((l) => l.startsWith('model version,'))).toBeTruthy();
    // Another role's request for it is refused.
    signInAs(await userId(ACCOUNTS.buyer));
    expect((await inputsCsv.GET(req('GET'), ctx(saved.id))).status).toBe(403);
    signInAs(await userId(ACCOUNTS.engineer));
  });

  it('stamps every result with the model version and the result schema it was made with', async () => {
    const row = await db('assessments').where({ id: first }).first();
    // Written out, not read from the code: the version string of fem/version.ts at this commit
    // and the drop check's second result schema (rungs).
    expect(row.model_version).toMatch(/^\d{4}\.\d{1,2}\.\d+$/);
    expect(row.result_schema).toBe('drop/2');
    const { assessment } = await (await one.GET(req('GET'), ctx(first))).json();
    expect(assessment).toMatchObject({ modelVersion: row.model_version, resultSchema: 'drop/2' });
  });

  it('numbers re-runs within their chain: a re-run of v2 is v3, and parallel re-runs never share a number', async () => {
    const v2 = (await db('assessments').where({ parent_id: first }).first()).id;
    const v3 = (await (await rerun.POST(req('POST', {}), ctx(v2))).json()).assessment;
    expect(v3).toMatchObject({ version: 3, parentId: v2, rootId: first });
    // Before: the next number was read outside the transaction and only among the direct
    // children, so four re-runs at once could all become the same version.
    const answers = await Promise.all(
      [first, v2, v3.id, first].map((id) => rerun.POST(req('POST', {}), ctx(id))),
    );
    expect(answers.map((r) => r.status)).toEqual([201, 201, 201, 201]);
    const versions = (await db('assessments').where({ root_id: first }).select('version'))
      .map((r) => Number(r.version))
      .sort((a, b) => a - b);
    expect(versions).toEqual([1, 2, 3, 4, 5, 6, 7]);
  });

  it('the database refuses two rows of one chain with the same version', async () => {
    const row = await db('assessments').where({ id: first }).first();
    const { id, ...copy } = row;
    void id;
    await expect(db('assessments').insert({ ...copy, parent_id: first })).rejects.toThrow(
      /unique/i,
    );
  });

  it('exports the curves as CSV with units in the header', async () => {
    const res = await curves.GET(req('GET'), ctx(first));
    const lines = (await res.text()).trim().split('\r\n');
    expect(lines[0]).toBe('height_mm,peak_pressure_kpa,impact_energy_j');
    expect(lines).toHaveLength(41);
  });

  it('a saved squeeze check exports its force–travel curve (the CSV used to be empty)', async () => {
    signInAs(await userId(ACCOUNTS.engineer));
    const inputs = {
      modulusMpa: 3,
      poisson: 0.35,
      diameterMm: 80,
      massG: 200,
      staticThresholdKpa: 100,
      friction: 0.5,
      padDiameterMm: 20,
      padEdgeMm: 2,
      maxTravelMm: 2,
    };
    const res = await list.POST(req('POST', { check: 'squeeze', title: 'Gripper', inputs }), {});
    expect(res.status).toBe(201);
    const { assessment } = await res.json();
    expect(assessment.resultSchema).toBe('squeeze/2');
    const lines = (await (await curves.GET(req('GET'), ctx(assessment.id))).text())
      .trim()
      .split('\r\n');
    expect(lines[0]).toBe(
      'travel_per_pad_mm,force_n,contact_radius_mm,peak_pressure_kpa,mean_pressure_kpa,lift_ratio',
    );
    // One row per load step of the squeeze, as saved.
    expect(lines).toHaveLength(assessment.results.model.steps.length + 1);
    const last = lines.at(-1)!.split(',').map(Number);
    // The last step is at the full 2 mm travel per pad.
    expect(last[0]).toBe(2);
    expect(last[1]).toBeGreaterThan(0);
    const pdf = await report.GET(req('GET'), ctx(assessment.id));
    expect(pdf.status).toBe(200);
  });

  it('renders the report as a PDF on the server', async () => {
    const res = await report.GET(req('GET'), ctx(first));
    expect(res.headers.get('content-type')).toBe('application/pdf');
    const bytes = Buffer.from(await res.arrayBuffer());
    expect(bytes.subarray(0, 5).toString()).toBe('%PDF-');
    expect(bytes.length).toBeGreaterThan(2000);
  });

  it('is private to its owner; an admin sees all; the others are refused', async () => {
    signInAs(await userId('editor2@kestrelvale.example'));
    expect((await one.GET(req('GET'), ctx(first))).status).toBe(404);
    expect((await (await list.GET(req('GET'), {})).json()).assessments).toEqual([]);
    signInAs(admin.id);
    expect((await one.GET(req('GET'), ctx(first))).status).toBe(200);
    signInAs(await userId(ACCOUNTS.buyer));
    expect((await list.GET(req('GET'), {})).status).toBe(403);
    signInAs(null);
    expect((await list.GET(req('GET'), {})).status).toBe(401);
  });

  it('bad input: 400 with a field message and nothing stored', async () => {
    signInAs(await userId(ACCOUNTS.engineer));
    const before = await countRows('assessments');
    for (const [body, field] of [
      [{ ...SAVE, title: '' }, 'title'],
      [{ ...SAVE, check: 'juggle' }, 'check'],
      [{ ...SAVE, inputs: { ...SAVE.inputs, heightMm: -1 } }, 'heightMm'],
      [{ ...SAVE, inputs: { cultivar: 'no-such', heightMm: 100, surface: 'steel' } }, 'cultivar'],
    ] as const) {
      const res = await list.POST(req('POST', body), {});
      expect(res.status).toBe(400);
      expect((await res.json()).fieldErrors[field]).toBeDefined();
    }
    expect((await one.GET(req('GET'), ctx('0x1'))).status).toBe(400);
    expect(await countRows('assessments')).toBe(before);
  });
});

describe('who may use assessments (written out)', () => {
  const EXPECT = { 'signed-out': 401, admin: 201, editor: 201, engineer: 201, buyer: 403 } as const;
  for (const [who, status] of Object.entries(EXPECT)) {
    it(`POST /api/assessments as ${who} → ${status}`, async () => {
      signInAs(who === 'signed-out' ? null : await userId(ACCOUNTS[who as keyof typeof ACCOUNTS]));
      const body = {
        check: 'stack',
        title: 'Bin',
        inputs: {
          modulusMpa: 3,
          poisson: 0.35,
          diameterMm: 80,
          massG: 200,
          binLengthMm: 1000,
          binWidthMm: 1000,
          fillDepthMm: 500,
        },
      };
      expect((await list.POST(req('POST', body), {})).status).toBe(status);
    });
  }
});
