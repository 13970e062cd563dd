import { APPLE } from './apple';
import { BERRIES } from './berries';
import { CITRUS } from './citrus';
import { PEAR } from './pear';
import { RELAXATION_VALUES } from './relaxation';
import { STONE_FRUIT } from './stone-fruit';
import { TROPICAL } from './tropical';
import type { SeedCommodity } from './types';
import { VEGETABLES } from './vegetables';

/**
 * Commodities and cultivars with their published values, one file per family. Every value names
 * its source and keeps its conditions; a quantity no source gives is simply absent ("no
 * published value"). A cultivar is named only where a cited source measured it.
 */
const FAMILIES: SeedCommodity[] = [
  APPLE,
  PEAR,
  ...STONE_FRUIT,
  ...BERRIES,
  ...CITRUS,
  ...TROPICAL,
  ...VEGETABLES,
];

/** The families with the stress-relaxation constants (kept in their own file) merged in. */
export const COMMODITIES: SeedCommodity[] = FAMILIES.map((c) => ({
  ...c,
  cultivars: c.cultivars.map((cv) => ({
    ...cv,
    values: [...cv.values, ...(RELAXATION_VALUES[cv.slug] ?? [])],
  })),
}));

const slugs = new Set(FAMILIES.flatMap((c) => c.cultivars.map((cv) => cv.slug)));
const stray = Object.keys(RELAXATION_VALUES).filter((s) => !slugs.has(s));
if (stray.length > 0) throw new Error(`Relaxation values for unknown records: ${stray.join(', ')}`);
