'use client';

import { formatDateTime } from '@/lib/dates';
import { useActionState } from 'react';
import { clearSignInLockAction } from '@/lib/actions/users';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

export interface LockRow {
  userId: number;
  email: string;
  scope: 'address' | 'account';
  address?: string;
  untilIso: string;
}

function ClearLock({ userId, email }: { userId: number; email: string }) {
  const [state, action, pending] = useActionState(clearSignInLockAction, initialActionState);
  return (
    <form action={action} className="space-y-1">
      <input type="hidden" name="userId" value={userId} />
      <Button
        type="submit"
        variant="secondary"
        disabled={pending}
        aria-label={`Clear the sign-in lock of ${email}`}
      >
        {pending ? 'Clearing…' : 'Clear lock'}
      </Button>
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
    </form>
  );
}

/** Accounts that too many failed sign-ins have locked, and the admin's way to let the owner back in. */
export function SignInLocks({ locks }: { locks: LockRow[] }) {
  if (!locks.length) {
    return (
      <p className="text-sm text-stone-600" data-testid="sign-in-locks-empty">
        No account is locked by failed sign-ins.
      </p>
    );
  }
  return (
    <ul
      className="divide-y divide-stone-200 rounded-lg border border-stone-200 bg-white"
      data-testid="sign-in-locks"
    >
      {locks.map((l) => (
        <li
          key={`${l.email}|${l.address ?? ''}`}
          className="flex flex-wrap items-start justify-between gap-3 p-3 text-sm"
        >
          <div className="min-w-0">
            <div className="font-medium [overflow-wrap:anywhere]">{l.email}</div>
            <div className="text-xs text-stone-600">
              {l.scope === 'account'
                ? 'Locked from every address (account-wide ceiling)'
                : `Locked from ${l.address}`}{' '}
              until <time dateTime={l.untilIso}>{formatDateTime(l.untilIso)}</time>
            </div>
          </div>
          <ClearLock userId={l.userId} email={l.email} />
        </li>
      ))}
    </ul>
  );
}
