import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, signInAsDemo } from '../support/browser';
import { demoEmail, signedIn } from '../support/delivery-flow';
import { DEMO_PASSWORD } from '@/lib/demo/demo-organisation';

/**
 * As the analyst, in Chromium: a station list pasted as CSV into a *Station contacts*
 * block (computed in the worker pool, it is a heavy kind) gives a table per station,
 * and a sentence quotes the daily contact minutes of all stations as a live value —
 * the same number POST /api/calc gives for the same inputs (to its 0.1 min display).
 * A station list with a latitude of 95° is refused naming line and column.
 */
const baseUrl = inject('baseUrl');
let context: BrowserContext;
let close: () => Promise<void>;

const SITES =
  'name, latitude, longitude, altitude (m), minimum elevation\nNorthmere Basin, 52.10, -3.20, 120, 5\nKestrel Ridge, 64.50, 18.00, 410, 10\nSaltmarsh Point, -12.40, 130.80, 30, 5\n';

beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => {
  await close?.();
});

async function memoWithSites(sites: string): Promise<number> {
  const analyst = await signedIn(baseUrl, 'analyst');
  const created = await analyst.json<{ id: number; version: number }>('/api/memos', {
    method: 'POST',
    body: JSON.stringify({ title: 'TERNLIGHT-1 ground contacts' }),
  });
  const content = {
    type: 'doc',
    content: [
      { type: 'heading', attrs: { level: 1 }, content: [{ type: 'text', text: 'Ground contacts' }] },
      {
        type: 'calcBlock',
        attrs: {
          blockId: 'contacts',
          kind: 'station-contacts',
          label: 'Contacts with the three stations',
          inputs: { sites: { text: sites }, altitudeKm: { text: '692.8 km' }, days: { text: '3' } },
        },
      },
      {
        type: 'paragraph',
        content: [
          { type: 'text', text: 'The three stations together see TERNLIGHT-1 for ' },
          { type: 'liveValue', attrs: { blockId: 'contacts', output: 'dailyContactMin' } },
          { type: 'text', text: ' a day.' },
        ],
      },
    ],
  };
  expect(
    (
      await analyst.json(`/api/memos/${created.body.id}`, {
        method: 'PATCH',
        body: JSON.stringify({ content, baseVersion: created.body.version }),
      })
    ).status,
  ).toBe(200);
  return created.body.id;
}

describe('site lists as the analyst', () => {
  it('a pasted station list gives the contacts table and a sentence quoting the daily contact minutes', async () => {
    const analyst = await signedIn(baseUrl, 'analyst');
    const api = await analyst.json<{ outputs: Record<string, number> }>('/api/calc', {
      method: 'POST',
      body: JSON.stringify({ kind: 'station-contacts', inputs: { sites: SITES, altitudeKm: 692.8, days: 3 } }),
    });
    expect(api.status).toBe(200);
    const id = await memoWithSites(SITES);
    const page = await signInAsDemo(context, baseUrl, demoEmail('analyst'), DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos/${id}`);
    const live = page.locator('[data-live-value="ok"]').first();
    await expect
      .poll(() => live.textContent(), { timeout: 60_000 })
      .toContain(api.body.outputs.dailyContactMin.toFixed(1));
    const block = page.locator('section.calc-block').first();
    await expect.poll(() => block.textContent(), { timeout: 10_000 }).toContain('Kestrel Ridge');
    await page.locator('.ProseMirror').screenshot({ path: 'test-results/screenshots/station-contacts.png' });
    await page.close();
  });

  it('a station list with a latitude of 95° is refused naming its line and column', async () => {
    const id = await memoWithSites(SITES.replace('64.50', '95'));
    const page = await signInAsDemo(context, baseUrl, demoEmail('analyst'), DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos/${id}`);
    const block = page.locator('section.calc-block').first();
    await expect
      .poll(() => block.getByRole('alert').first().textContent(), { timeout: 30_000 })
      .toMatch(/line 3, latitude: 95 deg is outside -90 … 90 deg/i);
    await page.close();
  });
});
