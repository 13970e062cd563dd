import { describe, expect, it } from 'vitest';
import { Matrix } from 'ml-matrix';
import { lusolve, matrix, type Matrix as MathMatrix } from 'mathjs';
import { solveContact } from '../../../fem/solver/active-set';
import { createContactSystem } from '../../../fem/solver/compliance';
import { FemConvergenceError } from '../../../fem/errors';

// Synthetic SPD system (inputs invented): a chain of nodes joined by springs kc, each tied to
// ground by kg — a discrete elastic foundation; gaps grow like r² as under a sphere.
const n = 6;
const kc = 400;
const kg = 100;
function chain(): number[][] {
  const K = Array.from({ length: n }, () => new Array<number>(n).fill(0));
  for (let i = 0; i < n; i++) {
    K[i][i] = kg + (i > 0 ? kc : 0) + (i < n - 1 ? kc : 0);
    if (i > 0) K[i][i - 1] = K[i - 1][i] = -kc;
  }
  return K;
}
const gaps = Float64Array.from({ length: n }, (_, i) => 1e-4 * i * i);
const travel = 1.2e-3;

/** The complementarity solution found by enumeration: forces, displacements, gaps, contact set. */
interface Enumerated {
  force: number[];
  displacement: number[];
  gap: number[];
  active: number[];
}

/**
 * Independent reference: enumerate all 2^n active sets in the stiffness form (impose
 * u_A = g_A − d, solve K_II u_I = −K_IA u_A with mathjs) and keep the one that satisfies
 * f_A ≤ 0, u_I ≤ g_I − d. For SPD K the linear complementarity problem has exactly one solution
 * (Cottle, Pang & Stone, The Linear Complementarity Problem, Academic Press 1992, Thm 3.1.6
 * [from memory]).
 */
function bruteForce(K: number[][], g: Float64Array, d: number): Enumerated {
  for (let mask = 1; mask < 1 << n; mask++) {
    const A = [...Array(n).keys()].filter((i) => mask & (1 << i));
    const I = [...Array(n).keys()].filter((i) => !(mask & (1 << i)));
    const u = new Array<number>(n).fill(0);
    A.forEach((i) => (u[i] = g[i] - d));
    if (I.length > 0) {
      const KII = matrix(I.map((i) => I.map((j) => K[i][j])));
      const rhs = matrix(I.map((i) => [-A.reduce((s, j) => s + K[i][j] * u[j], 0)]));
      const x = (lusolve(KII, rhs) as MathMatrix).toArray() as number[][];
      I.forEach((i, k) => (u[i] = x[k][0]));
    }
    const f = K.map((row) => row.reduce((s, kij, j) => s + kij * u[j], 0));
    const ok = A.every((i) => f[i] <= 1e-9) && I.every((i) => u[i] <= g[i] - d + 1e-12);
    if (ok) {
      const active = [...Array(n).keys()].map((i) => (mask & (1 << i) ? 1 : 0));
      const gap = u.map((ui, i) => (active[i] ? 0 : g[i] - d - ui));
      return { force: f.map((fi) => -fi), displacement: u, gap, active };
    }
  }
  throw new Error('no complementary solution');
}

describe('active-set contact on a synthetic SPD system', () => {
  const K = chain();
  const system = createContactSystem(new Matrix(K));
  const expected = bruteForce(K, gaps, travel);

  it('matches the enumerated complementarity solution', () => {
    const sol = solveContact(system, { gap: gaps, travel });
    expect(Array.from(sol.active)).toEqual(expected.active);
    expect(expected.active).toContain(0); // the case has nodes out of contact
    // Tolerances: forces to 1e-9 N, displacements and gaps to 1e-12 m (forces ~0.1 N, gaps
    // ~1e-3 m): both are direct double-precision solves of the same 6 × 6 system, so they
    // agree to round-off; the enumeration solves for displacements, the solver for forces.
    sol.force.forEach((p, i) => expect(p).toBeCloseTo(expected.force[i], 9));
    sol.displacement.forEach((u, i) => expect(u).toBeCloseTo(expected.displacement[i], 12));
    sol.gap.forEach((s, i) => expect(s).toBeCloseTo(expected.gap[i], 12));
  });

  it('releases nodes that would pull on the pad', () => {
    const start = new Uint8Array(n).fill(1);
    const sol = solveContact(system, { gap: gaps, travel, initialActive: start });
    expect(sol.released).toBeGreaterThan(0);
    // Same tolerance as above: the end state is the unique solution whatever the start.
    sol.force.forEach((p, i) => expect(p).toBeCloseTo(expected.force[i], 9));
  });

  it('adds penetrating nodes from an empty start', () => {
    const sol = solveContact(system, { gap: gaps, travel, initialActive: new Uint8Array(n) });
    expect(sol.added).toBeGreaterThan(0);
    sol.force.forEach((p, i) => expect(p).toBeCloseTo(expected.force[i], 9));
  });

  it('throws FemConvergenceError past the iteration limit', () => {
    const call = () =>
      solveContact(system, {
        gap: gaps,
        travel,
        initialActive: new Uint8Array(n),
        maxIterations: 1,
      });
    expect(call).toThrow(FemConvergenceError);
    expect(call).toThrow(/did not settle within 1 iterations/);
  });

  it('a series facing spring softens the contact and tends to rigid when stiff', () => {
    const rigid = solveContact(system, { gap: gaps, travel });
    const soft = solveContact(system, {
      gap: gaps,
      travel,
      facingCompliance: new Float64Array(n).fill(1e-2),
    });
    const stiff = solveContact(system, {
      gap: gaps,
      travel,
      facingCompliance: new Float64Array(n).fill(1e-9),
    });
    const total = (p: Float64Array) => p.reduce((a, b) => a + b, 0);
    expect(total(soft.force)).toBeLessThan(total(rigid.force));
    // Facing compliance 1e-9 m/N against node compliance ~1e-3 m/N: relative change ~1e-6.
    expect(Math.abs(total(stiff.force) / total(rigid.force) - 1)).toBeLessThan(1e-5);
  });
});
