import { vi } from 'vitest';
import { setRequestHeaders } from './request';

/**
 * Only the one session read (readSession) is replaced: tests say who is signed in, and everything
 * after that (the user read fresh from the database, the capability table, the handler) runs for
 * real. The stand-in is a live session row of that user; tests/integration/sessions.test.ts runs
 * the real cookie, session rows and their ending.
 */
export const sessionState: { userId: number | null } = { userId: null };

vi.mock('@/lib/auth/read-session', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/lib/auth/read-session')>();
  const { getActiveActor } = await import('@/lib/auth/accounts');
  return {
    ...actual,
    readSession: vi.fn(async () => {
      if (sessionState.userId == null) return null;
      // As the real read: a disabled or unknown account has no session.
      const user = await getActiveActor(sessionState.userId);
      return user && { user, expires: new Date(Date.now() + 8 * 3600e3) };
    }),
  };
});

// Outside a Next request there is no cache to revalidate.
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

export function signInAs(userId: number | null) {
  sessionState.userId = userId;
}

/** The headers the next server action or next-auth call sees (for example a foreign Origin). */
export const actionHeaders = setRequestHeaders;
