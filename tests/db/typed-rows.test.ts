import { beforeAll, describe, expect, it } from 'vitest';
import { freshDatabase } from '../support/db';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { assessmentInputs, assessmentResults, auditDetail } from '@/lib/db-json';
import { toBool, toIso } from '@/lib/db-values';
import { recordAudit } from '@/lib/audit-trail';

// The typed reads (Kysely on the Knex connection, lib/db-kysely.ts) against plain Knex reads of
// the same rows, on whichever database this leg runs: SQLite in memory or PostgreSQL.

let ownerId: number;
let assessmentId: number;

beforeAll(async () => {
  await freshDatabase();
  ownerId = (await db('users').orderBy('id').first()).id;
  const [row] = await db('assessments')
    .insert({
      owner_id: ownerId,
      check: 'squeeze',
      title: 'Typed read',
      notes: null,
      inputs: JSON.stringify({ force: 12.5, nested: { a: [1, 2] } }),
      results: JSON.stringify({ pinned: null, margin: 0.25 }),
      version: 1,
      created_at: new Date('2026-12-01T08:30:00.000Z'),
    })
    .returning('id');
  assessmentId = typeof row === 'object' ? row.id : row;
});

describe('typed rows read what Knex reads', () => {
  it('assessments, with the JSON columns parsed by zod', async () => {
    const raw = await db('assessments').where({ id: assessmentId }).first();
    const row = await typed()
      .selectFrom('assessments')
      .selectAll()
      .where('id', '=', assessmentId)
      .executeTakeFirstOrThrow();
    expect(row).toEqual(raw);
    expect(assessmentInputs.parse(row.inputs)).toEqual(JSON.parse(raw.inputs));
    expect(assessmentResults.parse(row.results)).toEqual({ pinned: null, margin: 0.25 });
    expect(toIso(row.created_at)).toBe('2026-12-01T08:30:00.000Z');
    expect(() => assessmentInputs.parse('[1, 2]')).toThrow();
    expect(() => assessmentInputs.parse('{not json')).toThrow(/assessments.inputs is not JSON/);
  });

  it('cultivars, joined to their commodity', async () => {
    const raw = await db('cultivars as c')
      .join('commodities as m', 'm.id', 'c.commodity_id')
      .select('c.*', 'm.slug as m_slug')
      .orderBy('c.id');
    const rows = await typed()
      .selectFrom('cultivars as c')
      .innerJoin('commodities as m', 'm.id', 'c.commodity_id')
      .selectAll('c')
      .select('m.slug as m_slug')
      .orderBy('c.id')
      .execute();
    expect(rows.length).toBeGreaterThan(0);
    expect(rows).toEqual(raw);
    expect(rows.map((r) => toBool(r.is_type))).toEqual(raw.map((r) => Boolean(r.is_type)));
  });

  it('audit_log, inside a Knex transaction and gone after its rollback', async () => {
    const before = await typed().selectFrom('audit_log').select('id').execute();
    const rollback = new Error('roll back');
    await expect(
      db.transaction(async (trx) => {
        await recordAudit(trx, {
          actorId: ownerId,
          action: 'test.typed',
          entity: 'test',
          entityId: 7,
          detail: { why: 'typed read', n: 3 },
        });
        const raw = await trx('audit_log').where({ action: 'test.typed' }).first();
        const row = await typed(trx)
          .selectFrom('audit_log')
          .selectAll()
          .where('action', '=', 'test.typed')
          .executeTakeFirstOrThrow();
        expect(row).toEqual(raw);
        expect(auditDetail.parse(row.detail)).toEqual({ why: 'typed read', n: 3 });
        expect(row.entity_id).toBe('7');
        throw rollback;
      }),
    ).rejects.toBe(rollback);
    const after = await typed()
      .selectFrom('audit_log')
      .select('id')
      .where('action', '=', 'test.typed')
      .execute();
    expect(after).toEqual([]);
    expect(await typed().selectFrom('audit_log').select('id').execute()).toEqual(before);
    expect(auditDetail.parse(null)).toBeNull();
  });
});
