import { z } from 'zod';
import { ROLES } from '@/lib/auth/roles';

/** The stages of a packing line, in the order fruit meets them; every article covers each. */
export const LINE_STAGES = {
  receiving: 'Receiving and bin tipping',
  dumping: 'Water or dry dumping',
  singulation: 'Singulation',
  grading: 'Sizing and grading',
  packing: 'Packing',
  palletising: 'Palletising',
  'cold-chain': 'Cold chain and transport',
} as const;
export type LineStage = keyof typeof LINE_STAGES;
export const LINE_STAGE_KEYS = Object.keys(LINE_STAGES) as LineStage[];

const SLUG = /^[a-z0-9]+(?:-[a-z0-9]+)*$/;
const slug = (what: string) =>
  z.string().regex(SLUG, `${what} is a slug: lower-case letters, digits and single hyphens.`);

/** YAML reads an unquoted 2026-01-15 as a Date; both spellings end as `YYYY-MM-DD`. */
const isoDate = z.preprocess(
  (v) => (v instanceof Date && !Number.isNaN(v.getTime()) ? v.toISOString().slice(0, 10) : v),
  z.iso.date('updated is an ISO date, e.g. 2026-01-15.'),
);

const handlingSchema = z.object({
  stage: z.enum(LINE_STAGE_KEYS as [LineStage, ...LineStage[]]),
  rules: z.array(z.string().trim().min(10).max(240)).min(1).max(4),
});

/** The frontmatter of an Atlas article (content/atlas/README.md explains each field). */
export const articleFrontmatterSchema = z
  .object({
    title: z.string().trim().min(3).max(120),
    commodity: slug('commodity'),
    summary: z.string().trim().min(20).max(320),
    audience: z.enum(['engineer', 'buyer', 'both']),
    updated: isoDate,
    reviewedBy: z.enum(ROLES),
    status: z.enum(['published', 'draft']).default('published'),
    mostProneStage: z.enum(LINE_STAGE_KEYS as [LineStage, ...LineStage[]]),
    sources: z.array(slug('a source key')).min(1),
    keyCultivars: z.array(slug('a cultivar')).min(1).max(4),
    handling: z.array(handlingSchema).length(LINE_STAGE_KEYS.length),
  })
  .strict()
  .superRefine((fm, ctx) => {
    LINE_STAGE_KEYS.forEach((stage, i) => {
      if (fm.handling[i]?.stage !== stage) {
        ctx.addIssue({
          code: 'custom',
          path: ['handling', i, 'stage'],
          message: `handling lists every line stage once, in line order: item ${i + 1} is "${stage}".`,
        });
      }
    });
    if (new Set(fm.sources).size !== fm.sources.length) {
      ctx.addIssue({ code: 'custom', path: ['sources'], message: 'A source key is listed twice.' });
    }
  });

export type ArticleFrontmatter = z.infer<typeof articleFrontmatterSchema>;
