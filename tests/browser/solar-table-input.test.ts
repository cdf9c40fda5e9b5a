/**
 * The analyst's solar-activity table in the editor: choose the table source of a drag-decay block, paste a CSV into
 * its text area; a malformed row is named by line under the field, a good table computes, and the pasted text is
 * kept after a reload (it is stored with the block's inputs). The maintenance plan's dispersion figure renders.
 */
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

const baseUrl = inject('baseUrl');
const analystEmail = DEMO_USERS.find((u) => u.role === 'analyst')!.email;

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

const GOOD = [
  '# programme forecast (invented)',
  'date,f107,f107Average,ap',
  '2026-01-01,150,150,12',
  '2027-01-01,160,158,12',
  '2028-01-01,170,165,14',
].join('\n');
const BAD = 'date,f107,f107Average,ap\n2026-01-01,150,150,12\n2027-01-01,160,abc,12';

describe('solar-activity table input in Chromium', () => {
  it('analyst: pastes a table into a drag-decay block; a bad line is named, a good table computes and is kept after reload', async () => {
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, analystEmail, DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.getByLabel('Title').fill('TERNLIGHT-1 maintenance, forecast table');
    await page.getByRole('radio', { name: /Orbit maintenance plan/ }).check();
    await page.getByRole('button', { name: 'Create' }).click();
    await page.waitForURL(/\/memos\/\d+$/);

    const drag = page.locator('section[data-block-id="decay"]');
    await expect
      .poll(() => drag.locator('td[data-output="lifetimeYears"]').textContent(), { timeout: 60_000 })
      .toMatch(/yr$/);
    await drag.locator('#in-decay-solarFlux').selectOption('table');
    // An enum left empty shows the default it stands for, marked as the default (not a blank box).
    const beyond = drag.locator('#in-decay-beyondTable');
    expect(await beyond.inputValue()).toBe('');
    expect(await beyond.evaluate((el: HTMLSelectElement) => el.selectedOptions[0]?.textContent)).toBe(
      'refuse (default)',
    );
    await beyond.selectOption('cycle');
    const csv = drag.locator('textarea#in-decay-solarActivityTableCsv');
    await csv.fill(BAD);
    await expect
      .poll(() => drag.locator('#err-decay-solarActivityTableCsv').textContent(), { timeout: 60_000 })
      .toMatch(/line 3: f107Average "abc" is not a number/i);
    await screenshot(page, 'solar-table-bad-line');

    await csv.fill(GOOD);
    await expect
      .poll(() => drag.getByText(/outside the solar-activity table \(2026-01-01 to 2028-01-01\)/).count(), {
        timeout: 60_000,
      })
      .toBeGreaterThan(0);
    await expect.poll(() => drag.locator('td[data-output="lifetimeYears"]').textContent()).toMatch(/yr$/);
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await screenshot(page, 'solar-table-good');

    await page.reload();
    await expect
      .poll(() => page.locator('textarea#in-decay-solarActivityTableCsv').inputValue(), { timeout: 20_000 })
      .toBe(GOOD);

    // the appended injection-dispersion section: its block computes and its figure is drawn
    const dispersion = page.locator('section[data-block-id="dispersion"]');
    await expect
      .poll(() => dispersion.locator('td[data-output="ltanDriftP997MinPerYear"]').textContent(), { timeout: 60_000 })
      .toMatch(/min\/yr$/);
    await expect
      .poll(() => page.locator('[data-figure-id="fig-dispersion"] svg').count(), { timeout: 60_000 })
      .toBeGreaterThan(0);
    await screenshot(page, 'dispersion-figure');
    await page.close();
  }, 180_000);
});
