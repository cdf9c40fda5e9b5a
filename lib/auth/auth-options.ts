import type { NextAuthOptions } from 'next-auth';
import CredentialsProvider from 'next-auth/providers/credentials';
import { authenticateUser } from '@/lib/users/authenticate-user';
import { resolveAuthSecret } from '@/lib/config/auth-secret';
import { isRole } from './roles';
import { recordAudit } from '@/lib/audit/record-audit';
import { redeemDeliveryLink } from '@/lib/delivery/redeem-delivery-link';
import { clientAddress } from '@/lib/throttle/client-address';
import {
  assertPasswordAttemptAllowed,
  PasswordAttemptsRefused,
  recordPasswordFailure,
  recordPasswordSuccess,
} from '@/lib/throttle/password-attempts';
import { openSession } from '@/lib/sessions/open-session';
import { endSession } from '@/lib/sessions/end-sessions';
import { isSessionOpen, SessionEnded } from '@/lib/sessions/is-session-open';
import { readBrowserSession } from '@/lib/sessions/read-browser-session';
import { assertLinkAttemptAllowed, recordLinkFailure } from '@/lib/throttle/link-attempts';
import { readClaims } from '@/lib/delivery/link-token';

type SignedInUser = {
  id: string;
  name: string;
  email: string;
  role: string;
  via: 'password' | 'delivery-link';
  clientAddress: string;
};
type RequestHeaders = Record<string, string | string[] | undefined>;

/**
 * next-auth: e-mail and password against bcrypt hashes, throttled per account
 * and per client address (lib/throttle); JWT sessions carry user id, role and
 * a session id whose row (lib/sessions) is checked on every request, so
 * sign-out and revocation end a session before its token expires.
 * An error thrown by `authorize` reaches the sign-in page as its message.
 */
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
      async authorize(credentials, req): Promise<SignedInUser | null> {
        if (!credentials?.email || !credentials.password) return null;
        const attempt = {
          account: credentials.email,
          clientAddress: clientAddress((req?.headers ?? {}) as RequestHeaders),
        };
        const email = credentials.email.trim().toLowerCase().slice(0, 320);
        try {
          await assertPasswordAttemptAllowed(attempt);
        } catch (err) {
          if (err instanceof PasswordAttemptsRefused) {
            await recordAudit({
              actor: null,
              action: 'sign-in-throttled',
              details: {
                email,
                scope: err.scope,
                clientAddress: attempt.clientAddress,
                retryAt: err.retryAt.toISOString(),
              },
            });
          }
          throw err;
        }
        const actor = await authenticateUser(credentials.email, credentials.password);
        if (!actor) {
          await recordPasswordFailure(attempt);
          await recordAudit({
            actor: null,
            action: 'sign-in-refused',
            details: { email, clientAddress: attempt.clientAddress },
          });
          return null;
        }
        await recordPasswordSuccess(attempt);
        await recordAudit({ actor, action: 'sign-in' });
        return {
          id: String(actor.id),
          name: actor.name,
          email: actor.email,
          role: actor.role,
          via: 'password',
          clientAddress: attempt.clientAddress,
        };
      },
    }),
    // A one-time delivery link from a release message signs its recipient in once (lib/delivery/redeem-delivery-link.ts),
    // never over another person's session in the same browser.
    CredentialsProvider({
      id: 'delivery-link',
      name: 'Delivery link',
      credentials: { token: { label: 'Link token', type: 'text' } },
      async authorize(credentials, req): Promise<SignedInUser | null> {
        if (!credentials?.token) return null;
        const headers = (req?.headers ?? {}) as RequestHeaders;
        const attempt = {
          clientAddress: clientAddress(headers),
          userId: readClaims(credentials.token)?.userId ?? null,
        };
        await assertLinkAttemptAllowed(attempt);
        const signedIn = await readBrowserSession(headers);
        const actor = await redeemDeliveryLink(credentials.token, signedIn);
        if (!actor) {
          await recordLinkFailure(attempt);
          return null;
        }
        return {
          id: String(actor.id),
          name: actor.name,
          email: actor.email,
          role: actor.role,
          via: 'delivery-link',
          clientAddress: attempt.clientAddress,
        };
      },
    }),
  ],
  callbacks: {
    async jwt({ token, user }) {
      if (user) {
        const signedIn = user as unknown as SignedInUser;
        token.uid = Number(signedIn.id);
        token.role = signedIn.role;
        token.sid = await openSession(token.uid, signedIn.via, signedIn.clientAddress);
        return token;
      }
      // Every later read of the session (each request, /api/auth/session): an ended session makes next-auth
      // answer "no session" and clear the cookie, instead of renewing it.
      if (!(await isSessionOpen(token.sid, token.uid))) throw new SessionEnded();
      return token;
    },
    async session({ session, token }) {
      if (session.user && typeof token.uid === 'number' && isRole(token.role)) {
        session.user.id = token.uid;
        session.user.role = token.role;
        session.sid = token.sid;
      }
      return session;
    },
  },
  logger: {
    // An ended session is an expected answer, not a server error worth a stack trace.
    error(code, metadata) {
      if (code === 'JWT_SESSION_ERROR' && metadata instanceof SessionEnded) return;
      console.error(`[next-auth][error][${code}]`, metadata);
    },
  },
  events: {
    async signOut({ token }) {
      if (token?.sid && (await endSession(token.sid, 'sign-out')) && typeof token.uid === 'number') {
        await recordAudit({ actor: { id: token.uid, email: String(token.email ?? '') }, action: 'sign-out' });
      }
    },
  },
};
