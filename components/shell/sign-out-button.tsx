'use client';

import { signOut } from 'next-auth/react';

export function SignOutButton() {
  return (
    <button
      type="button"
      onClick={() => signOut({ callbackUrl: '/sign-in' })}
      className="rounded-md px-2 py-1 text-sm text-leaf-50 hover:bg-leaf-900"
    >
      Sign out
    </button>
  );
}
