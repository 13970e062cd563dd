/**
 * The model work of every check that runs off the main thread: pure functions of plain data,
 * shared by the worker threads (lib/checks/worker.ts) and the inline mode of tests.
 */
import type { TaskTable } from '@/lib/compute/task-table';
import { probabilityTask, squeezeCheckTask } from './squeeze/compute';

export const TASKS = {
  squeezeCheck: squeezeCheckTask,
  squeezeProbability: probabilityTask,
} satisfies TaskTable;

export type CheckTasks = typeof TASKS;
