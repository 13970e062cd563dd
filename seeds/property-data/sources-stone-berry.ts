import type { SeedSource } from './types';

/** Sources added for the deeper knowledge base (2026-12): see the family's seed file. */
export const STONE_BERRY_SOURCES: SeedSource[] = [];
