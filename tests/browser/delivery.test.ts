import crypto from 'node:crypto';
import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import path from 'node:path';
import type { BrowserContext, Locator } from 'playwright-core';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser';
import { demoEmail, frozenMemo, signedIn } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';

/**
 * End to end in Chromium against the real app and its local SMTP server:
 * the configuration manager releases revision A, the administrator reads the
 * message in the Outbox, the customer follows its link, downloads the PDF
 * (same SHA-256 as stored) and acknowledges receipt. The app instance is
 * this file's own: a release to the demo customer would change what other
 * test files expect the customer to see.
 */

let app: AppServer;
let baseUrl = '';
let context: BrowserContext;
let close: () => Promise<void>;
let memoId = 0;
let sha256 = '';
const TITLE = 'TERNLIGHT-1 baseline for Northmere';
/** The memo page is long; the delivery panel is shot on its own. */
const shoot = (region: Locator, name: string) =>
  region.screenshot({ path: path.resolve('test-results', 'screenshots', `${name}.png`) });

beforeAll(async () => {
  app = await startAppServer();
  baseUrl = app.baseUrl;
  const [analyst, reviewer, cm] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager'] as const).map((r) => signedIn(baseUrl, r)),
  );
  ({ memoId, sha256 } = await frozenMemo({ analyst, reviewer, cm }, TITLE));
  ({ context, close } = await openBrowser());
}, 300_000);
afterAll(async () => {
  await close();
  app?.stop();
});

describe('delivery of a frozen revision, in Chromium', () => {
  let link = '';

  it('configuration manager: adds Samir to the distribution list and releases revision A with a cover note', async () => {
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, demoEmail('config-manager'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.goto(`${baseUrl}/memos/${memoId}`);
    const panel = page.getByRole('region', { name: 'Delivery to customers' });
    await panel.getByLabel('Add a customer').selectOption({ label: 'Samir Dunmore' });
    await panel.getByRole('button', { name: 'Add', exact: true }).click();
    await expect
      .poll(() => panel.getByRole('list', { name: 'Distribution list' }).getByText('Samir Dunmore').count(), {
        timeout: 15_000,
      })
      .toBe(1);
    await panel.getByRole('button', { name: 'Release revision A…' }).click();
    await panel
      .getByLabel('Cover note')
      .fill('Revision A is the baseline for the January review board. Please acknowledge receipt.');
    await shoot(panel, 'delivery-release-form');
    await panel.getByRole('button', { name: 'Release and send' }).click();
    await expect
      .poll(() => panel.getByRole('status').textContent(), { timeout: 15_000 })
      .toContain('Revision A released; 1 message handed to the mail server.');
    const row = panel
      .getByRole('table', { name: 'Deliveries of revision A' })
      .getByRole('row', { name: /Samir Dunmore/ });
    await expect.poll(() => row.textContent(), { timeout: 15_000 }).toContain('✓');
    await shoot(panel, 'delivery-release-panel');
    await page.close();
  });

  it('administrator: the Outbox lists the message; it shows the cover note, the PDF with the stored SHA-256 and the link', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, demoEmail('admin'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('link', { name: 'Outbox' }).click();
    await page.waitForURL(`${baseUrl}/admin/outbox`);
    const subject = page.getByRole('link', { name: new RegExp(`Revision A of .* released: ${TITLE}`) });
    await expect.poll(() => subject.count(), { timeout: 15_000 }).toBe(1);
    await screenshot(page, 'delivery-outbox');
    await subject.click();
    await page.waitForURL(/\/admin\/outbox\/\d+$/);
    const text = (await page.getByRole('region', { name: 'Text body' }).locator('pre').textContent()) ?? '';
    expect(text).toContain('Revision A is the baseline for the January review board.');
    expect(await page.getByRole('region', { name: 'Attachments' }).textContent()).toContain(`SHA-256 ${sha256}`);
    link = /(http:\/\/\S+\/delivery\/\S+)/.exec(text)?.[1] ?? '';
    expect(link.startsWith(`${baseUrl}/delivery/`)).toBe(true);
    await screenshot(page, 'delivery-outbox-message');
    await page.close();
  });

  it('customer: follows the link, sees exactly that revision, downloads the PDF (same SHA-256) and acknowledges receipt', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await page.goto(link);
    await screenshot(page, 'delivery-link-page');
    await page.getByRole('button', { name: 'Open revision A' }).click();
    await page.waitForURL(`${baseUrl}/portal/${memoId}/A`);
    await expect.poll(() => page.getByRole('heading', { name: TITLE }).count(), { timeout: 15_000 }).toBe(1);
    expect(await page.getByRole('region', { name: 'Cover note' }).textContent()).toContain(
      'Revision A is the baseline for the January review board.',
    );
    expect(await page.getByRole('region', { name: 'Change summary' }).textContent()).toContain(
      'First issue to the Northmere Basin Authority.',
    );
    await screenshot(page, 'delivery-portal-revision');

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: /Download PDF/ }).click(),
    ]);
    const file = await download.path();
    expect(crypto.createHash('sha256').update(fs.readFileSync(file)).digest('hex')).toBe(sha256);

    await page.getByRole('button', { name: 'Acknowledge receipt' }).click();
    await expect
      .poll(() => page.getByRole('status').textContent(), { timeout: 15_000 })
      .toMatch(/You acknowledged receipt of revision A on \d{4}-\d{2}-\d{2}/);
    await screenshot(page, 'delivery-portal-acknowledged');

    await page.getByRole('navigation', { name: 'Main' }).getByRole('link', { name: 'Released to you' }).click();
    await page.waitForURL(`${baseUrl}/portal`);
    const entry = page
      .getByRole('list', { name: 'Released revisions' })
      .getByRole('listitem')
      .filter({ hasText: TITLE });
    await expect.poll(() => entry.textContent(), { timeout: 15_000 }).toContain('acknowledged');
    await screenshot(page, 'delivery-portal');

    // The editor page of the memo sends the customer to the portal view, never to the draft.
    await page.goto(`${baseUrl}/memos/${memoId}`);
    await page.waitForURL(`${baseUrl}/portal/${memoId}/A`);

    await page.goto(link);
    await expect
      .poll(() => page.getByRole('heading', { name: 'This link has already been used' }).count(), { timeout: 15_000 })
      .toBe(1);
    expect(await page.getByRole('button', { name: /Open revision/ }).count()).toBe(0);
    await screenshot(page, 'delivery-link-refused');
    await page.close();
  });

  it('configuration manager: the memo page shows the delivery as delivered, opened and acknowledged', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, demoEmail('config-manager'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.goto(`${baseUrl}/memos/${memoId}`);
    const row = page
      .getByRole('table', { name: 'Deliveries of revision A' })
      .getByRole('row', { name: /Samir Dunmore/ });
    const cells = await row.getByRole('cell').allTextContents();
    expect(cells[2]).toMatch(/^✓ \d{4}-\d{2}-\d{2}/);
    expect(cells[3]).toMatch(/^\d{4}-\d{2}-\d{2} \d{2}:\d{2} UTC$/);
    expect(cells[4]).toMatch(/^✓ \d{4}-\d{2}-\d{2}/);
    await shoot(page.getByRole('region', { name: 'Delivery to customers' }), 'delivery-tracking');
    await page.close();
  });
});
