import os from 'node:os';
import path from 'node:path';
import { isMainThread } from 'node:worker_threads';
import { afterAll, describe, expect, it } from 'vitest';
import { FemConvergenceError, FemInputError } from '@/fem';
import { buildWorker } from '@/lib/compute/build-worker';
import { ComputePool } from '@/lib/compute/pool';
import { AbortedError } from '@/lib/errors';
import { FIXTURE_TASKS } from './fixture/tasks';

const mainNice = os.getPriority(0);
const pool = new ComputePool<typeof FIXTURE_TASKS>({
  filename: () => buildWorker(path.resolve('tests/lib/compute/fixture/worker.ts')),
  threads: 2,
});
afterAll(() => pool.close());

describe('compute pool (real worker threads)', () => {
  it('runs a named task in a worker thread and returns its plain answer', async () => {
    expect(isMainThread).toBe(true);
    const answer = await pool.run('where', { tag: 'a' });
    expect(answer).toMatchObject({ tag: 'a', mainThread: false });
    expect(answer.threadId).toBeGreaterThan(0);
  });

  it.runIf(process.platform === 'linux')(
    'runs the model at nice 10 and leaves the main thread at its own priority',
    async () => {
      const answer = await pool.run('where', { tag: 'nice' });
      // The default of TENDERLINE_COMPUTE_NICE (never below the process's own); nice is per
      // thread on Linux.
      expect(answer.nice).toBe(Math.max(mainNice, 10));
      expect(os.getPriority(0)).toBe(mainNice);
    },
  );

  it('keeps a model refusal typed across the boundary, with its field', async () => {
    // Before: worker_threads cloned the FemInputError into a plain Error, field lost → HTTP 500.
    const error = await pool.run('refuse', { field: 'travel' }).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(FemInputError);
    expect(error).toMatchObject({ field: 'travel', message: 'travel must be greater than zero' });
    await expect(pool.run('diverge', {})).rejects.toBeInstanceOf(FemConvergenceError);
  });

  it('lets a fault stay a fault (not disguised as a refusal)', async () => {
    const error = await pool.run('fault', {}).catch((e: unknown) => e);
    expect(error).toBeInstanceOf(Error);
    expect(error).not.toBeInstanceOf(FemInputError);
    expect((error as Error).message).toMatch(/a bug, not a refusal/);
  });

  it('reports progress from the worker', async () => {
    const seen: number[] = [];
    await pool.run('spin', { ms: 200 }, { onProgress: (f) => seen.push(f) });
    expect(seen.length).toBeGreaterThanOrEqual(5);
    expect(seen).toEqual([...seen].sort((a, b) => a - b));
  });

  it('stops an abandoned run: the abort rejects at once, not when the work would end', async () => {
    const controller = new AbortController();
    const started = Date.now();
    const run = pool.run('spin', { ms: 5000 }, { signal: controller.signal });
    setTimeout(() => controller.abort(), 100);
    await expect(run).rejects.toBeInstanceOf(AbortedError);
    // 5 s of work abandoned after 0.1 s: well under 2 s allows for a slow worker start.
    expect(Date.now() - started).toBeLessThan(2000);
    // The pool still answers after the stopped thread is replaced.
    expect(await pool.run('where', { tag: 'after' })).toMatchObject({ tag: 'after' });
  });

  it('sends tasks of one key to the same thread while it is free', async () => {
    const a = await pool.run('spin', { ms: 1 }, { affinity: 'apple|0.35' });
    const b = await pool.run('spin', { ms: 1 }, { affinity: 'apple|0.35' });
    const c = await pool.run('spin', { ms: 1 }, { affinity: 'apple|0.35' });
    expect(new Set([a.threadId, b.threadId, c.threadId]).size).toBe(1);
  });

  it('uses an idle thread when the key’s own is busy', async () => {
    const long = pool.run('spin', { ms: 400 }, { affinity: 'k' });
    const other = await pool.run('spin', { ms: 1 }, { affinity: 'k' });
    expect(other.threadId).not.toBe((await long).threadId);
  });

  it('spreads a burst of one key over every thread instead of queueing it on one', async () => {
    // Before: with every thread busy, all of one key's tasks queued on its own thread while the
    // other stood idle (five of six on one thread). Now each goes to the least busy thread.
    const runs = await Promise.all(
      Array.from({ length: 6 }, () => pool.run('spin', { ms: 50 }, { affinity: 'burst' })),
    );
    const perThread = new Map<number, number>();
    for (const r of runs) perThread.set(r.threadId, (perThread.get(r.threadId) ?? 0) + 1);
    expect([...perThread.values()].sort()).toEqual([3, 3]);
  });

  it('runs inline when asked, with the same typed refusals', async () => {
    const inline = new ComputePool({ filename: '', threads: 1, inline: FIXTURE_TASKS });
    expect(await inline.run('where', { tag: 'i' })).toMatchObject({ mainThread: true });
    await expect(inline.run('refuse', { field: 'modulus' })).rejects.toBeInstanceOf(FemInputError);
  });
});
