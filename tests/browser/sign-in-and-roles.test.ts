import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import { DEMO_MEMO } from '@/lib/demo/demo-memo';

const baseUrl = inject('baseUrl');
const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;

let context: BrowserContext;
let close: () => Promise<void>;

beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('signing in, in Chromium', () => {
  it('analyst: sign in → memo list → open the demo memo', async () => {
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, email('analyst'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await expect.poll(() => page.getByRole('link', { name: DEMO_MEMO.title }).count()).toBe(1);
    await expect.poll(() => page.getByText('Analyst', { exact: true }).count()).toBeGreaterThan(0);
    await screenshot(page, 'analyst-memo-list');
    await page.getByRole('link', { name: DEMO_MEMO.title }).click();
    await page.waitForURL(/\/memos\/\d+$/);
    // The analyst may edit this draft: its title is the editable title field.
    await expect.poll(() => page.locator('#memo-title').inputValue(), { timeout: 20_000 }).toBe(DEMO_MEMO.title);
    await expect.poll(() => page.getByRole('heading', { name: 'Mission drivers' }).count()).toBe(1);
    await screenshot(page, 'analyst-demo-memo');
    // Sign out through the user menu.
    await page.getByRole('button', { name: /Ilse Marrow/ }).click();
    await page.getByRole('menuitem', { name: 'Sign out' }).click();
    await page.waitForURL(/\/signin/);
    await page.close();
  });

  it('customer: lands on the portal, sees no drafts, and the demo memo is refused', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, email('customer'), DEMO_PASSWORD);
    // A customer lands on the portal of what was released to them, not on the staff's memo list.
    await page.waitForURL(`${baseUrl}/portal`);
    await expect.poll(() => page.getByRole('heading', { name: 'Released to you' }).count()).toBe(1);
    await page.goto(`${baseUrl}/memos`);
    await expect
      .poll(() => page.getByText('No revision has been released to you yet', { exact: false }).count())
      .toBe(1);
    expect(await page.getByRole('link', { name: DEMO_MEMO.title }).count()).toBe(0);
    await screenshot(page, 'customer-memo-list');
    await page.goto(`${baseUrl}/memos/1`);
    await expect.poll(() => page.getByText('This memo is not shared with you.').count()).toBe(1);
    await page.close();
  });

  it('wrong password: a clear message, and no session', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, email('analyst'), 'wrong-password');
    const alert = page.getByRole('alert').filter({ hasText: /\S/ });
    await expect.poll(() => alert.textContent()).toMatch(/do not match an active account/);
    await screenshot(page, 'sign-in-wrong-password');
    await page.goto(`${baseUrl}/memos`);
    await page.waitForURL(/\/signin\?callbackUrl=/);
    await page.close();
  });

  it('admin: the People page lists every account', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, email('admin'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('link', { name: 'People' }).click();
    await page.waitForURL(`${baseUrl}/admin/users`);
    for (const u of DEMO_USERS) await expect.poll(() => page.getByText(u.email).count()).toBe(1);
    await screenshot(page, 'admin-people');
    await page.close();
  });
});
