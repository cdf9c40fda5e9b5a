import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { selectInMemo } from '../support/select-text';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * Inline review in Chromium: the assigned reviewer comments on a passage
 * of a memo built from the demo template, in the read-only view; the analyst sees the unread
 * note, opens the thread on its highlighted passage, replies and resolves.
 */

const baseUrl = inject('baseUrl');
const person = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const QUOTE = 'the design adopts the 12-day cycle of 175 revolutions';
const TITLE = 'TERNLIGHT-1 review trial';
/** Waits on the server and on the highlights' re-location; generous, because the whole app suite shares one 2-core machine. */
const WAIT = { timeout: 10_000 };
const BODY = 'Why 175 revolutions rather than the 13-day cycle? Please state the gap it would leave.';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

/** What the reader sees in the window (the full-page shots of this long memo are too tall to judge). */
async function viewShot(page: Page, name: string): Promise<void> {
  await page.screenshot({ path: path.resolve('test-results', 'screenshots', `${name}-view.png`) });
}

const signInAs = (role: string): Promise<Page> => signInAsDemo(context, baseUrl, person(role).email, DEMO_PASSWORD);

describe('inline review in Chromium', () => {
  let threadId = 0;

  it('reviewer: selects a passage in the read-only memo, comments, and sees it highlighted', async () => {
    // The analyst starts from nothing unread and sends a memo from the demo template to the reviewer.
    // (Its own memo, so that other test files moving the demo memo through its lifecycle do not matter.)
    const analyst = await signInAs('analyst');
    expect((await analyst.request.post(`${baseUrl}/api/notifications/read`, { data: {} })).status()).toBe(200);
    const made = await analyst.request.post(`${baseUrl}/api/memos`, {
      data: { title: TITLE, templateId: 'sso-design-rationale' },
    });
    expect(made.status()).toBe(201);
    const memoId = ((await made.json()) as { id: number }).id;
    const dir = (await (await analyst.request.get(`${baseUrl}/api/users?role=reviewer`)).json()) as {
      users: { id: number; name: string }[];
    };
    const reviewerId = dir.users.find((u) => u.name === person('reviewer').name)!.id;
    expect(
      (
        await analyst.request.post(`${baseUrl}/api/memos/${memoId}/transitions`, {
          data: { action: 'submit', reviewerIds: [reviewerId] },
        })
      ).status(),
    ).toBe(200);
    await analyst.close();

    const page = await signInAs('reviewer');
    await page.getByRole('link', { name: TITLE, exact: true }).click();
    await page.waitForURL(new RegExp(`/memos/${memoId}$`));
    await expect
      .poll(() => page.locator('section[data-block-id="repeat"] td[data-output="altitudeKm"]').textContent(), {
        timeout: 20_000,
      })
      .toMatch(/km$/);
    expect(await page.locator('[contenteditable="true"]').count()).toBe(0);

    // The keyboard shortcut opens a new thread on the selection; cancel it.
    await selectInMemo(page, '240 km imager swath');
    await expect.poll(() => page.getByRole('button', { name: 'Comment', exact: true }).count(), WAIT).toBe(1);
    await page.keyboard.press('Control+Alt+KeyM');
    await expect.poll(() => page.locator('[data-new-thread]').textContent(), WAIT).toContain('“240 km imager swath”');
    await page.getByRole('button', { name: 'Cancel' }).click();
    expect(await page.locator('[data-new-thread]').count()).toBe(0);

    await selectInMemo(page, QUOTE);
    const commentButton = page.getByRole('button', { name: 'Comment', exact: true });
    await expect.poll(() => commentButton.count(), WAIT).toBe(1);
    await screenshot(page, 'comments-reviewer-selection');
    await viewShot(page, 'comments-reviewer-selection');
    await commentButton.click();
    const box = page.getByLabel('New thread');
    await expect.poll(() => box.evaluate((el) => el === document.activeElement), WAIT).toBe(true);
    // The passage being commented on stays marked while the comment is written.
    expect(await page.locator('[data-comment-pending]').textContent()).toBe(QUOTE);
    await box.fill(BODY);
    await page.getByRole('button', { name: 'Post comment' }).click();

    const card = page.locator('[data-thread-id]', { hasText: BODY });
    await expect.poll(() => card.count(), WAIT).toBe(1);
    threadId = Number(await card.getAttribute('data-thread-id'));
    expect(threadId).toBeGreaterThan(0);
    expect(await card.getAttribute('data-thread-group')).toBe('open');
    await expect
      .poll(() => page.locator(`.ProseMirror [data-comment-thread="${threadId}"]`).textContent(), WAIT)
      .toBe(QUOTE);
    expect(await page.locator('[data-comment-pending]').count()).toBe(0);
    // A reviewer replies but does not resolve.
    expect(await card.getByRole('button', { name: /Resolve thread/ }).count()).toBe(0);
    expect(await card.getByLabel('Reply').count()).toBe(1);
    await screenshot(page, 'comments-reviewer-thread-posted');
    await viewShot(page, 'comments-reviewer-thread-posted');
    await page.close();
  });

  it('analyst: sees one unread note, opens the thread on its passage, replies and resolves', async () => {
    const page = await signInAs('analyst');
    const badge = page.getByRole('button', { name: /^Review notes/ });
    await expect.poll(() => badge.getAttribute('aria-label'), { timeout: 20_000 }).toBe('Review notes 1 unread');
    const row = page.locator('tr', { has: page.getByRole('link', { name: TITLE, exact: true }) });
    expect(await row.locator('[aria-label$="open review threads"]').textContent()).toBe('1');
    await badge.click();
    const note = page
      .getByRole('link', { name: new RegExp(`${person('reviewer').name} started a thread on DM-\\d{4}-\\d{3}`) })
      .filter({ hasText: BODY });
    await expect.poll(() => note.count(), WAIT).toBe(1);
    await screenshot(page, 'comments-analyst-unread-badge');
    await viewShot(page, 'comments-analyst-unread-badge');
    await note.click();
    await page.waitForURL(new RegExp(`/memos/\\d+\\?thread=${threadId}$`));

    const mark = page.locator(`.ProseMirror [data-comment-thread="${threadId}"]`);
    await expect.poll(() => mark.textContent(), { timeout: 20_000 }).toBe(QUOTE);
    await expect.poll(() => mark.getAttribute('class'), WAIT).toContain('comment-mark-active');
    const card = page.locator(`[data-thread-id="${threadId}"]`);
    await expect
      .poll(() => card.getByRole('button', { name: /Thread on/ }).getAttribute('aria-expanded'), WAIT)
      .toBe('true');
    // Opening the memo read its notes.
    await expect.poll(() => badge.getAttribute('aria-label'), WAIT).toBe('Review notes, none unread');
    await screenshot(page, 'comments-analyst-thread-open');
    await viewShot(page, 'comments-analyst-thread-open');

    await card.getByLabel('Reply').fill('The 13-day cycle leaves a 12 km gap at the equator; section 3.1 now says so.');
    await card.getByRole('button', { name: 'Reply', exact: true }).click();
    await expect
      .poll(() => card.getByRole('list', { name: 'Replies' }).textContent(), WAIT)
      .toContain('The 13-day cycle leaves a 12 km gap');
    await card.getByRole('button', { name: /Resolve thread/ }).click();
    await expect.poll(() => card.getAttribute('data-thread-group'), WAIT).toBe('resolved');
    await expect
      .poll(() => page.getByRole('button', { name: /^Resolved \d+/ }).getAttribute('aria-pressed'), WAIT)
      .toBe('true');
    expect(await card.textContent()).toContain(`by ${person('analyst').name}`);
    await screenshot(page, 'comments-analyst-resolved');
    await viewShot(page, 'comments-analyst-resolved');

    // Opened again (without the thread link), the resolved thread is not highlighted until it is chosen.
    await page.goto(page.url().replace(/\?.*$/, ''));
    await expect
      .poll(() => page.getByRole('button', { name: /^Resolved \d+/ }).textContent(), { timeout: 20_000 })
      .toMatch(/^Resolved [1-9]/);
    await expect
      .poll(() => page.locator('section[data-block-id="repeat"] td[data-output="altitudeKm"]').textContent(), {
        timeout: 20_000,
      })
      .toMatch(/km$/);
    expect(await page.locator(`.ProseMirror [data-comment-thread="${threadId}"]`).count()).toBe(0);
    await page.getByRole('button', { name: /^Resolved \d+/ }).click();
    await page
      .locator(`[data-thread-id="${threadId}"]`)
      .getByRole('button', { name: /Thread on/ })
      .click();
    await expect
      .poll(() => page.locator(`.ProseMirror [data-comment-thread="${threadId}"]`).textContent(), WAIT)
      .toBe(QUOTE);
    await page.close();
  });
  it('analyst: deleting a commented passage detaches its thread, which shows its quote; undo re-attaches it', async () => {
    const page = await signInAs('analyst');
    const made = await page.request.post(`${baseUrl}/api/memos`, {
      data: { title: 'TERNLIGHT-1 rationale, detach trial', templateId: 'sso-design-rationale' },
    });
    expect(made.status()).toBe(201);
    const memoId = ((await made.json()) as { id: number }).id;
    const quote = 'Five-year design life within the 28 m/s propellant allocation';
    const posted = await page.request.post(`${baseUrl}/api/memos/${memoId}/comments`, {
      data: {
        body: 'Which solar cycle does the 28 m/s assume?',
        anchor: { quote, prefix: ' (ascending node 22:30).\n', suffix: '.\nRepeat ground track\nExact repeat cycles' },
      },
    });
    expect(posted.status()).toBe(201);
    const threadId = ((await posted.json()) as { id: number }).id;

    await page.goto(`${baseUrl}/memos/${memoId}`);
    const mark = page.locator(`.ProseMirror [data-comment-thread="${threadId}"]`);
    await expect.poll(() => mark.textContent(), { timeout: 20_000 }).toBe(quote);

    await page.locator('.ProseMirror li', { hasText: 'Five-year design life' }).click();
    await selectInMemo(page, quote);
    await page.keyboard.press('Backspace');
    await expect.poll(() => page.locator('.ProseMirror').textContent(), WAIT).not.toContain('Five-year');
    const detachedTab = page.getByRole('button', { name: /^Detached \d+/ });
    await expect.poll(() => detachedTab.textContent(), { timeout: 10_000 }).toBe('Detached 1');
    expect(await mark.count()).toBe(0);
    await detachedTab.click();
    const card = page.locator(`[data-thread-id="${threadId}"]`);
    expect(await card.getAttribute('data-thread-group')).toBe('detached');
    expect(await card.textContent()).toContain(`“${quote}”`);
    expect(await card.textContent()).toContain('This passage is no longer in the memo.');
    await screenshot(page, 'comments-analyst-detached');
    await viewShot(page, 'comments-analyst-detached');

    await page.locator('.ProseMirror h1', { hasText: 'Mission drivers' }).click();
    await page.keyboard.press('Control+z');
    await expect.poll(() => mark.textContent(), { timeout: 10_000 }).toBe(quote);
    await expect.poll(() => detachedTab.textContent(), WAIT).toBe('Detached 0');
    await page.close();
  });
});
