/**
 * The model work that runs off the main thread: a pure function per task name, shared by the
 * worker threads (dist/compute-worker.mjs) and by the inline fallback used in tests.
 */
import { runComputeTask, type ComputeTask } from './task-table';

export type { ComputeTask };

export interface TaskMessage {
  task: ComputeTask;
  input: unknown;
  /** Receives `{ progress }` messages (0 … 1) while a long task runs. */
  port?: { postMessage(value: unknown): void };
}

/** The worker's entry: run one task, report progress on its port, return the answer. */
export default async function run(message: TaskMessage): Promise<unknown> {
  return runComputeTask(message.task, message.input, (progress) =>
    message.port?.postMessage({ progress }),
  );
}
