import { EigenvalueDecomposition, Matrix } from 'ml-matrix';
import { describe, expect, it } from 'vitest';
import { elasticSplit } from '../../../fem/elements/elastic-d';
import { q4Stiffness } from '../../../fem/elements/q4-stiffness';
import type { BodyModel } from '../../../fem/types';
import { assembleStiffness } from '../../../fem/body/assembly';
import { centroidStresses } from '../../../fem/elements/element-stresses';
import { q4Stress } from '../../../fem/elements/q4-stress';
import { GAUSS_2 } from '../../../fem/elements/quad4';
import type { QuadMesh } from '../../../fem/mesh/quad-mesh';
import { csrMultiply } from '../support/csr';
import { solveSymmetric } from '../support/symmetric-solve';

// A distorted (non-parallelogram) quad away from the axis, counter-clockwise; invented inputs.
const XR = [0.5, 1.3, 1.45, 0.6];
const XZ = [0.1, 0.0, 0.9, 0.75];

function stiffness(model: BodyModel): Matrix {
  const k = new Float64Array(64);
  q4Stiffness(XR, XZ, elasticSplit(model, 1, 0.3), k);
  return new Matrix(Array.from({ length: 8 }, (_, i) => Array.from(k.subarray(8 * i, 8 * i + 8))));
}

function energy(k: Matrix, u: number[]): number {
  const ku = k.mmul(Matrix.columnVector(u)).to1DArray();
  return ku.reduce((s, v, i) => s + v * u[i], 0);
}

const scale = (k: Matrix): number => Math.max(...k.to1DArray().map(Math.abs));

describe('bilinear quad element stiffness', () => {
  // Source: Cook, Malkus, Plesha & Witt, Concepts and Applications of FEA (2002), ch. 3 and 6
  // [from memory]: k = ∫BᵀDB dV is symmetric; full 2×2 Gauss leaves no spurious zero-energy modes.
  for (const model of ['axisymmetric', 'plane-strain'] as const) {
    it(`is symmetric (${model})`, () => {
      const k = stiffness(model);
      // Tolerance 1e-14 of the largest entry: symmetric by construction, round-off only.
      expect(Math.max(...k.clone().sub(k.transpose()).abs().to1DArray())).toBeLessThanOrEqual(
        1e-14 * scale(k),
      );
    });
  }

  it('has only the axial translation as a rigid mode (axisymmetric)', () => {
    // Source: Cook et al. 2002, axisymmetric solids [from memory]: u_z = const costs no energy;
    // u_r = const stretches the hoop (ε_θ = u_r / r) and does.
    const k = stiffness('axisymmetric');
    const axial = [0, 1, 0, 1, 0, 1, 0, 1];
    const radial = [1, 0, 1, 0, 1, 0, 1, 0];
    // Tolerance 1e-13 × largest entry × |u|²: zero to round-off.
    expect(Math.abs(energy(k, axial))).toBeLessThan(1e-13 * scale(k) * 4);
    expect(energy(k, radial)).toBeGreaterThan(1e-3 * scale(k));
    const eig = new EigenvalueDecomposition(k).realEigenvalues;
    const max = Math.max(...eig);
    // Exactly one eigenvalue below 1e-10 of the largest: no spurious mechanisms (2×2 Gauss).
    expect(eig.filter((l) => l < 1e-10 * max)).toHaveLength(1);
  });

  it('has two translations and the rotation as rigid modes (plane strain)', () => {
    // Source: Cook et al. 2002, ch. 3 [from memory]: three rigid-body modes in the plane.
    const k = stiffness('plane-strain');
    const rot = XR.flatMap((x, a) => [-XZ[a], x]);
    const modes = [[1, 0, 1, 0, 1, 0, 1, 0], [0, 1, 0, 1, 0, 1, 0, 1], rot];
    for (const u of modes) {
      const norm2 = u.reduce((s, v) => s + v * v, 0);
      // Tolerance 1e-13 × largest entry × |u|²: zero to round-off.
      expect(Math.abs(energy(k, u))).toBeLessThan(1e-13 * scale(k) * norm2);
    }
    const eig = new EigenvalueDecomposition(k).realEigenvalues;
    const max = Math.max(...eig);
    // Exactly three eigenvalues below 1e-10 of the largest: the rigid modes, nothing spurious.
    expect(eig.filter((l) => l < 1e-10 * max)).toHaveLength(3);
  });
});

// Source: MacNeal & Harder, "A proposed standard set of problems to test finite element
// accuracy", Finite Elements in Analysis and Design 1 (1985) 3–20 [from memory]: the 0.24 × 0.12
// rectangle with four irregular interior nodes, five quads, E = 1e6, ν = 0.25.
const R = [0, 0.24, 0.24, 0, 0.04, 0.18, 0.16, 0.08];
const Z = [0, 0, 0.12, 0.12, 0.02, 0.03, 0.08, 0.08];
const QUADS = [0, 1, 5, 4, 1, 2, 6, 5, 2, 3, 7, 6, 3, 0, 4, 7, 4, 5, 6, 7];
const BOUNDARY = [0, 1, 2, 3];
const E = 1e6;
const NU = 0.25;

/** Solves the patch with the linear field prescribed on the boundary nodes. */
function runPatch(
  model: BodyModel,
  shift: number,
  field: (r: number, z: number) => [number, number],
) {
  const mesh: QuadMesh = {
    nodeR: Float64Array.from(R, (r) => r + shift),
    nodeZ: Float64Array.from(Z),
    quads: Int32Array.from(QUADS),
  };
  const k = assembleStiffness(mesh, model, E, NU);
  const fixed = new Uint8Array(16);
  const ub = new Float64Array(16);
  for (const v of BOUNDARY) {
    [ub[2 * v], ub[2 * v + 1]] = field(mesh.nodeR[v], mesh.nodeZ[v]);
    fixed[2 * v] = fixed[2 * v + 1] = 1;
  }
  const rhs = csrMultiply(k, ub).map((x) => -x);
  const u = solveSymmetric(k, rhs, fixed).map((x, i) => x + ub[i]);
  return { mesh, u };
}

/**
 * Hooke's law in Lamé form, σ_ii = λ tr ε + 2μ ε_ii, τ = μ γ (Timoshenko & Goodier, Theory of
 * Elasticity [from memory]), written out here rather than taken from elasticD(). `eps` lists the
 * normal strains, then the engineering shear strain; plane strain has ε_zz = 0.
 */
function hooke(eps: number[]): number[] {
  const lambda = (E * NU) / ((1 + NU) * (1 - 2 * NU));
  const mu = E / (2 * (1 + NU));
  const normal = eps.slice(0, -1);
  const trace = normal.reduce((s, e) => s + e, 0);
  return [...normal.map((e) => lambda * trace + 2 * mu * e), mu * eps[eps.length - 1]];
}

describe('constant-strain patch test', () => {
  // Tolerance: 1e-10 relative. The linear field lies in the bilinear space and 2×2 Gauss
  // integrates the equilibrium of a constant stress exactly, so only round-off remains.
  const TOL = 1e-10;

  it('plane strain reproduces u = 1e-3(x + y/2), v = 1e-3(y + x/2) and constant stress', () => {
    const field = (x: number, y: number): [number, number] => [
      1e-3 * (x + y / 2),
      1e-3 * (y + x / 2),
    ];
    const { mesh, u } = runPatch('plane-strain', 0, field);
    for (let v = 4; v < 8; v++) {
      const [ex, ey] = field(mesh.nodeR[v], mesh.nodeZ[v]);
      expect(Math.abs(u[2 * v] - ex)).toBeLessThan(TOL * 1e-3 * 0.24);
      expect(Math.abs(u[2 * v + 1] - ey)).toBeLessThan(TOL * 1e-3 * 0.24);
    }
    const [sx, sy, txy] = hooke([1e-3, 1e-3, 1e-3]);
    const lambda = (E * NU) / ((1 + NU) * (1 - 2 * NU));
    const ref = Math.abs(sx);
    for (const s of centroidStresses(mesh, 'plane-strain', E, NU, u)) {
      expect(Math.abs(s.srr - sx)).toBeLessThan(TOL * ref);
      expect(Math.abs(s.szz - sy)).toBeLessThan(TOL * ref);
      expect(Math.abs(s.srz - txy)).toBeLessThan(TOL * ref);
      // Plane strain out-of-plane stress σ_zz = λ(ε_x + ε_y) (Hooke's law with ε_zz = 0).
      expect(Math.abs(s.stt - lambda * 2e-3)).toBeLessThan(TOL * ref);
    }
  });

  it('axisymmetric reproduces u_r = 1e-3 r, u_z = 2e-3 z − 5e-4 and constant stress at Gauss points', () => {
    // u_r ∝ r keeps σ_rr = σ_θθ, so the constant stress is in equilibrium without body force
    // (axisymmetric equilibrium ∂σ_rr/∂r + (σ_rr − σ_θθ)/r = 0; Timoshenko & Goodier [from memory]).
    const field = (r: number, z: number): [number, number] => [1e-3 * r, 2e-3 * z - 5e-4];
    const { mesh, u } = runPatch('axisymmetric', 0.5, field);
    for (let v = 4; v < 8; v++) {
      const [er, ez] = field(mesh.nodeR[v], mesh.nodeZ[v]);
      expect(Math.abs(u[2 * v] - er)).toBeLessThan(TOL * 1e-3);
      expect(Math.abs(u[2 * v + 1] - ez)).toBeLessThan(TOL * 1e-3);
    }
    const [srr, szz, stt] = hooke([1e-3, 2e-3, 1e-3, 0]);
    const material = elasticSplit('axisymmetric', E, NU);
    for (let e = 0; e < 5; e++) {
      const nodes = QUADS.slice(4 * e, 4 * e + 4);
      const xr = nodes.map((v) => mesh.nodeR[v]);
      const xz = nodes.map((v) => mesh.nodeZ[v]);
      const ue = nodes.flatMap((v) => [u[2 * v], u[2 * v + 1]]);
      for (const xi of GAUSS_2) {
        for (const eta of GAUSS_2) {
          const s = q4Stress(xr, xz, ue, material, xi, eta);
          expect(Math.abs(s.srr - srr)).toBeLessThan(TOL * szz);
          expect(Math.abs(s.szz - szz)).toBeLessThan(TOL * szz);
          expect(Math.abs(s.stt - stt)).toBeLessThan(TOL * szz);
          expect(Math.abs(s.srz)).toBeLessThan(TOL * szz);
        }
      }
    }
  });
});
