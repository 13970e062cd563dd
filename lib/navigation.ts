import { can, type Capability, type Role } from '@/lib/auth/roles';

/** The areas of the app shell and the capability each one needs. */
export const AREAS = [
  { href: '/atlas', label: 'Atlas', capability: 'atlas:read' },
  { href: '/properties', label: 'Properties', capability: 'properties:read-published' },
  { href: '/checks', label: 'Checks', capability: 'checks:run' },
  { href: '/assessments', label: 'Assessments', capability: 'assessments:manage-own' },
  { href: '/editor', label: 'Editor', capability: 'editor:use' },
  { href: '/admin', label: 'Admin', capability: 'users:manage' },
] as const satisfies readonly { href: string; label: string; capability: Capability }[];

export function areasFor(role: Role) {
  return AREAS.filter((area) => can(role, area.capability));
}
