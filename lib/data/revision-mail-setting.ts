import 'server-only';
import { db } from '@/lib/db';
import { typed } from '@/lib/db-kysely';
import { toBool } from '@/lib/db-values';
import { assertCan, type Actor } from '@/lib/auth/actor';
import { recordAudit } from '@/lib/audit-trail';
import { parseInput } from '@/lib/validation/parse';
import { workflowMailSchema } from '@/lib/validation/workflow-mail';

/** Whether this user receives the revision workflow's e-mails (on unless muted). */
export async function getWorkflowMail(actor: Actor): Promise<boolean> {
  assertCan(actor, 'account:manage-own');
  const row = await typed()
    .selectFrom('users')
    .select('workflow_mail')
    .where('id', '=', actor.id)
    .executeTakeFirst();
  return row ? toBool(row.workflow_mail) : true;
}

/** Turn one's own workflow e-mails on or off: `{ workflowMail: 'on' | 'off' | boolean }`. */
export async function setWorkflowMail(actor: Actor, input: unknown): Promise<boolean> {
  assertCan(actor, 'account:manage-own');
  const { workflowMail } = parseInput(workflowMailSchema, input);
  await db.transaction(async (trx) => {
    await trx('users')
      .where({ id: actor.id })
      .update({ workflow_mail: workflowMail, updated_at: new Date() });
    await recordAudit(trx, {
      actorId: actor.id,
      action: 'user.workflow-mail',
      entity: 'user',
      entityId: actor.id,
      detail: { workflowMail },
    });
  });
  return workflowMail;
}
