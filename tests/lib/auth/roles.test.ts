import { describe, expect, it } from 'vitest';
import {
  can,
  CAPABILITIES,
  invitableRoles,
  ROLES,
  type Capability,
  type Role,
} from '@/lib/auth/roles';
import { areasFor } from '@/lib/navigation';

/**
 * The whole capability table restated by hand, role by role, from the product's role table
 * (buyer: reads guidance and published summaries; engineer: reads everything published with its
 * history, follows cultivars, runs checks, keeps assessments; editor: all an engineer can plus
 * drafts, reviews, lab-test and photo uploads and inviting buyers; admin: all of that plus everyone's assessments, users, invitations, mail and the audit log).
 */
const EXPECTED: Record<Role, Capability[]> = {
  buyer: ['account:manage-own', 'atlas:read', 'properties:read-published'],
  engineer: [
    'account:manage-own',
    'atlas:read',
    'properties:read-published',
    'properties:read-history',
    'properties:follow',
    'checks:run',
    'assessments:manage-own',
  ],
  editor: [
    'account:manage-own',
    'atlas:read',
    'properties:read-published',
    'properties:read-history',
    'properties:follow',
    'checks:run',
    'assessments:manage-own',
    'editor:use',
    'revisions:edit',
    'revisions:review',
    'lab-tests:upload',
    'images:upload',
    'invitations:create-buyer',
  ],
  admin: [
    'account:manage-own',
    'atlas:read',
    'properties:read-published',
    'properties:read-history',
    'properties:follow',
    'checks:run',
    'assessments:manage-own',
    'assessments:read-all',
    'editor:use',
    'revisions:edit',
    'revisions:review',
    'lab-tests:upload',
    'images:upload',
    'invitations:create-buyer',
    'invitations:create-any',
    'users:manage',
    'grade-rules:manage',
    'outbox:read',
    'audit:read',
  ],
};

describe('capability table', () => {
  it('names exactly the capabilities restated here', () => {
    expect([...CAPABILITIES].sort()).toEqual([...EXPECTED.admin].sort());
    expect([...ROLES].sort()).toEqual(['admin', 'buyer', 'editor', 'engineer']);
  });

  for (const role of ['admin', 'editor', 'engineer', 'buyer'] as const) {
    it(`gives the ${role} exactly its capabilities, and refuses the rest`, () => {
      for (const capability of EXPECTED.admin) {
        expect(can(role, capability), capability).toBe(EXPECTED[role].includes(capability));
      }
    });
  }

  it('lets editors invite buyers only, admins any role, the others nobody', () => {
    expect(invitableRoles('admin').sort()).toEqual(['admin', 'buyer', 'editor', 'engineer']);
    expect(invitableRoles('editor')).toEqual(['buyer']);
    expect(invitableRoles('engineer')).toEqual([]);
    expect(invitableRoles('buyer')).toEqual([]);
  });
});

describe('navigation', () => {
  it('shows each role only the areas it may enter', () => {
    const labels = (role: Role) => areasFor(role).map((a) => a.label);
    expect(labels('buyer')).toEqual(['Atlas', 'Properties']);
    expect(labels('engineer')).toEqual(['Atlas', 'Properties', 'Checks', 'Assessments']);
    expect(labels('editor')).toEqual(['Atlas', 'Properties', 'Checks', 'Assessments', 'Editor']);
    expect(labels('admin')).toEqual([
      'Atlas',
      'Properties',
      'Checks',
      'Assessments',
      'Editor',
      'Admin',
    ]);
  });
});
