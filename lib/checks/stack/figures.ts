import { checkTypical, climb, derivedValue, type EvidenceSet } from '@/lib/evidence/ladder';
import {
  lateralRatioFromRepose,
  lateralRatioRelation,
  PACKING_FRACTION,
} from '@/lib/evidence/relations';
import type { UsedValue } from '../used-value';

const round = (x: number, digits = 4) => Number(x.toPrecision(digits));

/** Evidence a relation may stand on: published, or derived from published figures (rungs 1–3). */
const isPublished = (u: UsedValue) =>
  u.rung === 'own' || u.rung === 'commodity' || u.rung === 'derived';

/**
 * The bin's figures from the evidence ladder: bulk density, wall friction and Janssen's ratio,
 * each typed, else the cultivar's, the commodity's, a value derived from published figures of
 * the same fruit (the ratio from its angle of repose), a stored typical value, or the check's own
 * typical value (stated as such). Bulk density is not derived from the fruit's density: loose
 * random packing of spheres (0.60) lies above every published fruit bulk ÷ true density in the
 * knowledge base (0.32–0.55), so the packing fraction serves only the typical fallback.
 */
export function stackFigures(
  set: EvidenceSet,
  fruitDensity: UsedValue,
  entered: { bulkDensityKgM3?: number; wallFriction?: number; lateralRatio?: number },
): { bulk: UsedValue; wall: UsedValue; ratio: UsedValue } {
  const bulk: UsedValue = climb(
    set,
    { quantity: 'bulk_density' },
    {
      entered: entered.bulkDensityKgM3,
      unit: 'kg/m³',
      fallback: () =>
        checkTypical(
          round(PACKING_FRACTION.value * fruitDensity.value, 3),
          'kg/m³',
          `${PACKING_FRACTION.value * 100} % of a typical fruit density (random loose packing of like spheres fills 55–64 % of a volume; Scott G.D., Nature 188:908, 1960 [from memory]).`,
          {
            low: round(PACKING_FRACTION.low * fruitDensity.value, 3),
            high: round(PACKING_FRACTION.high * fruitDensity.value, 3),
          },
        ),
    },
  )!.used;
  const wall: UsedValue = climb(
    set,
    { quantity: 'friction_coefficient', variants: ['plywood', 'wood', 'hard plastic', 'plastic'] },
    {
      entered: entered.wallFriction,
      unit: '–',
      fallback: () =>
        checkTypical(0.4, '–', 'wall friction of fruit on a wooden or plastic bin.', {
          low: 0.25,
          high: 0.6,
        }),
    },
  )!.used;
  const ratio: UsedValue = climb(
    set,
    { quantity: 'lateral_pressure_ratio' },
    {
      entered: entered.lateralRatio,
      unit: '–',
      derive: () => {
        const repose = climb(set, { quantity: 'angle_of_repose' }, { unit: '°' })?.used;
        if (!repose || !isPublished(repose)) return null;
        return derivedValue(
          lateralRatioRelation(repose.value),
          lateralRatioFromRepose(repose.value),
          '–',
          { repose },
          `angle of repose ${repose.value}° (${repose.source ?? 'published'})`,
        );
      },
      fallback: () =>
        checkTypical(
          0.4,
          '–',
          "Janssen's ratio K for a bulk of round fruit (bin design takes 0.3–0.6).",
          {
            low: 0.3,
            high: 0.6,
          },
        ),
    },
  )!.used;
  return { bulk, wall, ratio };
}
