import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { authenticateUser } from '@/lib/users/authenticate-user';
import { resolveAuthSecret } from '@/lib/config/auth-secret';
import { isRole } from './roles';
import { recordAudit } from '@/lib/audit/record-audit';
import { redeemDeliveryLink } from '@/lib/delivery/redeem-delivery-link';

/** next-auth: e-mail and password against bcrypt hashes; JWT sessions carry user id and role. */
export const authOptions: NextAuthOptions = {
  secret: resolveAuthSecret(),
  session: { strategy: 'jwt', maxAge: 12 * 60 * 60 },
  pages: { signIn: '/signin' },
  providers: [
    CredentialsProvider({
      name: 'E-mail and password',
      credentials: {
        email: { label: 'E-mail', type: 'email' },
        password: { label: 'Password', type: 'password' },
      },
      async authorize(credentials) {
        if (!credentials?.email || !credentials.password) return null;
        const actor = await authenticateUser(credentials.email, credentials.password);
        if (!actor) {
          await recordAudit({ actor: null, action: 'sign-in-refused', details: { email: credentials.email.trim().toLowerCase().slice(0, 320) } });
          return null;
        }
        await recordAudit({ actor, action: 'sign-in' });
        return { id: String(actor.id), name: actor.name, email: actor.email, role: actor.role };
      },
    }),
    // A one-time delivery link from a release message signs its recipient in once (lib/delivery/redeem-delivery-link.ts).
    CredentialsProvider({
      id: 'delivery-link',
      name: 'Delivery link',
      credentials: { token: { label: 'Link token', type: 'text' } },
      async authorize(credentials) {
        if (!credentials?.token) return null;
        const actor = await redeemDeliveryLink(credentials.token);
        return actor ? { id: String(actor.id), name: actor.name, email: actor.email, role: actor.role } : null;
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        token.uid = Number(user.id);
        token.role = (user as { role?: string }).role;
      }
      return token;
    },
    async session({ session, token }) {
      if (session.user && typeof token.uid === 'number' && isRole(token.role)) {
        session.user.id = token.uid;
        session.user.role = token.role;
      }
      return session;
    },
  },
};
