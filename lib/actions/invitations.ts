'use server';

import { revalidatePath } from 'next/cache';
import { cookies } from 'next/headers';
import { redirect } from 'next/navigation';
import { signInThisBrowser } from '@/lib/auth/browser-session';
import { requireActor } from '@/lib/auth/session';
import { resendInvitation, revokeInvitation } from '@/lib/data/invitation-admin';
import { acceptInvitation, createInvitation, INVITATION_DAYS } from '@/lib/data/invitations';
import { LINK_COOKIE, linkCookieOptions } from '@/lib/invitations/link-cookie';
import { formObject } from '@/lib/validation/form';
import { invitationIdFormSchema } from '@/lib/validation/invitations';
import { parseInput } from '@/lib/validation/parse';
import { runAction, type ActionState } from './state';

/** The pages that list open invitations. */
function refreshLists() {
  revalidatePath('/admin/users');
  revalidatePath('/editor');
}

/** Put typed values back after an error, so the form does not lose them (never passwords). */
function keepValues(state: ActionState, values: Record<string, string>): ActionState {
  return state.ok ? state : { ...state, values };
}

export async function inviteAction(_prev: ActionState, form: FormData): Promise<ActionState> {
  const values = formObject(form);
  const state = await runAction(async () => {
    const actor = await requireActor('invitations:create-buyer');
    const invitation = await createInvitation(actor, values);
    refreshLists();
    const replaced = invitation.replaced.length ? ' The earlier invitation was replaced.' : '';
    return `Invitation e-mailed to ${invitation.email}; the link works once for ${INVITATION_DAYS} days.${replaced}`;
  });
  return keepValues(state, { email: values.email ?? '', role: values.role ?? '' });
}

/** Withdraw an open invitation ("invitationId"). */
export async function revokeInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('invitations:create-buyer');
    const { invitationId } = parseInput(invitationIdFormSchema, formObject(form));
    const invitation = await revokeInvitation(actor, invitationId);
    refreshLists();
    return `Invitation to ${invitation.email} revoked; its link no longer works.`;
  });
}

/** Send an invitation again with a new link ("invitationId"); the old link stops working. */
export async function resendInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  return runAction(async () => {
    const actor = await requireActor('invitations:create-buyer');
    const { invitationId } = parseInput(invitationIdFormSchema, formObject(form));
    const invitation = await resendInvitation(actor, invitationId);
    refreshLists();
    return `A new link was e-mailed to ${invitation.email}; the earlier link no longer works.`;
  });
}

/**
 * Public: the invitation link's form. The token travels in a hidden field. Accepting signs this
 * browser in (lib/auth/browser-session.ts) and opens the home page; the link's cookie is cleared.
 */
export async function acceptInvitationAction(
  _prev: ActionState,
  form: FormData,
): Promise<ActionState> {
  const values = formObject(form);
  let signedIn = false;
  const state = await runAction(async () => {
    const result = await acceptInvitation(values.token, values);
    try {
      await signInThisBrowser({ id: result.userId, email: result.email }, 'invitation');
      signedIn = true;
    } catch (error) {
      // The account stands either way; the sign-in page still opens it.
      console.error('[invitation] the new account could not be signed in', error);
    }
    (await cookies()).set(LINK_COOKIE, '', { ...linkCookieOptions(), maxAge: 0 });
    return signedIn
      ? `Your account ${result.email} is ready and you are signed in.`
      : `Your account ${result.email} is ready. Sign in with your new password.`;
  });
  // Straight into the product, signed in: no second sign-in right after choosing the password.
  if (state.ok && signedIn) redirect('/');
  return keepValues(state, { name: values.name ?? '' });
}
