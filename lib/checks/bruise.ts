import { z } from 'zod';
import { m, ph, textSchema } from '@/lib/phrase';

/** What a bruise is judged by, and the answer in the trade's words. */
export const BRUISE_VERDICTS = ['no bruise', 'within tolerance', 'beyond tolerance'] as const;
export type BruiseVerdict = (typeof BRUISE_VERDICTS)[number];

export const gradeRuleViewSchema = z.object({
  slug: z.string(),
  name: z.string(),
  kind: z.enum(['standard', 'research', 'site']),
  measure: z.enum(['diameter', 'area']),
  limit: z.number(),
  max_depth_mm: z.number().nullable(),
  source: z.string().nullable(),
  /** True when the rule was made for another commodity and is used for want of one. */
  borrowed: z.boolean(),
});

/** The bruise a check predicts and how it stands against the chosen grade rule. */
export const bruiseSchema = z.object({
  diameter_mm: z.number(),
  area_mm2: z.number(),
  /** Not predicted from a surface pressure; a standard's depth limit is then not checked. */
  depth_mm: z.number().nullable(),
  verdict: z.enum(BRUISE_VERDICTS),
  rule: gradeRuleViewSchema.nullable(),
  /** One sentence: the bruise, the rule, and the verdict (measures in the reader's units). */
  words: textSchema,
});

export type BruiseView = z.infer<typeof bruiseSchema>;
export type GradeRuleView = z.infer<typeof gradeRuleViewSchema>;

const r3 = (x: number) => Number(x.toPrecision(3));

/** The grade rule as a result names it. */
export function ruleView(
  rule: {
    slug: string;
    name: string;
    kind: 'standard' | 'research' | 'site';
    measure: 'diameter' | 'area';
    limit: number;
    maxDepthMm: number | null;
    source: string | null;
    commodity: string | null;
  },
  commodity: string | null,
): GradeRuleView {
  return {
    slug: rule.slug,
    name: rule.name,
    kind: rule.kind,
    measure: rule.measure,
    limit: rule.limit,
    max_depth_mm: rule.maxDepthMm,
    source: rule.source,
    borrowed: rule.commodity === null && commodity !== null,
  };
}

/**
 * Judge a predicted surface bruise (radius, m) against a grade rule: no bruise at all, a bruise
 * within the rule's largest diameter or area, or one beyond it.
 */
export function judgeBruise(radiusM: number, rule: GradeRuleView | null): BruiseView {
  const diameter = r3(2 * radiusM * 1000);
  const area = r3(Math.PI * (radiusM * 1000) ** 2);
  const verdict: BruiseVerdict =
    radiusM <= 0
      ? 'no bruise'
      : !rule
        ? 'beyond tolerance'
        : (rule.measure === 'diameter' ? diameter : area) <= rule.limit
          ? 'within tolerance'
          : 'beyond tolerance';
  const limit = rule
    ? rule.measure === 'diameter'
      ? ph`${m(r3(rule.limit), 'mm')} across`
      : ph`${m(r3(rule.limit), 'mm²')}`
    : null;
  const size = ph`a bruise about ${m(diameter, 'mm')} across (${m(area, 'mm²')})`;
  const ruleWords = rule
    ? ph`${rule.name} (${rule.source ?? 'site rule'}) tolerates up to ${limit!}${rule.borrowed ? '; a rule defined on another commodity, used for want of one of its own' : ''}`
    : ph`no grade rule applies`;
  const words =
    verdict === 'no bruise'
      ? ph`No bruise: the contact pressure stays below the threshold.`
      : verdict === 'within tolerance'
        ? ph`Bruise within the grade's tolerance: ${size}; ${ruleWords}.`
        : ph`Bruise beyond tolerance: ${size}; ${ruleWords}.`;
  return { diameter_mm: diameter, area_mm2: area, depth_mm: null, verdict, rule, words };
}

/**
 * The radius, m, out to which a contact-pressure profile exceeds a threshold: the last point
 * above it, interpolated linearly to the crossing with the next (the profile runs outward from
 * the axis). Zero when no point exceeds it.
 */
export function radiusAbove(
  profile: readonly { r_mm: number | null; pressure_kpa: number | null }[],
  thresholdKpa: number,
): number {
  const pts = profile.filter(
    (p): p is { r_mm: number; pressure_kpa: number } => p.r_mm !== null && p.pressure_kpa !== null,
  );
  let radius = 0;
  for (let i = 0; i < pts.length; i++) {
    if (pts[i].pressure_kpa <= thresholdKpa) continue;
    const next = pts[i + 1];
    radius =
      next && next.pressure_kpa <= thresholdKpa
        ? pts[i].r_mm +
          ((pts[i].pressure_kpa - thresholdKpa) / (pts[i].pressure_kpa - next.pressure_kpa)) *
            (next.r_mm - pts[i].r_mm)
        : pts[i].r_mm;
  }
  return radius / 1000;
}

/** A bruise radius limit, m, from a grade rule: half its diameter, or the radius of its area. */
export function bruiseRadiusLimit(rule: { measure: 'diameter' | 'area'; limit: number }): number {
  return rule.measure === 'diameter' ? rule.limit / 2000 : Math.sqrt(rule.limit / Math.PI) / 1000;
}
