/**
 * Writes public/samples/relaxation-demo.csv, the demo relaxation file offered on the lab-tests
 * page: invented readings, not a measurement. Peleg's F(t) = F₀·(1 − t ÷ (k₁ + k₂·t)) (Peleg,
 * J. Food Science 44:277–281, 1979) with k₁ = 8 s, k₂ = 1.6, F₀ = 30 N, read every 0.5 s for
 * 120 s, each force with uniform noise of ±0.05 N (a texture analyser's load cell at rest) and
 * written to 0.01 N. Seeded, so the file is the same on every run: `npx tsx scripts/relaxation-demo.ts`.
 */
import fs from 'node:fs';
import path from 'node:path';

const DEMO = { k1: 8, k2: 1.6, f0: 30, step: 0.5, end: 120, noise: 0.05, seed: 20261206 };

/** mulberry32: a small deterministic PRNG, uniform on [0, 1). */
function mulberry32(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}

function demoCsv(): string {
  const random = mulberry32(DEMO.seed);
  const lines = ['time_s,force_n'];
  const steps = Math.round(DEMO.end / DEMO.step);
  for (let i = 0; i <= steps; i++) {
    const t = i * DEMO.step;
    const force = DEMO.f0 * (1 - t / (DEMO.k1 + DEMO.k2 * t));
    const noisy = force + DEMO.noise * (2 * random() - 1);
    lines.push(`${t.toFixed(1)},${noisy.toFixed(2)}`);
  }
  return lines.join('\n') + '\n';
}

const file = path.resolve('public/samples/relaxation-demo.csv');
fs.mkdirSync(path.dirname(file), { recursive: true });
fs.writeFileSync(file, demoCsv());
console.log(`wrote ${path.relative(process.cwd(), file)}`);
