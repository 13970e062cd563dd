import os from 'node:os';
import path from 'node:path';

/**
 * Bundles a worker module (TypeScript, `@/` imports) into one ES module a worker thread can load.
 * `npm ci` writes the production bundle to dist/ (scripts/build-cli.ts); development and the
 * tests build from source with this on first use, so their workers never run an older copy.
 */
export async function buildWorker(entry: string, outfile?: string): Promise<string> {
  const { build } = await import('esbuild');
  const target =
    outfile ??
    path.join(
      os.tmpdir(),
      `tenderline-${process.pid}-${path.basename(path.dirname(entry))}-${path.basename(entry, '.ts')}.mjs`,
    );
  await build({
    entryPoints: [entry],
    outfile: target,
    bundle: true,
    platform: 'node',
    format: 'esm',
    target: 'node20',
    logLevel: 'warning',
    absWorkingDir: process.cwd(),
  });
  return target;
}
