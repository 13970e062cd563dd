import { withAuth } from 'next-auth/middleware';

/**
 * First, cheap layer: signed-out visitors to any page go to /sign-in. API routes pass through
 * and answer 401 themselves; every page, handler and action checks the role again on the server.
 */
export default withAuth({
  pages: { signIn: '/sign-in' },
  callbacks: {
    authorized: ({ token, req }) => req.nextUrl.pathname.startsWith('/api/') || Boolean(token),
  },
});

export const config = {
  matcher: ['/((?!api/auth|sign-in|invite|_next/static|_next/image|favicon.ico|fonts/).*)'],
};
