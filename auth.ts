import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { verifyCredentials } from '@/lib/data/users';
import {
  clearFailures,
  delayAfterFailure,
  lockedForMs,
  recordFailure,
  throttleKey,
} from '@/lib/auth/throttle';
import { signInSchema } from '@/lib/validation/users';

export { SIGN_IN_ERRORS } from '@/lib/auth/sign-in-messages';

export const authOptions: NextAuthOptions = {
  session: { strategy: 'jwt', maxAge: 8 * 3600 },
  pages: { signIn: '/sign-in', error: '/sign-in' },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: {
        email: { label: 'E-mail', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      async authorize(credentials) {
        const parsed = signInSchema.safeParse(credentials ?? {});
        if (!parsed.success) return null;
        const key = throttleKey(parsed.data.email);
        if ((await lockedForMs(key)) > 0) throw new Error('RateLimited');
        const actor = await verifyCredentials(parsed.data.email, parsed.data.password);
        if (!actor) {
          await recordFailure(key);
          const delay = await delayAfterFailure(key);
          await new Promise((resolve) => setTimeout(resolve, delay));
          return null;
        }
        await clearFailures(key);
        return { id: String(actor.id), email: actor.email, name: actor.name, role: actor.role };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) token.role = user.role;
      return token;
    },
    async session({ session, token }) {
      if (session.user) {
        session.user.id = token.sub ?? '';
        session.user.role = token.role;
      }
      return session;
    },
  },
};
