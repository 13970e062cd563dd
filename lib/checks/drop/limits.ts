import { citationOf } from '@/lib/evidence/ladder';
import type { Rung } from '@/lib/evidence/rungs';
import { m, ph, type Text } from '@/lib/phrase';
import type { Observation } from '@/lib/properties/quantities';
import type { RevisionValue } from '@/lib/properties/records';
import type { ResolvedFruit } from '../fruit';
import { DROP_SURFACES, type DropSurface } from '../surfaces';
import { heightForEnergy, type FruitSI } from './model';

const round = (x: number, digits = 4) => Number(x.toPrecision(digits));

export interface Limit {
  heightM: number;
  basis: Text;
  source: string | null;
  note: string | null;
  rung: Rung;
  /** True when fruit bruised at this level: the safe height lies somewhere below it. */
  upperBound: boolean;
  observation: Observation | null;
}

/**
 * The dynamic limits of a surface as heights, m, from the first rung that has any (the
 * cultivar's, else the commodity record's, else a stored typical one): thresholds (no bruise, or
 * a guide's maximum) first, lowest first; levels at which fruit bruised after them, as upper
 * bounds.
 */
export function dynamicLimits(f: ResolvedFruit, fruit: FruitSI, surface: DropSurface): Limit[] {
  const variants: readonly string[] = DROP_SURFACES[surface].thresholdVariants;
  const set = f.evidence;
  const onSurface = (v: RevisionValue) =>
    variants.includes(v.variant) &&
    (v.quantity === 'drop_threshold_height' || v.quantity === 'impact_threshold_energy');
  const rungs: [Rung, RevisionValue[]][] = [
    ['own', set.own.filter((v) => onSurface(v) && !v.isTypicalDefault)],
    ['commodity', set.commodity.filter((v) => onSurface(v) && !v.isTypicalDefault)],
    ['typical', [...set.own, ...set.commodity].filter((v) => onSurface(v) && v.isTypicalDefault)],
  ];
  const [rung, values] = rungs.find(([, list]) => list.length) ?? ['own', []];
  const limits = values.map((v): Limit => {
    const energy = v.quantity === 'impact_threshold_energy';
    return {
      heightM: energy ? heightForEnergy(fruit, v.value) : v.value / 1000,
      basis: energy
        ? ph`${m(v.value, 'J')} onto ${v.variant} (a height for this ${m(round(f.massG.value, 3), 'g')} fruit)`
        : ph`${m(v.value, 'mm')} drop onto ${v.variant}`,
      source: citationOf(v.source) ?? (v.isTypicalDefault ? 'typical value' : null),
      note: v.note,
      rung,
      upperBound: v.observation === 'bruised-at',
      observation: v.observation,
    };
  });
  return limits.sort(
    (a, b) => Number(a.upperBound) - Number(b.upperBound) || a.heightM - b.heightM,
  );
}
