import { expect } from 'vitest';
import { FemInputError } from '../../../fem/errors';

/** |actual − expected| ≤ tolerance·|expected|. */
export function expectRelative(actual: number, expected: number, tolerance: number): void {
  expect(Number.isFinite(actual)).toBe(true);
  expect(Math.abs(actual - expected)).toBeLessThanOrEqual(tolerance * Math.abs(expected));
}

/** `run` throws a FemInputError whose `field` is `field` and whose message names it. */
export function expectFieldError(run: () => unknown, field: string): void {
  let caught: unknown;
  try {
    run();
  } catch (error) {
    caught = error;
  }
  expect(caught).toBeInstanceOf(FemInputError);
  expect((caught as FemInputError).field).toBe(field);
  expect((caught as FemInputError).message).toContain(field);
}
