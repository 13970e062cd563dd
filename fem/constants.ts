/** Standard gravity g_n, m/s² (3rd CGPM, 1901): the default acceleration wherever weight enters. */
export const STANDARD_GRAVITY = 9.80665;
