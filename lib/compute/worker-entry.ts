// The bundle entry of dist/compute-worker.mjs: every task registered, then the runner.
import os from 'node:os';
import { isMainThread } from 'node:worker_threads';
import './register-tasks';

/**
 * The model threads yield to the server's main thread: on Linux the nice value belongs to each
 * thread, and setpriority(2) with id 0 sets the calling thread's, so a worker at nice 10 (or
 * TENDERLINE_COMPUTE_NICE, 0–19) gives way whenever the main thread, which answers requests and
 * serves pages, needs the core. Elsewhere, or where it is refused, the worker keeps the normal
 * priority.
 */
const nice = Number(process.env.TENDERLINE_COMPUTE_NICE ?? 10);
if (
  !isMainThread &&
  os.platform() === 'linux' &&
  Number.isInteger(nice) &&
  nice > 0 &&
  nice <= 19
) {
  try {
    os.setPriority(0, Math.max(os.getPriority(0), nice));
  } catch {
    // not permitted here: run at the normal priority
  }
}

export { default } from './tasks';
