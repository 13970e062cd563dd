'use client';

import Link from 'next/link';
import { useActionState } from 'react';
import { changePasswordAction } from '@/lib/actions/account';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

export function ChangePasswordForm() {
  const [state, action, pending] = useActionState(changePasswordAction, initialActionState);
  const errors = state.fieldErrors ?? {};
  return (
    <form action={action} className="max-w-sm space-y-4">
      <Field
        label="Current password"
        name="currentPassword"
        type="password"
        autoComplete="current-password"
        errors={errors.currentPassword}
      />
      <Field
        label="New password"
        name="newPassword"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        errors={errors.newPassword}
      />
      <Field
        label="Repeat new password"
        name="confirmPassword"
        type="password"
        autoComplete="new-password"
        errors={errors.confirmPassword}
      />
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
      {state.ok ? (
        <Link href="/sign-in" className="block text-sm font-medium text-leaf-700 underline">
          Sign in again
        </Link>
      ) : null}
      <Button type="submit" disabled={pending}>
        {pending ? 'Saving…' : 'Change password'}
      </Button>
    </form>
  );
}
