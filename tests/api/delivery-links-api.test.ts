import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { HttpSession } from '../../scripts/support/http-session';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { demoEmail, frozenMemo, linkToken, signedIn, signInWithLink } from '../support/delivery-flow';
import { ANOTHER_PERSON_SIGNED_IN } from '@/lib/delivery/redeem-delivery-link';
import type { DeliveryRecord, ReleaseRecord } from '@/lib/delivery/delivery-record';
import type { OutboxDetail, OutboxSummary } from '@/lib/mail/list-outbox-messages';
import { LIMITS } from '@/lib/throttle/throttle-limits';

/**
 * Delivery links against a real app instance of this file's own: a link
 * never switches a browser that is signed in as someone else, and resending
 * a delivery voids the older unused link (README "Delivery", "Sessions").
 */

let app: AppServer;
let baseUrl = '';
let analyst: HttpSession, cm: HttpSession, admin: HttpSession;
let deliveryId = 0;

const latestLink = async (): Promise<string> => {
  const messages = (
    await admin.json<{ messages: OutboxSummary[] }>(`/api/outbox?to=${encodeURIComponent(demoEmail('customer'))}`)
  ).body.messages;
  return linkToken((await admin.json<OutboxDetail>(`/api/outbox/${messages[0].id}`)).body.text);
};
const whoIs = async (s: HttpSession) =>
  (await s.json<{ user?: { email: string } }>('/api/auth/session')).body?.user?.email ?? null;
const page = async (token: string, s?: HttpSession) =>
  s ? await (await s.request(`/delivery/${token}`)).text() : await (await fetch(`${baseUrl}/delivery/${token}`)).text();

beforeAll(async () => {
  app = await startAppServer();
  baseUrl = app.baseUrl;
  let reviewer: HttpSession;
  [analyst, reviewer, cm, admin] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager', 'admin'] as const).map((r) => signedIn(baseUrl, r)),
  );
  const { memoId } = await frozenMemo({ analyst, reviewer, cm }, 'TERNLIGHT-1 link trial');
  const samirId = (
    await cm.json<{ users: { id: number; name: string }[] }>('/api/users?role=customer')
  ).body.users.find((u) => u.name === 'Samir Dunmore')!.id;
  expect(
    (await cm.json(`/api/memos/${memoId}/distribution`, { method: 'POST', body: JSON.stringify({ userId: samirId }) }))
      .status,
  ).toBe(201);
  const release = await cm.json<ReleaseRecord>(`/api/memos/${memoId}/revisions/A/releases`, {
    method: 'POST',
    body: JSON.stringify({ recipientIds: [samirId], coverNote: 'For the Northmere board.' }),
  });
  expect(release.status).toBe(201);
  deliveryId = release.body.deliveries[0].id;
}, 300_000);
afterAll(() => app?.stop());

describe('delivery links', () => {
  it('with another person signed in, the page says so and signing in with the link is refused: the browser stays that person, the link unspent', async () => {
    const token = await latestLink();
    const browser = analyst.copy();
    const html = await page(token, browser);
    expect(html).toContain('Someone else is signed in here');
    expect(html).not.toContain('Open revision A');
    expect(await signInWithLink(browser, token)).toBe(true); // still signed in …
    expect(await whoIs(browser)).toBe(demoEmail('analyst')); // … as the analyst, not switched
    expect((await browser.json('/api/portal')).status).toBe(403);
    const trail = await admin.json<{ events: { details: { reason?: string } }[] }>(
      '/api/audit?action=delivery.link-refused',
    );
    expect(trail.body.events.some((e) => e.details.reason === 'another person signed in')).toBe(true);
    // The provider's refusal is the message the button shows.
    expect(ANOTHER_PERSON_SIGNED_IN).toMatch(/Sign out first/);

    // Signed out, the same browser may use the link: it was not spent.
    expect(await browser.signOut()).toBe(200);
    expect(await page(token, browser)).toContain('Open revision A');
    expect(await signInWithLink(browser, token)).toBe(true);
    expect(await whoIs(browser)).toBe(demoEmail('customer'));
  });

  it('resending a delivery voids the older unused link: its page says a newer link replaced it and it signs no one in', async () => {
    const again = await cm.json<DeliveryRecord>(`/api/deliveries/${deliveryId}/resend`, { method: 'POST', body: '{}' });
    expect(again.status).toBe(200);
    const older = await latestLink();
    const resent = await cm.json<DeliveryRecord>(`/api/deliveries/${deliveryId}/resend`, {
      method: 'POST',
      body: '{}',
    });
    expect(resent.body).toMatchObject({ status: 'delivered' });
    const newer = await latestLink();
    expect(newer).not.toBe(older);
    expect(await page(older)).toContain('A newer link replaced this one');
    const stranger = new HttpSession(baseUrl);
    expect(await signInWithLink(stranger, older)).toBe(false);
    expect(await page(newer)).toContain('Open revision A');
    expect(await signInWithLink(stranger, newer)).toBe(true);
    expect(await whoIs(stranger)).toBe(demoEmail('customer'));
  });

  it(`after ${LIMITS.linkFailuresPerAddress.points} unusable links from one address, link sign-ins from it are refused with when to try again (last: it blocks this file's loopback address)`, async () => {
    const linkError = async (token: string) => {
      const s = new HttpSession(baseUrl);
      const csrf = await s.json<{ csrfToken: string }>('/api/auth/csrf');
      const form = new URLSearchParams({
        csrfToken: csrf.body.csrfToken,
        token,
        json: 'true',
        callbackUrl: `${baseUrl}/portal`,
      });
      const res = await s.json<{ url: string }>('/api/auth/callback/delivery-link', {
        method: 'POST',
        body: form,
        headers: { 'content-type': 'application/x-www-form-urlencoded' },
      });
      return new URL(res.body.url, baseUrl).searchParams.get('error');
    };
    // Earlier tests in this file already spent some of the allowance (a replaced link); count until the refusal, bounded.
    let refusedAfter = -1;
    for (let i = 0; i <= LIMITS.linkFailuresPerAddress.points && refusedAfter < 0; i++) {
      if ((await linkError(`bm90LWEtbGluay0${i}xx.${'A'.repeat(43)}`)) !== 'CredentialsSignin') refusedAfter = i;
    }
    expect(refusedAfter).toBeGreaterThan(LIMITS.linkFailuresPerAddress.points - 3);
    expect(refusedAfter).toBeLessThanOrEqual(LIMITS.linkFailuresPerAddress.points);
    expect((await cm.json(`/api/deliveries/${deliveryId}/resend`, { method: 'POST', body: '{}' })).status).toBe(200);
    expect(await linkError(await latestLink())).toMatch(
      /^Too many unusable links from your network address\. Try again after \d\d:\d\d UTC/,
    );
  });
});
