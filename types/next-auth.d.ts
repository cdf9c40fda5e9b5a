import type { Role } from '@/lib/auth/roles';

declare module 'next-auth' {
  interface Session {
    user: { id: number; role: Role; name?: string | null; email?: string | null };
    /** The row in auth_sessions this browser's token names (lib/sessions). */
    sid?: string;
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid?: number;
    role?: string;
    /** Session id: a row in auth_sessions, checked on every request. */
    sid?: string;
  }
}
