import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser } from '../support/browser';
import { newDesignMemoAsAnalyst } from '../support/new-design-memo';
import { getCalcKind } from '@/lib/calc';

const baseUrl = inject('baseUrl');
const altitudeLabel = getCalcKind('sso-inclination')!.inputs.find((f) => f.name === 'altitudeKm')!.label;

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('calc block messages in Chromium', () => {
  it('analyst: an out-of-range altitude is refused in a sentence naming the field by label; a cleared field shows its default as such; the header follows the autosaves', async () => {
    const page = await newDesignMemoAsAnalyst(context, baseUrl, 'TERNLIGHT-1 refused inputs');
    const sso = page.locator('section[data-block-id="sso"]');
    const headerVersion = async () =>
      Number(await page.locator('[data-header-version]').getAttribute('data-header-version'));
    const versionAtStart = await headerVersion();

    await sso.getByRole('button', { name: /Type Mean altitude.* instead/ }).click();
    await sso.locator('#in-sso-altitudeKm').fill('50000 km');
    const fieldError = sso.locator('#err-sso-altitudeKm');
    await expect
      .poll(() => fieldError.textContent(), { timeout: 20_000 })
      .toBe(`${altitudeLabel} must be at most 6000 km (got 50000).`);
    await expect.poll(() => sso.getByRole('alert').textContent()).toMatch(/^The input needs a change: Mean altitude/);
    expect(await sso.innerText()).not.toMatch(/altitudeKm|eccentricity:/);
    // One status label for the state.
    expect(await sso.locator('header [role="status"]').allTextContents()).toEqual(['not computed']);
    await sso.screenshot({ path: 'test-results/screenshots/calc-block-refused-altitude.png' });

    // Valid but unusual: computed, with a note asking to check it.
    await sso.locator('#in-sso-altitudeKm').fill('5000 km');
    await expect.poll(() => fieldError.count(), { timeout: 20_000 }).toBe(0);
    await expect
      .poll(() => sso.locator('[data-unusual-input="altitudeKm"]').textContent())
      .toMatch(/^5000 km is unusual for an Earth-observation orbit/);
    await sso.locator('#in-sso-altitudeKm').fill('700 km');
    await expect.poll(() => sso.locator('[data-unusual-input]').count()).toBe(0);
    await expect.poll(() => fieldError.count(), { timeout: 20_000 }).toBe(0);
    const eccentricity = sso.locator('#in-sso-eccentricity');
    expect(await eccentricity.getAttribute('placeholder')).toBe('default 0');
    await eccentricity.fill('');
    await expect
      .poll(() => sso.locator('[data-default-in-use="eccentricity"]').textContent())
      .toBe('Left empty: the default, 0, is used.');
    await expect
      .poll(() => sso.locator('header [role="status"]').allTextContents(), { timeout: 20_000 })
      .toEqual(['computed on server']);
    await sso.screenshot({ path: 'test-results/screenshots/calc-block-default-in-use.png' });

    // The header's version and time follow the autosaves without a reload.
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await expect.poll(headerVersion).toBeGreaterThan(versionAtStart);
    const updatedAt = await page.locator('[data-header-updated]').getAttribute('data-header-updated');
    expect(Date.now() - Date.parse(updatedAt!)).toBeLessThan(60_000);
    await page.close();
  }, 120_000);

  it('analyst: the candidate trade table takes the block’s full width and fits the memo column without sideways scrolling', async () => {
    const page = await newDesignMemoAsAnalyst(
      context,
      baseUrl,
      'TERNLIGHT-1 candidate trade',
      /Candidate orbit trade study/,
    );
    const trade = page.locator('section[data-block-id="trade"]');
    await expect
      .poll(() => trade.locator('table[aria-label] th[scope="col"]').count(), { timeout: 30_000 })
      .toBeGreaterThan(2);
    expect(await trade.locator('[data-layout]').getAttribute('data-layout')).toBe('stacked');
    const table = trade.locator('table[aria-label]').first();
    const fits = await table.evaluate((t) => t.parentElement!.scrollWidth <= t.parentElement!.clientWidth + 1);
    expect(fits).toBe(true);
    await trade.screenshot({ path: 'test-results/screenshots/trade-table-in-memo.png' });
    await page.close();
  }, 120_000);
});
