/**
 * The worker threads' module: one named export per task of ./tasks (piscina's `name` option
 * calls it). Built to dist/compute-worker.mjs for production; run from source through tsx
 * elsewhere. The `satisfies` line fails to compile when a task has no export here.
 */
import type { WorkerModule } from '@/lib/compute/task-table';
import { workerFunctions } from '@/lib/compute/worker-runtime';
import { TASKS, type CheckTasks } from './tasks';

const fns = workerFunctions(TASKS);

export const squeezeCheck = fns.squeezeCheck;
export const squeezeProbability = fns.squeezeProbability;

({ squeezeCheck, squeezeProbability }) satisfies WorkerModule<CheckTasks>;
