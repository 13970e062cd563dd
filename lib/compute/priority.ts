import os from 'node:os';
import { isMainThread } from 'node:worker_threads';

/**
 * The model threads yield to the server's main thread: on Linux the nice value belongs to each
 * thread, and setpriority(2) with id 0 sets the calling thread's, so a worker at nice 10 (or
 * TENDERLINE_COMPUTE_NICE, 0–19) gives way whenever the main thread, which answers requests and
 * serves pages, needs the core. Elsewhere, or where it is refused, the worker keeps the normal
 * priority. Called once when a worker thread loads its module.
 */
export function lowerWorkerPriority(): void {
  const nice = Number(process.env.TENDERLINE_COMPUTE_NICE ?? 10);
  if (isMainThread || os.platform() !== 'linux' || !Number.isInteger(nice)) return;
  if (nice <= 0 || nice > 19) return;
  try {
    os.setPriority(0, Math.max(os.getPriority(0), nice));
  } catch {
    // not permitted here: run at the normal priority
  }
}
