import 'server-only';
import type { Phrase } from '@/lib/phrase';
import { runSqueeze } from '@/fem';
import type { Actor } from '@/lib/auth/actor';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { citationOf } from '@/lib/evidence/ladder';
import { runDropCheck } from './drop/check';
import { susceptibilityOf } from './drop/volume';
import { resolveFruit } from './resolve-fruit';
import { runStackCheck } from './stack/check';
import { DROP_SURFACES } from './surfaces';
import { judgeDrop, judgeFactor, judgeRange, type Judgement } from './calibration-rules';

/**
 * The checks against the published record: each row a published outcome, its source, what the
 * check predicts for it, and whether the two agree within the rule stated with the row.
 * Disagreements are kept and shown, not tuned away.
 */
/** Words and measures: a measure is shown in the reader's units. */
export type { Phrase };

export interface CalibrationRow extends Judgement {
  check: 'drop' | 'stack' | 'squeeze';
  case: string;
  source: string;
  published: Phrase;
  predicted: Phrase;
  /** predicted ÷ published, where one figure stands against one figure */
  ratio: number | null;
}

const sig = (x: number, n = 3) => Number(x.toPrecision(n));

type Surface = keyof typeof DROP_SURFACES;
function surfaceOf(variant: string): Surface | null {
  for (const [key, s] of Object.entries(DROP_SURFACES) as [
    Surface,
    (typeof DROP_SURFACES)[Surface],
  ][])
    if (
      key !== 'foam' &&
      'thresholdVariants' in s &&
      (s.thresholdVariants as readonly string[]).includes(variant)
    )
      return key;
  return null;
}

const OBSERVED: Record<string, string> = {
  'no-bruise': 'no bruise at',
  'bruised-at': 'fruit bruised at',
  'recommended-max': 'handling guide’s maximum',
};

/**
 * Every published drop height in the knowledge base on a surface the drop check models, against
 * the check's elastic estimate of the tallest no-bruise drop (Hertz impact with the record's
 * static threshold). A figure a cultivar shares with its commodity record is listed once.
 */
async function dropRows(actor: Actor): Promise<CalibrationRow[]> {
  const records = await listPublishedCultivars(actor);
  const seen = new Set<string>();
  const rows: CalibrationRow[] = [];
  for (const r of records)
    for (const v of r.values) {
      if (v.isTypicalDefault || v.quantity !== 'drop_threshold_height' || !v.observation) continue;
      const surface = surfaceOf(v.variant);
      if (!surface) continue;
      const key = `${r.commodity.id}|${v.source?.key}|${v.variant}|${v.value}|${v.observation}`;
      if (seen.has(key)) continue;
      seen.add(key);
      const result = await runDropCheck(actor, { cultivar: r.slug, heightMm: v.value, surface });
      const at = result.safe_heights.find((s) => s.surface === surface);
      const onset = at?.static_safe_height_mm ?? null;
      if (onset === null) continue;
      const judged = judgeDrop(v.observation, v.value, onset);
      const tol = at?.within_tolerance_height_mm;
      rows.push({
        check: 'drop',
        case: `${r.name} onto ${v.variant}`,
        source: citationOf(v.source) ?? 'published',
        published: [`${OBSERVED[v.observation]} `, { value: v.value, unit: 'mm' }],
        predicted: [
          'no bruise up to ',
          { value: sig(onset), unit: 'mm' },
          ...(tol == null ? [] : ['; within the grade up to ', { value: sig(tol), unit: 'mm' }]),
        ],
        ratio: sig(onset / v.value),
        ...judged,
      });
    }
  return rows;
}

/** Bin depths the trade fills, and the packing depths one study reports. */
async function stackRows(actor: Actor): Promise<CalibrationRow[]> {
  const rows: CalibrationRow[] = [];
  const apple = await runStackCheck(actor, {
    cultivar: 'apple-type',
    binLengthMm: 1200,
    binWidthMm: 1000,
    fillDepthMm: 600,
  });
  const words = apple.bruise?.words ?? 'no bruise judged';
  rows.push({
    check: 'stack',
    case: 'Apple in a 1200 × 1000 mm bin filled 600 mm deep',
    source: 'common practice (bulk bins of this depth are filled and the fruit sold)',
    published: ['standard practice: no grade loss from the bin'],
    predicted: typeof words === 'string' ? [words] : words,
    ratio: null,
    agrees: apple.bruise != null && apple.bruise.verdict !== 'beyond tolerance',
    rule: 'the predicted bottom bruise within the strictest grade’s tolerance',
  });
  const peach = await runStackCheck(actor, {
    cultivar: 'peach-type',
    binLengthMm: 1200,
    binWidthMm: 1000,
    fillDepthMm: 300,
  });
  const layers = peach.layers?.within_tolerance ?? peach.layers?.no_bruise ?? null;
  if (layers !== null) {
    const judged = judgeFactor(layers, 13, 16, 2);
    rows.push({
      check: 'stack',
      case: "Peach ('Dixred' in the source; the peach commodity record here), at harvest",
      source: 'Turk. J. Agric. For. 27(3), 2003',
      published: ['packed 13–16 layers deep at harvest (4–6 after 28 days at 0 °C)'],
      predicted: [`${sig(layers)} layers within the grade’s tolerance`],
      ratio: sig(layers / 14.5),
      ...judged,
    });
  }
  return rows;
}

/** Wang, Wang & Wu 2024: apples between plates at 54–80 N, mean film pressure 0.26–0.31 MPa. */
async function squeezeRows(actor: Actor): Promise<CalibrationRow[]> {
  const fruit = await resolveFruit(actor, { cultivar: 'apple-type' });
  const run = runSqueeze({
    equatorialRadius: fruit.diameterMm.value / 2000,
    axialRadius: fruit.axialMm.value / 2000,
    modulus: fruit.modulusMpa.value * 1e6,
    poisson: fruit.poisson.value,
    travel: (Math.min(fruit.diameterMm.value, fruit.axialMm.value) * 0.07) / 1000,
    mesh: 'balanced',
    steps: 40,
  });
  const at = (force: number) => {
    const k = run.steps.findIndex((s) => s.force >= force);
    if (k <= 0) return null;
    const a = run.steps[k - 1];
    const b = run.steps[k];
    const w = (force - a.force) / (b.force - a.force);
    return (a.meanPressure + (b.meanPressure - a.meanPressure) * w) / 1e6;
  };
  const lo = at(54);
  const hi = at(80);
  if (lo === null || hi === null) return [];
  const mean = (lo + hi) / 2;
  return [
    {
      check: 'squeeze',
      case: 'Apple between flat plates at 54–80 N (the apple commodity record’s figures)',
      source: 'Wang, Wang & Wu 2024, Processes 12:543',
      published: [
        'average pressure-film contact pressure ',
        { value: 260, unit: 'kPa' },
        ' to ',
        { value: 310, unit: 'kPa' },
      ],
      predicted: [
        'mean contact pressure ',
        { value: sig(lo * 1000), unit: 'kPa' },
        ' to ',
        { value: sig(hi * 1000), unit: 'kPa' },
      ],
      ratio: sig(mean / 0.285),
      ...judgeRange(mean, 0.26, 0.31, 0.3),
    },
  ];
}

/**
 * Bruise volumes published at an impact energy, against the drop check's volume from the
 * fruit's first bruise susceptibility (V = BS · E). The stored susceptibility is one study's
 * volume ÷ energy at its highest energy, so that point is left out: the rows are the points it
 * was not made from.
 */
async function volumeRows(actor: Actor): Promise<CalibrationRow[]> {
  const fruit = await resolveFruit(actor, { cultivar: 'strawberry-type' });
  const bs = susceptibilityOf(fruit.evidence, DROP_SURFACES.steel.thresholdVariants, true);
  if (!bs) return [];
  const cases = [
    {
      what: "'Selva' and 'Gavita', lowest energy",
      energy: 0.022,
      volume: 46,
      source: 'Aliasgarian Najafabadi et al.',
    },
    {
      what: 'Florida cultivars, lowest energy',
      energy: 0.04,
      volume: 13,
      source: 'Ferreira et al. 2008',
    },
    {
      what: 'Florida cultivars, highest energy',
      energy: 0.083,
      volume: 91,
      source: 'Ferreira et al. 2008',
    },
  ];
  return cases.map((c) => {
    const predicted = bs.value * c.energy;
    return {
      check: 'drop' as const,
      case: `Strawberry bruise volume, ${c.what} (${c.energy} J)`,
      source: c.source,
      published: [{ value: c.volume, unit: 'mm³' }, ' bruised at ', { value: c.energy, unit: 'J' }],
      predicted: [
        { value: sig(predicted), unit: 'mm³' },
        ` from ${bs.value} mm³/J (${bs.source ?? 'published'})`,
      ],
      ratio: sig(predicted / c.volume),
      agrees: predicted / c.volume >= 0.5 && predicted / c.volume <= 2,
      rule: 'within a factor of 2 of the published volume',
    };
  });
}

/** The whole table, drop rows first. */
export async function calibrationTable(actor: Actor): Promise<CalibrationRow[]> {
  return [
    ...(await squeezeRows(actor)),
    ...(await stackRows(actor)),
    ...(await dropRows(actor)),
    ...(await volumeRows(actor)),
  ];
}
