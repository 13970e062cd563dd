import { describe, expect, it } from 'vitest';
import {
  contactBandOf,
  contactScaleOf,
  edgeBandOf,
  planOf,
  type EdgeTarget,
} from '../../../fem/body/grading';
import { MESH_LEVEL_PARAMS } from '../../../fem/mesh/mesh-levels';
import { meshQuality } from '../support/mesh-quality';
import { quarterEllipseMesh } from '../../../fem/mesh/quarter-ellipse';
import type { MeshLevel } from '../../../fem/types';

const LEVELS: MeshLevel[] = ['sparse', 'balanced', 'dense'];
/** Surface node spacing at the pole per level, units of the equatorial radius (product spec). */
const POLE_SPACING: Record<MeshLevel, number> = { sparse: 0.02, balanced: 0.01, dense: 0.005 };

/** Shoelace area of a closed polygon through the given nodes. */
function polygonArea(r: Float64Array, z: Float64Array, loop: number[]): number {
  let s = 0;
  for (let i = 0; i < loop.length; i++) {
    const a = loop[i];
    const b = loop[(i + 1) % loop.length];
    s += r[a] * z[b] - r[b] * z[a];
  }
  return 0.5 * s;
}

describe('quarter-ellipse mesh', () => {
  for (const level of LEVELS) {
    for (const aspect of [0.5, 1, 2, 0.3, 3]) {
      it(`${level}, aspect ${aspect}: valid elements that tile the section`, () => {
        const mesh = quarterEllipseMesh(aspect, MESH_LEVEL_PARAMS[level]);
        const q = meshQuality(mesh);
        // Bilinear map is one-to-one iff det J > 0 at the corners (then everywhere inside);
        // Gauss points are checked too (Cook et al. 2002, isoparametric elements [from memory]).
        expect(q.minDetJ).toBeGreaterThan(0);
        // Quality floor [common practice]: no corner angle under ~15° (sine 0.25) even at aspect 0.3 / 3.
        expect(q.minCornerSine).toBeGreaterThan(0.25);

        // Element areas sum to the area inside the boundary polygon (midplane, surface, axis):
        // with positive Jacobians this means no gaps or overlaps. Tolerance 1e-12 (round-off).
        let area = 0;
        for (let e = 0; e < mesh.quads.length / 4; e++) {
          area += polygonArea(
            mesh.nodeR,
            mesh.nodeZ,
            Array.from(mesh.quads.subarray(4 * e, 4 * e + 4)),
          );
        }
        const loop = [
          ...mesh.midplane,
          ...[...mesh.surface].reverse().slice(1),
          ...mesh.axis.slice(1, -1),
        ];
        const boundary = polygonArea(mesh.nodeR, mesh.nodeZ, loop);
        expect(Math.abs(area - boundary)).toBeLessThan(1e-12);
        // And close to the quarter ellipse πab/4 (chords cut a little off; 1 % bound for the coarse level).
        expect(Math.abs(boundary / ((Math.PI * aspect) / 4) - 1)).toBeLessThan(0.01);
      });
    }
  }

  it('puts boundary nodes on the boundary, the surface ordered from the pole', () => {
    const aspect = 1.7;
    const m = quarterEllipseMesh(aspect, MESH_LEVEL_PARAMS.balanced);
    for (const v of m.axis) expect(m.nodeR[v]).toBe(0);
    for (const v of m.midplane) expect(m.nodeZ[v]).toBe(0);
    expect(m.nodeZ[m.surface[0]]).toBeCloseTo(aspect, 14);
    for (let i = 0; i < m.surface.length; i++) {
      const v = m.surface[i];
      // On the ellipse r² + (z/a)² = 1 to round-off (tolerance 1e-12).
      expect(Math.abs(m.nodeR[v] ** 2 + (m.nodeZ[v] / aspect) ** 2 - 1)).toBeLessThan(1e-12);
      if (i > 0) expect(m.nodeR[v]).toBeGreaterThan(m.nodeR[m.surface[i - 1]]);
    }
  });

  for (const level of LEVELS) {
    it(`${level}: fine near the pole, spacing growing with distance, to r ≥ 0.6`, () => {
      const m = quarterEllipseMesh(1, MESH_LEVEL_PARAMS[level]);
      const spacing = POLE_SPACING[level];
      const r = Array.from(m.surface, (v) => m.nodeR[v]);
      // Product mesh specification: pole spacing 0.02 / 0.01 / 0.005 of the radius (written out
      // here, not read from the code); 1 % for the difference between arc and chord.
      expect(Math.abs(r[1] - spacing)).toBeLessThan(0.01 * spacing);
      const reach = r.findIndex((x) => x > 0.6);
      expect(reach).toBeGreaterThan(0);
      for (let i = 1; i <= reach; i++) {
        const h = r[i] - r[i - 1];
        // Surface step never above 1.5× the pole spacing or 15 % of the distance from the pole,
        // so a contact of radius a ≥ 0.05 spans several nodes [common practice].
        expect(h).toBeLessThan(Math.max(1.5 * spacing, 0.15 * r[i]));
      }
    });
  }
});

describe('quarter-ellipse mesh graded to a contact and a pad edge', () => {
  // Graded plans as the squeeze builds them: small contacts (a = 0.002–0.16 of the radius) and
  // refined bands at a pad's edge, tiny and large edge radii.
  const plans: [string, MeshLevel, number, EdgeTarget | null][] = [
    ['tiny contact', 'balanced', 0.002, null],
    ['1 mm on 80 mm', 'balanced', 0.158, null],
    ['13 mm pad', 'balanced', 0.158, { flat: 0.1125, outer: 0.1625, edge: 0.05, maxContact: 0.2 }],
    [
      '3 mm pad, 0.1 mm edge',
      'dense',
      0.0375,
      { flat: 0.035, outer: 0.0375, edge: 0.0025, maxContact: 0.2 },
    ],
    [
      'pad inside the core',
      'sparse',
      0.1,
      { flat: 0.005, outer: 0.01, edge: 0.005, maxContact: 0.12 },
    ],
  ];
  it.each(plans)('%s: valid elements that tile the section', (_name, level, a, edge) => {
    const contact = contactBandOf(a);
    const band = edge && edgeBandOf(level, contact, edge);
    const mesh = quarterEllipseMesh(1.2, planOf(level, contact, band ?? null));
    const q = meshQuality(mesh);
    // As for the standard levels: positive Jacobians, no corner under ~15° [common practice].
    expect(q.minDetJ).toBeGreaterThan(0);
    expect(q.minCornerSine).toBeGreaterThan(0.25);
    // Surface nodes on the ellipse to round-off, rising from the pole.
    for (let i = 1; i < mesh.surface.length; i++) {
      const v = mesh.surface[i];
      expect(Math.abs(mesh.nodeR[v] ** 2 + (mesh.nodeZ[v] / 1.2) ** 2 - 1)).toBeLessThan(1e-12);
      expect(mesh.nodeR[v]).toBeGreaterThan(mesh.nodeR[mesh.surface[i - 1]]);
    }
    // Near the pole the surface spacing is at most the graded spacing a/N (N = 8, 16, 32 nodes
    // per contact radius, product mesh specification) with 40 % for the core's outer steps.
    const perContact = { sparse: 8, balanced: 16, dense: 32 }[level];
    const r = Array.from(mesh.surface, (v) => mesh.nodeR[v]);
    const within = r.filter((x) => x <= 0.8 * contactScaleOf(contact));
    for (let i = 1; i < within.length; i++) {
      expect(within[i] - within[i - 1]).toBeLessThan((1.4 * contactScaleOf(contact)) / perContact);
    }
  });
});
