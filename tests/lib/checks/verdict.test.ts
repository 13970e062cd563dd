import { describe, expect, it } from 'vitest';
import { verdictOf } from '@/lib/checks/verdict';

// The bands are Tenderline's own reading, stated on every page: comfortable at 1.5 or more,
// tight from 1.0 up to 1.5, bruise risk below 1.0. The cases are written out from that rule.
describe('verdict bands', () => {
  const cases: [number, string][] = [
    [3, 'comfortable'],
    [1.5, 'comfortable'],
    [1.4999, 'tight'],
    [1, 'tight'],
    [0.9999, 'bruise risk'],
    [0.2, 'bruise risk'],
  ];
  for (const [margin, verdict] of cases) {
    it(`margin ${margin} → ${verdict}`, () => expect(verdictOf(margin)).toBe(verdict));
  }
});
