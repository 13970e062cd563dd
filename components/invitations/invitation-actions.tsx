'use client';

import { useActionState } from 'react';
import { resendInvitationAction, revokeInvitationAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';

/** Resend and revoke for one open invitation, each a server action, with its own message. */
export function InvitationActions({ id, email }: { id: number; email: string }) {
  const [resent, resend, resending] = useActionState(resendInvitationAction, initialActionState);
  const [revoked, revoke, revoking] = useActionState(revokeInvitationAction, initialActionState);
  const last = revoked.status ? revoked : resent;
  const busy = resending || revoking;
  return (
    <div>
      <div className="flex flex-wrap gap-2">
        <form action={resend}>
          <input type="hidden" name="invitationId" value={id} />
          <Button
            type="submit"
            variant="secondary"
            disabled={busy}
            aria-label={`Resend to ${email}`}
          >
            {resending ? 'Sending…' : 'Resend'}
          </Button>
        </form>
        <form action={revoke}>
          <input type="hidden" name="invitationId" value={id} />
          <Button type="submit" variant="danger" disabled={busy} aria-label={`Revoke for ${email}`}>
            {revoking ? 'Revoking…' : 'Revoke'}
          </Button>
        </form>
      </div>
      <p
        aria-live="polite"
        className={`mt-1 text-xs ${last.ok ? 'text-leaf-700' : 'text-red-700'}`}
      >
        {last.message}
      </p>
    </div>
  );
}
