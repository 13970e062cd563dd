import type { Rung } from '@/lib/evidence/rungs';
import type { CultivarRecord } from '@/lib/properties/records';
import { ValidationError } from '@/lib/errors';
import { climb } from '@/lib/evidence/ladder';
import { evidenceForRecords } from './evidence-set';
import { frictionSurfacesFor } from './facings';
import { fruitFromEvidence, type ResolvedFruit } from './fruit';
import { dynamicLimits } from './drop/limits';
import { stackFigures } from './stack/figures';
import type { UsedValue } from './used-value';

export const COVERED_CHECKS = ['squeeze', 'drop', 'stack'] as const;
export type CoveredCheck = (typeof COVERED_CHECKS)[number];

/** One figure a check takes for a record when nothing but the machine is typed. */
export interface CoveredFigure {
  check: CoveredCheck;
  figure: string;
  rung: Rung | 'missing';
  source: string | null;
}

export interface RecordCoverage {
  slug: string;
  name: string;
  commodity: string;
  isCommodityRecord: boolean;
  /** Whether each check gives a bruise margin with nothing but the machine typed. */
  runs: Record<CoveredCheck, boolean>;
  figures: CoveredFigure[];
}

const FRUIT: [keyof ResolvedFruit, string][] = [
  ['modulusMpa', "Young's modulus"],
  ['poisson', "Poisson's ratio"],
  ['diameterMm', 'Diameter'],
  ['axialMm', 'Axial diameter'],
  ['massG', 'Mass'],
  ['densityKgM3', 'Density'],
  ['staticThresholdKpa', 'Static bruise threshold'],
];

const figureOf = (check: CoveredCheck, figure: string, u: UsedValue | null): CoveredFigure => ({
  check,
  figure,
  rung: u ? u.rung : 'missing',
  source: u?.source ?? null,
});

/**
 * What the squeeze, drop and stack checks take for one record with nothing typed but the
 * machine (a rigid pad, a drop onto steel, a bin), figure by figure with its rung; whether each
 * check then gives a margin. The same ladder the checks climb, so this is what a user meets.
 */
export function coverageOf(record: CultivarRecord, all: CultivarRecord[]): RecordCoverage {
  const set = evidenceForRecords(record, all, null);
  const out: RecordCoverage = {
    slug: record.slug,
    name: record.name,
    commodity: record.commodity.name,
    isCommodityRecord: record.isType,
    runs: { squeeze: false, drop: false, stack: false },
    figures: [],
  };
  let fruit: ResolvedFruit | null = null;
  let missingField: string | null = null;
  try {
    fruit = fruitFromEvidence(null, set, {});
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    missingField = Object.keys(error.fieldErrors)[0] ?? 'fruit';
  }
  for (const check of COVERED_CHECKS) {
    if (fruit) {
      for (const [key, label] of FRUIT)
        out.figures.push(figureOf(check, label, fruit[key] as UsedValue | null));
    } else {
      out.figures.push({ check, figure: `fruit (${missingField})`, rung: 'missing', source: null });
    }
  }
  if (!fruit) return out;
  const hasThreshold = fruit.staticThresholdKpa !== null;
  const friction =
    climb(
      set,
      { quantity: 'friction_coefficient', variants: frictionSurfacesFor('rigid') },
      { unit: '–' },
    )?.used ?? null;
  out.figures.push(figureOf('squeeze', 'Friction against the pad', friction));
  out.runs.squeeze = hasThreshold && friction !== null;
  const fruitSI = {
    modulus: fruit.modulusMpa.value * 1e6,
    poisson: fruit.poisson.value,
    radius: fruit.diameterMm.value / 2000,
    mass: fruit.massG.value / 1000,
  };
  const limit = dynamicLimits(fruit, fruitSI, 'steel')[0];
  out.figures.push({
    check: 'drop',
    figure: 'Drop threshold onto steel',
    rung: limit ? limit.rung : 'missing',
    source: limit?.source ?? null,
  });
  out.runs.drop = Boolean(limit) || hasThreshold;
  const bin = stackFigures(set, fruit.densityKgM3, {});
  out.figures.push(figureOf('stack', 'Bulk density', bin.bulk));
  out.figures.push(figureOf('stack', 'Wall friction', bin.wall));
  out.figures.push(figureOf('stack', 'Lateral pressure ratio', bin.ratio));
  out.runs.stack = hasThreshold;
  return out;
}

/** Counts of used figures per rung over some records' coverage. */
export function rungCounts(coverage: RecordCoverage[]): Record<Rung | 'missing', number> {
  const counts = { own: 0, commodity: 0, derived: 0, typical: 0, entered: 0, missing: 0 };
  for (const c of coverage) for (const f of c.figures) counts[f.rung]++;
  return counts;
}
