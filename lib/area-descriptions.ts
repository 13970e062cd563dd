/** What each area holds, for the home page and the area pages until their issues fill them. */
export const AREA_DESCRIPTIONS: Record<string, string> = {
  '/atlas':
    'One handling article per commodity: anatomy and bruise behaviour, harvest and ripeness, guidance per line stage, cautions and sources, beside the live property card of each cultivar.',
  '/properties':
    'The sourced property database: Young’s modulus (MPa), Poisson’s ratio, density (kg/m³), size (mm), bruise threshold (kPa) and failure stress per cultivar, with revision history, diffs and CSV export.',
  '/checks':
    'Squeeze, drop and stack checks: contact pressure (kPa) from the reduced-stiffness squeeze model and Hertz closed forms, compared with the bruise threshold as a bruise margin.',
  '/assessments':
    'Saved checks that pin the property revision they used, with printable reports, PDF/CSV export and a re-run offer when newer data is published.',
  '/editor':
    'Draft property revisions with sources, compression-test uploads that fit an apparent modulus, photos, review of other editors’ drafts, and buyer invitations.',
  '/admin': 'Users and roles, invitations, the mail outbox and the audit log of every write.',
};
