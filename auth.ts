import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { attemptSignIn } from '@/lib/auth/sign-in';
import { signInContext } from '@/lib/auth/sign-in-context';
import {
  endSession,
  SESSION_MAX_AGE,
  sessionCookieName,
  sessionCookieOptions,
  startSession,
} from '@/lib/auth/session-store';
import { clientAddress } from '@/lib/http/client-address';
import { isHttpsApp } from '@/lib/http/origin';
import { signInSchema } from '@/lib/validation/users';

/** Thrown if anything asks next-auth to read a session: lib/auth/read-session.ts does that. */
class NotTheSessionRead extends Error {
  constructor() {
    super('Sessions are read by readSession() (lib/auth/read-session.ts), not by next-auth.');
    this.name = 'NotTheSessionRead';
  }
}

/**
 * next-auth checks the credentials and writes the cookie; the session itself is a database row
 * (lib/auth/session-store.ts). next-auth refuses its 'database' strategy with credentials, so
 * its 'jwt' strategy is kept and its token codec swapped: "encoding" at sign-in starts a
 * database session and returns its random token, "decoding" (which next-auth does only to sign
 * out) hands that token to the signOut event, which deletes the row.
 */
export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE },
  jwt: {
    maxAge: SESSION_MAX_AGE,
    encode: async ({ token }) => startSession(Number(token?.sub)),
    decode: async ({ token }) => (token ? { sid: token } : null),
  },
  useSecureCookies: isHttpsApp(),
  cookies: {
    sessionToken: { name: sessionCookieName(), options: sessionCookieOptions() },
  },
  pages: { signIn: '/sign-in', error: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: {
        email: { label: 'E-mail', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      async authorize(credentials, req) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) return null;
        const address = clientAddress(req?.headers ?? {});
        const outcome = await attemptSignIn(parsed.data.email, parsed.data.password, address);
        if (outcome.kind === 'limited') {
          const context = signInContext.getStore();
          if (context) context.limitedForMs = outcome.retryAfterMs;
          throw new Error('RateLimited');
        }
        if (outcome.kind === 'failed') return null;
        const { id, email, name, role } = outcome.user;
        return { id: String(id), email, name, role };
      },
    }),
  ],
  callbacks: {
    // Only sign-in runs this (with the user): its token is encoded into a new database session.
    async jwt({ token, user }) {
      if (!user) throw new NotTheSessionRead();
      return { sub: token.sub };
    },
  },
  events: {
    async signOut({ token }) {
      if (typeof token?.sid === 'string') await endSession(token.sid);
    },
  },
  logger: {
    error(code, metadata) {
      console.error(`[next-auth] ${code}`, metadata);
    },
    warn() {},
    debug() {},
  },
};
