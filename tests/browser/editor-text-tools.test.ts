import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import { EMPTY_MEMO_PLACEHOLDER } from '@/components/editor/editor-extensions';

const baseUrl = inject('baseUrl');
const analyst = DEMO_USERS.find((u) => u.role === 'analyst')!.email;
// A 1×1 PNG (PNG specification, ISO/IEC 15948: signature, IHDR, IDAT, IEND).
const PNG_1X1 = Buffer.from(
  'iVBORw0KGgoAAAANSUhEUgAAAAEAAAABCAYAAAAfFcSJAAAADUlEQVR42mNk+M9QDwADhgGAWjR9awAAAABJRU5ErkJggg==',
  'base64',
);

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('editor text tools in Chromium', () => {
  it('analyst: an empty memo shows a placeholder; links through a dialog; table rows and columns deleted; image alt text and caption', async () => {
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, analyst, DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.getByLabel('Title').fill('TERNLIGHT-1 blank notes');
    await page.getByRole('button', { name: 'Create' }).click();
    await page.waitForURL(/\/memos\/\d+$/);

    const prose = page.locator('.ProseMirror');
    await expect
      .poll(() => prose.locator('p.is-editor-empty').getAttribute('data-placeholder'), { timeout: 20_000 })
      .toBe(EMPTY_MEMO_PLACEHOLDER);
    // Shown, not only present: the paragraph's ::before carries the text.
    expect(await prose.locator('p.is-editor-empty').evaluate((p) => getComputedStyle(p, '::before').content)).toBe(
      JSON.stringify(EMPTY_MEMO_PLACEHOLDER),
    );
    await screenshot(page, 'editor-empty-memo-placeholder');

    // Link through the dialog: a refused scheme is explained, an https address is set.
    await prose.click();
    await page.keyboard.type('Northmere Basin Authority requirements');
    await page.keyboard.press('Shift+Home');
    await page.getByRole('button', { name: 'Link', exact: true }).click();
    const dialog = page.getByRole('dialog', { name: 'Link' });
    await dialog.getByLabel('Link address').fill('javascript:alert(1)');
    await dialog.getByRole('button', { name: 'Set link' }).click();
    await expect.poll(() => dialog.getByText(/cannot be a link in a memo/).count()).toBe(1);
    await screenshot(page, 'editor-link-dialog-refused');
    await dialog.getByLabel('Link address').fill('https://example.org/requirements');
    await page.keyboard.press('Enter');
    await expect.poll(() => dialog.count()).toBe(0);
    expect(await prose.locator('a').getAttribute('href')).toBe('https://example.org/requirements');

    // Image: alt text and caption typed next to it are kept on the node.
    await page.keyboard.press('End');
    await page.keyboard.press('Enter');
    await page
      .locator('input[type="file"]')
      .setInputFiles({ name: 'ground-station.png', mimeType: 'image/png', buffer: PNG_1X1 });
    const figure = prose.locator('[data-image-view]');
    await expect.poll(() => figure.count(), { timeout: 20_000 }).toBe(1);
    await figure.getByLabel('Alt text').fill('Ground station mask at Northmere');
    await figure.getByLabel('Caption').fill('Station visibility mask, 5° elevation.');
    expect(await figure.locator('img').getAttribute('alt')).toBe('Ground station mask at Northmere');
    // Table: 3×3 inserted after the first paragraph, one row and one column deleted from inside a cell.
    await prose.locator('p').first().click();
    await page.keyboard.press('End');
    await page.getByRole('button', { name: 'Table', exact: true }).click();
    await expect.poll(() => prose.locator('table tr').count()).toBe(3);
    await page.getByRole('button', { name: 'Delete row', exact: true }).click();
    await expect.poll(() => prose.locator('table tr').count()).toBe(2);
    await page.getByRole('button', { name: 'Delete column', exact: true }).click();
    await expect.poll(() => prose.locator('table tr').first().locator('th, td').count()).toBe(2);
    await screenshot(page, 'editor-table-trimmed');

    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await screenshot(page, 'editor-image-alt-caption');
    await page.reload();
    const again = page.locator('.ProseMirror [data-image-view]');
    await expect
      .poll(() => again.getByLabel('Caption').inputValue(), { timeout: 20_000 })
      .toBe('Station visibility mask, 5° elevation.');
    expect(await again.locator('img').getAttribute('alt')).toBe('Ground station mask at Northmere');
    await page.close();
  }, 120_000);
});
