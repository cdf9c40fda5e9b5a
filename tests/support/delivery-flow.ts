import { expect } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { Role } from '@/lib/auth/roles';

/** Helpers for delivery tests over HTTP: sign in demo roles, drive a new memo to a frozen revision. */

export const demoEmail = (role: Role) => DEMO_USERS.find((u) => u.role === role)!.email;

/** The demo reviewer's user id (other tests add reviewers to the shared server, so never take the first listed). */
export async function demoReviewerId(analyst: HttpSession): Promise<number> {
  const name = DEMO_USERS.find((u) => u.role === 'reviewer')!.name;
  const dir = await analyst.json<{ users: { id: number; name: string }[] }>('/api/users?role=reviewer');
  return dir.body.users.find((u) => u.name === name)!.id;
}

export async function signedIn(baseUrl: string, role: Role): Promise<HttpSession> {
  const s = new HttpSession(baseUrl);
  expect(await s.signIn(demoEmail(role), DEMO_PASSWORD)).toBe(true);
  return s;
}

type Moved = { memo: { id: number; status: string }; revision?: { letter: string; pdfSha256: string } };

/** A new memo from the SSO template, submitted, approved and frozen; returns its id and revision A's SHA-256. */
export async function frozenMemo(
  s: { analyst: HttpSession; reviewer: HttpSession; cm: HttpSession },
  title: string,
): Promise<{ memoId: number; sha256: string }> {
  const created = await s.analyst.json<{ id: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title, templateId: 'sso-design-rationale' }),
  });
  expect(created.status).toBe(201);
  const memoId = created.body.id;
  const reviewerId = await demoReviewerId(s.analyst);
  const move = (who: HttpSession, body: Record<string, unknown>) =>
    who.json<Moved>(`/api/memos/${memoId}/transitions`, { method: 'POST', body: JSON.stringify(body) });
  expect((await move(s.analyst, { action: 'submit', reviewerIds: [reviewerId] })).status).toBe(200);
  expect((await move(s.reviewer, { action: 'approve', note: 'Sound.', password: DEMO_PASSWORD })).status).toBe(200);
  const frozen = await move(s.cm, {
    action: 'freeze',
    changeSummary: 'First issue to the Northmere Basin Authority.',
    password: DEMO_PASSWORD,
  });
  expect(frozen.status).toBe(200);
  return { memoId, sha256: frozen.body.revision!.pdfSha256 };
}

/** Signs in through the `delivery-link` credentials provider; true when a session cookie was issued. */
export async function signInWithLink(s: HttpSession, token: string): Promise<boolean> {
  const csrf = await s.json<{ csrfToken: string }>('/api/auth/csrf');
  const form = new URLSearchParams({
    csrfToken: csrf.body.csrfToken,
    token,
    json: 'true',
    callbackUrl: `${s.baseUrl}/portal`,
  });
  await s.request('/api/auth/callback/delivery-link', {
    method: 'POST',
    body: form,
    headers: { 'content-type': 'application/x-www-form-urlencoded' },
  });
  const session = await s.json<{ user?: { email?: string } }>('/api/auth/session');
  return Boolean(session.body?.user?.email);
}

export const linkToken = (text: string | null | undefined): string =>
  /\/delivery\/([A-Za-z0-9_.-]+)/.exec(text ?? '')?.[1] ?? '';
