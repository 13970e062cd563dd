/**
 * Thrown for any input the numerical core refuses (non-finite numbers, E ≤ 0, ν outside [0, 0.5),
 * sizes ≤ 0, travel too large) and for a contact iteration that does not settle.
 * `field` names the offending input so the web layer can map it to a 400 with a field message.
 */
export class FemInputError extends Error {
  readonly field: string;
  constructor(field: string, message: string) {
    super(message);
    this.name = 'FemInputError';
    this.field = field;
  }
}

/** Thrown when an iterative solve (active-set contact, bisection) does not converge. */
export class FemConvergenceError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'FemConvergenceError';
  }
}
