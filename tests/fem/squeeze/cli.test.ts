import { execFile } from 'node:child_process';
import { mkdtemp, rm } from 'node:fs/promises';
import os from 'node:os';
import path from 'node:path';
import { promisify } from 'node:util';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildCli } from '../../../scripts/build-cli';

const run = promisify(execFile);
let outdir = '';
let built = '';
// The CLI as shipped: built from the current source with the package's own build, run by node.
beforeAll(async () => {
  outdir = await mkdtemp(path.join(os.tmpdir(), 'tenderline-cli-'));
  built = await buildCli(outdir);
});
afterAll(() => rm(outdir, { recursive: true, force: true }));
const cli = (args: string[]) => run(process.execPath, [built, 'squeeze', ...args]);

const valid = [
  '--diameter-mm',
  '80',
  '--modulus-mpa',
  '3',
  '--poisson',
  '0.35',
  '--travel-mm',
  '1',
  '--steps',
  '5',
  '--mesh',
  'sparse',
  '--pad-diameter-mm',
  '30',
  '--density',
  '840',
  '--friction',
  '0.4',
  '--safety-factor',
  '2',
  '--threshold-kpa',
  '150',
];

describe('tenderline CLI (scripts/fem.ts, built to dist/tenderline.mjs)', () => {
  it('prints one JSON object for a valid run', async () => {
    const { stdout } = await cli([...valid, '--json']);
    const out = JSON.parse(stdout);
    expect(out.steps).toHaveLength(5);
    // 1 mm printed to 4 significant figures is exactly 1: 1e-6 only absorbs the float parse.
    expect(out.final.travel_per_pad_mm).toBeCloseTo(1, 6);
    expect(out.final.force_n).toBeGreaterThan(0);
    expect(out.steps[0]).toHaveProperty('lift_ratio');
    const grip = out.liftability.grip;
    expect(grip.travel_per_pad_mm).toBeGreaterThan(0);
    // Product definition: bruise margin = threshold / peak pressure at the grip. Compared to
    // 2 decimals (toBeCloseTo 2): both are printed to 3–4 significant figures.
    expect(grip.bruise_margin).toBeCloseTo(150 / grip.peak_pressure_kpa, 2);
    expect(out.hertz.at_travel.force_n).toBeGreaterThan(0);
    expect(out.mesh).toMatchObject({ level: 'sparse' });
    expect(out.profile[0]).toHaveProperty('r_mm');
    expect(out.units.travel_per_pad_mm).toMatch(/^mm: travel of each pad/);
  }, 30_000);

  it.each([
    ['an unknown option', ['--bogus', '1']],
    ['a non-number', ['--poisson', 'abc']],
    ['a bad Poisson ratio', ['--poisson', '0.6']],
    ['a bad mesh name', ['--mesh', 'medium']],
    ['a negative modulus', ['--modulus-mpa', '-3']],
  ])(
    'exits 2 with one line on stderr for %s',
    async (_name, patch) => {
      const args = [...valid];
      const at = args.indexOf(patch[0]);
      if (at >= 0) args.splice(at, 2, ...patch);
      else args.push(...patch);
      const err = await cli(args).then(
        () => null,
        (e: { code: number; stderr: string }) => e,
      );
      expect(err?.code).toBe(2);
      expect(err?.stderr.trim().split('\n')).toHaveLength(1);
    },
    30_000,
  );

  const shape = ['--modulus-mpa', '3', '--poisson', '0.35', '--travel-mm', '1'];
  it.each([
    [
      ['--axial-mm', '80', '--equatorial-mm', '10'],
      '--axial-mm must lie between 0.3 and 3 times the --equatorial-mm',
    ],
    [['--axial-mm', '80', '--equatorial-mm', '0'], '--equatorial-mm must be greater than zero'],
    [['--diameter-mm', '0'], '--diameter-mm must be greater than zero'],
    [
      ['--diameter-mm', '80', '--facing-thickness-mm', '3'],
      '--facing-modulus-mpa is needed with --facing-thickness-mm',
    ],
    [['--diameter-mm', '80', '--friction', '0.4'], '--density is needed with --friction'],
    [['--diameter-mm', '80', '--mesh', 'medium'], '--mesh must be sparse, balanced or dense'],
    // The former names are refused with the new one.
    [['--diameter-mm', '80', '--mesh', 'normal'], "is now called 'balanced'"],
  ])(
    'names the option the user typed, not the internal field (%j)',
    async (size, message) => {
      const err = await cli([...size, ...shape]).then(
        () => null,
        (e: { code: number; stderr: string }) => e,
      );
      expect(err?.code).toBe(2);
      expect(err?.stderr).toContain(message);
      // No internal camelCase field name (equatorialRadius, facingThickness, …) leaks through.
      expect(err?.stderr).not.toMatch(/\b[a-z]+[A-Z]\w*/);
    },
    30_000,
  );
});
