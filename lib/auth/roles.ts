/** The four roles of the product: site owner, lab editor, packhouse engineer, visiting buyer. */
export const ROLES = ['admin', 'editor', 'engineer', 'buyer'] as const;
export type Role = (typeof ROLES)[number];

export function isRole(value: unknown): value is Role {
  return typeof value === 'string' && (ROLES as readonly string[]).includes(value);
}

/**
 * What a role may do. This table is the only place that decides; pages, route handlers,
 * server actions and the data layer all ask `can(role, capability)`.
 */
const TABLE = {
  'account:manage-own': ['admin', 'editor', 'engineer', 'buyer'],
  'atlas:read': ['admin', 'editor', 'engineer', 'buyer'],
  'properties:read-published': ['admin', 'editor', 'engineer', 'buyer'],
  'properties:read-history': ['admin', 'editor', 'engineer'],
  'properties:follow': ['admin', 'editor', 'engineer'],
  'checks:run': ['admin', 'editor', 'engineer'],
  'assessments:manage-own': ['admin', 'editor', 'engineer'],
  'assessments:read-all': ['admin'],
  'editor:use': ['admin', 'editor'],
  'revisions:edit': ['admin', 'editor'],
  'revisions:review': ['admin', 'editor'],
  'lab-tests:upload': ['admin', 'editor'],
  'images:upload': ['admin', 'editor'],
  'invitations:create-buyer': ['admin', 'editor'],
  'invitations:create-any': ['admin'],
  'users:manage': ['admin'],
  'grade-rules:manage': ['admin'],
  'outbox:read': ['admin'],
  'audit:read': ['admin'],
} as const satisfies Record<string, readonly Role[]>;

export type Capability = keyof typeof TABLE;
export const CAPABILITIES = Object.keys(TABLE) as Capability[];

export function can(role: Role, capability: Capability): boolean {
  return (TABLE[capability] as readonly Role[]).includes(role);
}

/** Roles an inviter may hand out: editors invite buyers only; admins any role. */
export function invitableRoles(role: Role): Role[] {
  if (can(role, 'invitations:create-any')) return [...ROLES];
  if (can(role, 'invitations:create-buyer')) return ['buyer'];
  return [];
}
