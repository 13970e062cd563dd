import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import type { RevisionValue } from '@/lib/properties/records';
import { ValidationError } from '@/lib/errors';
import {
  chooseValue,
  pinCultivar,
  publishedValue,
  type PinnedCultivar,
  type UsedValue,
} from './cultivar-inputs';

export interface FruitEntry {
  cultivar?: string;
  modulusMpa?: number;
  poisson?: number;
  diameterMm?: number;
  massG?: number;
  staticThresholdKpa?: number;
}

export interface ResolvedFruit {
  pinned: PinnedCultivar | null;
  modulusMpa: UsedValue;
  poisson: UsedValue;
  diameterMm: UsedValue;
  massG: UsedValue;
  staticThresholdKpa: UsedValue | null;
  /** Published values of other quantities the check may need (thresholds, friction, bulk). */
  extra: RevisionValue[];
}

/** Mass of a sphere of the given diameter and density, g. */
function sphereMassG(diameterMm: number, densityKgM3: number): number {
  const r = diameterMm / 2000;
  return (4 / 3) * Math.PI * r ** 3 * densityKgM3 * 1000;
}

function massOf(entry: FruitEntry, pinned: PinnedCultivar | null, diameter: UsedValue): UsedValue {
  const mass = publishedValue(pinned, 'mass');
  if (entry.massG !== undefined || mass)
    return chooseValue('massG', 'Mass', entry.massG, mass, 'g');
  const density = publishedValue(pinned, 'density');
  if (!density) {
    throw new ValidationError('Mass is needed.', {
      massG: ['No published mass or density for this cultivar: enter the mass (g).'],
    });
  }
  return {
    value: sphereMassG(diameter.value, density.value),
    unit: 'g',
    // Worked out, not published: the published density times the volume of a sphere.
    origin: 'derived',
    source: `sphere of the diameter at ${density.value} kg/m³ (${density.source ?? 'density'})`,
    low: null,
    high: null,
    sd: null,
  };
}

/** The fruit's properties for a check: typed values first, then the cultivar's published ones. */
export async function resolveFruit(actor: Actor, entry: FruitEntry): Promise<ResolvedFruit> {
  const pinned = entry.cultivar ? await pinCultivar(actor, entry.cultivar) : null;
  const modulus = publishedValue(pinned, 'youngs_modulus');
  const diameterMm = chooseValue(
    'diameterMm',
    'Diameter',
    entry.diameterMm,
    publishedValue(pinned, 'diameter'),
    'mm',
  );
  const threshold = publishedValue(pinned, 'static_bruise_threshold');
  return {
    pinned,
    modulusMpa: chooseValue('modulusMpa', "Young's modulus", entry.modulusMpa, modulus, 'MPa'),
    poisson: chooseValue(
      'poisson',
      "Poisson's ratio",
      entry.poisson,
      publishedValue(pinned, 'poisson_ratio'),
      '–',
    ),
    diameterMm,
    massG: massOf(entry, pinned, diameterMm),
    staticThresholdKpa:
      entry.staticThresholdKpa !== undefined
        ? chooseValue(
            'staticThresholdKpa',
            'Static bruise threshold',
            entry.staticThresholdKpa,
            null,
            'kPa',
          )
        : threshold,
    extra: pinned?.values ?? [],
  };
}

/** The fruit's figures as every check's result names them (see fruitUsedShape). */
export function fruitUsed(f: ResolvedFruit) {
  return {
    modulus_mpa: f.modulusMpa,
    poisson_ratio: f.poisson,
    diameter_mm: f.diameterMm,
    mass_g: f.massG,
    static_bruise_threshold_kpa: f.staticThresholdKpa,
  };
}
