import 'server-only';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import './register-tasks';
import { runComputeTask, type Progress } from './task-table';

/**
 * The model is CPU-bound: solves run in worker threads so the server keeps answering pages and
 * other requests while they compute. One thread per core (at least one); requests queue beyond.
 * Without the built worker (development without `npm run build:cli`, or unit tests) the task
 * runs inline on the calling thread.
 */
const WORKER = path.join(process.cwd(), 'dist', 'compute-worker.mjs');
const globalForPool = globalThis as unknown as { tenderlinePool?: Piscina | null };

/** Worker threads: TENDERLINE_COMPUTE_THREADS when set (a whole number ≥ 1), else one per core. */
function threads(): number {
  const set = Number(process.env.TENDERLINE_COMPUTE_THREADS);
  return Number.isInteger(set) && set >= 1 ? set : Math.max(1, os.availableParallelism());
}

function pool(): Piscina | null {
  if (globalForPool.tenderlinePool !== undefined) return globalForPool.tenderlinePool;
  const inline = process.env.TENDERLINE_INLINE_COMPUTE === '1' || !fs.existsSync(WORKER);
  globalForPool.tenderlinePool = inline
    ? null
    : new Piscina({
        filename: WORKER,
        maxThreads: threads(),
        idleTimeout: 60_000,
      });
  return globalForPool.tenderlinePool;
}

/** Run a task off the main thread (or inline), with progress from 0 to 1. */
export async function runTask<T>(task: string, input: unknown, onProgress?: Progress): Promise<T> {
  const p = pool();
  if (!p) return (await runComputeTask(task, input, onProgress ?? (() => {}))) as T;
  // A progress channel only when someone listens: making and transferring one costs the main
  // thread about half a millisecond a task.
  if (!onProgress) return (await p.run({ task, input })) as T;
  const { port1, port2 } = new MessageChannel();
  port1.on('message', (m: { progress?: number }) => {
    if (typeof m.progress === 'number') onProgress(m.progress);
  });
  try {
    return (await p.run({ task, input, port: port2 }, { transferList: [port2] })) as T;
  } finally {
    port1.close();
  }
}
