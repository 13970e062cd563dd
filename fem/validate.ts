import { FemInputError } from './errors';

/** A finite number, or a FemInputError naming `field`. */
export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new FemInputError(field, `${field} must be a finite number`);
  }
  return value;
}

/** A finite number > 0, or a FemInputError naming `field`. */
export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) throw new FemInputError(field, `${field} must be greater than zero`);
  return value;
}

/** A finite number ≥ 0, or a FemInputError naming `field`. */
export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new FemInputError(field, `${field} must not be negative`);
  return value;
}

/**
 * Poisson's ratio in [0, 0.5): 0 is a valid (fully compressible) material; 0.5 is incompressible,
 * where the bulk modulus E/(3(1 − 2ν)) is infinite.
 */
export function requirePoisson(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0 || value >= 0.5) {
    throw new FemInputError(field, `${field} must be at least 0 and less than 0.5`);
  }
  return value;
}

/** One of `choices`, or a FemInputError naming `field` and listing them ("a, b or c"). */
export function requireOneOf<T extends string>(field: string, value: T, choices: readonly T[]): T {
  if (!choices.includes(value)) {
    const list = `${choices.slice(0, -1).join(', ')} or ${choices[choices.length - 1]}`;
    throw new FemInputError(field, `${field} must be ${list}`);
  }
  return value;
}
