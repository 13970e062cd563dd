import { APPLE } from './apple';
import { BERRIES } from './berries';
import { CITRUS } from './citrus';
import { PEAR } from './pear';
import { STONE_FRUIT } from './stone-fruit';
import { TROPICAL } from './tropical';
import type { SeedCommodity } from './types';
import { VEGETABLES } from './vegetables';

/**
 * Commodities and cultivars with their published values, one file per family. Every value names
 * its source and keeps its conditions; a quantity no source gives is simply absent ("no
 * published value"). A cultivar is named only where a cited source measured it.
 */
export const COMMODITIES: SeedCommodity[] = [
  APPLE,
  PEAR,
  ...STONE_FRUIT,
  ...BERRIES,
  ...CITRUS,
  ...TROPICAL,
  ...VEGETABLES,
];
