'use client';

import Link from 'next/link';
import { useActionState } from 'react';
import { signOutEverywhereAction } from '@/lib/actions/account';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** Ends every session of this account (a lost laptop, a shared screen). */
export function SignOutEverywhere() {
  const [state, action, pending] = useActionState(signOutEverywhereAction, initialActionState);
  return (
    <form action={action} className="max-w-sm space-y-3" data-testid="sign-out-everywhere">
      <p className="text-sm text-stone-600">
        Ends your sessions on every browser and device, this one included.
      </p>
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
      {state.ok ? (
        <Link href="/sign-in" className="text-sm font-medium text-leaf-700 underline">
          Sign in again
        </Link>
      ) : (
        <Button type="submit" variant="danger" disabled={pending}>
          {pending ? 'Signing out…' : 'Sign out everywhere'}
        </Button>
      )}
    </form>
  );
}
