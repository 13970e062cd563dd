/**
 * The bruise a drop leaves, from a published bruise susceptibility: bruise volume grows with the
 * impact energy, V = BS · E (bruise susceptibility as volume per energy, the usual definition —
 * e.g. Van Zeebroeck M. et al., Postharvest Biol. Technol. 45:157–167, 2007 [from memory]).
 * The surface diameter the grade rules judge follows from the volume with the bruise taken as a
 * hemisphere (depth equal to its surface radius): V = (2/3)πr³. That shape is our assumption —
 * a shallower bruise of the same volume is wider — and it is stated with every answer. Pure.
 */
import { STANDARD_GRAVITY } from '@/fem';
import { climb, type EvidenceSet } from '@/lib/evidence/ladder';
import type { UsedValue } from '../used-value';

/** Bruise volume, mm³, of an impact of `energyJ` at susceptibility `bsMm3PerJ`. */
export function bruiseVolume(bsMm3PerJ: number, energyJ: number): number {
  return bsMm3PerJ * Math.max(energyJ, 0);
}

/** Surface radius, mm, of a hemispherical bruise of volume `volumeMm3`: r = (3V / 2π)^(1/3). */
export function hemisphereRadius(volumeMm3: number): number {
  return Math.cbrt((3 * volumeMm3) / (2 * Math.PI));
}

/** The drop height, mm, at which a fruit of `massKg` leaves a bruise of surface radius `rMm`. */
export function heightForVolumeBruise(bsMm3PerJ: number, massKg: number, rMm: number): number {
  const volume = (2 / 3) * Math.PI * rMm ** 3;
  return (volume / bsMm3PerJ / (massKg * STANDARD_GRAVITY)) * 1000;
}

/**
 * The fruit's bruise susceptibility for a surface from the ladder: one filed under the surface,
 * else — for a hard surface only (steel, hard plastic) — one whose source names no impactor.
 */
export function susceptibilityOf(
  set: EvidenceSet,
  variants: readonly string[],
  hard: boolean,
): UsedValue | null {
  return (
    climb(
      set,
      { quantity: 'bruise_susceptibility', variants: hard ? [...variants, ''] : variants },
      { unit: 'mm³/J' },
    )?.used ?? null
  );
}

const r4 = (x: number) => Number(x.toPrecision(4));

/** The drop's bruise from the susceptibility, in named units. */
export function volumeBruiseJson(
  bs: UsedValue,
  energyJ: number,
  massKg: number,
  limitMm: number | null,
) {
  const volume = bruiseVolume(bs.value, energyJ);
  const radius = hemisphereRadius(volume);
  return {
    susceptibility_mm3_j: bs.value,
    source: bs.source,
    rung: bs.rung,
    impact_energy_j: r4(energyJ),
    volume_mm3: r4(volume),
    diameter_mm: r4(2 * radius),
    within_tolerance_height_mm:
      limitMm === null ? null : r4(heightForVolumeBruise(bs.value, massKg, limitMm)),
    shape:
      'a hemisphere (depth equal to its surface radius): our assumption; a shallower bruise of the same volume is wider',
  };
}
