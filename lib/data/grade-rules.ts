import 'server-only';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { insertedId, isUniqueViolation } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { NotFoundError, ValidationError } from '@/lib/errors';
import { citationOf } from '@/lib/evidence/ladder';
import { parseInput } from '@/lib/validation/parse';
import {
  GRADE_KINDS,
  GRADE_MEASURES,
  gradeRuleInputSchema,
  type GradeKind,
  type GradeRuleInput,
  type GradeMeasure,
} from '@/lib/validation/grade-rules';
import { recordAudit } from '@/lib/audit-trail';
import { toSource } from './property-rows';

/** A grade rule as the checks and pages read it. */
export interface GradeRule {
  slug: string;
  name: string;
  /** The commodity it is for, or null for any. */
  commodity: string | null;
  kind: GradeKind;
  measure: GradeMeasure;
  /** The largest bruise tolerated: mm across, or mm² of surface. */
  limit: number;
  maxDepthMm: number | null;
  /** Short citation of its source, or "site rule" for an admin's own. */
  source: string | null;
  note: string | null;
}

const asKind = (v: string): GradeKind =>
  (GRADE_KINDS as readonly string[]).includes(v) ? (v as GradeKind) : 'site';
const asMeasure = (v: string): GradeMeasure =>
  (GRADE_MEASURES as readonly string[]).includes(v) ? (v as GradeMeasure) : 'diameter';

/** Every grade rule, each naming its commodity (null: any), for the check forms' choice. */
export async function allGradeRules(): Promise<GradeRule[]> {
  return gradeRulesFor(undefined);
}

/**
 * The rules that apply to a commodity (its own first, then those for any commodity); with
 * `undefined`, every rule.
 */
export async function gradeRulesFor(commodityId: number | null | undefined): Promise<GradeRule[]> {
  let q = typed()
    .selectFrom('grade_rules as g')
    .leftJoin('commodities as m', 'm.id', 'g.commodity_id')
    .selectAll('g')
    .select(['m.name as commodity_name']);
  if (commodityId !== undefined)
    q = q.where((eb) =>
      commodityId === null
        ? eb('g.commodity_id', 'is', null)
        : eb.or([eb('g.commodity_id', '=', commodityId), eb('g.commodity_id', 'is', null)]),
    );
  const rows = await q.orderBy('g.commodity_id', 'desc').orderBy('g.limit_value').execute();
  const ids = [...new Set(rows.map((r) => r.source_id).filter((id) => id !== null))];
  const sources = new Map(
    (ids.length
      ? await typed().selectFrom('sources').selectAll().where('id', 'in', ids).execute()
      : []
    ).map((row) => [row.id, toSource(row)]),
  );
  return rows.map((r) => ({
    slug: r.slug,
    name: r.name,
    commodity: r.commodity_name,
    kind: asKind(r.kind),
    measure: asMeasure(r.measure),
    limit: r.limit_value,
    maxDepthMm: r.max_depth_mm,
    source:
      r.source_id !== null
        ? citationOf(sources.get(r.source_id) ?? null)
        : r.kind === 'site'
          ? 'site rule'
          : null,
    note: r.note,
  }));
}

/** The grade rules an engineer may choose from for a commodity (by slug), for the forms. */
export async function listGradeRules(actor: Actor, commodity?: string): Promise<GradeRule[]> {
  assertCan(actor, 'checks:run');
  if (!commodity) return gradeRulesFor(null);
  const row = await typed()
    .selectFrom('commodities')
    .select('id')
    .where('slug', '=', commodity)
    .executeTakeFirst();
  if (!row) throw new NotFoundError(`No commodity "${commodity.slice(0, 60)}".`);
  return gradeRulesFor(row.id);
}

/**
 * The rule a check judges by: the one asked for (it must apply to the commodity), else the
 * commodity's strictest published standard, else the research definition for any commodity.
 */
export async function chooseGradeRule(
  commodityId: number | null,
  slug: string | undefined,
): Promise<GradeRule | null> {
  const rules = await gradeRulesFor(commodityId);
  if (slug) {
    const rule = rules.find((r) => r.slug === slug);
    if (!rule)
      throw new ValidationError('Unknown grade rule.', {
        gradeRule: [`No grade rule "${slug.slice(0, 80)}" for this fruit.`],
      });
    return rule;
  }
  const own = rules.filter((r) => r.commodity !== null && r.kind === 'standard');
  return own[0] ?? rules.find((r) => r.kind === 'research') ?? rules[0] ?? null;
}

const slugOf = (name: string) =>
  `site-${name
    .toLowerCase()
    .normalize('NFKD')
    .replace(/[^a-z0-9]+/g, '-')
    .replace(/^-|-$/g, '')
    .slice(0, 60)}`;

/** Admin: add the site's own grade rule (validated, audited, in one transaction). */
export async function createGradeRule(actor: Actor, input: unknown): Promise<GradeRule> {
  assertCan(actor, 'grade-rules:manage');
  const v = parseInput(gradeRuleInputSchema, input);
  // Two admins naming rules alike at once: the loser of the unique slug tries the next one.
  for (let attempt = 1; ; attempt++) {
    try {
      const made = await insertRule(actor, v);
      return (await gradeRulesFor(made.commodityId)).find((r) => r.slug === made.slug)!;
    } catch (error) {
      if (!isUniqueViolation(error) || attempt >= 5) throw error;
    }
  }
}

async function insertRule(actor: Actor, v: GradeRuleInput) {
  return db.transaction(async (trx) => {
    let commodityId: number | null = null;
    if (v.commodity) {
      const c = await typed(trx)
        .selectFrom('commodities')
        .select('id')
        .where('slug', '=', v.commodity)
        .executeTakeFirst();
      if (!c)
        throw new ValidationError('Unknown commodity.', {
          commodity: [`No commodity "${v.commodity}".`],
        });
      commodityId = c.id;
    }
    const base = slugOf(v.name) || 'site-rule';
    const taken = await typed(trx)
      .selectFrom('grade_rules')
      .select('slug')
      .where('slug', 'like', `${base}%`)
      .execute();
    const names = new Set(taken.map((t) => t.slug));
    let slug = base;
    for (let i = 2; names.has(slug); i++) slug = `${base}-${i}`;
    const [row] = await trx('grade_rules')
      .insert({
        slug,
        name: v.name,
        commodity_id: commodityId,
        kind: 'site',
        measure: v.measure,
        limit_value: v.limit,
        max_depth_mm: v.maxDepthMm,
        source_id: null,
        note: v.note,
        created_by: actor.id,
        created_at: new Date(),
      })
      .returning('id');
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'grade-rule.create',
      entity: 'grade_rule',
      entityId: insertedId(row),
      detail: { slug, measure: v.measure, limit: v.limit, commodity: v.commodity },
    });
    return { slug, commodityId };
  });
}
