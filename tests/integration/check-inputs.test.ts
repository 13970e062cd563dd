import { beforeAll, describe, expect, it } from 'vitest';
import { signInAs } from '../support/session';
import { freshDatabase, userId } from '../support/db';
import { ACCOUNTS } from '../support/accounts';
import { db } from '@/lib/db';
import { getActiveActor } from '@/lib/data/users';
import { createDraft, publishRevision, submitDraft, updateDraft } from '@/lib/data/revisions';
import * as drop from '@/app/api/checks/drop/route';
import * as squeeze from '@/app/api/checks/squeeze/route';

const post = (route: typeof drop | typeof squeeze, body: unknown) =>
  route.POST(
    new Request('http://tenderline.test/api/checks', {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify(body),
    }),
    {},
  );

// Illustrative values of an invented cultivar (not data): a published density but no mass.
const SOURCE = 'shahabasi-1979';
async function publishDensityOnly() {
  const actor = async (e: string) => (await getActiveActor(await userId(e)))!;
  const editor = await actor(ACCOUNTS.editor);
  const [commodity] = await db('commodities').select('id').limit(1);
  await db('cultivars').insert({
    commodity_id: commodity.id,
    slug: 'test-density-only',
    name: 'Density only',
    is_type: false,
  });
  const { id } = await createDraft(editor, 'test-density-only');
  await updateDraft(editor, id, {
    values: [
      { quantity: 'youngs_modulus', variant: 'apparent', value: 3, sourceKey: SOURCE },
      { quantity: 'poisson_ratio', value: 0.35, sourceKey: SOURCE },
      { quantity: 'diameter', value: 80, sourceKey: SOURCE },
      { quantity: 'density', value: 800, sourceKey: SOURCE },
      { quantity: 'drop_threshold_height', variant: 'steel', value: 300, sourceKey: SOURCE },
    ],
  });
  await submitDraft(editor, id);
  await publishRevision(await actor(ACCOUNTS.admin), id);
}

describe('where a check’s figures come from', () => {
  beforeAll(async () => {
    await freshDatabase();
    await publishDensityOnly();
    signInAs(await userId(ACCOUNTS.engineer));
  });

  it('a mass worked out from the published density is labelled derived, not published', async () => {
    const res = await post(drop, {
      cultivar: 'test-density-only',
      heightMm: 100,
      surface: 'steel',
    });
    const json = await res.json();
    expect(res.status, JSON.stringify(json)).toBe(200);
    const mass = json.result.inputs_used.mass_g;
    // Sphere of 80 mm at 800 kg/m³: (π/6)·0.08³·800 kg = 214.47 g; 1e-4 covers rounding only.
    expect(Math.abs(mass.value - 214.466) / 214.466).toBeLessThan(1e-4);
    expect(mass.origin).toBe('derived');
    expect(mass.source).toMatch(/800 kg\/m³/);
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
    // 0.2 kg over (π/6)·0.08³ m³ = 746.0 kg/m³ (4 figures kept).
    expect(density).toMatchObject({ value: 746, origin: 'derived' });
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
