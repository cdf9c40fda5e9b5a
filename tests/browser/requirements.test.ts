import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * An analyst states a requirement from the toolbar, picking a calc block
 * output as the live-value picker does, sets its threshold, and sees the
 * verdict and margin in the text and in the compliance table; submit warns
 * about a requirement not met. The repeat orbit of the design-rationale
 * template has a mean altitude of 692.837 km (engine output, 3 decimals):
 * at most 690 km misses by 2.837 km, at most 700 km is met by 7.163 km.
 */
const baseUrl = inject('baseUrl');
const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('requirements in the editor', () => {
  it('analyst: inserts a requirement on the repeat orbit altitude, sees ✗ then ✓ with the margin, in the text and the compliance table', async () => {
    const page = await context.newPage();
    await page.setViewportSize({ width: 1280, height: 900 });
    await signInThroughForm(page, baseUrl, email('analyst'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.getByLabel('Title').fill('TERNLIGHT-1 rationale, requirement trial');
    await page.getByRole('radio', { name: /Sun-synchronous orbit design rationale/ }).check();
    await page.getByRole('button', { name: 'Create' }).click();
    await page.waitForURL(/\/memos\/\d+$/);

    // The template's own requirements are checked and gathered in the table.
    const table = page.locator('section.compliance-table');
    await expect.poll(() => table.locator('tr[data-compliance-row]').count(), { timeout: 20_000 }).toBe(4);
    await expect.poll(() => table.locator('[data-verdict="pass"]').count(), { timeout: 20_000 }).toBe(4);

    // Insert one with the cursor inside the first paragraph: it goes after the paragraph, which stays whole.
    const firstParagraph = page.locator('.ProseMirror > p').first();
    const paragraphText = await firstParagraph.textContent();
    await firstParagraph.click();
    await page.getByRole('button', { name: '✓ Requirement' }).click();
    const picker = page.getByRole('listbox', { name: 'Value the requirement checks' });
    await picker
      .getByRole('option', { name: /Mean altitude \(a − equatorial radius\)/ })
      .first()
      .click();
    const req = page.locator('section[data-requirement-id="REQ-ORB-005"]');
    await expect.poll(() => req.count(), { timeout: 10_000 }).toBe(1);
    expect(await firstParagraph.textContent()).toBe(paragraphText);
    await req.getByLabel('Statement of REQ-ORB-005').fill('Mean altitude at most 690 km.');
    await req.getByLabel('Threshold of REQ-ORB-005').fill('690 km');
    await expect
      .poll(() => req.locator('[data-verdict]').textContent(), { timeout: 20_000 })
      .toBe('✗ not met · margin −2.837 km');
    await expect
      .poll(() => table.locator('tr[data-compliance-row="REQ-ORB-005"] [data-verdict]').getAttribute('data-verdict'))
      .toBe('fail');
    await req.scrollIntoViewIfNeeded();
    await screenshot(page, 'requirement-not-met');

    await req.getByLabel('Threshold of REQ-ORB-005').fill('0.7 Mm');
    await expect
      .poll(() => req.locator('[data-verdict]').textContent(), { timeout: 20_000 })
      .toBe('✓ met · margin +7.163 km');
    await expect.poll(() => table.locator('tr[data-compliance-row="REQ-ORB-005"]').textContent()).toContain('≤ 0.7 Mm');
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await table.scrollIntoViewIfNeeded();
    await screenshot(page, 'requirement-compliance-table');

    // Back to failing: the submit form warns and still lets the memo go.
    await req.getByLabel('Threshold of REQ-ORB-005').fill('690 km');
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await page.getByRole('button', { name: 'Submit for review' }).click();
    const warning = page.locator('[data-requirement-warnings]');
    await expect.poll(() => warning.textContent(), { timeout: 20_000 }).toContain('REQ-ORB-005 is not met');
    await screenshot(page, 'requirement-submit-warning');
    await page.close();
  });
});
