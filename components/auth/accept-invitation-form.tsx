'use client';

import Link from 'next/link';
import { useActionState } from 'react';
import { acceptInvitationAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

export function AcceptInvitationForm({ token, email }: { token: string; email: string }) {
  const [state, action, pending] = useActionState(acceptInvitationAction, initialActionState);
  const errors = state.fieldErrors ?? {};
  if (state.ok) {
    return (
      <div className="space-y-3">
        <FormMessage tone="success" message={state.message} />
        <Link href="/sign-in" className="text-sm font-medium text-leaf-700 underline">
          Go to sign-in
        </Link>
      </div>
    );
  }
  return (
    <form action={action} className="space-y-4">
      <input type="hidden" name="token" value={token} />
      <p className="text-sm text-stone-600 wrap-anywhere">
        Account for <strong>{email}</strong>
      </p>
      <Field
        label="Your name"
        name="name"
        autoComplete="name"
        maxLength={100}
        defaultValue={state.values?.name}
        errors={errors.name}
      />
      <Field
        label="Password"
        name="password"
        type="password"
        autoComplete="new-password"
        hint="At least 10 characters."
        errors={errors.password}
      />
      <Field
        label="Repeat password"
        name="confirmPassword"
        type="password"
        autoComplete="new-password"
        errors={errors.confirmPassword}
      />
      <FormMessage tone="error" message={state.message} />
      <Button type="submit" disabled={pending} className="w-full">
        {pending ? 'Creating account…' : 'Create account'}
      </Button>
    </form>
  );
}
