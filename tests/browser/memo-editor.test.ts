import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInThroughForm } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import { getCalcKind, runCalc } from '@/lib/calc';
import { formatValue } from '@/lib/format/format-output';

const baseUrl = inject('baseUrl');
const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;

/** What the page must show: the engine's own result for the input, at the output's display precision. */
function expectedInclination(altitudeKm: number): string {
  const out = runCalc('sso-inclination', { altitudeKm, eccentricity: 0.0011 });
  if (!out.ok) throw new Error(out.error);
  const field = getCalcKind('sso-inclination')!.outputs.find((o) => o.name === 'inclinationDeg')!;
  return formatValue(out.result.outputs.inclinationDeg, field.unit, field.precision);
}

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('memo editor in Chromium', () => {
  let memoUrl = '';

  it('analyst: new memo from the design-rationale template; a unit-aware altitude change recomputes the block and the live value; kept after reload', async () => {
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, email('analyst'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.getByLabel('Title').fill('TERNLIGHT-1 rationale, altitude trial');
    await page.getByRole('radio', { name: /Sun-synchronous orbit design rationale/ }).check();
    await page.getByRole('button', { name: 'Create' }).click();
    await page.waitForURL(/\/memos\/\d+$/);
    memoUrl = page.url();

    const sso = page.locator('section[data-block-id="sso"]');
    const inclination = sso.locator('td[data-output="inclinationDeg"]');
    const liveValue = page.locator('p', { hasText: 'requires an inclination of' }).locator('[data-live-value]').first();
    await expect.poll(() => inclination.textContent(), { timeout: 20_000 }).toMatch(/°$/);
    await expect.poll(() => liveValue.textContent()).toBe(await inclination.textContent());
    await screenshot(page, 'editor-template-opened');

    // The altitude comes from the repeat-orbit block; type one instead, in megametres.
    await sso.getByRole('button', { name: /Type Mean altitude.* instead/ }).click();
    const altitude = sso.locator('#in-sso-altitudeKm');
    await altitude.fill('0.705 Mm');
    await expect.poll(() => sso.getByText('= 705 km').count()).toBe(1);
    const want = expectedInclination(705);
    await expect.poll(() => inclination.textContent(), { timeout: 20_000 }).toBe(want);
    await expect.poll(() => liveValue.textContent()).toBe(want);
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await screenshot(page, 'editor-altitude-changed');

    await page.reload();
    const ssoAgain = page.locator('section[data-block-id="sso"]');
    await expect.poll(() => ssoAgain.locator('#in-sso-altitudeKm').inputValue(), { timeout: 20_000 }).toBe('0.705 Mm');
    await expect
      .poll(() => ssoAgain.locator('td[data-output="inclinationDeg"]').textContent(), { timeout: 20_000 })
      .toBe(want);
    await expect
      .poll(() =>
        page.locator('p', { hasText: 'requires an inclination of' }).locator('[data-live-value]').first().textContent(),
      )
      .toBe(want);
    await page.close();
  });

  it('analyst: a bad input names the field and keeps the last good result', async () => {
    const page = await context.newPage();
    await page.goto(memoUrl);
    const sso = page.locator('section[data-block-id="sso"]');
    await expect
      .poll(() => sso.locator('td[data-output="inclinationDeg"]').textContent(), { timeout: 20_000 })
      .toMatch(/°$/);
    await sso.locator('#in-sso-altitudeKm').fill('98 deg');
    await expect.poll(() => sso.getByText('“98 deg” is not a length; the field is in km').count()).toBeGreaterThan(0);
    await sso.locator('#in-sso-altitudeKm').fill('40 km');
    await expect.poll(() => sso.getByRole('alert').textContent(), { timeout: 20_000 }).toMatch(/Mean altitude/);
    await expect
      .poll(() => sso.locator('td[data-output="inclinationDeg"]').textContent())
      .toBe(expectedInclination(705));
    await screenshot(page, 'editor-bad-input');

    // Feed the altitude from the repeat-orbit block again, through the output picker.
    await sso.getByRole('button', { name: /Feed Mean altitude.* from another block/ }).click();
    await sso
      .getByRole('combobox', { name: /Feed Mean altitude.* from another block/ })
      .selectOption('repeat|altitudeKm');
    await expect
      .poll(() => sso.getByText('from', { exact: false }).filter({ hasText: 'Selected repeat orbit' }).count())
      .toBeGreaterThan(0);
    const repeat = runCalc('repeat-orbit', { revolutions: 175, days: 12 });
    if (!repeat.ok) throw new Error(repeat.error);
    await expect
      .poll(() => sso.locator('td[data-output="inclinationDeg"]').textContent(), { timeout: 20_000 })
      .toBe(expectedInclination(repeat.result.outputs.altitudeKm as number));
    await page.close();
  });

  it('reviewer: opens the demo memo read-only, with computed numbers and no toolbar', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, email('reviewer'), DEMO_PASSWORD);
    await page.waitForURL(`${baseUrl}/memos`);
    await page.getByRole('link', { name: 'TERNLIGHT-1 orbit design rationale' }).click();
    await page.waitForURL(/\/memos\/\d+$/);
    await expect
      .poll(() => page.locator('section[data-block-id="sso"] td[data-output="inclinationDeg"]').textContent(), {
        timeout: 20_000,
      })
      .toMatch(/°$/);
    expect(await page.getByRole('toolbar').count()).toBe(0);
    expect(await page.getByText('read-only', { exact: true }).count()).toBe(1);
    expect(await page.locator('[contenteditable="true"]').count()).toBe(0);
    expect(await page.locator('section[data-block-id="repeat"] input').first().getAttribute('readonly')).not.toBeNull();
    await screenshot(page, 'editor-reviewer-read-only');
    await page.close();
  });
});
