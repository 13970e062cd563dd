/**
 * The version of the numerical core's results, stored with every saved assessment so a report
 * says which model made it. Raise it with any change that alters a computed figure (a formula,
 * a mesh, a tolerance, a default); refactors that leave every figure the same keep it.
 */
export const MODEL_VERSION = '2026.12.1';
