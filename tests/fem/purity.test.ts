import fs from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';

// Product rule: fem/ is pure TypeScript with no framework, database or I/O imports, so the
// numerical core runs the same in the web app, the CLI and the tests.
const ALLOWED = new Set(['ml-matrix']);

function files(dir: string): string[] {
  return fs.readdirSync(dir, { withFileTypes: true }).flatMap((e) => {
    const p = path.join(dir, e.name);
    return e.isDirectory() ? files(p) : p.endsWith('.ts') ? [p] : [];
  });
}

describe('fem/ stays pure', () => {
  it('imports only its own files and ml-matrix, and touches no process or console', () => {
    const offenders: string[] = [];
    for (const file of files(path.resolve('fem'))) {
      const text = fs.readFileSync(file, 'utf8');
      for (const m of text.matchAll(/(?:from|import)\s*\(?\s*'([^']+)'/g)) {
        if (!m[1].startsWith('.') && !ALLOWED.has(m[1])) offenders.push(`${file}: ${m[1]}`);
      }
      if (/\bprocess\.|\bconsole\.|require\(/.test(text))
        offenders.push(`${file}: process/console/require`);
    }
    expect(offenders).toEqual([]);
  });
});
