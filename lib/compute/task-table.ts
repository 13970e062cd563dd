/**
 * The contract between the code that asks for model work and the worker threads that do it.
 * A task table maps a task name to a pure function (input, progress) → answer; the worker module
 * exports one named function per task (piscina's `name` option picks it), and the same table
 * runs inline where worker threads are switched off.
 */
import type { Outcome } from './wire';

/** Reports the fraction of a long task that is done, 0 … 1. */
export type Progress = (fraction: number) => void;

// `any` in the constraint only: every concrete table keeps its own input and answer types.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type TaskTable = Record<string, (input: any, progress: Progress) => unknown>;

export type TaskInput<T extends TaskTable, K extends keyof T> = Parameters<T[K]>[0];
export type TaskAnswer<T extends TaskTable, K extends keyof T> = Awaited<ReturnType<T[K]>>;

/** What a worker function receives: the input, and a port for `{ progress }` messages. */
export interface TaskMessage<I> {
  input: I;
  port?: { postMessage(value: unknown): void };
}

/** The worker module's shape for a table: one named function per task, answering an outcome. */
export type WorkerModule<T extends TaskTable> = {
  [K in keyof T]: (message: TaskMessage<TaskInput<T, K>>) => Promise<Outcome<TaskAnswer<T, K>>>;
};
