import { vi } from 'vitest';
import { setRequestHeaders } from './request';

/**
 * Only the session cookie reading is replaced (next-auth's for pages, ours for routes and actions): tests say who is signed in, and everything after
 * that (the database lookup of the user, the capability table, the handler) runs for real.
 * The mock stands for a freshly signed-in, valid token: it carries the user's current session
 * generation (tests/integration/sessions.test.ts runs the real token checks).
 */
export const sessionState: { userId: number | null } = { userId: null };

async function generationOf(): Promise<number> {
  const { db } = await import('@/lib/db');
  const row = await db('users').where({ id: sessionState.userId }).first();
  return Number(row?.session_generation ?? 0);
}

vi.mock('next-auth', async (importOriginal) => {
  const actual = await importOriginal<typeof import('next-auth')>();
  return {
    ...actual,
    getServerSession: vi.fn(async () =>
      sessionState.userId == null
        ? null
        : {
            user: { id: String(sessionState.userId), generation: await generationOf() },
            expires: new Date(Date.now() + 3600e3).toISOString(),
          },
    ),
  };
});

// The same stand-in for the cookie read of route handlers and server actions.
vi.mock('@/lib/auth/session-claims', async (importOriginal) => {
  const actual = await importOriginal<typeof import('@/lib/auth/session-claims')>();
  return {
    ...actual,
    readSessionClaims: vi.fn(async () =>
      sessionState.userId == null
        ? null
        : { id: sessionState.userId, generation: await generationOf() },
    ),
  };
});

// Outside a Next request there is no cache to revalidate.
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

export function signInAs(userId: number | null) {
  sessionState.userId = userId;
}

/** The headers the next server action sees (for example a foreign Origin). */
export const actionHeaders = setRequestHeaders;
