import { OTHER_SOURCES } from './sources-other';
import { CITRUS_TROPICAL_SOURCES } from './sources-citrus-tropical';
import { GRADE_SOURCES } from './sources-grades';
import { POME_SOURCES } from './sources-pome';
import { RELAXATION_SOURCES } from './sources-relaxation';
import { STONE_BERRY_SOURCES } from './sources-stone-berry';
import { TEMPERATE_SOURCES } from './sources-temperate';
import type { SeedSource } from './types';
import { VEGETABLE_SOURCES } from './sources-vegetables';
import { WARM_SOURCES } from './sources-warm';

/** Published sources behind the seeded values (each `note` says how its values were read). */
export const SOURCES: SeedSource[] = [
  ...TEMPERATE_SOURCES,
  ...WARM_SOURCES,
  ...OTHER_SOURCES,
  ...POME_SOURCES,
  ...STONE_BERRY_SOURCES,
  ...CITRUS_TROPICAL_SOURCES,
  ...VEGETABLE_SOURCES,
  ...GRADE_SOURCES,
  ...RELAXATION_SOURCES,
];
