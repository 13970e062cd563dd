import { vi } from 'vitest';

/**
 * Only next-auth's cookie reading is replaced: tests say who is signed in, and everything after
 * that (the database lookup of the user, the capability table, the handler) runs for real.
 */
export const sessionState: { userId: number | null } = { userId: null };

vi.mock('next-auth', async (importOriginal) => {
  const actual = await importOriginal<typeof import('next-auth')>();
  return {
    ...actual,
    getServerSession: vi.fn(async () =>
      sessionState.userId == null
        ? null
        : {
            user: { id: String(sessionState.userId) },
            expires: new Date(Date.now() + 3600e3).toISOString(),
          },
    ),
  };
});

// Outside a Next request there is no cache to revalidate.
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

export function signInAs(userId: number | null) {
  sessionState.userId = userId;
}
