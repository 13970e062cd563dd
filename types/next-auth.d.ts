import type { Role } from '@/lib/auth/roles';
import 'next-auth';
import 'next-auth/jwt';

declare module 'next-auth' {
  interface User {
    role: Role;
  }
  interface Session {
    user: { id: string; email: string; name: string; role: Role };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    role: Role;
  }
}
