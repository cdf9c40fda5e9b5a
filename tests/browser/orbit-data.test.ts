import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { startAppServer, type AppServer } from '../../scripts/support/start-app-server';
import { openBrowser, screenshot, signInAsDemo, signInThroughForm } from '../support/browser';
import { demoEmail, frozenMemo, signedIn } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';
import type { HttpSession } from '../../scripts/support/http-session';

/**
 * As the analyst and the customer, in Chromium: revision A of a memo carries
 * its design orbit as a CCSDS OPM; the analyst pastes that OPM into an
 * *Orbit data message* block of another memo and sees the design's mean
 * elements come back (mean altitude of the 175/12 repeat orbit to 1 m, shown to
 * 3 decimals); a malformed message names its line and keyword; the customer's
 * portal offers the OPM and OEM with their SHA-256. Own app instance: the
 * release to the demo customer would change what other files expect.
 */

let app: AppServer;
let baseUrl = '';
let context: BrowserContext;
let close: () => Promise<void>;
let memoId = 0;
let analyst: HttpSession;
let opm = '';

beforeAll(async () => {
  app = await startAppServer();
  baseUrl = app.baseUrl;
  const [a, reviewer, cm] = await Promise.all(
    (['analyst', 'reviewer', 'config-manager'] as const).map((r) => signedIn(baseUrl, r)),
  );
  analyst = a;
  ({ memoId } = await frozenMemo({ analyst, reviewer, cm }, 'TERNLIGHT-1 orbit data baseline'));
  opm = await (await analyst.request(`/api/memos/${memoId}/revisions/A/opm`)).text();
  const customers = await cm.json<{ users: { id: number; name: string }[] }>('/api/users?role=customer');
  const samirId = customers.body.users.find((u) => u.name === 'Samir Dunmore')!.id;
  expect(
    (await cm.json(`/api/memos/${memoId}/distribution`, { method: 'POST', body: JSON.stringify({ userId: samirId }) }))
      .status,
  ).toBe(201);
  expect(
    (
      await cm.json(`/api/memos/${memoId}/revisions/A/releases`, {
        method: 'POST',
        body: JSON.stringify({
          recipientIds: [samirId],
          coverNote: 'Revision A with the design orbit as CCSDS messages.',
        }),
      })
    ).status,
  ).toBe(201);
  ({ context, close } = await openBrowser());
}, 300_000);
afterAll(async () => {
  await close?.();
  app?.stop();
});

/** A memo holding one orbit-message block with `message` pasted, saved through the API. */
async function memoWithMessage(title: string, message: string): Promise<number> {
  const created = await analyst.json<{ id: number; version: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title }),
  });
  const content = {
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Orbit as delivered' }] },
      {
        type: 'calcBlock',
        attrs: {
          blockId: 'delivered',
          kind: 'orbit-message',
          label: 'Design orbit read back from revision A',
          inputs: { message: { text: message } },
        },
      },
    ],
  };
  const saved = await analyst.json(`/api/memos/${created.body.id}`, {
    method: 'PATCH',
    body: JSON.stringify({ content, baseVersion: created.body.version }),
  });
  expect(saved.status).toBe(200);
  return created.body.id;
}

describe('orbit data messages as the analyst and the customer', () => {
  it("analyst: the revision's OPM pasted into an orbit-message block gives the design's mean altitude and inclination", async () => {
    const calc = async (kind: string, inputs: Record<string, unknown>) =>
      (
        await analyst.json<{ outputs: Record<string, number> }>('/api/calc', {
          method: 'POST',
          body: JSON.stringify({ kind, inputs }),
        })
      ).body.outputs;
    const repeat = await calc('repeat-orbit', { revolutions: 175, days: 12 });
    const id = await memoWithMessage('Launcher hand-over check', opm);
    const page = await signInAsDemo(context, baseUrl, demoEmail('analyst'), DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos/${id}`);
    const block = page.locator('section.calc-block').first();
    const altitude = block.locator('[data-output="meanAltitudeKm"]');
    await expect.poll(() => altitude.textContent(), { timeout: 20_000 }).toContain(repeat.altitudeKm.toFixed(3));
    expect(await block.locator('[data-output="refFrame"]').textContent()).toContain('EME2000');
    expect(await block.getByRole('button', { name: 'Upload file…' }).count()).toBe(1);
    expect(await block.getByRole('button', { name: 'Download OPM' }).count()).toBe(1);
    await block.screenshot({ path: 'test-results/screenshots/orbit-message-import.png' });
    await page.close();
  });

  it('analyst: a message with a wrong unit is refused with its line and keyword, nothing computed from it', async () => {
    const id = await memoWithMessage('Malformed hand-over', opm.replace(/^(X\s+= \S+) \[km\]$/m, '$1 [m]'));
    const page = await signInAsDemo(context, baseUrl, demoEmail('analyst'), DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos/${id}`);
    const block = page.locator('section.calc-block').first();
    await expect
      .poll(() => block.getByRole('alert').first().textContent(), { timeout: 20_000 })
      .toMatch(/line \d+, X: unit \[m\] where the standard requires \[km\]/i);
    await block.screenshot({ path: 'test-results/screenshots/orbit-message-refused.png' });
    await page.close();
  });

  it("customer: the portal's revision page offers the OPM and OEM with their SHA-256, and the OPM downloads", async () => {
    await context.clearCookies();
    const page = await context.newPage();
    await signInThroughForm(page, baseUrl, demoEmail('customer'), DEMO_PASSWORD);
    await page.waitForURL((url) => !url.pathname.startsWith('/signin'));
    await page.goto(`${baseUrl}/portal/${memoId}/A`);
    const offer = page.getByRole('region', { name: 'Orbit data' });
    await expect.poll(() => offer.textContent(), { timeout: 15_000 }).toContain('Download OPM (design state)');
    expect(await offer.textContent()).toContain('Download OEM (one day, 60 s)');
    const href = await offer.getByRole('link', { name: 'Download OPM (design state)' }).getAttribute('href');
    const res = await page.request.get(`${baseUrl}${href}`);
    expect(res.status()).toBe(200);
    expect(await res.text()).toBe(opm);
    await screenshot(page, 'portal-orbit-data');
    await page.close();
  });
});
