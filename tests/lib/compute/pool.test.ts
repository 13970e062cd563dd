import { beforeAll, describe, expect, it } from 'vitest';
import os from 'node:os';
import { isMainThread } from 'node:worker_threads';

const mainNice = os.getPriority(0);
import { buildCli } from '@/scripts/build-cli';

describe('compute pool', () => {
  beforeAll(async () => {
    await buildCli(); // writes dist/compute-worker.mjs, which the pool loads
  }, 60_000);

  it('runs a task in a worker thread and returns its answer', async () => {
    expect(isMainThread).toBe(true);
    delete process.env.TENDERLINE_INLINE_COMPUTE;
    const { runTask } = await import('@/lib/compute/pool');
    expect(await runTask('echo', { margin: 1.5 })).toMatchObject({
      input: { margin: 1.5 },
      mainThread: false,
    });
  });

  it.runIf(process.platform === 'linux')(
    'runs the model at nice 10 and leaves the main thread at its own priority',
    async () => {
      const { runTask } = await import('@/lib/compute/pool');
      const answer = await runTask<{ nice: number }>('echo', {});
      // The default of TENDERLINE_COMPUTE_NICE (never below the process own nice); the nice
      // value is per thread on Linux.
      expect(answer.nice).toBe(Math.max(mainNice, 10));
      expect(os.getPriority(0)).toBe(mainNice);
    },
  );

  it('refuses an unknown task with its name', async () => {
    const { runTask } = await import('@/lib/compute/pool');
    await expect(runTask('no-such-task', {})).rejects.toThrow(/unknown compute task no-such-task/);
  });
});
