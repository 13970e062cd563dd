import { vi } from 'vitest';

/**
 * Only next-auth's cookie reading is replaced: tests say who is signed in, and everything after
 * that (the database lookup of the user, the capability table, the handler) runs for real.
 */
export const sessionState: { userId: number | null; headers: Headers } = {
  userId: null,
  headers: new Headers(),
};

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

// Server actions read the request's headers (the cross-site check); tests set them.
vi.mock('next/headers', () => ({
  headers: vi.fn(async () => sessionState.headers),
  cookies: vi.fn(async () => ({ get: () => undefined, getAll: () => [] })),
}));

// Outside a Next request there is no cache to revalidate.
vi.mock('next/cache', () => ({ revalidatePath: vi.fn(), revalidateTag: vi.fn() }));

export function signInAs(userId: number | null) {
  sessionState.userId = userId;
}

/** The headers the next server action sees (for example a foreign Origin). */
export function actionHeaders(init: Record<string, string> = {}) {
  sessionState.headers = new Headers(init);
}
