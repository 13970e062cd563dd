import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// Product rule: fem/ is pure TypeScript with no framework, database or I/O, so the numerical core
// runs the same in the web app, the CLI and the tests. Its imports (only its own files and
// ml-matrix) are checked by dependency-cruiser (rule fem-pure in .dependency-cruiser.cjs, run by
// `npm run lint`); what is not an import — the process and console globals, a require() call —
// is checked here.
function files(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('fem/ stays pure', () => {
  it('touches no process or console and calls no require()', () => {
    const offenders: string[] = [];
    for (const file of files(path.resolve('fem'))) {
      const text = fs.readFileSync(file, 'utf8');
      if (/\bprocess\.|\bconsole\.|require\(/.test(text))
        offenders.push(`${file}: process/console/require`);
    }
    expect(offenders).toEqual([]);
  });
});
