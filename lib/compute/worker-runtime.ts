/**
 * Worker-thread side of the boundary: wraps a task table's functions as the named exports
 * piscina calls. A typed model error comes back as an outcome (see ./wire); any other error is
 * a fault and is thrown as usual.
 */
import { lowerWorkerPriority } from './priority';
import type { TaskMessage, TaskTable, WorkerModule } from './task-table';
import { guarded } from './wire';

/** The worker module's exports for `table`; lowers the thread's priority once. */
export function workerFunctions<T extends TaskTable>(table: T): WorkerModule<T> {
  lowerWorkerPriority();
  const out: Record<string, (m: TaskMessage<unknown>) => Promise<unknown>> = {};
  for (const [name, task] of Object.entries(table)) {
    out[name] = (m) =>
      guarded(() => task(m.input, (progress) => m.port?.postMessage({ progress })));
  }
  return out as WorkerModule<T>;
}
