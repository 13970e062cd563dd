import { describe, expect, it } from 'vitest';
import { judgeDrop, judgeFactor, judgeRange } from '@/lib/checks/calibration-rules';

// The rules written out by hand; each case sits just inside or just outside a stated bound.
describe('how a prediction is judged against a published outcome', () => {
  it('a no-bruise or recommended height: within a factor of 2 either way', () => {
    expect(judgeDrop('no-bruise', 100, 199).agrees).toBe(true);
    expect(judgeDrop('no-bruise', 100, 201).agrees).toBe(false);
    expect(judgeDrop('recommended-max', 100, 51).agrees).toBe(true);
    expect(judgeDrop('recommended-max', 100, 49).agrees).toBe(false);
  });

  it('a height at which fruit bruised: the estimate at or below it, not 4× lower', () => {
    // Potato onto a rigid plate bruised at 50 mm: an estimate of 48.8 mm agrees; 60 mm would
    // call safe a drop that bruised; 10 mm is five times lower, saying nothing new.
    expect(judgeDrop('bruised-at', 50, 48.8).agrees).toBe(true);
    expect(judgeDrop('bruised-at', 50, 60).agrees).toBe(false);
    expect(judgeDrop('bruised-at', 50, 10).agrees).toBe(false);
    expect(judgeDrop('bruised-at', 50, 12.5).agrees).toBe(true);
  });

  it('a range widened by a share, and a span within a factor', () => {
    // 0.26–0.31 widened by 30 %: 0.182 to 0.403.
    expect(judgeRange(0.19, 0.26, 0.31, 0.3).agrees).toBe(true);
    expect(judgeRange(0.18, 0.26, 0.31, 0.3).agrees).toBe(false);
    expect(judgeRange(0.4, 0.26, 0.31, 0.3).agrees).toBe(true);
    expect(judgeRange(0.41, 0.26, 0.31, 0.3).agrees).toBe(false);
    // 13–16 within a factor of 2: 6.5 to 32.
    expect(judgeFactor(6.5, 13, 16, 2).agrees).toBe(true);
    expect(judgeFactor(6.4, 13, 16, 2).agrees).toBe(false);
    expect(judgeFactor(33, 13, 16, 2).agrees).toBe(false);
  });
});
