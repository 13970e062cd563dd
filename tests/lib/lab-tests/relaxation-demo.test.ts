import { createHash } from 'node:crypto';
import fs from 'node:fs';
import { describe, expect, it } from 'vitest';
import {
  isRelaxationDemoFile,
  RELAXATION_DEMO_PATH,
  RELAXATION_DEMO_SHA256,
} from '@/lib/lab-tests/relaxation-demo';
import { parseRelaxationCsv } from '@/lib/lab-tests/relaxation-csv';
import { fitRelaxation } from '@/lib/lab-tests/relaxation-fit';

const demo = fs.readFileSync(`public${RELAXATION_DEMO_PATH}`);

describe('the demo relaxation file', () => {
  it('is the file the app recognises as the demo, and a changed byte is not', () => {
    expect(createHash('sha256').update(demo).digest('hex')).toBe(RELAXATION_DEMO_SHA256);
    expect(isRelaxationDemoFile(demo)).toBe(true);
    const changed = Buffer.from(demo);
    changed[changed.length - 2] ^= 1;
    expect(isRelaxationDemoFile(changed)).toBe(false);
  });

  it('fits near the constants it was made from: k₁ = 8 s, k₂ = 1.6, F₀ = 30 N', () => {
    // Made with ±0.05 N noise and forces to 0.01 N (scripts/relaxation-demo.ts); the same
    // argument as the generated-curve test gives 5 % on k₁ and 1 % on k₂. F₀ is the first
    // reading, so within the noise of 30 N.
    const { readings, rows } = parseRelaxationCsv(demo);
    const fit = fitRelaxation(readings);
    expect(rows).toBe(241);
    expect(Math.abs(fit.k1 / 8 - 1)).toBeLessThan(0.05);
    expect(Math.abs(fit.k2 / 1.6 - 1)).toBeLessThan(0.01);
    expect(Math.abs(fit.f0 - 30)).toBeLessThanOrEqual(0.05);
  });
});
