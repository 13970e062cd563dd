import { formatDateTime } from '@/lib/dates';
import type { OpenInvitation } from '@/lib/data/invitation-admin';
import { InvitationActions } from './invitation-actions';

/**
 * Rows are keyed by address, not id: a resend replaces the row's invitation with a new one, and
 * the row (with its "new link sent" message) should stay. Two open rows for one address are rare
 * (two inviters at the same moment) and get a counter.
 */
function keyOf(list: OpenInvitation[], index: number): string {
  const email = list[index].email;
  const earlier = list.slice(0, index).filter((inv) => inv.email === email).length;
  return earlier ? `${email}#${earlier}` : email;
}

/** Open invitations with who sent them and when the link lapses; one card per row on phones. */
export function PendingInvitations({ invitations }: { invitations: OpenInvitation[] }) {
  if (invitations.length === 0) {
    return (
      <p className="text-sm text-stone-600" data-testid="pending-invitations-empty">
        No invitations are waiting to be accepted.
      </p>
    );
  }
  return (
    <div className="rounded-lg border border-stone-200 bg-white" data-testid="pending-invitations">
      <div className="hidden grid-cols-[2fr_1fr_1.5fr_1.5fr_auto] gap-3 bg-stone-100 px-3 py-2 text-xs uppercase tracking-wide text-stone-600 md:grid">
        <span>E-mail</span>
        <span>Role</span>
        <span>Invited by</span>
        <span>Link works until</span>
        <span className="w-40">Actions</span>
      </div>
      <ul>
        {invitations.map((inv, i) => (
          <li
            key={keyOf(invitations, i)}
            className="grid gap-1 border-t border-stone-200 px-3 py-3 text-sm first:border-t-0 md:grid-cols-[2fr_1fr_1.5fr_1.5fr_auto] md:items-start md:gap-3 md:first:border-t"
            data-testid={`invitation-row-${inv.email}`}
          >
            <span className="font-medium wrap-anywhere">{inv.email}</span>
            <span>
              <span className="text-xs text-stone-500 md:hidden">Role: </span>
              {inv.role}
            </span>
            <span className="wrap-anywhere">
              <span className="text-xs text-stone-500 md:hidden">Invited by </span>
              {inv.inviter.name}
            </span>
            <span className={inv.expired ? 'text-red-700' : undefined}>
              <span className="text-xs text-stone-500 md:hidden">
                {inv.expired ? 'Expired ' : 'Link works until '}
              </span>
              <span className="num text-xs">{formatDateTime(inv.expiresAt)}</span>
              {inv.expired ? <span className="hidden text-xs md:inline"> (expired)</span> : null}
            </span>
            <div className="mt-1 md:mt-0 md:w-40">
              <InvitationActions id={inv.id} email={inv.email} />
            </div>
          </li>
        ))}
      </ul>
    </div>
  );
}
