import type { Knex } from 'knex';
import { SOURCES } from './property-data/sources';

/**
 * Grade rules from published standards and research. Inches are converted exactly (25.4 mm).
 * Runs once: rules already there are left as they are.
 */
const INCH = 25.4;
const RULES = [
  {
    slug: 'us-extra-fancy-apple',
    name: 'U.S. Extra Fancy (apples): no bruise injury',
    commodity: 'apple',
    kind: 'standard',
    measure: 'diameter',
    limit: (5 / 8) * INCH,
    maxDepth: (1 / 8) * INCH,
    source: 'wac-16-403-174-apple-bruises',
    note: 'Extra Fancy apples are free from injury caused by bruises (7 CFR 51.300); injury is a bruise greater than 5/8 in (15.9 mm) across or 1/8 in (3.2 mm) deep (WAC 16-403-174).',
  },
  {
    slug: 'us-fancy-apple',
    name: 'U.S. Fancy (apples): no bruise damage',
    commodity: 'apple',
    kind: 'standard',
    measure: 'diameter',
    limit: (7 / 8) * INCH,
    maxDepth: (3 / 16) * INCH,
    source: 'wac-16-403-174-apple-bruises',
    note: 'Fancy apples are free from damage caused by bruises (7 CFR 51.301); damage is a bruise greater than 7/8 in (22.2 mm) across or 3/16 in (4.8 mm) deep (WAC 16-403-174).',
  },
  {
    slug: 'wa-serious-damage-apple',
    name: 'Serious bruise damage (apples, Washington code)',
    commodity: 'apple',
    kind: 'standard',
    measure: 'diameter',
    limit: (9 / 8) * INCH,
    maxDepth: (3 / 8) * INCH,
    source: 'wac-16-403-174-apple-bruises',
    note: 'Serious damage is a bruise greater than 1 1/8 in (28.6 mm) across or 3/8 in (9.5 mm) deep (WAC 16-403-174).',
  },
  {
    slug: 'critical-bruise-100mm2',
    name: 'Critical bruise (research definition)',
    commodity: null,
    kind: 'research',
    measure: 'area',
    limit: 100,
    maxDepth: null,
    source: 'pome-pang-1994-is-thresholds',
    note: 'Pang et al. (1994) set their apple bruise thresholds at the drop giving a 100 mm² bruise. Defined on apples; used for another commodity only for want of a rule of its own, and said so.',
  },
] as const;

/** A cited source's row, added from the seed's list when a catalogue seeded earlier lacks it. */
async function sourceRow(knex: Knex, key: string): Promise<{ id: number }> {
  const found = await knex('sources').where({ key }).first();
  if (found) return found;
  const s = SOURCES.find((x) => x.key === key);
  if (!s) throw new Error(`grade rule: unknown source ${key}`);
  await knex('sources').insert({
    key: s.key,
    kind: s.kind,
    authors: s.authors,
    year: s.year,
    title: s.title,
    venue: s.venue ?? null,
    pages: s.pages ?? null,
    doi: s.doi ?? null,
    url: s.url ?? null,
    note: s.note,
    created_at: new Date(),
  });
  return knex('sources').where({ key }).first();
}

export async function seed(knex: Knex): Promise<void> {
  if (((await knex('grade_rules').count({ n: '*' }))[0].n as number) > 0) return;
  for (const r of RULES) {
    const commodity = r.commodity
      ? await knex('commodities').where({ slug: r.commodity }).first()
      : null;
    const source = await sourceRow(knex, r.source);
    if (r.commodity && !commodity) continue; // the catalogue changed: no such commodity
    await knex('grade_rules').insert({
      slug: r.slug,
      name: r.name,
      commodity_id: commodity?.id ?? null,
      kind: r.kind,
      measure: r.measure,
      limit_value: Number(r.limit.toFixed(3)),
      max_depth_mm: r.maxDepth === null ? null : Number(r.maxDepth.toFixed(3)),
      source_id: source.id,
      note: r.note,
      created_at: new Date(),
    });
  }
}
