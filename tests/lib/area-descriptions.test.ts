import { describe, expect, it } from 'vitest';
import { areaDescription } from '@/lib/area-descriptions';

describe('area cards are worded from what the role may do', () => {
  it('promises a buyer neither drafts, revision history nor CSV export on Properties', () => {
    const text = areaDescription('/properties', 'buyer');
    expect(text).toContain('Young’s modulus (MPa)');
    expect(text).not.toMatch(/revision history|drafts|CSV/i);
  });

  it('tells an editor about drafts and history, and about inviting buyers', () => {
    expect(areaDescription('/properties', 'editor')).toMatch(/revision history/);
    expect(areaDescription('/editor', 'editor')).toMatch(/Invite buyers/);
  });

  it('says nothing of an area the role cannot use', () => {
    expect(areaDescription('/checks', 'buyer')).toBe('');
    expect(areaDescription('/admin', 'editor')).toBe('');
  });
});
