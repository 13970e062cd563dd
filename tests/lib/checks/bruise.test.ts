import { describe, expect, it } from 'vitest';
import { siText } from '@/lib/phrase';
import { judgeBruise, radiusAbove, type GradeRuleView } from '@/lib/checks/bruise';

// A Hertz pressure profile p(r) = p₀√(1 − r²/a²) (Johnson 1985, eq. 4.25) sampled at 201 points,
// a = 6 mm, p₀ = 250 kPa, threshold 100 kPa: exact edge b = 6·√(1 − 0.16) = 5.4991 mm (by hand).
const profile = Array.from({ length: 201 }, (_, i) => {
  const r = (8 * i) / 200;
  return { r_mm: r, pressure_kpa: r < 6 ? 250 * Math.sqrt(1 - (r / 6) ** 2) : 0 };
});

const EXTRA_FANCY: GradeRuleView = {
  slug: 'us-extra-fancy-apple',
  name: 'U.S. Extra Fancy (apples): no bruise injury',
  kind: 'standard',
  measure: 'diameter',
  limit: 15.875,
  max_depth_mm: 3.175,
  source: 'Washington State Legislature',
  borrowed: false,
};

describe('the bruise from a pressure profile', () => {
  it('finds the edge of the region above the threshold (0.1 %: linear interpolation on a 0.04 mm step)', () => {
    expect(Math.abs(radiusAbove(profile, 100) * 1000 - 5.4991) / 5.4991).toBeLessThan(1e-3);
    expect(radiusAbove(profile, 300)).toBe(0);
  });

  it('judges it against a grade rule in the trade’s words', () => {
    // 11.0 mm across is within 15.875 mm; 17 mm is not; nothing above the threshold is no bruise.
    expect(judgeBruise(5.5e-3, EXTRA_FANCY)).toMatchObject({
      diameter_mm: 11,
      verdict: 'within tolerance',
    });
    expect(judgeBruise(8.5e-3, EXTRA_FANCY).verdict).toBe('beyond tolerance');
    expect(judgeBruise(0, EXTRA_FANCY).verdict).toBe('no bruise');
    // An area rule: 100 mm² is a circle of radius √(100/π) = 5.642 mm (by hand).
    const area = { ...EXTRA_FANCY, measure: 'area' as const, limit: 100, borrowed: true };
    expect(judgeBruise(5.6e-3, area).verdict).toBe('within tolerance');
    expect(judgeBruise(5.7e-3, area).verdict).toBe('beyond tolerance');
    expect(siText(judgeBruise(5.7e-3, area).words)).toMatch(/defined on another commodity/);
  });
});
