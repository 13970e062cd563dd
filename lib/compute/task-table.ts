import os from 'node:os';
import { isMainThread } from 'node:worker_threads';

/** Task name → pure function (input, progress) → answer. Filled in as checks move to workers. */
export type Progress = (fraction: number) => void;
type Task = (input: unknown, progress: Progress) => unknown;

const TASKS: Record<string, Task> = {
  /** A trivial task that proves the pool works end to end, where it ran and at what priority. */
  echo: (input) => ({ input, mainThread: isMainThread, nice: os.getPriority(0) }),
};

export type ComputeTask = string;

export function registerTask(name: string, task: Task): void {
  TASKS[name] = task;
}

export async function runComputeTask(name: string, input: unknown, progress: Progress) {
  const task = Object.hasOwn(TASKS, name) ? TASKS[name] : undefined;
  if (!task) throw new Error(`unknown compute task ${name}`);
  return task(input, progress);
}
