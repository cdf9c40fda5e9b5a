import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * Text typed just before "Send to reviewers", still inside the autosave delay,
 * must end up in the submitted memo: the submit action saves it first and waits
 * for the server. When that save fails, nothing is submitted and the panel says
 * why. Driven in Chromium as an analyst would; checked against what the server
 * serves after a reload (no tolerance: the word is there or not).
 */

const baseUrl = inject('baseUrl');
const analyst = DEMO_USERS.find((u) => u.role === 'analyst')!.email;
const reviewerName = DEMO_USERS.find((u) => u.role === 'reviewer')!.name;

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

/** A blank memo with the submit form open and a reviewer ticked, so that sending is one click away. */
async function blankMemoReadyToSubmit(title: string): Promise<{ page: Page; url: string }> {
  const page = await signInAsDemo(context, baseUrl, analyst, DEMO_PASSWORD);
  await page.getByRole('button', { name: 'New memo' }).click();
  await page.getByLabel('Title').fill(title);
  await page.getByRole('button', { name: 'Create' }).click();
  await page.waitForURL(/\/memos\/\d+$/);
  await expect
    .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
    .toBe('saved');
  await page.getByRole('button', { name: 'Submit for review' }).click();
  await page.getByLabel(reviewerName).check();
  return { page, url: page.url() };
}

describe('Send to reviewers with text not yet autosaved', () => {
  it('saves the text typed a moment before and submits it', async () => {
    const { page, url } = await blankMemoReadyToSubmit('TERNLIGHT-1 late-typing trial');
    await page.locator('.ProseMirror').click();
    await page.keyboard.type('Heliotrope');
    // Well inside the autosave delay: nothing has been sent yet.
    expect(await page.locator('[data-save-state]').getAttribute('data-save-state')).toBe('dirty');
    await page.getByRole('button', { name: 'Send to reviewers' }).click();
    await expect.poll(() => page.locator('[data-read-only-reason]').count(), { timeout: 20_000 }).toBe(1);

    await page.goto(url);
    await expect.poll(() => page.locator('[data-read-only-reason]').count(), { timeout: 20_000 }).toBe(1);
    await expect.poll(() => page.locator('.ProseMirror').textContent(), { timeout: 20_000 }).toContain('Heliotrope');
    await screenshot(page, 'submit-saves-pending-text');
    await page.close();
  });

  it('refuses to submit, saying why, when the pending text cannot be saved', async () => {
    const { page, url } = await blankMemoReadyToSubmit('TERNLIGHT-1 unsaved-submit trial');
    await page.route(/\/api\/memos\/\d+$/, (route) =>
      route.request().method() === 'PATCH' ? route.abort('connectionrefused') : route.continue(),
    );
    await page.locator('.ProseMirror').click();
    await page.keyboard.type('Marigold');
    await page.getByRole('button', { name: 'Send to reviewers' }).click();
    await expect
      .poll(
        () =>
          page
            .getByRole('alert')
            .filter({ hasText: 'Nothing was sent: Not saved: the server cannot be reached' })
            .count(),
        { timeout: 20_000 },
      )
      .toBe(1);
    expect(await page.locator('[data-read-only-reason]').count()).toBe(0);
    await screenshot(page, 'submit-refused-unsaved-text');

    // The memo is still a draft on the server, without the unsaved word.
    await page.unroute(/\/api\/memos\/\d+$/);
    const res = await page.request.get(url.replace(/\/memos\//, '/api/memos/'));
    const memo = (await res.json()) as { status: string; content: unknown };
    expect(memo.status).toBe('draft');
    expect(JSON.stringify(memo.content)).not.toContain('Marigold');
    await page.close();
  });
});
