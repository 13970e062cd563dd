import { describe, expect, it } from 'vitest';
import { revisionValueSchema } from '@/lib/validation/revisions';

const base = { quantity: 'diameter', variant: '', sourceKey: 'shahabasi-1979' };
const issues = (r: { success: boolean; error?: { issues: { message: string }[] } }) =>
  r.error?.issues.map((i) => i.message) ?? [];

describe('a draft value typed with a decimal comma', () => {
  it('reads "20,5" as 20.5, and the spread too', () => {
    const r = revisionValueSchema.safeParse({
      ...base,
      value: '20,5',
      low: '18,25',
      high: '22,75',
    });
    expect(r.success, JSON.stringify(issues(r))).toBe(true);
    expect(r.data?.value).toBe(20.5);
    expect(r.data?.low).toBe(18.25);
    expect(r.data?.high).toBe(22.75);
  });

  it('refuses "1,234,5" with the reason, and words as before', () => {
    const twice = revisionValueSchema.safeParse({ ...base, value: '1,234,5' });
    expect(issues(twice)).toContain(
      'The value: "1,234,5" has more than one comma; a number takes one decimal mark (e.g. 1234.5).',
    );
    const words = revisionValueSchema.safeParse({ ...base, value: 'eighty' });
    expect(issues(words)).toContain('The value must be a number.');
  });
});
