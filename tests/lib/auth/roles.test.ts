import { describe, expect, it } from 'vitest';
import { areasFor, can, CAPABILITIES, invitableRoles, ROLES } from '@/lib/auth/roles';

// The role table of DESIGN.md ("Who uses it"), restated independently of lib/auth/roles.ts.
const EXPECTED: Record<string, string[]> = {
  buyer: ['account:manage-own', 'atlas:read', 'properties:read-published'],
  engineer: [
    'account:manage-own',
    'atlas:read',
    'properties:read-published',
    'checks:run',
    'assessments:manage-own',
  ],
};

describe('capability table', () => {
  it('gives buyers and engineers exactly what DESIGN.md says', () => {
    for (const role of ['buyer', 'engineer'] as const) {
      expect(CAPABILITIES.filter((c) => can(role, c)).sort()).toEqual([...EXPECTED[role]].sort());
    }
  });

  it('gives editors all an engineer can, plus editing and buyer invitations, but no admin', () => {
    for (const c of EXPECTED.engineer) expect(can('editor', c as never)).toBe(true);
    expect(can('editor', 'editor:use')).toBe(true);
    expect(can('editor', 'invitations:create-buyer')).toBe(true);
    expect(can('editor', 'invitations:create-any')).toBe(false);
    expect(can('editor', 'users:manage')).toBe(false);
    expect(can('editor', 'audit:read')).toBe(false);
  });

  it('gives admins everything', () => {
    for (const c of CAPABILITIES) expect(can('admin', c)).toBe(true);
  });

  it('shows each role only the areas it may enter', () => {
    expect(areasFor('buyer').map((a) => a.label)).toEqual(['Atlas', 'Properties']);
    expect(areasFor('admin')).toHaveLength(6);
    expect(invitableRoles('editor')).toEqual(['buyer']);
    expect(invitableRoles('admin')).toEqual([...ROLES]);
    expect(invitableRoles('engineer')).toEqual([]);
  });
});
