import { FemInputError } from '../errors';

/**
 * Guard for outputs: extreme but individually valid inputs can overflow or underflow a closed
 * form; refuse them (naming the input most likely responsible) rather than return NaN/Infinity.
 */
export function requireFiniteResult(field: string, quantity: string, value: number): number {
  if (!Number.isFinite(value)) {
    throw new FemInputError(field, `${field} is out of range: ${quantity} would not be finite`);
  }
  return value;
}
