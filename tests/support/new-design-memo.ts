import { expect } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { signInThroughForm } from './browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * Signs the demo analyst in and creates a memo from a template (the design rationale unless named);
 * for the design rationale, resolves once its sso block has a result.
 */
export async function newDesignMemoAsAnalyst(
  context: BrowserContext,
  baseUrl: string,
  title: string,
  template = /Sun-synchronous orbit design rationale/,
): Promise<Page> {
  await context.clearCookies();
  const page = await context.newPage();
  await signInThroughForm(page, baseUrl, DEMO_USERS.find((u) => u.role === 'analyst')!.email, DEMO_PASSWORD);
  await page.waitForURL(`${baseUrl}/memos`);
  await page.getByRole('button', { name: 'New memo' }).click();
  await page.getByLabel('Title').fill(title);
  await page.getByRole('radio', { name: template }).check();
  await page.getByRole('button', { name: 'Create' }).click();
  await page.waitForURL(/\/memos\/\d+$/);
  if (template.source.includes('design rationale')) {
    await expect
      .poll(() => page.locator('section[data-block-id="sso"] td[data-output="inclinationDeg"]').textContent(), {
        timeout: 20_000,
      })
      .toMatch(/°$/);
  }
  return page;
}
