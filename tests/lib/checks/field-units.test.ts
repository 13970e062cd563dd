import { describe, expect, it } from 'vitest';
import { FIELD_UNITS } from '@/lib/checks/field-units';

// The unit each form field's value is in, written out from what the field measures (not read
// from the schemas under test): the forms convert the reader's typed figures with these.
const EXPECTED: Record<string, string> = {
  modulusMpa: 'MPa',
  poisson: '–',
  diameterMm: 'mm',
  massG: 'g',
  staticThresholdKpa: 'kPa',
  heightMm: 'mm',
  padModulusMpa: 'MPa',
  padThicknessMm: 'mm',
  binLengthMm: 'mm',
  binWidthMm: 'mm',
  fillDepthMm: 'mm',
  bulkDensityKgM3: 'kg/m³',
  wallFriction: '–',
  lateralRatio: '–',
  axialMm: 'mm',
  densityKgM3: 'kg/m³',
  padDiameterMm: 'mm',
  padEdgeMm: 'mm',
  facingModulusMpa: 'MPa',
  facingThicknessMm: 'mm',
  facingPoisson: '–',
  friction: '–',
  safetyFactor: '–',
  accelerationMs2: 'm/s²',
  maxTravelMm: 'mm',
  holdSeconds: 's',
  horizontalAccelerationMs2: 'm/s²',
  gripOffsetMm: 'mm',
};

describe('check form units come from the input schemas', () => {
  it('every number field carries its SI unit, and no other field appears', () => {
    expect(FIELD_UNITS).toEqual(EXPECTED);
  });
});
