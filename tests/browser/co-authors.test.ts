import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * The owner names a co-author on the memo page; the co-author then gets the
 * editor, and another analyst keeps a read-only page that says why.
 */

const baseUrl = inject('baseUrl');
const demo = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const stamp = Date.now();
const coAuthor = {
  name: 'Linnea Carrow',
  email: `linnea.carrow.${stamp}@brightwater.example`,
  password: 'co-author-trial-pw',
};

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
  const admin = new HttpSession(baseUrl);
  expect(await admin.signIn(demo('admin').email, DEMO_PASSWORD)).toBe(true);
  expect(
    (await admin.json('/api/users', { method: 'POST', body: JSON.stringify({ ...coAuthor, role: 'analyst' }) })).status,
  ).toBe(201);
});
afterAll(async () => close());

describe('co-authors on the memo page', () => {
  it('the owner adds a co-author, who may then edit; before that the page tells them why it is read-only', async () => {
    const owner = await signInAsDemo(context, baseUrl, demo('analyst').email, DEMO_PASSWORD);
    await owner.getByRole('button', { name: 'New memo' }).click();
    await owner.getByLabel('Title').fill('TERNLIGHT-1 co-author trial');
    await owner.getByRole('button', { name: 'Create' }).click();
    await owner.waitForURL(/\/memos\/\d+$/);
    const url = owner.url();
    await owner.close();

    const other = await signInAsDemo(context, baseUrl, coAuthor.email, coAuthor.password);
    await other.goto(url);
    await expect
      .poll(() => other.locator('[data-read-only-reason]').textContent(), { timeout: 20_000 })
      .toBe('Only the memo’s owner and its co-authors may do this; other analysts read and comment.');
    expect(await other.getByRole('button', { name: 'Co-authors…' }).count()).toBe(0);
    await other.close();

    const again = await signInAsDemo(context, baseUrl, demo('analyst').email, DEMO_PASSWORD);
    await again.goto(url);
    await again.getByRole('button', { name: 'Co-authors…' }).click();
    await again.getByLabel(coAuthor.name).check();
    await screenshot(again, 'memo-co-authors-form');
    await again.getByRole('button', { name: 'Save co-authors' }).click();
    await expect.poll(() => again.getByText(`Co-authors ${coAuthor.name}`).count(), { timeout: 20_000 }).toBe(1);
    await again.close();

    const nowAuthor = await signInAsDemo(context, baseUrl, coAuthor.email, coAuthor.password);
    await nowAuthor.goto(url);
    await expect
      .poll(() => nowAuthor.locator('.ProseMirror').getAttribute('contenteditable'), { timeout: 20_000 })
      .toBe('true');
    expect(await nowAuthor.locator('[data-read-only-reason]').count()).toBe(0);
    expect(await nowAuthor.getByRole('button', { name: 'Co-authors…' }).count()).toBe(0);
    await screenshot(nowAuthor, 'memo-co-author-editing');
    await nowAuthor.close();
  });
});
