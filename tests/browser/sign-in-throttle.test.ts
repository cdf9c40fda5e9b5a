import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo, signInThroughForm } from '../support/browser';
import { HttpSession } from '../../scripts/support/http-session';
import { demoEmail, signedIn } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';
import { LIMITS } from '@/lib/throttle/throttle-limits';

/**
 * In Chromium: the sign-in page shows the throttle's refusal with when to try
 * again, and the People page's "Sign out everywhere" ends a person's sessions.
 * The person is created for this file, so no demo account is blocked.
 */

const baseUrl = inject('baseUrl');
let context: BrowserContext;
let close: () => Promise<void>;
let admin: HttpSession;
const person = {
  email: `browser.throttle.${Date.now()}@brightwater.example`,
  name: 'Harriet Vell',
  password: 'first-password-26',
};
const traveller = {
  email: `browser.sessions.${Date.now()}@brightwater.example`,
  name: 'Osric Penhale',
  password: 'first-password-26',
};

beforeAll(async () => {
  ({ context, close } = await openBrowser());
  admin = await signedIn(baseUrl, 'admin');
  for (const p of [person, traveller]) {
    const res = await admin.json('/api/users', {
      method: 'POST',
      body: JSON.stringify({ email: p.email, name: p.name, role: 'analyst', password: p.password }),
    });
    expect(res.status).toBe(201);
  }
});
afterAll(async () => close());

describe('sign-in throttling and sign-out everywhere, in Chromium', () => {
  it(`after ${LIMITS.passwordFailuresPerAccount.points} wrong passwords the sign-in page says the account is refused and until when`, async () => {
    const page = await context.newPage();
    const alert = page.getByRole('alert').filter({ hasText: /\S/ });
    for (let i = 0; i < LIMITS.passwordFailuresPerAccount.points; i++) {
      await signInThroughForm(page, baseUrl, person.email, `wrong-password-${i}`);
      await expect.poll(() => alert.textContent()).toMatch(/do not match an active account/);
    }
    await signInThroughForm(page, baseUrl, person.email, person.password);
    await expect
      .poll(() => alert.textContent())
      .toMatch(
        /^Too many wrong passwords for this account\. Try again after \d\d:\d\d UTC \(in about \d+ minutes\)\.$/,
      );
    await screenshot(page, 'sign-in-throttled');
    await page.goto(`${baseUrl}/memos`);
    await page.waitForURL(/\/signin\?callbackUrl=/);
    await page.close();
  });

  it('“Sign out everywhere” on the People page ends the person’s sessions', async () => {
    const laptop = new HttpSession(baseUrl);
    expect(await laptop.signIn(traveller.email, traveller.password)).toBe(true);
    expect((await laptop.json('/api/notifications')).status).toBe(200);
    const page = await signInAsDemo(context, baseUrl, demoEmail('admin'), DEMO_PASSWORD);
    await page.goto(`${baseUrl}/admin/users`);
    page.once('dialog', (d) => void d.accept());
    await page.getByRole('button', { name: `Sign ${traveller.name} out everywhere` }).click();
    await expect.poll(() => page.getByRole('status').textContent()).toBe(`${traveller.name}: 1 session ended.`);
    await screenshot(page, 'people-signed-out-everywhere');
    expect((await laptop.json('/api/notifications')).status).toBe(401);
    await page.close();
  });
});
