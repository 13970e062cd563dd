import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { attemptSignIn } from '@/lib/auth/sign-in';
import { signInContext } from '@/lib/auth/sign-in-context';
import { getSessionUser } from '@/lib/auth/accounts';
import { endAllSessions } from '@/lib/data/users';
import { decodeSessionToken, encodeSessionToken, SESSION_MAX_AGE } from '@/lib/auth/session-token';
import { clientAddress } from '@/lib/http/client-address';
import { isHttpsApp } from '@/lib/http/origin';
import { signInSchema } from '@/lib/validation/users';

/** Thrown inside the jwt callback: next-auth then clears the cookie and reports no session. */
class SessionRevoked extends Error {
  constructor() {
    super('The session was ended (signed out, password changed, or account changed).');
    this.name = 'SessionRevoked';
  }
}

export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: SESSION_MAX_AGE },
  // The token expires with the session: next-auth would otherwise seal it for 30 days whatever
  // the cookie lifetime, so a copied cookie value would outlive the cookie.
  jwt: { encode: encodeSessionToken, decode: decodeSessionToken, maxAge: SESSION_MAX_AGE },
  useSecureCookies: isHttpsApp(),
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
        const { id, email, name, role, generation } = outcome.user;
        return { id: String(id), email, name, role, generation };
      },
    }),
  ],
  callbacks: {
    /**
     * At sign-in the token takes the user's generation; on every later read the user must still
     * be enabled and of that generation, so sign-out, a password change, disabling or a role
     * change ends the session everywhere, and /api/auth/session agrees with the server.
     */
    async jwt({ token, user }) {
      if (user) {
        token.role = user.role;
        token.gen = user.generation;
        return token;
      }
      const current = await getSessionUser(Number(token.sub));
      if (!current || current.generation !== token.gen) throw new SessionRevoked();
      token.role = current.role;
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.sub ?? '';
        session.user.role = token.role;
        session.user.generation = token.gen;
      }
      return session;
    },
  },
  events: {
    async signOut({ token }) {
      const id = Number(token?.sub);
      if (Number.isInteger(id) && id > 0) await endAllSessions(id, 'sign-out');
    },
  },
  logger: {
    error(code, metadata) {
      // A revoked session is expected, not a server fault.
      const cause = (metadata as { error?: unknown })?.error ?? metadata;
      if (code === 'JWT_SESSION_ERROR' && cause instanceof SessionRevoked) return;
      console.error(`[next-auth] ${code}`, metadata);
    },
    warn() {},
    debug() {},
  },
};
