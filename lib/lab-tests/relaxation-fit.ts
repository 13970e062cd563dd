import { fitPeleg, type PelegFit } from '@/fem';
import { fileError } from './decode';
import type { RelaxationReading } from './relaxation-csv';

/** Peleg's constants of a test: k₁ in s, k₂ dimensionless, F₀ in N; R² of both forms. */
export type RelaxationFit = PelegFit;

const plain = (message: string) =>
  message.charAt(0).toLowerCase() + message.slice(1).replace(/\.$/, '');

/**
 * Fit Peleg's F(t) = F₀·(1 − t ÷ (k₁ + k₂·t)) to the readings (Peleg 1979, via fitPeleg in the
 * numerical core). The core refuses what it cannot fit with a RangeError; that is a problem of
 * the file, so it goes beside the file field as the parser's refusals do.
 */
export function fitRelaxation(readings: readonly RelaxationReading[]): RelaxationFit {
  try {
    return fitPeleg(
      readings.map((r) => r.timeS),
      readings.map((r) => r.forceN),
    );
  } catch (error) {
    if (error instanceof RangeError) {
      throw fileError(`the readings cannot be fitted: ${plain(error.message)}`);
    }
    throw error;
  }
}
