import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// The squeeze pipeline runs one way: stage NN (fem/squeeze/NN-name.ts) calls only stage NN − 1.
// dependency-cruiser checks the imports (rules squeeze-stage-NN-calls-only-previous in
// .dependency-cruiser.cjs, run by `npm run lint`); those rules take "the stage before" from the
// files' order, so the numbering must have no gaps, which is checked here.
const dir = path.resolve('fem/squeeze');
const stages = fs.readdirSync(dir).filter((f) => /^\d\d-[a-z-]+\.ts$/.test(f));

describe('squeeze pipeline', () => {
  it('has its stages numbered 01, 02, … without gaps', () => {
    expect(stages.map((f) => Number(f.slice(0, 2)))).toEqual(stages.map((_, i) => i + 1));
  });
});
