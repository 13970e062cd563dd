import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// The squeeze pipeline runs one way: stage NN (fem/squeeze/NN-name.ts) calls only stage NN − 1.
// Type-only imports of earlier stages are allowed (they call nothing).
const dir = path.resolve('fem/squeeze');
const stages = fs.readdirSync(dir).filter((f) => /^\d\d-[a-z-]+\.ts$/.test(f));

describe('squeeze pipeline', () => {
  it('has its stages numbered 01, 02, … without gaps', () => {
    expect(stages.map((f) => Number(f.slice(0, 2)))).toEqual(stages.map((_, i) => i + 1));
  });

  it.each(stages)('%s calls no stage but the one before it', (file) => {
    const text = fs.readFileSync(path.join(dir, file), 'utf8');
    const called = [...text.matchAll(/^import (?!type )[^;]*from '\.\/(\d\d)-[a-z-]+'/gm)].map(
      (m) => Number(m[1]),
    );
    const n = Number(file.slice(0, 2));
    expect(called.filter((k) => k !== n - 1)).toEqual([]);
  });
});
