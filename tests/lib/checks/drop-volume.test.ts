import { describe, expect, it } from 'vitest';
import { bruiseVolume, heightForVolumeBruise, hemisphereRadius } from '@/lib/checks/drop/volume';

describe('the bruise from a bruise susceptibility', () => {
  it('a 200 g fruit dropped 100 mm at 3000 mm³/J, by hand', () => {
    // E = 0.2 · 9.80665 · 0.1 = 0.196133 J; V = 3000 · E = 588.40 mm³; a hemisphere of that
    // volume has r = (3V/2π)^(1/3) = 280.94^(1/3) = 6.5494 mm (6.5494³ = 280.93). Tolerance
    // 1e-4 relative: the four digits worked by hand.
    const energy = 0.2 * 9.80665 * 0.1;
    expect(bruiseVolume(3000, energy)).toBeCloseTo(588.399, 3);
    expect(Math.abs(hemisphereRadius(588.399) / 6.5494 - 1)).toBeLessThan(1e-4);
    // And back: the height at which the bruise reaches that radius is the 100 mm dropped.
    expect(
      Math.abs(heightForVolumeBruise(3000, 0.2, hemisphereRadius(588.399)) / 100 - 1),
    ).toBeLessThan(1e-9);
  });

  it('no energy, no bruise', () => {
    expect(bruiseVolume(3000, 0)).toBe(0);
    expect(bruiseVolume(3000, -1)).toBe(0);
  });
});
