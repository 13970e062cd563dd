import type { BodyModel } from '../types';

/**
 * Isotropic linear-elastic constitutive matrix D (Pa) with σ = D ε, engineering shear strain.
 * Axisymmetric: 4×4 on [ε_rr, ε_zz, ε_θθ, γ_rz]; plane strain: 3×3 on [ε_xx, ε_yy, γ_xy].
 * Row-major. Lamé form, as in any elasticity text (e.g. Timoshenko & Goodier, Theory of Elasticity).
 */
export function elasticD(model: BodyModel, modulus: number, poisson: number): Float64Array {
  const lambda = lameLambda(modulus, poisson);
  const mu = modulus / (2 * (1 + poisson));
  const nN = model === 'axisymmetric' ? 3 : 2;
  const size = nN + 1;
  const d = new Float64Array(size * size);
  for (let i = 0; i < nN; i++) {
    for (let j = 0; j < nN; j++) d[i * size + j] = lambda + (i === j ? 2 * mu : 0);
  }
  d[size * size - 1] = mu;
  return d;
}

/** Lamé's λ (Pa): the plane-strain out-of-plane stress is σ_zz = λ (ε_xx + ε_yy). */
export function lameLambda(modulus: number, poisson: number): number {
  return (modulus * poisson) / ((1 + poisson) * (1 - 2 * poisson));
}

/**
 * The material split into its deviatoric and volumetric parts, σ = D_dev ε + κ θ m with the
 * dilatation θ = mᵀε (m = 1 on the normal strains; in plane strain ε_zz = 0, so θ = ε_xx + ε_yy)
 * and the bulk modulus κ = λ + 2μ/3, so that D = D_dev + κ m mᵀ. The mean-dilatation element
 * integrates the two parts differently (see q4Stiffness).
 */
export interface ElasticSplit {
  model: BodyModel;
  /** shear modulus μ = E / (2(1 + ν)), Pa */
  mu: number;
  /** bulk modulus κ = E / (3(1 − 2ν)), Pa */
  bulk: number;
  /** D_dev = 2μ(I − m mᵀ/3) on the normal strains, μ on the shear strain; row-major */
  dev: Float64Array;
  /** rows of the strain vector: 4 axisymmetric, 3 plane strain */
  rows: number;
}

/** The deviatoric / volumetric split of an isotropic material, ν in [0, 0.5). */
export function elasticSplit(model: BodyModel, modulus: number, poisson: number): ElasticSplit {
  const mu = modulus / (2 * (1 + poisson));
  const bulk = modulus / (3 * (1 - 2 * poisson));
  const nN = model === 'axisymmetric' ? 3 : 2;
  const rows = nN + 1;
  const dev = new Float64Array(rows * rows);
  for (let i = 0; i < nN; i++) {
    for (let j = 0; j < nN; j++) dev[i * rows + j] = 2 * mu * ((i === j ? 1 : 0) - 1 / 3);
  }
  dev[rows * rows - 1] = mu;
  return { model, mu, bulk, dev, rows };
}
