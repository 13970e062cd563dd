'use client';

import { useActionState } from 'react';
import { updateUserAction } from '@/lib/actions/users';
import { initialActionState } from '@/lib/actions/initial-state';
import { ROLES, type Role } from '@/lib/auth/roles';
import { Button } from '@/components/ui/button';

interface Props {
  user: { id: number; email: string; name: string; role: Role; disabled: boolean };
  isSelf: boolean;
}

/** One user's row: role select and an enable/disable toggle, each a server action. */
export function UserRowForm({ user, isSelf }: Props) {
  const [state, action, pending] = useActionState(updateUserAction, initialActionState);
  return (
    <tr className="border-t border-stone-200 align-top" data-testid={`user-row-${user.email}`}>
      <td className="px-3 py-2">
        <div className="font-medium">{user.name}</div>
        <div className="text-xs text-stone-500">{user.email}</div>
      </td>
      <td className="px-3 py-2">
        <form action={action} className="flex items-center gap-2">
          <input type="hidden" name="userId" value={user.id} />
          <select
            name="role"
            defaultValue={user.role}
            aria-label={`Role of ${user.email}`}
            disabled={isSelf}
            className="rounded-md border border-stone-300 bg-white px-2 py-1 text-sm"
          >
            {ROLES.map((r) => (
              <option key={r} value={r}>
                {r}
              </option>
            ))}
          </select>
          <Button type="submit" variant="secondary" disabled={pending || isSelf}>
            Save role
          </Button>
        </form>
      </td>
      <td className="px-3 py-2">
        <form action={action} className="flex items-center gap-2">
          <input type="hidden" name="userId" value={user.id} />
          <input type="hidden" name="disabled" value={user.disabled ? 'false' : 'true'} />
          <span className={user.disabled ? 'text-red-700' : 'text-leaf-700'}>
            {user.disabled ? 'disabled' : 'active'}
          </span>
          <Button
            type="submit"
            variant={user.disabled ? 'secondary' : 'danger'}
            disabled={pending || isSelf}
          >
            {user.disabled ? 'Enable' : 'Disable'}
          </Button>
        </form>
        <p
          aria-live="polite"
          className={`mt-1 text-xs ${state.ok ? 'text-leaf-700' : 'text-red-700'}`}
        >
          {state.message}
        </p>
      </td>
    </tr>
  );
}
