import { beforeAll, describe, expect, it } from 'vitest';
import { isMainThread } from 'node:worker_threads';
import { buildCli } from '@/scripts/build-cli';

describe('compute pool', () => {
  beforeAll(async () => {
    await buildCli(); // writes dist/compute-worker.mjs, which the pool loads
  }, 60_000);

  it('runs a task in a worker thread and returns its answer', async () => {
    expect(isMainThread).toBe(true);
    delete process.env.TENDERLINE_INLINE_COMPUTE;
    const { runTask } = await import('@/lib/compute/pool');
    expect(await runTask('echo', { margin: 1.5 })).toEqual({
      input: { margin: 1.5 },
      mainThread: false,
    });
  });

  it('refuses an unknown task with its name', async () => {
    const { runTask } = await import('@/lib/compute/pool');
    await expect(runTask('no-such-task', {})).rejects.toThrow(/unknown compute task no-such-task/);
  });
});
