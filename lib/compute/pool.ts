import { MessageChannel } from 'node:worker_threads';
import { Piscina } from 'piscina';
import { AbortedError } from '@/lib/errors';
import type { Progress, TaskAnswer, TaskInput, TaskTable } from './task-table';
import { unwrap, type Outcome } from './wire';

export interface PoolOptions<T extends TaskTable> {
  /** The built worker module, or how to build it (once, on the first task). */
  filename: string | (() => Promise<string>);
  threads: number;
  /** Runs the tasks on the calling thread instead of in workers (tests that ask for it). */
  inline?: T;
}

export interface RunOptions {
  onProgress?: Progress;
  /** Aborting it drops a queued task, or stops the thread running it. */
  signal?: AbortSignal;
  /**
   * Tasks with the same key go to the same thread while it is free, so a thread's in-memory
   * cache (the condensed unit bodies of the model) serves them instead of being rebuilt by each.
   */
  affinity?: string;
}

/** FNV-1a hash of a string, as a whole number ≥ 0. */
function hash(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) h = Math.imul(h ^ text.charCodeAt(i), 0x01000193);
  return h >>> 0;
}

/**
 * Model work off the main thread. One single-thread piscina pool per thread, so a task can be
 * sent to the thread whose cache holds its body (see `lane`).
 */
export class ComputePool<T extends TaskTable> {
  private lanes: Piscina[] = [];
  private ready: Promise<Piscina[]> | null = null;
  private readonly busy: number[];
  private readonly inline?: T;

  constructor(private readonly options: PoolOptions<T>) {
    this.inline = options.inline;
    this.busy = Array.from({ length: Math.max(1, options.threads) }, () => 0);
  }

  private start(): Promise<Piscina[]> {
    this.ready ??= (async () => {
      const f = this.options.filename;
      const filename = typeof f === 'string' ? f : await f();
      this.lanes = this.busy.map(
        () => new Piscina({ filename, minThreads: 0, maxThreads: 1, idleTimeout: 60_000 }),
      );
      return this.lanes;
    })();
    return this.ready;
  }

  /**
   * The key's own thread while it is no busier than any other (its cache serves the task);
   * otherwise the least busy thread, so a burst of one key spreads over every core instead of
   * queueing on one.
   */
  private lane(affinity: string | undefined): number {
    const least = Math.min(...this.busy);
    const own = affinity === undefined ? -1 : hash(affinity) % this.busy.length;
    if (own >= 0 && this.busy[own] === least) return own;
    return this.busy.indexOf(least);
  }

  /** Run task `name`; a refusal of the model comes back as its typed error. */
  async run<K extends keyof T & string>(
    name: K,
    input: TaskInput<T, K>,
    options: RunOptions = {},
  ): Promise<TaskAnswer<T, K>> {
    if (options.signal?.aborted) throw new AbortedError();
    if (this.inline) {
      const progress = options.onProgress ?? (() => {});
      return (await this.inline[name](input, progress)) as TaskAnswer<T, K>;
    }
    const lanes = await this.start();
    const i = this.lane(options.affinity);
    this.busy[i]++;
    // A progress channel only when someone listens: making and transferring one costs the main
    // thread about half a millisecond a task.
    const channel = options.onProgress ? new MessageChannel() : null;
    channel?.port1.on('message', (m: { progress?: number }) => {
      if (typeof m.progress === 'number') options.onProgress?.(m.progress);
    });
    try {
      const outcome = (await lanes[i].run(
        { input, ...(channel && { port: channel.port2 }) },
        {
          name,
          signal: options.signal ?? null,
          ...(channel && { transferList: [channel.port2] }),
        },
      )) as Outcome<TaskAnswer<T, K>>;
      return unwrap(outcome);
    } catch (error) {
      if (options.signal?.aborted) throw new AbortedError();
      throw error;
    } finally {
      this.busy[i]--;
      channel?.port1.close();
    }
  }

  /** Stops every thread (tests, shutdown). */
  async close(): Promise<void> {
    await Promise.all(this.lanes.map((l) => l.close({ force: true })));
  }
}
