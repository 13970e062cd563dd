import { NextResponse } from 'next/server';
import { requireActor } from '@/lib/auth/session';
import { getWorkflowMail, setWorkflowMail } from '@/lib/data/revision-mail-setting';
import { handle, readJson } from '@/lib/http/handler';

/** Whether the signed-in user receives the revision workflow's e-mails. */
export const GET = handle(async () => {
  const actor = await requireActor('account:manage-own');
  return NextResponse.json({ workflowMail: await getWorkflowMail(actor) });
});

/** `{ workflowMail: true | false }` (or "on" / "off"); anything else is a 400. */
export const PUT = handle(async (request) => {
  const actor = await requireActor('account:manage-own');
  return NextResponse.json({ workflowMail: await setWorkflowMail(actor, await readJson(request)) });
});
