import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { chromium, type BrowserContext, type Page } from 'playwright-core';

/** Debian's Chromium, headless, quiet on a closed network; a fresh profile per context. */
export async function openBrowser(): Promise<{ context: BrowserContext; close: () => Promise<void> }> {
  const profile = fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-chromium-'));
  const context = await chromium.launchPersistentContext(profile, {
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    viewport: { width: 1280, height: 860 },
    args: [
      '--no-sandbox',
      '--disable-gpu',
      '--disable-quic',
      '--no-first-run',
      '--disable-background-networking',
      '--disable-component-update',
      '--disable-sync',
    ],
  });
  return {
    context,
    close: async () => {
      await context.close();
      fs.rmSync(profile, { recursive: true, force: true });
    },
  };
}

/** Screenshots for a person to look at, kept under test-results/. */
export async function screenshot(page: Page, name: string): Promise<void> {
  const dir = path.resolve('test-results', 'screenshots');
  fs.mkdirSync(dir, { recursive: true });
  await page.screenshot({ path: path.join(dir, `${name}.png`), fullPage: true });
}

export async function signInThroughForm(page: Page, baseUrl: string, email: string, password: string): Promise<void> {
  await page.goto(`${baseUrl}/signin`);
  await page.getByLabel('E-mail').fill(email);
  await page.getByLabel('Password').fill(password);
  await page.getByRole('button', { name: 'Sign in' }).click();
}

/** A fresh signed-in page for a demo person: cookies cleared, signed in through the form, on the memo list. */
export async function signInAsDemo(
  context: BrowserContext,
  baseUrl: string,
  email: string,
  password: string,
): Promise<Page> {
  await context.clearCookies();
  const page = await context.newPage();
  await signInThroughForm(page, baseUrl, email, password);
  await page.waitForURL(`${baseUrl}/memos`);
  return page;
}
