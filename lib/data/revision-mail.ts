import 'server-only';
import { db } from '@/lib/db';
import { toBool } from '@/lib/db-values';
import { can, isRole } from '@/lib/auth/roles';
import { appUrl, sendMail } from '@/lib/mail/send';
import { diffRevisions, type DiffValue } from '@/lib/properties/diff';
import { formatValueIn } from '@/lib/properties/format-units';
import { isUnitSystem, type UnitSystem } from '@/lib/units';
import { toDiffValue } from './follows';
import { valuesOf } from './property-rows';

/**
 * The workflow's e-mails: a submitted revision to every other user who may review it, a
 * published or returned one to its author. Each goes after the transition has committed, to
 * users who have not muted them (account page), with figures in the recipient's units; a failed
 * send is logged and never undoes the transition.
 */
interface Recipient {
  email: string;
  name: string;
  unit_system: string;
}

async function facts(id: number) {
  return db('property_revisions as r')
    .join('cultivars as c', 'c.id', 'r.cultivar_id')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .join('users as a', 'a.id', 'r.author_id')
    .leftJoin('users as v', 'v.id', 'r.reviewer_id')
    .leftJoin('property_revisions as b', 'b.id', 'r.based_on_id')
    .where('r.id', id)
    .first(
      'r.id',
      'r.number',
      'r.summary',
      'r.review_comment',
      'r.based_on_id',
      'r.author_id',
      'b.number as base_number',
      'c.name as cultivar',
      'm.name as commodity',
      'a.name as author_name',
      'a.email as author_email',
      'a.unit_system as author_units',
      'a.workflow_mail as author_mail',
      'a.disabled as author_disabled',
      'v.name as reviewer_name',
    );
}
type Facts = NonNullable<Awaited<ReturnType<typeof facts>>>;

/** What changed against the base, one line per value slot, in the reader's units. */
async function changeLines(f: Facts, system: UnitSystem): Promise<string[]> {
  const ids = f.based_on_id === null ? [f.id] : [f.based_on_id, f.id];
  const values = await valuesOf(ids);
  const before = f.based_on_id === null ? [] : values.get(f.based_on_id)!;
  const rows = diffRevisions(before.map(toDiffValue), values.get(f.id)!.map(toDiffValue)).filter(
    (r) => r.change !== 'same',
  );
  if (!rows.length) return ['- No value changed (sources or conditions may have).'];
  const list = (vs: DiffValue[]) => vs.map((v) => formatValueIn(v, system)).join('; ') || '—';
  return rows.map((r) => `- ${r.label}: ${list(r.before)} → ${list(r.after)}`);
}

const unitsOf = (r: { unit_system: string }): UnitSystem =>
  isUnitSystem(r.unit_system) ? r.unit_system : 'si';

const FOOTER = (why: string) => [
  '',
  `You receive this because ${why}. Mute workflow e-mails on your account page: ${appUrl()}/account`,
];

async function send(to: Recipient, subject: string, lines: string[]) {
  try {
    await sendMail({ to: to.email, subject, text: lines.join('\n') });
  } catch (error) {
    console.error(`workflow mail to ${to.email} failed`, error);
  }
}

/** Everyone who may review a revision, other than its author, with the mail left on. */
async function reviewers(authorId: number): Promise<Recipient[]> {
  const users = await db('users')
    .where({ disabled: false, workflow_mail: true })
    .whereNot('id', authorId)
    .select('email', 'name', 'role', 'unit_system');
  return users.filter((u) => isRole(u.role) && can(u.role, 'revisions:review'));
}

const titleOf = (f: Facts) => `${f.commodity}, ${f.cultivar}`;
const linkOf = (f: Facts) => `${appUrl()}/editor/revisions/${f.id}`;
const baseOf = (f: Facts) =>
  f.base_number === null ? 'an empty record' : `revision ${f.base_number}`;

export async function mailSubmitted(id: number): Promise<void> {
  const f = await facts(id);
  if (!f) return;
  for (const r of await reviewers(f.author_id)) {
    await send(r, `For review: ${titleOf(f)}, revision ${f.number}`, [
      `Hello ${r.name},`,
      '',
      `${f.author_name} has submitted revision ${f.number} of ${titleOf(f)} for review.`,
      ...(f.summary ? [`Their summary: ${f.summary}`] : []),
      '',
      `What changes against ${baseOf(f)}:`,
      ...(await changeLines(f, unitsOf(r))),
      '',
      `Review it (publish or return it with a comment): ${linkOf(f)}`,
      ...FOOTER('you may review revisions by other editors'),
    ]);
  }
}

/** The author, unless disabled or muted. */
function author(f: Facts): Recipient | null {
  if (toBool(f.author_disabled) || !toBool(f.author_mail)) return null;
  return { email: f.author_email, name: f.author_name, unit_system: f.author_units };
}

export async function mailPublished(id: number): Promise<void> {
  const f = await facts(id);
  const to = f && author(f);
  if (!f || !to) return;
  await send(to, `Published: ${titleOf(f)}, revision ${f.number}`, [
    `Hello ${to.name},`,
    '',
    `${f.reviewer_name ?? 'A reviewer'} has published your revision ${f.number} of ${titleOf(f)}.`,
    '',
    `What changed against ${baseOf(f)}:`,
    ...(await changeLines(f, unitsOf(to))),
    '',
    `The revision: ${linkOf(f)}`,
    ...FOOTER('you wrote this revision'),
  ]);
}

export async function mailReturned(id: number): Promise<void> {
  const f = await facts(id);
  const to = f && author(f);
  if (!f || !to) return;
  await send(to, `Returned to you: ${titleOf(f)}, revision ${f.number}`, [
    `Hello ${to.name},`,
    '',
    `${f.reviewer_name ?? 'A reviewer'} has returned your revision ${f.number} of ${titleOf(f)} with this comment:`,
    '',
    ...String(f.review_comment ?? '')
      .split('\n')
      .map((line) => `> ${line}`),
    '',
    `Your changes against ${baseOf(f)}, as submitted:`,
    ...(await changeLines(f, unitsOf(to))),
    '',
    `Edit it and submit it again: ${linkOf(f)}`,
    ...FOOTER('you wrote this revision'),
  ]);
}
