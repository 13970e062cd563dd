import type { SeedSource } from './types';

/** Sources of the stress-relaxation constants in `relaxation.ts` (keys prefixed `relax-`). */
export const RELAXATION_SOURCES: SeedSource[] = [];
