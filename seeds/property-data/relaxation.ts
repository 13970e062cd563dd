import type { SeedValue } from './types';

/**
 * Published stress-relaxation constants (Peleg's k₁ and k₂: the force held at a fixed
 * deformation decays as F(t) = F₀ · (1 − t ÷ (k₁ + k₂·t))), per record slug. Each pair comes from
 * one test of one source, with its strain, loading speed and specimen in `method`, `loadingRate`
 * and `probe`. Merged into the records by `commodities.ts`; a record without a pair has no
 * relaxation data, and the squeeze check then says so and holds the force at its initial value.
 */
export const RELAXATION_VALUES: Record<string, SeedValue[]> = {};
