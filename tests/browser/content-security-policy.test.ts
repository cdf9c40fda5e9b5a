import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * The pages' Content-Security-Policy in Chromium (issue 11, item 7): a memo
 * made from the design-rationale template (calc blocks, live values, five
 * figures) loads in the editor with no CSP violation reported, its figures
 * are drawn (vega with vega-interpreter, no eval), and its PDF still opens.
 */

const baseUrl = inject('baseUrl');
const analystEmail = DEMO_USERS.find((u) => u.role === 'analyst')!.email;

let context: BrowserContext;
let close: () => Promise<void>;
let memoId: number;

beforeAll(async () => {
  ({ context, close } = await openBrowser());
  // Violations as the page itself sees them; an init script runs outside the page's CSP.
  await context.addInitScript(() => {
    const w = window as unknown as { cspViolations: string[] };
    w.cspViolations = [];
    document.addEventListener('securitypolicyviolation', (e) =>
      w.cspViolations.push(
        `${e.violatedDirective} ${e.blockedURI} ${e.sample} at ${e.sourceFile}:${e.lineNumber}:${e.columnNumber}`,
      ),
    );
  });
  const analyst = new HttpSession(baseUrl);
  expect(await analyst.signIn(analystEmail, DEMO_PASSWORD)).toBe(true);
  const created = await analyst.json<{ id: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: 'CSP check memo', templateId: 'sso-design-rationale' }),
  });
  expect(created.status).toBe(201);
  memoId = created.body.id;
});
afterAll(async () => close());

describe('memo page under the Content-Security-Policy', () => {
  it('loads, draws its figures, accepts typing and offers its PDF, with no CSP violation', async () => {
    const page = await signInAsDemo(context, baseUrl, analystEmail, DEMO_PASSWORD);
    const consoleProblems: string[] = [];
    page.on('console', (m) => {
      if (/content security policy|refused to/i.test(m.text())) consoleProblems.push(m.text());
    });
    const response = await page.goto(`${baseUrl}/memos/${memoId}`);
    expect(response?.headers()['content-security-policy']).toMatch(/script-src 'self' 'nonce-/);
    await expect.poll(() => page.locator('#memo-title').inputValue(), { timeout: 20_000 }).toBe('CSP check memo');
    // Figures: vega draws each as an SVG with marks in it.
    await expect
      .poll(() => page.locator('.figure-svg svg path, .figure-svg svg line').count(), { timeout: 30_000 })
      .toBeGreaterThan(10);
    await expect.poll(() => page.locator('.figure-svg svg').count(), { timeout: 30_000 }).toBe(5);
    expect(await page.getByText('The figure could not be drawn').count()).toBe(0);
    // The editor takes typing.
    const editor = page.locator('.ProseMirror').first();
    await editor.locator('p').first().click();
    await page.keyboard.press('End');
    await page.keyboard.type(' Typed under the policy.');
    await expect.poll(() => editor.textContent()).toContain('Typed under the policy.');
    await screenshot(page, 'csp-memo-with-figures');
    // The PDF link still delivers a PDF.
    const pdf = await page.request.get(`${baseUrl}/api/memos/${memoId}/pdf`);
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toBe('application/pdf');
    const violations = await page.evaluate(() => (window as unknown as { cspViolations: string[] }).cspViolations);
    expect(violations).toEqual([]);
    expect(consoleProblems).toEqual([]);
    await page.close();
  });
});
