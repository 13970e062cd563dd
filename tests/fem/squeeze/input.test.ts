import { describe, expect, it } from 'vitest';
import { FemInputError, runSqueeze, sweepPadDiameters, type SqueezeInput } from '../../../fem';

// Inputs invented for the checks: an 80 mm fruit, E = 3 MPa, ν = 0.35, 1 mm travel.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.001,
  mesh: 'sparse',
};

function fieldOf(patch: Partial<SqueezeInput>): string {
  try {
    runSqueeze({ ...base, ...patch } as SqueezeInput);
  } catch (err) {
    if (err instanceof FemInputError) return `${err.field}: ${err.message}`;
    throw err;
  }
  throw new Error('no error thrown');
}

describe('squeeze input checks name the field', () => {
  const cases: [string, Partial<SqueezeInput>, RegExp][] = [
    ['E = 0', { modulus: 0 }, /^modulus: modulus must be greater than zero/],
    ['E < 0', { modulus: -1 }, /^modulus:/],
    ['ν < 0', { poisson: -0.1 }, /^poisson: poisson must be at least 0 and less than 0.5/],
    ['ν = 0.5', { poisson: 0.5 }, /^poisson: poisson must be at least 0 and less than 0.5/],
    ['ν NaN', { poisson: NaN }, /^poisson: poisson must be a finite number/],
    ['radius Infinity', { equatorialRadius: Infinity }, /^equatorialRadius: .*finite/],
    ['axial radius ≤ 0', { axialRadius: 0 }, /^axialRadius:/],
    ['aspect out of range', { axialRadius: 0.01 }, /^axialRadius: .*between 0.3 and 3/],
    ['travel 0', { travel: 0 }, /^travel: travel must be greater than zero/],
    ['travel too large', { travel: 0.007 }, /^travel: .*15 % of the axial radius/],
    ['steps 0', { steps: 0 }, /^steps: .*integer from 1 to 200/],
    ['steps 201', { steps: 201 }, /^steps:/],
    ['steps 2.5', { steps: 2.5 }, /^steps:/],
    ['pad diameter 0', { padDiameter: 0 }, /^padDiameter: .*greater than zero/],
    ['edge radius 0', { padDiameter: 0.02, edgeRadius: 0 }, /^edgeRadius: .*greater than zero/],
    [
      'edge radius ≥ D/2',
      { padDiameter: 0.02, edgeRadius: 0.01 },
      /^edgeRadius: .*half the padDiameter/,
    ],
    ['edge radius without pad', { edgeRadius: 0.001 }, /^edgeRadius:/],
    ['facing modulus 0', { facingModulus: 0, facingThickness: 0.003 }, /^facingModulus:/],
    ['facing thickness < 0', { facingModulus: 1e6, facingThickness: -1 }, /^facingThickness:/],
    ['facing thickness alone', { facingThickness: 0.003 }, /^facingModulus: .*needed/],
    ['facing Poisson alone', { facingPoisson: 0.4 }, /^facingPoisson: facingPoisson needs/],
    [
      'facing Poisson 0.5',
      { facingModulus: 1e6, facingThickness: 0.003, facingPoisson: 0.5 },
      /^facingPoisson: .*less than 0.5/,
    ],
    ['mesh contact radius 0', { meshContactRadius: 0 }, /^meshContactRadius: .*greater than zero/],
    ['density alone', { density: 800 }, /^friction: .*needed/],
    ['friction 0', { density: 800, friction: 0 }, /^friction:/],
    ['safety factor < 1', { density: 800, friction: 0.4, safetyFactor: 0.5 }, /^safetyFactor:/],
    ['accel NaN', { density: 800, friction: 0.4, accelG: NaN }, /^accelG:/],
    ['threshold ≤ 0', { density: 800, friction: 0.4, bruiseThreshold: 0 }, /^bruiseThreshold:/],
    ['mesh name', { mesh: 'medium' as never }, /^mesh:/],
    ['model name', { model: '3d' as never }, /^model:/],
  ];
  it.each(cases)('%s', (_name, patch, expected) => {
    expect(fieldOf(patch)).toMatch(expected);
  });

  it('accepts ν = 0, a valid fully compressible material', () => {
    expect(runSqueeze({ ...base, poisson: 0 }).final.force).toBeGreaterThan(0);
  });

  it('sweep refuses an empty diameter list', () => {
    expect(() => sweepPadDiameters(base, [])).toThrow(FemInputError);
  });
});
