import { can, type Role } from '@/lib/auth/roles';

/**
 * Who sees unpublished Atlas material (draft articles, open revisions in search): the roles that
 * edit the property record. Everyone else sees what is published, and nothing more.
 */
export function seesDrafts(role: Role): boolean {
  return can(role, 'revisions:edit');
}
