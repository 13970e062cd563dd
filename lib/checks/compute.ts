import 'server-only';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { buildWorker } from '@/lib/compute/build-worker';
import { ComputePool } from '@/lib/compute/pool';
import { TASKS, type CheckTasks } from './tasks';

/**
 * The checks' worker threads. Production (`next start`) runs the bundle that `npm ci` and
 * `npm run build:cli` write to dist/; anywhere else (`next dev`, the test legs) the worker is
 * bundled from this source on first use, so it is never older than the code. TENDERLINE_INLINE_COMPUTE=1 runs
 * the tasks on the calling thread (unit tests that spy on the model).
 */
const globalForPool = globalThis as unknown as { tenderlineChecks?: ComputePool<CheckTasks> };

/** Worker threads: TENDERLINE_COMPUTE_THREADS when set (a whole number ≥ 1), else one per core. */
function threads(): number {
  const set = Number(process.env.TENDERLINE_COMPUTE_THREADS);
  return Number.isInteger(set) && set >= 1 ? set : Math.max(1, os.availableParallelism());
}

function workerFile(): string | (() => Promise<string>) {
  const built = path.join(process.cwd(), 'dist', 'compute-worker.mjs');
  const wantBuilt =
    process.env.TENDERLINE_COMPUTE_WORKER === 'dist' ||
    (process.env.NODE_ENV === 'production' && process.env.TENDERLINE_COMPUTE_WORKER !== 'source');
  if (wantBuilt) {
    if (!fs.existsSync(built))
      throw new Error(`${built} is missing: run \`npm run build:cli\` (npm ci does).`);
    return built;
  }
  return () => buildWorker(path.join(process.cwd(), 'lib', 'checks', 'worker.ts'));
}

/** The one pool of the process (kept across hot reloads in development). */
export function checkPool(): ComputePool<CheckTasks> {
  if (globalForPool.tenderlineChecks) return globalForPool.tenderlineChecks;
  const inline = process.env.TENDERLINE_INLINE_COMPUTE === '1';
  globalForPool.tenderlineChecks = new ComputePool<CheckTasks>({
    filename: inline ? '' : workerFile(),
    threads: threads(),
    ...(inline && { inline: TASKS }),
  });
  return globalForPool.tenderlineChecks;
}
