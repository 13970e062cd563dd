import type { RefinedBand } from './mesh-levels';

/** Growth of the spacing per unit distance away from the contact zone and from a refined band. */
const CONTACT_GROWTH = 0.15;
const BAND_GROWTH = 0.2;

/** Target ring spacing at chord ρ: the natural ρ·g, capped near the contact and the band. */
export interface RingSpacing {
  /** natural relative spacing g (ring about as wide as deep) */
  natural: number;
  contactSpacing: number;
  contactExtent: number;
  band: RefinedBand | null;
}

function spacingAt(s: RingSpacing, rho: number): number {
  let h = rho * s.natural;
  h = Math.min(h, s.contactSpacing + CONTACT_GROWTH * Math.max(0, rho - s.contactExtent));
  if (s.band) {
    const away = Math.max(0, s.band.lo - rho, rho - s.band.hi);
    h = Math.min(h, s.band.spacing + BAND_GROWTH * away);
  }
  return h;
}

/**
 * Ring radii (chords from the pole) from `from` to `to`, both included: the band (if it lies
 * inside) at its exact uniform spacing, the rest with the count and positions that follow the
 * target spacing (equal steps of ∫dρ/h, by the trapezoid rule on a fine sampling).
 */
export function ringRadii(s: RingSpacing, from: number, to: number): number[] {
  const b = s.band;
  if (!b || b.hi <= from || b.lo >= to) return graded(s, from, to);
  const lo = Math.max(b.lo, from);
  const hi = Math.min(b.hi, to);
  const n = Math.max(1, Math.round((hi - lo) / b.spacing));
  const inside = Array.from({ length: n + 1 }, (_, i) => lo + ((hi - lo) * i) / n);
  const before = lo > from ? graded(s, from, lo).slice(0, -1) : [];
  const after = hi < to ? graded(s, hi, to).slice(1) : [];
  return [...before, ...inside, ...after];
}

function graded(s: RingSpacing, from: number, to: number): number[] {
  const samples = 4000;
  const cum = new Float64Array(samples + 1);
  const step = (to - from) / samples;
  let prev = 1 / spacingAt(s, from);
  for (let i = 1; i <= samples; i++) {
    const next = 1 / spacingAt(s, from + i * step);
    cum[i] = cum[i - 1] + 0.5 * step * (prev + next);
    prev = next;
  }
  const n = Math.max(1, Math.round(cum[samples]));
  const out = [from];
  let j = 0;
  for (let k = 1; k < n; k++) {
    const target = (cum[samples] * k) / n;
    while (cum[j + 1] < target) j++;
    const t = (target - cum[j]) / (cum[j + 1] - cum[j]);
    out.push(from + (j + t) * step);
  }
  out.push(to);
  return out;
}
