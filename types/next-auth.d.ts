import type { Role } from '@/lib/auth/roles';
import 'next-auth';
import 'next-auth/jwt';

declare module 'next-auth' {
  interface User {
    role: Role;
    generation: number;
  }
  interface Session {
    user: { id: string; email: string; name: string; role: Role; generation: number };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    role: Role;
    /** The user's session generation at sign-in; a bumped generation ends this session. */
    gen: number;
  }
}
