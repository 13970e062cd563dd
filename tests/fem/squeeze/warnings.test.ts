import { describe, expect, it } from 'vitest';
import { runSqueeze, type SqueezeInput } from '../../../fem';

// Inputs invented: an 80 mm fruit, E = 3 MPa, sparse mesh.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.001,
  steps: 2,
  mesh: 'sparse',
};
const codes = (input: SqueezeInput) => runSqueeze(input).warnings.map((w) => w.code);

describe('squeeze warnings', () => {
  it('says when the travel passes the small-strain range, and what that range is', () => {
    // Product rule: travel up to 5 % of the axial radius is treated as small strain.
    const res = runSqueeze({ ...base, travel: 0.003 });
    const w = res.warnings.find((x) => x.code === 'large-travel');
    expect(w?.message).toMatch(/7\.5 % of the fruit's radius/);
    expect(w?.message).toMatch(/about 5\.0 %/);
    expect(codes({ ...base, travel: 0.002 })).not.toContain('large-travel');
  });

  it('says when Poisson’s ratio is above the checked 0.499', () => {
    expect(codes({ ...base, poisson: 0.4995 })).toContain('near-incompressible');
    expect(codes({ ...base, poisson: 0.499 })).not.toContain('near-incompressible');
  });

  it('tells the steep outer part of the rounded edge from its gentle inner part', () => {
    // 3 mm pad, 0.2 mm edge: the contact (1.49 mm) reaches past the flat (1.3 mm) by more than
    // 80 % of the edge radius, where the edge's slope passes 4/3; a 13 mm pad with a 2 mm edge
    // is touched only a quarter of the way onto its rounding.
    expect(codes({ ...base, padDiameter: 0.003, edgeRadius: 0.0002 })).toContain(
      'pad-edge-contact',
    );
    const wide = codes({ ...base, padDiameter: 0.013 });
    expect(wide).toContain('edge-contact');
    expect(wide).not.toContain('pad-edge-contact');
  });

  it('gives every warning a code and a plain message', () => {
    const res = runSqueeze({ ...base, travel: 0.003, padDiameter: 0.006, edgeRadius: 0.0001 });
    expect(res.warnings.length).toBeGreaterThan(1);
    for (const w of res.warnings) {
      expect(w.code).toMatch(/^[a-z-]+$/);
      expect(w.message).toMatch(/^[A-Z].*\.$/);
      expect(w.message).not.toMatch(/\b[a-z]+[A-Z]\w*/); // no internal camelCase names
    }
  });
});
