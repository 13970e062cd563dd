/**
 * Builds the command line (scripts/fem.ts → dist/tenderline.mjs, the package's `tenderline` bin)
 * and the benchmark (scripts/bench.ts → dist/bench.mjs) to plain JavaScript with esbuild, so they
 * start without compiling TypeScript. Run by `npm run build:cli`, on install and before the bench.
 */
import { build } from 'esbuild';
import { chmod } from 'node:fs/promises';
import path from 'node:path';
import { pathToFileURL } from 'node:url';

const root = path.resolve(import.meta.dirname, '..');

/** Bundles both entry points (fem and ml-matrix included) into `outdir`; returns the CLI's path. */
export async function buildCli(outdir = path.join(root, 'dist')): Promise<string> {
  await build({
    entryPoints: {
      tenderline: path.join(root, 'scripts/fem.ts'),
      bench: path.join(root, 'scripts/bench.ts'),
      // The app's worker threads for the model (lib/compute/pool.ts loads it).
      'compute-worker': path.join(root, 'lib/checks/worker.ts'),
    },
    outdir,
    outExtension: { '.js': '.mjs' },
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    // The bundle is generated code: `eslint .` (which does not read .gitignore) leaves it alone.
    banner: { js: '#!/usr/bin/env node\n/* eslint-disable */' },
    legalComments: 'none',
    logLevel: 'warning',
  });
  const cli = path.join(outdir, 'tenderline.mjs');
  await chmod(cli, 0o755);
  return cli;
}

if (process.argv[1] && import.meta.url === pathToFileURL(process.argv[1]).href) {
  await buildCli();
}
