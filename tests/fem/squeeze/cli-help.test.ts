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
// The CLI as shipped: built with the package's own build, run by node.
beforeAll(async () => {
  outdir = await mkdtemp(path.join(os.tmpdir(), 'tenderline-cli-help-'));
  built = await buildCli(outdir);
}, 60_000);
afterAll(() => rm(outdir, { recursive: true, force: true }));

// Every option the CLI takes, written out here from its documentation comment and options table.
const OPTIONS = [
  '--diameter-mm',
  '--axial-mm',
  '--equatorial-mm',
  '--modulus-mpa',
  '--poisson',
  '--density',
  '--threshold-kpa',
  '--failure-shear-kpa',
  '--travel-mm',
  '--steps',
  '--pad-diameter-mm',
  '--edge-radius-mm',
  '--facing-modulus-mpa',
  '--facing-thickness-mm',
  '--facing-poisson',
  '--friction',
  '--safety-factor',
  '--accel-g',
  '--mesh',
  '--model',
  '--json',
  '--help',
];

describe('tenderline --help', () => {
  it.each([[['--help']], [['-h']], [['help']], [['squeeze', '--help']], [['squeeze', '-h']]])(
    '%j prints the help text on stdout and exits 0',
    async (args) => {
      const { stdout, stderr } = await run(process.execPath, [built, ...args]);
      expect(stderr).toBe('');
      expect(stdout).toMatch(/^Usage: tenderline squeeze \[options\] \[--json\]/);
      expect(stdout).not.toMatch(/Unknown option|ERR_PARSE_ARGS/);
      for (const option of OPTIONS) expect(stdout).toContain(option);
      expect(stdout).toContain('not a substitute for bruise tests');
    },
    30_000,
  );

  it('a bare call points to --help in its one error line', async () => {
    const err = await run(process.execPath, [built]).then(
      () => null,
      (e: { code: number; stderr: string }) => e,
    );
    expect(err?.code).toBe(2);
    expect(err?.stderr.trim()).toBe(
      'tenderline: usage: tenderline squeeze [options] [--json] (--help lists them)',
    );
  }, 30_000);
});
