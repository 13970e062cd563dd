'use client';

import { useActionState } from 'react';
import { updateUserAction } from '@/lib/actions/users';
import { initialActionState } from '@/lib/actions/initial-state';
import { ROLES, type Role } from '@/lib/auth/roles';
import { Button } from '@/components/ui/button';
import { USER_COLUMNS } from './user-columns';

interface Props {
  user: { id: number; email: string; name: string; role: Role; disabled: boolean };
  isSelf: boolean;
}

/** One user: role select and an enable/disable toggle, each a server action. */
export function UserRowForm({ user, isSelf }: Props) {
  const [state, action, pending] = useActionState(updateUserAction, initialActionState);
  const locked = isSelf ? 'You cannot change your own role or account here.' : undefined;
  return (
    <li
      className={`grid gap-2 border-t border-stone-200 px-3 py-3 text-sm first:border-t-0 md:items-center md:gap-3 md:first:border-t ${USER_COLUMNS}`}
      data-testid={`user-row-${user.email}`}
    >
      <div className="min-w-0">
        <div className="font-medium">{user.name}</div>
        <div className="text-xs text-stone-500 wrap-anywhere">{user.email}</div>
      </div>
      <form action={action} className="flex flex-wrap items-center gap-2">
        <input type="hidden" name="userId" value={user.id} />
        <select
          name="role"
          defaultValue={user.role}
          aria-label={`Role of ${user.email}`}
          disabled={isSelf}
          title={locked}
          className="rounded-md border border-stone-300 bg-white px-2 py-1 text-sm disabled:cursor-not-allowed disabled:bg-stone-100 disabled:text-stone-500"
        >
          {ROLES.map((r) => (
            <option key={r} value={r}>
              {r}
            </option>
          ))}
        </select>
        <Button type="submit" variant="secondary" disabled={pending || isSelf} title={locked}>
          Save role
        </Button>
      </form>
      <div>
        <form action={action} className="flex flex-wrap items-center gap-2">
          <input type="hidden" name="userId" value={user.id} />
          <input type="hidden" name="disabled" value={user.disabled ? 'false' : 'true'} />
          <span className={user.disabled ? 'text-red-700' : 'text-leaf-700'}>
            {user.disabled ? 'disabled' : 'active'}
          </span>
          <Button
            type="submit"
            variant={user.disabled ? 'secondary' : 'danger'}
            disabled={pending || isSelf}
            title={locked}
          >
            {user.disabled ? 'Enable' : 'Disable'}
          </Button>
        </form>
        {isSelf ? <p className="mt-1 text-xs text-stone-500">Your own account</p> : null}
        <p
          aria-live="polite"
          className={`mt-1 text-xs ${state.ok ? 'text-leaf-700' : 'text-red-700'}`}
        >
          {state.message}
        </p>
      </div>
    </li>
  );
}
