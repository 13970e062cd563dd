import type { SeedValue } from './types';

/**
 * Published stress-relaxation constants (Peleg's k₁ and k₂: the force held at a fixed
 * deformation decays as F(t) = F₀ · (1 − t ÷ (k₁ + k₂·t))), per record slug. Each pair comes from
 * one test of one source, with its strain, loading speed and specimen in `method`, `loadingRate`
 * and `probe`. Merged into the records by `commodities.ts`; a record without a pair has no
 * relaxation data, and the squeeze check then says so and holds the force at its initial value.
 *
 * Search of 2026-12 (stored pages and docs; abstracts and first pages only): no pair could be read
 * for any commodity in the database, so none is seeded. What was found, for whoever opens the
 * full texts:
 * - Steffe J.F., Rheological Methods in Food Process Engineering, 2nd ed. (1996), p. 304,
 *   Table 5.5 (after Peleg & Normand, Rheol. Acta 22:108–113, 1983): potato flesh k₂ = 1.56,
 *   but the stored text rendering of the table puts "2.41 s" and "4.40 s" between the pea-bean
 *   and potato rows so that k₁ cannot be assigned (either could be the potato's); no strain,
 *   speed or specimen is given there. Seed it only after reading the printed table.
 * - Torres R., Montes E.J., Pérez O.A., Andrade R.D., Inf. Tecnol. 23(5):115–, 2012: Peleg and
 *   generalised-Maxwell fits of mango ('Puerco', 'Corazón'), papaya and plantain at several
 *   ripeness stages; only the abstract was readable (no constants).
 * - Generalised Maxwell / Prony fits, deliberately not converted to Peleg: Moresi et al. 2012
 *   (Tarocco orange, spring ≈ 42 % of the initial modulus), Gorji Chakespari et al. 2010 (apple
 *   'Shafi Abadi', 'Golab Kohanz'; constants not in the stored copy), Dangshan pear (tcsae 2002),
 *   sea buckthorn (Khazaei & Mann), grapefruit (Dakogol et al. 2015, inconsistent terms).
 */
export const RELAXATION_VALUES: Record<string, SeedValue[]> = {};
