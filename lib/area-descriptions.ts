import { can, type Capability, type Role } from '@/lib/auth/roles';

/** One sentence of an area's description, shown only to roles that have its capability. */
interface Part {
  text: string;
  capability?: Capability;
}

/**
 * What each area holds, worded per role from the capability table: a card never promises what
 * the reader's role cannot use (a buyer's Properties card says nothing of drafts or history).
 */
const AREA_PARTS: Record<string, Part[]> = {
  '/atlas': [
    {
      text: 'One handling article per commodity: anatomy and bruise behaviour, harvest and ripeness, guidance per line stage, cautions and sources, beside the live live values panel of each cultivar.',
    },
  ],
  '/properties': [
    {
      text: 'Published, sourced property values per cultivar: Young’s modulus (MPa), Poisson’s ratio, density (kg/m³), size (mm), bruise threshold (kPa) and failure stress (kPa).',
    },
    {
      text: 'Drafts, revision history and diffs between revisions sit beside each value.',
      capability: 'editor:use',
    },
  ],
  '/checks': [
    {
      text: 'Squeeze, drop and stack checks: contact pressure (kPa) from the reduced-stiffness squeeze model and Hertz closed forms, compared with the bruise threshold as a bruise margin.',
      capability: 'checks:run',
    },
  ],
  '/assessments': [
    {
      text: 'Your saved checks, each pinned to the property revision it used, with printable reports, PDF/CSV export and a re-run offer when newer data is published.',
      capability: 'assessments:manage-own',
    },
  ],
  '/editor': [
    {
      text: 'Draft property revisions with sources, lab-test uploads (plate compression) that fit an apparent modulus, photos, and review of other editors’ drafts.',
      capability: 'editor:use',
    },
    { text: 'Invite buyers by e-mail.', capability: 'invitations:create-buyer' },
  ],
  '/admin': [
    {
      text: 'Users and roles, invitations, the mail outbox and the audit log of every write.',
      capability: 'users:manage',
    },
  ],
};

/** The description of an area for this role, or '' when the role may use none of it. */
export function areaDescription(href: string, role: Role): string {
  return (AREA_PARTS[href] ?? [])
    .filter((part) => !part.capability || can(role, part.capability))
    .map((part) => part.text)
    .join(' ');
}
