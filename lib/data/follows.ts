import 'server-only';
import { db } from '@/lib/db';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { diffRevisions, formatValue, type DiffValue } from '@/lib/properties/diff';
import { appUrl, sendMail } from '@/lib/mail/send';
import { recordAudit } from '@/lib/audit-trail';
import type { RevisionValue } from '@/lib/properties/records';
import { cultivarIdBySlug } from './cultivars';
import { valuesOf } from './property-rows';

export async function isFollowing(actor: Actor, slug: string): Promise<boolean> {
  assertCan(actor, 'properties:follow');
  const cultivar = await cultivarIdBySlug(slug);
  return Boolean(
    await db('follows').where({ user_id: actor.id, cultivar_id: cultivar.id }).first(),
  );
}

/** Follow (or stop following) a cultivar: e-mailed when a revision of it is published. */
export async function setFollowing(actor: Actor, slug: string, follow: boolean): Promise<boolean> {
  assertCan(actor, 'properties:follow');
  const cultivar = await cultivarIdBySlug(slug);
  await db.transaction(async (trx) => {
    const key = { user_id: actor.id, cultivar_id: cultivar.id };
    if (follow)
      await trx('follows')
        .insert({ ...key, created_at: new Date() })
        .onConflict(['user_id', 'cultivar_id'])
        .ignore();
    else await trx('follows').where(key).delete();
    await recordAudit(trx, {
      actorId: actor.id,
      action: follow ? 'cultivar.follow' : 'cultivar.unfollow',
      entity: 'cultivar',
      entityId: cultivar.id,
    });
  });
  return follow;
}

export const toDiffValue = (v: RevisionValue): DiffValue => ({
  quantity: v.quantity,
  variant: v.variant,
  value: v.value,
  unit: v.unit,
  low: v.low,
  high: v.high,
  sd: v.sd,
  sourceKey: v.source?.key ?? null,
});

/** The changed values as lines of plain text for the e-mail. */
function changeLines(before: RevisionValue[], after: RevisionValue[]): string[] {
  const rows = diffRevisions(before.map(toDiffValue), after.map(toDiffValue)).filter(
    (r) => r.change !== 'same',
  );
  if (!rows.length) return ['No value changed (sources or conditions may have).'];
  const list = (vs: DiffValue[]) => vs.map(formatValue).join('; ') || '—';
  return rows.map((r) => `- ${r.label}: ${list(r.before)} → ${list(r.after)}`);
}

/** After a publish has committed: e-mail every follower what changed. A failed send is logged. */
export async function notifyFollowers(published: {
  id: number;
  cultivarId: number;
  number: number;
  base: number | null;
}) {
  const cultivar = await db('cultivars as c')
    .join('commodities as m', 'm.id', 'c.commodity_id')
    .where('c.id', published.cultivarId)
    .select('c.slug', 'c.name', 'm.name as commodity')
    .first();
  const followers = await db('follows as f')
    .join('users as u', 'u.id', 'f.user_id')
    .where('f.cultivar_id', published.cultivarId)
    .andWhere('u.disabled', false)
    .select('u.email', 'u.name');
  if (!followers.length) return;
  const ids = published.base === null ? [published.id] : [published.base, published.id];
  const values = await valuesOf(ids);
  const lines = changeLines(
    published.base === null ? [] : values.get(published.base)!,
    values.get(published.id)!,
  );
  const title = `${cultivar.commodity}, ${cultivar.name}`;
  for (const f of followers) {
    try {
      await sendMail({
        to: f.email,
        subject: `Revised property data: ${title} (revision ${published.number})`,
        text: [
          `Hello ${f.name},`,
          '',
          `Revision ${published.number} of the property data for ${title} has been published.`,
          '',
          'What changed:',
          ...lines,
          '',
          `Values, sources and the full comparison: ${appUrl()}/properties/${cultivar.slug}`,
          '',
          'You receive this because you follow this cultivar. Unfollow it on the same page.',
        ].join('\n'),
      });
    } catch (error) {
      console.error(`follower mail to ${f.email} failed`, error);
    }
  }
}
