/**
 * The fruit's figures from the evidence ladder, with no I/O: the checks, the check forms'
 * placeholders, the coverage test and the data gaps page all take them from here.
 */
import {
  climb,
  derivedValue,
  type Climbed,
  type EvidenceSet,
  type Need,
} from '@/lib/evidence/ladder';
import {
  AXIAL_BY_SHAPE,
  DENSITY_FROM_MASS,
  MASS_FROM_SIZE,
  MASS_SCALED,
  THRESHOLD_FROM_BIOYIELD,
  axialByShape,
  densityFromMass,
  massFromSize,
  massScaled,
  thresholdFromBioyield,
} from '@/lib/evidence/relations';
import { isStronger } from '@/lib/evidence/rungs';
import type { Stage } from '@/lib/properties/quantities';
import { ValidationError } from '@/lib/errors';
import type { PinnedCultivar } from './cultivar-inputs';
import type { UsedValue } from './used-value';
import { m, ph, type Text } from '@/lib/phrase';

export interface FruitEntry {
  cultivar?: string;
  stage?: Stage;
  modulusMpa?: number;
  poisson?: number;
  diameterMm?: number;
  axialMm?: number;
  massG?: number;
  densityKgM3?: number;
  staticThresholdKpa?: number;
}

export interface ResolvedFruit {
  pinned: PinnedCultivar | null;
  evidence: EvidenceSet;
  modulusMpa: UsedValue;
  poisson: UsedValue;
  diameterMm: UsedValue;
  axialMm: UsedValue;
  massG: UsedValue;
  densityKgM3: UsedValue;
  staticThresholdKpa: UsedValue | null;
  /** Plain words about the evidence: a stage that differs, records that disagree. */
  warnings: Text[];
}

export const NO_EVIDENCE: EvidenceSet = {
  commodityName: '',
  own: [],
  commodity: [],
  across: [],
  stage: null,
};

export const EQUATORIAL: Need = { quantity: 'diameter', variants: ['equatorial', ''] };
const AXIAL: Need = { quantity: 'diameter', variants: ['axial'] };

/** A figure no rung has: a 400 on its field, naming the rungs that were tried. */
export function missing(field: string, label: string, unit: string, set: EvidenceSet): never {
  const where = set.commodityName
    ? `this cultivar, the ${set.commodityName.toLowerCase()} commodity record, a derived value or a typical value`
    : 'a cultivar (none chosen)';
  throw new ValidationError(`${label} is needed.`, {
    [field]: [`${label}: no value from ${where}. Enter one (${unit}).`],
  });
}

/** Climb, or a 400 on the field when no rung has the figure. */
export function required(
  climbed: Climbed | null,
  field: string,
  label: string,
  unit: string,
  set: EvidenceSet,
): UsedValue {
  return climbed?.used ?? missing(field, label, unit, set);
}

const pct = (a: number, b: number) => Math.abs(a / b - 1);
const sig = (x: number) => Number(x.toPrecision(3));

/** The axial diameter: typed; the record's, kept in shape when the size was typed; else round. */
function axialOf(entry: FruitEntry, set: EvidenceSet, diameter: UsedValue): UsedValue {
  if (entry.axialMm !== undefined)
    return climb(set, AXIAL, { entered: entry.axialMm, unit: 'mm' })!.used;
  const stored = climb(set, AXIAL, { unit: 'mm' });
  if (stored && diameter.rung === 'entered') {
    const recordSize = climb(set, EQUATORIAL, { unit: 'mm' });
    if (recordSize)
      return derivedValue(
        AXIAL_BY_SHAPE,
        axialByShape(stored.used.value, recordSize.used.value, diameter.value),
        'mm',
        { axial: stored.used, equatorial: recordSize.used, size: diameter },
        // The figures are each in their own row of the inputs used (and in the reader's units).
        'the published axial diameter × this diameter ÷ the published diameter',
      );
  }
  if (stored) return stored.used;
  return {
    ...diameter,
    note: `Taken as round (axial = equatorial diameter): no axial diameter on any rung.${diameter.note ? ` ${diameter.note}` : ''}`,
  };
}

/**
 * Mass and density as one coherent pair: what the user typed, else the one on the stronger rung
 * (density when tied, or when the size was typed, since a typed size changes the mass), the other
 * derived from it and the size. A typed pair that disagrees with the size by more than 10 % is
 * refused with both figures.
 */
function massAndDensity(
  entry: FruitEntry,
  set: EvidenceSet,
  d: UsedValue,
  a: UsedValue,
  warnings: Text[],
): { massG: UsedValue; densityKgM3: UsedValue } {
  const massFrom = (density: UsedValue) =>
    derivedValue(
      MASS_FROM_SIZE,
      massFromSize(density.value, d.value, a.value),
      'g',
      { density, equatorial: d, axial: a },
      'the density and the fruit’s equatorial and axial diameters',
    );
  const densityFrom = (mass: UsedValue) =>
    derivedValue(
      DENSITY_FROM_MASS,
      densityFromMass(mass.value, d.value, a.value),
      'kg/m³',
      { mass, equatorial: d, axial: a },
      'the mass and the fruit’s equatorial and axial diameters',
    );
  if (entry.massG !== undefined && entry.densityKgM3 !== undefined) {
    const implied = massFromSize(entry.densityKgM3, d.value, a.value);
    const size = `${sig(d.value)} × ${sig(a.value)} mm`;
    if (pct(entry.massG, implied) > 0.1) {
      const message = `The mass (${entry.massG} g) and the density (${entry.densityKgM3} kg/m³) disagree by ${Math.round(pct(entry.massG, implied) * 100)} % for a ${size} fruit, which at that density weighs ${sig(implied)} g. Enter one of them (the other follows from the size), or correct the size.`;
      throw new ValidationError('Mass and density disagree.', {
        massG: [message],
        densityKgM3: [message],
      });
    }
    return {
      massG: climb(set, { quantity: 'mass' }, { entered: entry.massG, unit: 'g' })!.used,
      densityKgM3: climb(
        set,
        { quantity: 'density' },
        { entered: entry.densityKgM3, unit: 'kg/m³' },
      )!.used,
    };
  }
  if (entry.massG !== undefined) {
    const massG = climb(set, { quantity: 'mass' }, { entered: entry.massG, unit: 'g' })!.used;
    return { massG, densityKgM3: densityFrom(massG) };
  }
  if (entry.densityKgM3 !== undefined) {
    const densityKgM3 = climb(
      set,
      { quantity: 'density' },
      { entered: entry.densityKgM3, unit: 'kg/m³' },
    )!.used;
    return { massG: massFrom(densityKgM3), densityKgM3 };
  }
  const mass = climb(set, { quantity: 'mass' }, { unit: 'g' })?.used ?? null;
  const density = climb(set, { quantity: 'density' }, { unit: 'kg/m³' })?.used ?? null;
  const sizeTyped = d.rung === 'entered';
  if (density && (!mass || sizeTyped || !isStronger(mass.rung, density.rung))) {
    const massG = massFrom(density);
    if (mass && !sizeTyped && pct(mass.value, massG.value) > 0.1)
      warnings.push(
        ph`The stored mass (${m(mass.value, 'g')}, ${mass.source ?? mass.rung}) and the mass from the density and size (${m(massG.value, 'g')}) differ by ${Math.round(pct(mass.value, massG.value) * 100)} %: the check takes the density, the stronger or equal evidence, and the mass that follows from it.`,
      );
    return { massG, densityKgM3: density };
  }
  if (mass && sizeTyped) {
    // A typed size with only a stored mass: scale that mass to the typed size (same shape).
    const at = climb(set, EQUATORIAL, { unit: 'mm' })?.used;
    if (at) {
      const massG = derivedValue(
        MASS_SCALED,
        massScaled(mass.value, at.value, d.value),
        'g',
        { mass, size: d },
        'the published mass, scaled from the size it was published at to this diameter',
      );
      return { massG, densityKgM3: densityFrom(massG) };
    }
  }
  if (mass) {
    const densityKgM3 = densityFrom(mass);
    if (density && pct(density.value, densityKgM3.value) > 0.1)
      warnings.push(
        ph`The stored density (${m(density.value, 'kg/m³')}) and the density from the mass and size (${m(densityKgM3.value, 'kg/m³')}) differ by ${Math.round(pct(density.value, densityKgM3.value) * 100)} %: the check takes the mass, the stronger evidence, and the density that follows from it.`,
      );
    return { massG: mass, densityKgM3 };
  }
  return missing('massG', 'Mass (or density)', 'g', set);
}

/**
 * The static threshold: typed, own, commodity, derived from a published bioyield stress, a
 * stored typical threshold, or last a typical bioyield stress taken as the threshold (typical).
 */
function thresholdOf(entry: FruitEntry, set: EvidenceSet): UsedValue | null {
  const typicalBioyield = (): UsedValue | null => {
    const by = climb(set, { quantity: 'bioyield_stress' }, { unit: 'kPa' })?.used;
    if (!by || by.rung !== 'typical') return null;
    return {
      ...by,
      note: `A typical bioyield stress taken as the threshold (${THRESHOLD_FROM_BIOYIELD.statement}).${by.note ? ` ${by.note}` : ''}`,
    };
  };
  return (
    climb(
      set,
      { quantity: 'static_bruise_threshold' },
      {
        entered: entry.staticThresholdKpa,
        unit: 'kPa',
        derive: () => {
          const by = climb(set, { quantity: 'bioyield_stress' }, { unit: 'kPa' })?.used;
          if (!by || (by.rung !== 'own' && by.rung !== 'commodity')) return null;
          return derivedValue(
            THRESHOLD_FROM_BIOYIELD,
            thresholdFromBioyield(by.value),
            'kPa',
            { bioyield: by },
            `the bioyield stress (${by.source ?? 'published'})`,
          );
        },
        fallback: typicalBioyield,
      },
    )?.used ?? null
  );
}

/** The same, from evidence already loaded (the check forms' placeholders use it too). */
export function fruitFromEvidence(
  pinned: PinnedCultivar | null,
  set: EvidenceSet,
  entry: FruitEntry,
): ResolvedFruit {
  const warnings: Text[] = [];
  const modulusMpa = required(
    climb(
      set,
      { quantity: 'youngs_modulus', variants: ['apparent', 'flesh'] },
      {
        entered: entry.modulusMpa,
        unit: 'MPa',
      },
    ),
    'modulusMpa',
    "Young's modulus",
    'MPa',
    set,
  );
  const poisson = required(
    climb(set, { quantity: 'poisson_ratio' }, { entered: entry.poisson, unit: '–' }),
    'poisson',
    "Poisson's ratio",
    '–',
    set,
  );
  const diameterMm = required(
    climb(set, EQUATORIAL, { entered: entry.diameterMm, unit: 'mm' }),
    'diameterMm',
    'Diameter',
    'mm',
    set,
  );
  const axialMm = axialOf(entry, set, diameterMm);
  const pair = massAndDensity(entry, set, diameterMm, axialMm, warnings);
  const staticThresholdKpa = thresholdOf(entry, set);
  for (const u of [modulusMpa, poisson, diameterMm, staticThresholdKpa])
    if (u?.note?.includes('not on')) warnings.push(u.note);
  return {
    pinned,
    evidence: set,
    modulusMpa,
    poisson,
    diameterMm,
    axialMm,
    ...pair,
    staticThresholdKpa,
    warnings,
  };
}

/** The fruit's figures as every check's result names them (see fruitUsedShape). */
export function fruitUsed(f: ResolvedFruit) {
  return {
    modulus_mpa: f.modulusMpa,
    poisson_ratio: f.poisson,
    diameter_mm: f.diameterMm,
    axial_diameter_mm: f.axialMm,
    mass_g: f.massG,
    density_kg_m3: f.densityKgM3,
    static_bruise_threshold_kpa: f.staticThresholdKpa,
  };
}
