import { mulberry32 } from '../integration/lab-tests-support';

export interface PelegCurve {
  /** Peleg's constants: k₁ in s, k₂ dimensionless; F₀ in N */
  k1: number;
  k2: number;
  f0: number;
  /** reading interval and last reading, s */
  step: number;
  end: number;
  /** with a seed, each force gets uniform noise of ± this many N */
  noise?: number;
  seed?: number;
}

/**
 * A relaxation file written from Peleg's F(t) = F₀·(1 − t ÷ (k₁ + k₂·t)) (M. Peleg, J. Food
 * Science 44:277–281, 1979), forces to 6 decimals, the first row at t = 0. Invented inputs.
 */
export function pelegCsv(c: PelegCurve, header = 'time_s,force_n'): string {
  const random = c.seed === undefined ? null : mulberry32(c.seed);
  const lines = [header];
  const steps = Math.round(c.end / c.step);
  for (let i = 0; i <= steps; i++) {
    const t = i * c.step;
    let force = c.f0 * (1 - t / (c.k1 + c.k2 * t));
    if (random) force += (c.noise ?? 0) * (2 * random() - 1);
    lines.push(`${Number(t.toFixed(6))},${force.toFixed(6)}`);
  }
  return lines.join('\n') + '\n';
}

/** The demo file's inputs (scripts/relaxation-demo.ts): k₁ = 8 s, k₂ = 1.6, F₀ = 30 N. */
export const PELEG: PelegCurve = { k1: 8, k2: 1.6, f0: 30, step: 0.5, end: 120 };

/**
 * A small valid file, readings each second for 39 s, with one row replaced (row numbers count
 * the header as row 1, so t = 0 is row 2 and t = n s is row n + 2).
 */
export function relaxationWithRow(row: number, line: string, header = 'time_s,force_n'): string {
  const lines = pelegCsv({ ...PELEG, step: 1, end: 39 }, header)
    .trimEnd()
    .split('\n');
  lines[row - 1] = line;
  return lines.join('\n') + '\n';
}
