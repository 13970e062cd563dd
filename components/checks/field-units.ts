/** The SI unit of each check field (what the route takes); the form shows the user's units. */
export const FIELD_UNITS: Record<string, string> = {
  heightMm: 'mm',
  padModulusMpa: 'MPa',
  padThicknessMm: 'mm',
  modulusMpa: 'MPa',
  poisson: '–',
  diameterMm: 'mm',
  massG: 'g',
  staticThresholdKpa: 'kPa',
  binLengthMm: 'mm',
  binWidthMm: 'mm',
  fillDepthMm: 'mm',
  bulkDensityKgM3: 'kg/m³',
  wallFriction: '–',
  lateralRatio: '–',
};
