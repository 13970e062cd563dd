'use client';

import { useActionState } from 'react';
import { inviteAction } from '@/lib/actions/invitations';
import { initialActionState } from '@/lib/actions/initial-state';
import type { Role } from '@/lib/auth/roles';
import { Button } from '@/components/ui/button';
import { Field } from '@/components/ui/field';
import { FormMessage } from '@/components/ui/form-message';

/** Invite by e-mail, for admins (any role) and editors (buyers only): `roles` are those offered. */
export function InviteForm({ roles }: { roles: Role[] }) {
  const [state, action, pending] = useActionState(inviteAction, initialActionState);
  const errors = state.fieldErrors ?? {};
  const role = roles.find((r) => r === state.values?.role) ?? 'buyer';
  return (
    <form action={action} className="max-w-md space-y-3" data-testid="invite-form">
      <Field
        label="E-mail of the person to invite"
        name="email"
        type="email"
        maxLength={254}
        defaultValue={state.values?.email}
        errors={errors.email}
      />
      {roles.length > 1 ? (
        <div className="space-y-1">
          <label htmlFor="invite-role" className="block text-sm font-medium">
            Role
          </label>
          <select
            id="invite-role"
            name="role"
            key={role}
            defaultValue={role}
            className="rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm"
          >
            {roles.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
          <p className="text-xs text-red-700" aria-live="polite">
            {errors.role?.join(' ')}
          </p>
        </div>
      ) : (
        <input type="hidden" name="role" value={roles[0] ?? 'buyer'} />
      )}
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
      <Button type="submit" disabled={pending}>
        {pending ? 'Sending…' : 'Send invitation'}
      </Button>
    </form>
  );
}
