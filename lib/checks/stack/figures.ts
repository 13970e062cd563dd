import { checkTypical, climb, type EvidenceSet } from '@/lib/evidence/ladder';
import type { UsedValue } from '../used-value';

const round = (x: number, digits = 4) => Number(x.toPrecision(digits));

/** Random loose packing of like spheres fills about 60 % of a bin's volume [from memory]. */
const PACKING_FRACTION = 0.6;

/**
 * The bin's figures from the evidence ladder: bulk density, wall friction and Janssen's ratio,
 * each typed, else the cultivar's, the commodity's, a stored typical value, or the check's own
 * typical value (stated as such).
 */
export function stackFigures(
  set: EvidenceSet,
  fruitDensity: number,
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
          round(PACKING_FRACTION * fruitDensity, 3),
          'kg/m³',
          `${PACKING_FRACTION * 100} % of the fruit's own density (random loose packing of like spheres fills 55–64 % of a volume; Scott G.D., Nature 188:908, 1960 [from memory]).`,
          { low: round(0.55 * fruitDensity, 3), high: round(0.64 * fruitDensity, 3) },
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
