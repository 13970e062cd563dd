import type { AuditRow } from '@/lib/data/audit-reader';

type Detail = Record<string, unknown>;

/** The stored detail as an object; text that is not a JSON object gives none. */
function parse(detail: string | null): Detail {
  if (!detail) return {};
  try {
    const value: unknown = JSON.parse(detail);
    return value && typeof value === 'object' && !Array.isArray(value) ? (value as Detail) : {};
  } catch {
    return {};
  }
}

const text = (v: unknown) => (typeof v === 'string' || typeof v === 'number' ? String(v) : '');
const quoted = (v: unknown) => (text(v) ? ` “${text(v)}”` : '');

/** Each action in a few words, as the filter lists it. */
export const ACTION_LABELS: Record<string, string> = {
  'sign-in.success': 'Signed in',
  'sign-in.failure': 'Sign-in refused',
  'sign-in.locked': 'Sign-in locked',
  'sign-in.unlock': 'Sign-in lock cleared',
  'session.end-all': 'Signed out everywhere',
  'user.update': 'Account changed',
  'user.password': 'Password changed',
  'user.units': 'Units chosen',
  'user.workflow-mail': 'Revision e-mails switched',
  'invitation.create': 'Invitation sent',
  'invitation.resend': 'Invitation sent again',
  'invitation.revoke': 'Invitation withdrawn',
  'invitation.accept': 'Invitation accepted',
  'revision.draft': 'Draft started',
  'revision.edit': 'Draft edited',
  'revision.import': 'Values imported',
  'revision.submit': 'Sent for review',
  'revision.return': 'Returned to its author',
  'revision.publish': 'Published',
  'revision.rebase': 'Draft rebased',
  'revision.resolve': 'Rebase conflict decided',
  'revision.discard': 'Draft discarded',
  'compression-test.upload': 'Compression test uploaded',
  'compression-test.draft': 'Draft from a compression test',
  'relaxation-test.upload': 'Relaxation test uploaded',
  'relaxation-test.draft': 'Draft from a relaxation test',
  'source.create': 'Source added',
  'image.upload': 'Photo uploaded',
  'grade-rule.create': 'Grade rule added',
  'assessment.create': 'Assessment saved',
  'assessment.rerun': 'Assessment re-run',
  'cultivar.follow': 'Cultivar followed',
  'cultivar.unfollow': 'Cultivar no longer followed',
};

/** An action this list does not know, in words all the same: `photo.delete` → "Photo delete". */
export function actionLabel(action: string): string {
  const known = ACTION_LABELS[action];
  if (known) return known;
  const words = action.replace(/[._-]+/g, ' ').trim();
  return words.charAt(0).toUpperCase() + words.slice(1);
}

const REFUSALS: Record<string, string> = {
  'unknown-account': 'no such account',
  'wrong-password': 'wrong password',
  disabled: 'account disabled',
};

/** What happened, in a sentence, with what the entry recorded about itself. */
function what(action: string, d: Detail): string {
  switch (action) {
    case 'sign-in.success':
      return d.via === 'invitation' ? 'Signed in on accepting an invitation' : 'Signed in';
    case 'sign-in.failure':
      return `Sign-in as ${text(d.email)} refused (${REFUSALS[text(d.reason)] ?? 'refused'})`;
    case 'sign-in.locked':
      return `Sign-in as ${text(d.email)} locked after repeated failures`;
    case 'sign-in.unlock':
      return `Cleared the sign-in lock of ${text(d.email)}`;
    case 'session.end-all':
      return 'Ended every session of the account';
    case 'user.update': {
      const before = (d.before ?? {}) as Detail;
      const change = (d.change ?? {}) as Detail;
      const parts: string[] = [];
      if (change.role && change.role !== before.role) {
        parts.push(`role from ${text(before.role)} to ${text(change.role)}`);
      }
      if (change.disabled === true) parts.push('disabled the account');
      if (change.disabled === false && before.disabled === true) parts.push('enabled the account');
      return parts.length ? `Changed the account: ${parts.join(', ')}` : 'Changed the account';
    }
    case 'user.units':
      return d.unitSystem === 'us' ? 'Chose US customary units' : 'Chose SI units';
    case 'invitation.create':
      return `Invited ${text(d.email)} as ${text(d.role)}${Array.isArray(d.replaced) && d.replaced.length ? ', replacing an earlier invitation' : ''}`;
    case 'invitation.resend':
      return `Sent ${text(d.email)} a new invitation link; the earlier one stopped working`;
    case 'invitation.revoke':
      return text(d.email)
        ? `Withdrew the invitation of ${text(d.email)}`
        : 'Withdrew an invitation';
    case 'invitation.accept':
      return 'Accepted an invitation and created the account';
    case 'revision.edit':
      return `Edited a draft (${text(d.values)} values)`;
    case 'revision.import':
      return `Imported ${text(d.imported)} values into a draft`;
    case 'revision.return':
      return `Returned a revision to its author${d.comment ? ':' : ''}${quoted(d.comment)}`;
    case 'revision.discard':
      return `Discarded a draft${d.reason ? ':' : ''}${quoted(d.reason)}`;
    case 'compression-test.upload':
    case 'relaxation-test.upload':
      return `${actionLabel(action)}: ${text(d.file)}${d.rows ? `, ${text(d.rows)} readings` : ''}`;
    case 'image.upload':
      return d.demo ? 'Stored a demo photo' : 'Uploaded a photo';
    default:
      return actionLabel(action);
  }
}

const ENTITY_WORDS: Record<string, string> = {
  revision: 'a revision',
  user: 'an account',
  'sign-in': 'an account',
  invitation: 'an invitation',
  cultivar: 'a cultivar',
  assessment: 'an assessment',
  compression_test: 'a compression test',
  relaxation_test: 'a relaxation test',
  image: 'a photo',
  source: 'a source',
  grade_rule: 'a grade rule',
};

/** One entry in words: who, what, and which record by name (never a raw id or JSON). */
export function describeAudit(row: AuditRow): { who: string; what: string; record: string } {
  const d = parse(row.detail);
  const who = row.actorName
    ? row.actorName
    : text(d.email)
      ? `Not signed in (${text(d.email)})`
      : 'Not signed in';
  const record =
    row.record ??
    (row.entityId == null
      ? '—'
      : `${ENTITY_WORDS[row.entity] ?? 'a record'} no longer in the database`);
  return { who, what: what(row.action, d), record };
}
