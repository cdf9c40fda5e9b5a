import { createRequire } from 'node:module';
import fs from 'node:fs';
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo, signInThroughForm } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * The main pages checked with axe-core (Deque's rules for WCAG 2.0/2.1
 * levels A and AA, https://dequeuniversity.com/rules/axe/4.14) in Chromium:
 * no violation of impact "serious" or "critical" — colour contrast of at
 * least 4.5:1 for normal text (WCAG 2.1 success criterion 1.4.3) is one of
 * them. And at a 390 × 844 CSS-pixel window (a common phone) no page
 * scrolls sideways (WCAG 2.1 SC 1.4.10 Reflow asks for 320 px).
 */

const baseUrl = inject('baseUrl');
const person = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const axeSource = fs.readFileSync(createRequire(import.meta.url).resolve('axe-core/axe.min.js'), 'utf8');
const WAIT = { timeout: 20_000 };
const PHONE = { width: 390, height: 844 };
const DESKTOP = { width: 1280, height: 860 };

interface AxeViolation {
  id: string;
  impact: string | null;
  help: string;
  nodes: { target: string[]; failureSummary?: string }[];
}

/** Serious and critical axe violations on the page as it stands, one line each with the elements concerned. */
async function seriousViolations(page: Page): Promise<string[]> {
  // Evaluated through the DevTools protocol, which the page's content security policy does not govern.
  if (!(await page.evaluate('typeof window.axe === "object"'))) await page.evaluate(axeSource);
  const violations = (await page.evaluate(
    `window.axe.run(document, { runOnly: { type: 'tag', values: ['wcag2a', 'wcag2aa', 'wcag21a', 'wcag21aa'] }, resultTypes: ['violations'] }).then((r) => r.violations.map((v) => ({ id: v.id, impact: v.impact, help: v.help, nodes: v.nodes.slice(0, 5).map((n) => ({ target: n.target, failureSummary: n.failureSummary })) })))`,
  )) as AxeViolation[];
  return violations
    .filter((v) => v.impact === 'serious' || v.impact === 'critical')
    .map(
      (v) =>
        `${v.impact} ${v.id} (${v.help}): ${v.nodes.map((n) => `${n.target.join(' ')} — ${n.failureSummary?.replace(/\s+/g, ' ') ?? ''}`).join('; ')}`,
    );
}

/** How far the page scrolls sideways beyond the window, in CSS pixels (0 when it does not). */
const sidewaysOverflow = (page: Page) =>
  page.evaluate(() => (document.scrollingElement?.scrollWidth ?? 0) - window.innerWidth);

/** Checks a page at desktop and phone width: axe, sideways scrolling, and a screenshot of each to look at. */
async function checkPage(page: Page, name: string, ready: () => Promise<unknown>): Promise<void> {
  await page.setViewportSize(DESKTOP);
  await ready();
  // Soft: every problem of every page is listed in one run.
  expect.soft(await seriousViolations(page), `${name} at ${DESKTOP.width} px`).toEqual([]);
  await screenshot(page, `a11y-${name}-desktop`);
  await page.setViewportSize(PHONE);
  await page.waitForTimeout(300);
  expect.soft(await sidewaysOverflow(page), `${name} scrolls sideways at ${PHONE.width} px`).toBeLessThanOrEqual(0);
  expect.soft(await seriousViolations(page), `${name} at ${PHONE.width} px`).toEqual([]);
  await screenshot(page, `a11y-${name}-phone`);
  await page.setViewportSize(DESKTOP);
}

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('accessibility and small screens, in Chromium', () => {
  let memoId = 0;

  it('sign-in page', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await page.goto(`${baseUrl}/signin`);
    await checkPage(page, 'signin', () => page.getByLabel('E-mail').waitFor());
    await page.close();
  });

  it('analyst: memo list, memo editor, settings', async () => {
    const page = await signInAsDemo(context, baseUrl, person('analyst').email, DEMO_PASSWORD);
    const made = await page.request.post(`${baseUrl}/api/memos`, {
      data: { title: 'TERNLIGHT-1 accessibility trial', templateId: 'sso-design-rationale' },
    });
    expect(made.status()).toBe(201);
    memoId = ((await made.json()) as { id: number }).id;
    await page.reload();
    await checkPage(page, 'memo-list', () =>
      expect.poll(() => page.getByRole('link', { name: 'TERNLIGHT-1 accessibility trial' }).count(), WAIT).toBe(1),
    );

    await page.goto(`${baseUrl}/memos/${memoId}`);
    const altitude = page.locator('section[data-block-id="repeat"] td[data-output="altitudeKm"]');
    await checkPage(page, 'memo-editor', async () => {
      await expect.poll(() => altitude.textContent(), WAIT).toMatch(/km$/);
      // Figures are drawn once their results arrive.
      await expect.poll(() => page.locator('figure svg').count(), WAIT).toBeGreaterThan(0);
    });
    // Every drawn figure has a name a screen reader can read.
    const unnamed = await page.evaluate(
      () =>
        [...document.querySelectorAll('figure svg')].filter((svg) => {
          const named =
            svg.closest('[role="img"][aria-label]') ??
            (svg.getAttribute('role') === 'img' &&
              (svg.getAttribute('aria-label') || svg.querySelector('title')?.textContent));
          return !named;
        }).length,
    );
    expect(unnamed).toBe(0);

    await page.goto(`${baseUrl}/settings/notifications`);
    await checkPage(page, 'settings', () => page.getByRole('heading').first().waitFor());
    await page.close();
  });

  it('reviewer: review view and comparison', async () => {
    // The analyst sends the memo to the reviewer (here, so that this check does not depend on the one above passing).
    const analyst = await signInAsDemo(context, baseUrl, person('analyst').email, DEMO_PASSWORD);
    const dir = (await (await analyst.request.get(`${baseUrl}/api/users?role=reviewer`)).json()) as {
      users: { id: number; name: string }[];
    };
    const reviewerId = dir.users.find((u) => u.name === person('reviewer').name)!.id;
    expect(
      (
        await analyst.request.post(`${baseUrl}/api/memos/${memoId}/transitions`, {
          data: { action: 'submit', reviewerIds: [reviewerId] },
        })
      ).status(),
    ).toBe(200);
    await analyst.close();
    const page = await signInAsDemo(context, baseUrl, person('reviewer').email, DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos/${memoId}`);
    await checkPage(page, 'review-view', () =>
      expect
        .poll(() => page.locator('section[data-block-id="repeat"] td[data-output="altitudeKm"]').textContent(), WAIT)
        .toMatch(/km$/),
    );
    await page.goto(`${baseUrl}/memos/${memoId}/compare`);
    await checkPage(page, 'compare', () => page.getByRole('heading', { level: 1 }).waitFor());
    await page.close();
  });

  it('customer: portal', async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, person('customer').email, DEMO_PASSWORD);
    await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
    await page.goto(`${baseUrl}/portal`);
    await checkPage(page, 'portal', () => page.getByRole('heading', { level: 1 }).waitFor());
    await page.close();
  });

  it('admin: audit trail', async () => {
    const page = await signInAsDemo(context, baseUrl, person('admin').email, DEMO_PASSWORD);
    await page.goto(`${baseUrl}/admin/audit`);
    await checkPage(page, 'audit', () => page.getByRole('heading', { level: 1 }).waitFor());
    await page.close();
  });
});
