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
