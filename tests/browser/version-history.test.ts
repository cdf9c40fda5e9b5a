import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * The version history as an analyst sees it, in Chromium: eight autosaves in
 * quick succession are one entry ("v1–v9", "9 saves"), while the page header's
 * version follows each save without a reload; the current version is named
 * through the panel's dialog, by keyboard; further typing starts a new entry
 * above the named one; restoring the named version is an entry of its own;
 * the comparison opens on what the current entry changed. Screenshots are left for a person to look at.
 */

const baseUrl = inject('baseUrl');
const analyst = DEMO_USERS.find((u) => u.role === 'analyst')!;
const WAIT = { timeout: 15_000 };

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

const headerVersion = (page: Page) => page.locator('[data-header-version]').getAttribute('data-header-version');
const entries = (page: Page) => page.getByRole('complementary', { name: 'Version history' }).locator('li');

/** Types a word at the end of the memo and waits until the server has it as the next version. */
async function typeAndAutosave(page: Page, word: string, expectVersion: number): Promise<void> {
  await page.getByRole('textbox', { name: 'Memo text' }).press('End');
  await page.keyboard.type(` ${word}`);
  await expect.poll(() => headerVersion(page), WAIT).toBe(String(expectVersion));
  await expect.poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), WAIT).toBe('saved');
}

describe('version history in Chromium', () => {
  it('autosaves coalesce into one entry; naming it shows the name; later edits start a new entry', async () => {
    const page = await signInAsDemo(context, baseUrl, analyst.email, DEMO_PASSWORD);
    const created = await page.request.post(`${baseUrl}/api/memos`, {
      data: { title: 'TERNLIGHT-1 disposal options, working notes' },
      headers: { origin: baseUrl },
    });
    expect(created.status(), await created.text()).toBe(201);
    const { id } = (await created.json()) as { id: number };
    await page.goto(`${baseUrl}/memos/${id}`);
    await page.getByRole('textbox', { name: 'Memo text' }).click();
    for (let i = 2; i <= 9; i++) await typeAndAutosave(page, `note${i}`, i);

    // The header followed every save; the panel lists one editing session.
    await expect.poll(() => entries(page).count(), WAIT).toBe(1);
    const session = entries(page).first();
    await expect.poll(() => session.textContent(), WAIT).toMatch(/v1–v9/);
    // Within a day the span reads "09:02–09:18 UTC"; a run of saves across midnight UTC names both dates.
    expect(await session.textContent()).toMatch(
      /9 saves, \d{4}-\d\d-\d\d \d\d:\d\d(–\d\d:\d\d UTC| UTC – \d{4}-\d\d-\d\d \d\d:\d\d UTC)/,
    );
    expect(await page.locator('[data-header-updated]').textContent()).toMatch(
      /^Updated \d{4}-\d\d-\d\d \d\d:\d\d UTC$/,
    );
    await screenshot(page, 'version-history-one-session');

    // Name it, by keyboard: the control, the dialog, Escape closes without naming; Enter names.
    const nameButton = session.getByRole('button', { name: 'Name this version' });
    await nameButton.focus();
    await page.keyboard.press('Enter');
    const dialog = page.getByRole('dialog', { name: 'Name version 9' });
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(true);
    await page.keyboard.press('Escape');
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(false);
    // Focus goes back to the control that opened the dialog.
    expect(await page.evaluate(() => document.activeElement?.textContent)).toBe('Name this version');
    await nameButton.focus();
    await page.keyboard.press('Enter');
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(true);
    // The field has focus; an empty name is refused in words.
    await page.keyboard.press('Enter');
    await expect.poll(() => dialog.getByRole('alert').textContent(), WAIT).toMatch(/Give the version a name/);
    await page.keyboard.type('Checkpoint: before review');
    await screenshot(page, 'version-history-name-dialog');
    await page.keyboard.press('Enter');
    await expect.poll(() => dialog.isVisible(), WAIT).toBe(false);
    await expect.poll(() => entries(page).first().textContent(), WAIT).toMatch(/^Checkpoint: before review/);

    // Further edits: a new entry above the named one, which stays as it was.
    await typeAndAutosave(page, 'after', 10);
    await typeAndAutosave(page, 'review', 11);
    await expect.poll(() => entries(page).count(), WAIT).toBe(2);
    // The panel refetches after each save: the header can be at v11 while the list still shows v10.
    await expect.poll(() => entries(page).nth(0).textContent(), WAIT).toMatch(/v10–v11.*2 saves/);
    expect(await entries(page).nth(1).textContent()).toMatch(/^Checkpoint: before review.*v1–v9.*9 saves/);
    await screenshot(page, 'version-history-after-checkpoint');

    // Restoring the named version: an entry of its own that says where its text came from.
    await entries(page).nth(1).getByRole('button', { name: 'Restore as new version' }).click();
    await expect.poll(() => headerVersion(page), WAIT).toBe('12');
    await expect.poll(() => entries(page).count(), WAIT).toBe(3);
    await expect.poll(() => entries(page).nth(0).textContent(), WAIT).toMatch(/v12 · .*restored from v9/);
    expect((await page.getByRole('textbox', { name: 'Memo text' }).textContent())?.trim()).toBe(
      'note2 note3 note4 note5 note6 note7 note8 note9',
    );

    // The comparison opens on the current entry's changes: from the last version before the restore.
    await page.goto(`${baseUrl}/memos/${id}/compare`);
    await expect
      .poll(() => page.getByRole('heading', { level: 1 }).textContent(), WAIT)
      .toBe('Compare version 11 with current (version 12)');
    await screenshot(page, 'version-history-compare-session');
    await page.close();
  });
});
