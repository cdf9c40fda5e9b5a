import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser } from '../support/browser';
import { newDesignMemoAsAnalyst } from '../support/new-design-memo';

const baseUrl = inject('baseUrl');

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

/**
 * The calc-kind and value lists follow the combobox-with-listbox pattern of the WAI-ARIA Authoring
 * Practices Guide: focus in the filter field, arrows move aria-activedescendant, Enter chooses, Escape closes.
 */
describe('pick lists in the editor, by keyboard', () => {
  it('analyst: inserts a calc block and quotes a value without the mouse', async () => {
    const page = await newDesignMemoAsAnalyst(context, baseUrl, 'TERNLIGHT-1 pick lists by keyboard');

    const blocksBefore = await page.locator('section[data-block-id]').count();
    await page.locator('.ProseMirror p').last().click();
    await page.keyboard.press('Control+Alt+K');
    const filter = page.getByRole('combobox', { name: 'Filter calculation kinds' });
    await expect.poll(() => filter.evaluate((el) => el === document.activeElement)).toBe(true);
    expect(await filter.getAttribute('aria-expanded')).toBe('true');
    const list = page.getByRole('listbox', { name: 'Calculation kinds' });
    expect(await filter.getAttribute('aria-controls')).toBe(await list.getAttribute('id'));
    const allKinds = await list.getByRole('option').count();
    expect(allKinds).toBeGreaterThan(5);

    // Type-to-filter: two words in any order narrow the list to the eclipse kinds.
    await page.keyboard.type('eclipse orbit');
    await expect.poll(() => list.getByRole('option').count()).toBeLessThan(allKinds);
    const titles = await list.getByRole('option').allTextContents();
    expect(titles.every((t) => /eclipse/i.test(t))).toBe(true);

    // The active option is the one aria-activedescendant names, and it is marked selected.
    const activeId = await filter.getAttribute('aria-activedescendant');
    expect(await page.locator(`[id="${activeId}"]`).getAttribute('aria-selected')).toBe('true');
    await list.locator('xpath=..').screenshot({ path: 'test-results/screenshots/pick-list-kinds-filtered.png' });
    await page.keyboard.press('Enter');
    await expect.poll(() => list.count()).toBe(0);
    await expect.poll(() => page.locator('section[data-block-id]').count()).toBe(blocksBefore + 1);

    // Value list: arrows wrap, Escape closes and gives the caret back to the text.
    await page.locator('.ProseMirror p').last().click();
    await page.keyboard.press('Control+Alt+V');
    const values = page.getByRole('listbox', { name: 'Values to quote' });
    const valueFilter = page.getByRole('combobox', { name: 'Filter values to quote' });
    await expect.poll(() => values.getByRole('option').count()).toBeGreaterThan(2);
    const first = await valueFilter.getAttribute('aria-activedescendant');
    await page.keyboard.press('ArrowUp');
    const last = await valueFilter.getAttribute('aria-activedescendant');
    expect(last).not.toBe(first);
    expect(await values.getByRole('option').last().getAttribute('id')).toBe(last);
    await page.keyboard.press('ArrowDown');
    expect(await valueFilter.getAttribute('aria-activedescendant')).toBe(first);
    await page.keyboard.press('Escape');
    await expect.poll(() => values.count()).toBe(0);
    await expect.poll(() => page.evaluate(() => document.activeElement?.classList.contains('ProseMirror'))).toBe(true);

    // Quote the sun-synchronous inclination by filtering on its label and pressing Enter.
    const liveBefore = await page.locator('[data-live-value]').count();
    await page.keyboard.press('Control+Alt+V');
    // The words match the sso block's name, so its outputs stay and the figure (captioned without "selected") goes.
    await page.keyboard.type('sun-synchronous inclination selected');
    await expect.poll(() => values.getByRole('option').first().textContent()).toMatch(/^Sun-synchronous inclination/);
    expect(
      await values
        .getByRole('option')
        .filter({ hasText: /^Figure/ })
        .count(),
    ).toBe(0);
    await values.locator('xpath=..').screenshot({ path: 'test-results/screenshots/pick-list-values-filtered.png' });
    await page.keyboard.press('Enter');
    await expect.poll(() => page.locator('[data-live-value]').count()).toBe(liveBefore + 1);
    await page.close();
  }, 120_000);
});
