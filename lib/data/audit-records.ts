import 'server-only';
import { db } from '@/lib/db';
import { toBool } from '@/lib/db-values';

type Ref = { entity: string; id: string | null };
type Named = { id: unknown; label: string };

const cultivarLabel = (r: { cultivar: string; commodity: string; is_type: unknown }) =>
  toBool(r.is_type as never)
    ? `${r.commodity} (commodity record)`
    : `${r.commodity}, ${r.cultivar}`;

const numericIds = (ids: string[]) => ids.map(Number).filter((n) => Number.isInteger(n) && n > 0);

function cultivars(table: string, alias: string) {
  return db(`${table} as ${alias}`)
    .join('cultivars as c', 'c.id', `${alias}.cultivar_id`)
    .join('commodities as m', 'm.id', 'c.commodity_id');
}

/** Each entity's records by id, in words: one query per entity that appears. */
const LOOKUPS: Record<string, (ids: string[]) => Promise<Named[]>> = {
  revision: async (ids) =>
    (
      await cultivars('property_revisions', 'r')
        .whereIn('r.id', numericIds(ids))
        .select('r.id', 'r.number', 'c.name as cultivar', 'm.name as commodity', 'c.is_type')
    ).map((r) => ({ id: r.id, label: `${cultivarLabel(r)}: revision ${r.number}` })),
  user: async (ids) =>
    (await db('users').whereIn('id', numericIds(ids)).select('id', 'name', 'email')).map((u) => ({
      id: u.id,
      label: `${u.name} (${u.email})`,
    })),
  invitation: async (ids) =>
    (await db('invitations').whereIn('id', numericIds(ids)).select('id', 'email', 'role')).map(
      (i) => ({ id: i.id, label: `invitation of ${i.email} as ${i.role}` }),
    ),
  cultivar: async (ids) =>
    (
      await db('cultivars as c')
        .join('commodities as m', 'm.id', 'c.commodity_id')
        .whereIn('c.id', numericIds(ids))
        .select('c.id', 'c.name as cultivar', 'm.name as commodity', 'c.is_type')
    ).map((r) => ({ id: r.id, label: cultivarLabel(r) })),
  assessment: async (ids) =>
    (await db('assessments').whereIn('id', numericIds(ids)).select('id', 'title')).map((a) => ({
      id: a.id,
      label: `assessment “${a.title}”`,
    })),
  compression_test: (ids) => uploadedTests('compression_tests', 'compression test', ids),
  relaxation_test: (ids) => uploadedTests('relaxation_tests', 'relaxation test', ids),
  image: async (ids) =>
    (
      await cultivars('images', 'i')
        .whereIn('i.id', numericIds(ids))
        .select('i.id', 'c.name as cultivar', 'm.name as commodity', 'c.is_type')
    ).map((r) => ({ id: r.id, label: `photo of ${cultivarLabel(r)}` })),
  source: async (keys) =>
    (await db('sources').whereIn('key', keys).select('key', 'title')).map((s) => ({
      id: s.key,
      label: `source “${s.title}”`,
    })),
  grade_rule: async (ids) =>
    (await db('grade_rules').whereIn('id', numericIds(ids)).select('id', 'name')).map((g) => ({
      id: g.id,
      label: `grade rule “${g.name}”`,
    })),
};
// A sign-in entry's record is the account that tried.
LOOKUPS['sign-in'] = LOOKUPS.user;

async function uploadedTests(table: string, words: string, ids: string[]): Promise<Named[]> {
  return (
    await cultivars(table, 't')
      .whereIn('t.id', numericIds(ids))
      .select('t.id', 't.file_name', 'c.name as cultivar', 'm.name as commodity', 'c.is_type')
  ).map((r) => ({ id: r.id, label: `${words} ${r.file_name} of ${cultivarLabel(r)}` }));
}

/** The records of some audit entries by name, keyed `entity:id`; unknown or removed ones absent. */
export async function recordNames(refs: Ref[]): Promise<Map<string, string>> {
  const byEntity = new Map<string, Set<string>>();
  for (const { entity, id } of refs) {
    if (id != null && LOOKUPS[entity])
      byEntity.set(entity, (byEntity.get(entity) ?? new Set()).add(id));
  }
  const names = new Map<string, string>();
  for (const [entity, ids] of byEntity) {
    for (const { id, label } of await LOOKUPS[entity]([...ids]))
      names.set(`${entity}:${id}`, label);
  }
  return names;
}
