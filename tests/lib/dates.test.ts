import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { formatDate, formatDateTime } from '@/lib/dates';

describe('the one date format', () => {
  it('shows a calendar date as YYYY-MM-DD and a moment to the minute in UTC', () => {
    expect(formatDate('2026-12-02T14:05:59.999Z')).toBe('2026-12-02');
    expect(formatDateTime('2026-12-02T14:05:59.999Z')).toBe('2026-12-02 14:05 UTC');
    expect(formatDateTime(new Date(Date.UTC(2026, 0, 9, 3, 7)))).toBe('2026-01-09 03:07 UTC');
    expect(formatDate('2026-01-15')).toBe('2026-01-15');
  });

  it('reads a time with an offset in UTC', () => {
    expect(formatDateTime('2026-12-02T23:30:00-02:00')).toBe('2026-12-03 01:30 UTC');
  });

  it('shows a dash, never "Invalid Date" or NaN, for no date or a bad one', () => {
    for (const bad of [null, undefined, '', 'not a date', Number.NaN]) {
      expect(formatDate(bad)).toBe('—');
      expect(formatDateTime(bad)).toBe('—');
    }
  });
});

function files(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    return statSync(full).isDirectory() ? files(full) : /\.tsx?$/.test(name) ? [full] : [];
  });
}

describe('dates on pages, e-mails and exports', () => {
  // Other ways of printing a date; every place that shows one goes through lib/dates.ts.
  const OTHER_FORMATS = [
    /\.toUTCString\(/,
    /\.toLocaleDateString\(/,
    /\.toLocaleTimeString\(/,
    /Intl\.DateTimeFormat/,
    /\.replace\('T', ' '\)/,
    /\.slice\(11, 1[69]\)/,
    /At\??\.slice\(0, 10\)/,
  ];
  // Folders other sessions are changing as this is written; they move to lib/dates.ts with them.
  const ELSEWHERE = [
    'lib/checks/',
    'components/checks/',
    'lib/search/',
    'lib/data/revisions',
    'app/(app)/editor/revisions/',
    'lib/lab-tests/',
    'components/properties/',
    'lib/reports/',
  ];

  it('are printed by lib/dates.ts alone', () => {
    const root = path.resolve(import.meta.dirname, '../..');
    const hits = ['app', 'components', 'lib']
      .flatMap((dir) => files(path.join(root, dir)))
      .map((file) => path.relative(root, file))
      .filter((file) => file !== 'lib/dates.ts' && !ELSEWHERE.some((d) => file.startsWith(d)))
      .filter((file) =>
        OTHER_FORMATS.some((re) => re.test(readFileSync(path.join(root, file), 'utf8'))),
      );
    expect(hits).toEqual([]);
  });
});
