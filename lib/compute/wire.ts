/**
 * How an error crosses the worker boundary. A thrown error is structured-cloned by
 * worker_threads into a plain `Error`: its class and its `field` are lost, so an input the model
 * refuses would reach the client as a 500. Worker functions therefore return an outcome, and a
 * refusal travels as `{ code, field, message }` and is rebuilt as the typed error here.
 */
import { FemConvergenceError, FemInputError } from '@/fem';

export interface WireError {
  code: 'fem_input' | 'fem_convergence';
  /** The model's name of the offending input (fem_input only). */
  field: string | null;
  message: string;
}

export type Outcome<T> = { ok: true; value: T } | { ok: false; error: WireError };

/** Worker side: a typed model error → its wire form; anything else is a fault and rethrown. */
export function toWire(error: unknown): WireError {
  if (error instanceof FemInputError)
    return { code: 'fem_input', field: error.field, message: error.message };
  if (error instanceof FemConvergenceError)
    return { code: 'fem_convergence', field: null, message: error.message };
  throw error;
}

/** Main side: the wire form → the typed error it was. */
export function fromWire(wire: WireError): Error {
  return wire.code === 'fem_input'
    ? new FemInputError(wire.field ?? 'input', wire.message)
    : new FemConvergenceError(wire.message);
}

/** Run `fn`, turning a typed model error into an outcome rather than a throw. */
export async function guarded<T>(fn: () => T | Promise<T>): Promise<Outcome<T>> {
  try {
    return { ok: true, value: await fn() };
  } catch (error) {
    return { ok: false, error: toWire(error) };
  }
}

/** The value of an outcome, or its error rebuilt and thrown. */
export function unwrap<T>(outcome: Outcome<T>): T {
  if (outcome.ok) return outcome.value;
  throw fromWire(outcome.error);
}
