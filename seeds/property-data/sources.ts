import { OTHER_SOURCES } from './sources-other';
import { TEMPERATE_SOURCES } from './sources-temperate';
import type { SeedSource } from './types';
import { WARM_SOURCES } from './sources-warm';

/** Published sources behind the seeded values (each `note` says how its values were read). */
export const SOURCES: SeedSource[] = [...TEMPERATE_SOURCES, ...WARM_SOURCES, ...OTHER_SOURCES];
