import NextAuth from 'next-auth';
import { authOptions } from '@/lib/auth/auth-options';
import { withBodyLimit } from '@/lib/api/route-handler';

const handler = NextAuth(authOptions);

/** next-auth's forms (sign-in, sign-out) are a few hundred bytes; anything over 64 KiB is refused with a 413 before it is parsed. */
const AUTH_FORM_MAX_BYTES = 64 * 1024;

export { handler as GET };
export const POST = withBodyLimit(AUTH_FORM_MAX_BYTES, handler);
