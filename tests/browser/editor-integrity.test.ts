import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import { getCalcKind, runCalc } from '@/lib/calc';
import { formatValue } from '@/lib/format/format-output';

/**
 * Three ways the editor could show or keep something other than what the
 * engine and the server hold, each driven as an analyst would in Chromium:
 * - a re-fed input must show the engine's result for the fed value, not the
 *   result of the value typed before it;
 * - after "Send to reviewers" the memo text and every control inside calc
 *   blocks and figures stop taking input, and the page says why;
 * - a calc block cut and pasted keeps its id, so live values and figures
 *   bound to it keep working.
 * Expected numbers come from the engine (lib/calc runCalc) at each output's
 * display precision, as the page formats them.
 */

const baseUrl = inject('baseUrl');
const email = (role: string) => DEMO_USERS.find((u) => u.role === role)!.email;

function shown(kind: string, output: string, inputs: Record<string, unknown>): string {
  const out = runCalc(kind, inputs);
  if (!out.ok) throw new Error(out.error);
  const field = getCalcKind(kind)!.outputs.find((o) => o.name === output)!;
  return formatValue(out.result.outputs[output], field.unit, field.precision);
}

function repeatAltitudeKm(): number {
  const repeat = runCalc('repeat-orbit', { revolutions: 175, days: 12 });
  if (!repeat.ok) throw new Error(repeat.error);
  return repeat.result.outputs.altitudeKm as number;
}

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

async function newRationaleMemo(page: Page, title: string): Promise<string> {
  await page.getByRole('button', { name: 'New memo' }).click();
  await page.getByLabel('Title').fill(title);
  await page.getByRole('radio', { name: /Sun-synchronous orbit design rationale/ }).check();
  await page.getByRole('button', { name: 'Create' }).click();
  await page.waitForURL(/\/memos\/\d+$/);
  return page.url();
}

const inclinationSentence = (page: Page) =>
  page.locator('p', { hasText: 'requires an inclination of' }).locator('[data-live-value]').first();

describe('editor integrity in Chromium', () => {
  it('re-feeding a typed input shows the result for the fed value in the block and the sentence (no stale 712 km result)', async () => {
    const page = await signInAsDemo(context, baseUrl, email('analyst'), DEMO_PASSWORD);
    await newRationaleMemo(page, 'TERNLIGHT-1 rationale, re-feed trial');
    const sso = page.locator('section[data-block-id="sso"]');
    const inclination = sso.locator('td[data-output="inclinationDeg"]');
    const fed = shown('sso-inclination', 'inclinationDeg', { altitudeKm: repeatAltitudeKm(), eccentricity: 0.0011 });
    const typed = shown('sso-inclination', 'inclinationDeg', { altitudeKm: 712, eccentricity: 0.0011 });
    expect(typed).not.toBe(fed);
    await expect.poll(() => inclination.textContent(), { timeout: 20_000 }).toBe(fed);

    await sso.getByRole('button', { name: /Type Mean altitude.* instead/ }).click();
    await sso.locator('#in-sso-altitudeKm').fill('712 km');
    await expect.poll(() => inclination.textContent(), { timeout: 20_000 }).toBe(typed);
    await expect.poll(() => inclinationSentence(page).textContent()).toBe(typed);

    await sso.getByRole('button', { name: /Feed Mean altitude.* from another block/ }).click();
    await sso
      .getByRole('combobox', { name: /Feed Mean altitude.* from another block/ })
      .selectOption('repeat|altitudeKm');
    await expect.poll(() => sso.getByText('Selected repeat orbit').count()).toBeGreaterThan(0);
    await expect.poll(() => inclination.textContent(), { timeout: 20_000 }).toBe(fed);
    await expect.poll(() => inclinationSentence(page).textContent()).toBe(fed);
    await expect.poll(() => sso.getByText('computed on server').count()).toBe(1);
    await screenshot(page, 'editor-refed-input');
    await page.close();
  });

  it('a calc block cut and pasted through HTML keeps its id; its live values still show its numbers', async () => {
    const page = await signInAsDemo(context, baseUrl, email('analyst'), DEMO_PASSWORD);
    await newRationaleMemo(page, 'TERNLIGHT-1 rationale, cut and paste trial');
    const fed = shown('sso-inclination', 'inclinationDeg', { altitudeKm: repeatAltitudeKm(), eccentricity: 0.0011 });
    await expect.poll(() => inclinationSentence(page).textContent(), { timeout: 20_000 }).toBe(fed);
    // Select the block as a node (its drag handle), cut it, and paste it at the end of the memo,
    // through the clipboard events ProseMirror handles (text/html in a DataTransfer).
    await page.locator('section[data-block-id="sso"] [data-drag-handle] span').first().click();
    const pasted = await page.evaluate(() => {
      const editor = document.querySelector('.ProseMirror') as HTMLElement;
      const data = new DataTransfer();
      editor.dispatchEvent(new ClipboardEvent('cut', { clipboardData: data, bubbles: true, cancelable: true }));
      const html = data.getData('text/html');
      const last = editor.lastElementChild as HTMLElement;
      const range = document.createRange();
      range.selectNodeContents(last);
      range.collapse(false);
      const sel = window.getSelection()!;
      sel.removeAllRanges();
      sel.addRange(range);
      return { html, gone: !editor.querySelector('section[data-block-id="sso"]') };
    });
    expect(pasted.gone).toBe(true);
    expect(pasted.html).toContain('data-block-id="sso"');
    await page.waitForTimeout(200);
    await page.evaluate((html) => {
      const editor = document.querySelector('.ProseMirror') as HTMLElement;
      const data = new DataTransfer();
      data.setData('text/html', html);
      editor.dispatchEvent(new ClipboardEvent('paste', { clipboardData: data, bubbles: true, cancelable: true }));
    }, pasted.html);
    await expect.poll(() => page.locator('section[data-block-id="sso"]').count()).toBe(1);
    await expect.poll(() => inclinationSentence(page).textContent(), { timeout: 20_000 }).toBe(fed);
    expect(await page.getByText('missing value', { exact: false }).count()).toBe(0);
    await screenshot(page, 'editor-block-cut-and-pasted');
    await page.close();
  });

  it('after Send to reviewers the memo takes no typing, no node view control is live, and the page says why', async () => {
    const page = await signInAsDemo(context, baseUrl, email('analyst'), DEMO_PASSWORD);
    const url = await newRationaleMemo(page, 'TERNLIGHT-1 rationale, read-only trial');
    await expect
      .poll(() => page.locator('section[data-block-id="sso"] td[data-output="inclinationDeg"]').textContent(), {
        timeout: 20_000,
      })
      .toMatch(/°$/);
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');

    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByLabel(DEMO_USERS.find((u) => u.role === 'reviewer')!.name).check();
    await page.getByRole('button', { name: 'Send to reviewers' }).click();
    await expect.poll(() => page.getByText('read-only', { exact: true }).count(), { timeout: 20_000 }).toBe(1);

    const prose = page.locator('.ProseMirror');
    await expect.poll(() => prose.getAttribute('contenteditable')).toBe('false');
    // The rebuilt read-only editor recomputes its blocks from the cache: let the numbers settle first.
    await expect.poll(() => page.getByText('computing…', { exact: true }).count(), { timeout: 30_000 }).toBe(0);
    await expect.poll(() => inclinationSentence(page).textContent(), { timeout: 20_000 }).toMatch(/°$/);
    const before = await prose.textContent();
    await page.locator('p', { hasText: 'requires an inclination of' }).click();
    await page.keyboard.type('TYPED AFTER SUBMIT');
    expect(await prose.textContent()).toBe(before);
    expect(await page.getByText('TYPED AFTER SUBMIT').count()).toBe(0);

    // No control inside calc blocks or figures takes input any more (a download, marked data-reads-only, changes nothing and stays).
    const live = page.locator(
      'section.calc-block input:not([readonly]):not([disabled]), section.calc-block select:not([disabled]), section.calc-block button:not([disabled]):not([data-reads-only]), .ProseMirror figure input:not([readonly]), .ProseMirror figure select:not([disabled]), .ProseMirror figure button:not([disabled])',
    );
    expect(await live.count()).toBe(0);
    expect(await page.getByRole('toolbar').count()).toBe(0);
    expect(await page.locator('[data-read-only-reason]').textContent()).toBe(
      'The memo is in review; only a draft can be edited.',
    );
    await screenshot(page, 'editor-read-only-after-submit');

    // And the server kept what was saved before submitting.
    await page.goto(url);
    await expect.poll(() => page.locator('[data-read-only-reason]').count(), { timeout: 20_000 }).toBe(1);
    expect(await page.getByText('TYPED AFTER SUBMIT').count()).toBe(0);
    await page.close();
  });
});
