import { beforeAll, describe, expect, it } from 'vitest';
import { siText } from '@/lib/phrase';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, publishRevision, submitDraft, updateDraft } from '@/lib/data/revisions';
import * as drop from '@/app/api/checks/drop/route';
import * as squeeze from '@/app/api/checks/squeeze/route';
import * as stack from '@/app/api/checks/stack/route';

const post = (route: typeof drop | typeof squeeze | typeof stack, body: unknown) =>
  route.POST(
    new Request('http://tenderline.test/api/checks', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(body),
    }),
    {},
  );

// Illustrative values of invented cultivars (not data), each in the first commodity, so the
// commodity record's published values are what they inherit.
const SOURCE = 'shahabasi-1979';
let commodityId = 0;
let typeValues: {
  quantity: string;
  variant: string;
  value: number;
  is_typical_default: number | boolean;
}[] = [];
async function publish(slug: string, values: Record<string, unknown>[]) {
  const actor = async (e: string) => (await getActiveActor(await userId(e)))!;
  const editor = await actor(ACCOUNTS.editor);
  await db('cultivars').insert({ commodity_id: commodityId, slug, name: slug, is_type: false });
  const { id } = await createDraft(editor, slug);
  await updateDraft(editor, id, { values });
  await submitDraft(editor, id);
  await publishRevision(await actor(ACCOUNTS.admin), id);
}
/** The commodity record's first published (not typical) value of a quantity, read from the table. */
const typeValue = (quantity: string, variants: string[]) =>
  variants
    .map((variant) =>
      typeValues.find(
        (v) => v.quantity === quantity && v.variant === variant && !v.is_typical_default,
      ),
    )
    .find(Boolean);

describe('where a check’s figures come from: the evidence ladder', () => {
  beforeAll(async () => {
    await freshDatabase();
    const [commodity] = await db('commodities').select('id').orderBy('id').limit(1);
    commodityId = commodity.id;
    const type = await db('cultivars').where({ commodity_id: commodityId, is_type: true }).first();
    typeValues = await db('revision_values')
      .where({ revision_id: type.published_revision_id })
      .orderBy('position')
      .select('quantity', 'variant', 'value', 'is_typical_default');
    await publish('test-density-only', [
      { quantity: 'youngs_modulus', variant: 'apparent', value: 3, sourceKey: SOURCE },
      { quantity: 'poisson_ratio', value: 0.35, sourceKey: SOURCE },
      { quantity: 'diameter', variant: 'equatorial', value: 80, sourceKey: SOURCE },
      { quantity: 'diameter', variant: 'axial', value: 80, sourceKey: SOURCE },
      { quantity: 'density', value: 800, sourceKey: SOURCE },
      {
        quantity: 'drop_threshold_height',
        variant: 'steel',
        value: 300,
        observation: 'bruised-at',
        sourceKey: SOURCE,
      },
      { quantity: 'youngs_modulus', variant: 'flesh', value: 4, stage: 'firm', sourceKey: SOURCE },
    ]);
    await publish('test-firm-only', [
      {
        quantity: 'youngs_modulus',
        variant: 'apparent',
        value: 5,
        stage: 'firm',
        sourceKey: SOURCE,
      },
    ]);
    signInAs(await userId(ACCOUNTS.engineer));
  });

  it('a mass worked out from the own density and size is derived, not published', async () => {
    const res = await post(drop, {
      cultivar: 'test-density-only',
      heightMm: 100,
      surface: 'steel',
    });
    const json = await res.json();
    expect(res.status, JSON.stringify(json)).toBe(200);
    const mass = json.result.inputs_used.mass_g;
    // Sphere of 80 mm at 800 kg/m³: (π/6)·0.08³·800 kg = 214.47 g; 3 figures kept (0.3 %).
    expect(Math.abs(mass.value - 214.466) / 214.466).toBeLessThan(3e-3);
    expect(mass.rung).toBe('derived');
    // The note names the relation and its inputs in words; their figures are their own rows.
    expect(mass.note).toMatch(/the density and the fruit’s equatorial and axial diameters/);
    expect(json.result.inputs_used.density_kg_m3).toMatchObject({ value: 800, rung: 'own' });
  });

  it('a figure the cultivar lacks is inherited from the commodity record, and says so', async () => {
    const res = await post(squeeze, {
      cultivar: 'test-density-only',
      maxTravelMm: 1,
      sweep: false,
    });
    const json = await res.json();
    expect(res.status, JSON.stringify(json)).toBe(200);
    const used = json.result.inputs_used;
    const threshold = typeValue('static_bruise_threshold', ['']);
    if (threshold) {
      expect(used.static_bruise_threshold_kpa).toMatchObject({
        value: threshold.value,
        rung: 'commodity',
      });
      expect(json.result.evidence.rests_on).toMatch(
        /commodity value for .*bruise threshold|typical value/,
      );
    }
    expect(used.modulus_mpa).toMatchObject({ value: 3, rung: 'own' });
    // The stronger own apparent modulus wins over the flesh one at another stage.
    expect(json.result.pinned.commodity_record).not.toBeNull();
  });

  it('what the user types wins; a typed size carries the mass with it', async () => {
    const res = await post(drop, {
      cultivar: 'test-density-only',
      heightMm: 100,
      surface: 'steel',
      diameterMm: 60,
      modulusMpa: 2,
    });
    const used = (await res.json()).result.inputs_used;
    expect(used.modulus_mpa).toMatchObject({ value: 2, rung: 'entered' });
    expect(used.diameter_mm).toMatchObject({ value: 60, rung: 'entered' });
    // The own axial (80 mm at 80 mm equatorial, a sphere) keeps the shape: 60 mm; mass
    // (π/6)·0.06³·800 kg = 90.48 g (by hand; 3 figures kept).
    expect(used.axial_diameter_mm).toMatchObject({ value: 60, rung: 'derived' });
    expect(Math.abs(used.mass_g.value - 90.478) / 90.478).toBeLessThan(3e-3);
  });

  it('a typed mass and density that disagree with the size by more than 10 % are refused, both figures shown', async () => {
    // 80 mm sphere at 800 kg/m³ weighs 214 g; 300 g is 40 % more.
    const res = await post(drop, {
      cultivar: 'test-density-only',
      heightMm: 100,
      surface: 'steel',
      massG: 300,
      densityKgM3: 800,
    });
    const json = await res.json();
    expect(res.status).toBe(400);
    expect(json.fieldErrors.massG[0]).toMatch(/300 g.*800 kg\/m³.*214 g/);
    expect(json.fieldErrors.densityKgM3[0]).toBe(json.fieldErrors.massG[0]);
    // Within 10 % the pair is accepted as typed.
    const ok = await post(drop, {
      cultivar: 'test-density-only',
      heightMm: 100,
      surface: 'steel',
      massG: 220,
      densityKgM3: 800,
    });
    expect(ok.status).toBe(200);
  });

  it('a height at which fruit bruised is an upper bound: below it the verdict is never comfortable', async () => {
    const below = (
      await (
        await post(drop, { cultivar: 'test-density-only', heightMm: 100, surface: 'steel' })
      ).json()
    ).result;
    // 300 mm (bruised at) ÷ 100 mm = 3, which would read comfortable as a threshold.
    expect(below.margin).toMatchObject({
      value: 3,
      basis: 'dynamic',
      verdict: 'tight',
      upper_bound: true,
    });
    expect(below.warnings.map(siText).join(' ')).toMatch(/upper bound/);
    const above = (
      await (
        await post(drop, { cultivar: 'test-density-only', heightMm: 400, surface: 'steel' })
      ).json()
    ).result;
    expect(above.margin).toMatchObject({ value: 0.75, verdict: 'bruise risk' });
  });

  it('a staged value from another stage is used only with a warning that says so', async () => {
    const res = await post(stack, {
      cultivar: 'test-firm-only',
      stage: 'ripe',
      binLengthMm: 1200,
      binWidthMm: 1000,
      fillDepthMm: 300,
    });
    const json = await res.json();
    expect(res.status, JSON.stringify(json)).toBe(200);
    expect(json.result.inputs_used.modulus_mpa).toMatchObject({ value: 5, rung: 'own' });
    expect(json.result.warnings.map(siText).join(' ')).toMatch(
      /firm \(harvest\) fruit, not on ripe \(eating\)/,
    );
    expect(json.result.pinned.stage).toBe('ripe');
  });

  it('a density worked out from a typed mass is labelled derived', async () => {
    const res = await post(squeeze, {
      modulusMpa: 3,
      poisson: 0.35,
      diameterMm: 80,
      massG: 200,
      friction: 0.5,
      maxTravelMm: 1,
      sweep: false,
    });
    const density = (await res.json()).result.inputs_used.density_kg_m3;
    // 0.2 kg over (π/6)·0.08³ m³ = 746.0 kg/m³ (3 figures kept).
    expect(density).toMatchObject({ value: 746, rung: 'derived' });
  });

  it('custom values with a figure missing: 400 naming it and the rungs tried', async () => {
    const res = await post(squeeze, {
      modulusMpa: 3,
      diameterMm: 80,
      massG: 200,
      friction: 0.5,
      maxTravelMm: 1,
    });
    const json = await res.json();
    expect(res.status).toBe(400);
    expect(json.fieldErrors.poisson[0]).toMatch(/Poisson's ratio: no value/);
  });

  it('a database failure while reading the cultivar is a server error, not "unknown cultivar"', async () => {
    // The table out of reach stands for an outage: the query fails, as it would with the
    // database file locked or the server gone.
    await db.schema.renameTable('cultivars', 'cultivars_away');
    try {
      const res = await post(drop, {
        cultivar: 'test-density-only',
        heightMm: 100,
        surface: 'steel',
      });
      const json = await res.json();
      expect(res.status).toBe(500);
      expect(json.fieldErrors?.cultivar).toBeUndefined();
      expect(json.message).not.toMatch(/unknown cultivar/i);
    } finally {
      await db.schema.renameTable('cultivars_away', 'cultivars');
    }
    const again = await post(drop, {
      cultivar: 'no-such-cultivar',
      heightMm: 100,
      surface: 'steel',
    });
    expect(again.status).toBe(400);
    expect((await again.json()).fieldErrors.cultivar[0]).toMatch(/No cultivar/);
  });
});
