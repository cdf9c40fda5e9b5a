import type { Role } from '@/lib/auth/roles';

declare module 'next-auth' {
  interface Session {
    user: { id: number; role: Role; name?: string | null; email?: string | null };
  }
}

declare module 'next-auth/jwt' {
  interface JWT {
    uid?: number;
    role?: string;
  }
}
