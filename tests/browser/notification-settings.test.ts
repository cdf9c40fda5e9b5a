import { afterAll, beforeAll, describe, expect, inject, it } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * The reviewer in Chromium: a memo submitted to them shows under Review
 * notes with the submit note; the e-mail switch of one kind is saved and
 * still off after a reload (checked against the API too), then put back.
 */

const baseUrl = inject('baseUrl');
const TITLE = `TERNLIGHT-1 settings trial ${Date.now().toString(36)}`;
const person = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const WAIT = { timeout: 10_000 };

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('review notes and notification e-mail settings in Chromium', () => {
  it('the reviewer sees the submission with its note, and switches “frozen” mail off and on again', async () => {
    const analyst = await signInAsDemo(context, baseUrl, person('analyst').email, DEMO_PASSWORD);
    const created = await analyst.request.post(`${baseUrl}/api/memos`, {
      data: { title: TITLE, templateId: 'sso-design-rationale' },
    });
    const memoId = ((await created.json()) as { id: number }).id;
    const reviewers = (await (await analyst.request.get(`${baseUrl}/api/users?role=reviewer`)).json()) as {
      users: { id: number; name: string }[];
    };
    const reviewerId = reviewers.users.find((u) => u.name === person('reviewer').name)!.id;
    expect(
      (
        await analyst.request.post(`${baseUrl}/api/memos/${memoId}/transitions`, {
          data: { action: 'submit', reviewerIds: [reviewerId], note: 'The eclipse table is new in this round.' },
        })
      ).status(),
    ).toBe(200);
    await analyst.close();
    await context.clearCookies();

    const page = await signInAsDemo(context, baseUrl, person('reviewer').email, DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos`);
    await page.getByRole('button', { name: /^Review notes/ }).click();
    const note = page
      .getByRole('link', { name: new RegExp(`${person('analyst').name} submitted for your review DM-\\d{4}-\\d{3}`) })
      .filter({ hasText: 'The eclipse table is new in this round.' });
    await expect.poll(() => note.count(), WAIT).toBe(1);
    await screenshot(page, 'review-notes-submitted');

    await page.goto(`${baseUrl}/settings/notifications`);
    const frozen = page.getByRole('checkbox', { name: /A memo is frozen as a revision/ });
    await expect.poll(() => frozen.isChecked(), WAIT).toBe(true);
    const saved = page.waitForResponse(
      (r) => r.url().endsWith('/api/me/notification-settings') && r.request().method() === 'PUT',
    );
    await frozen.uncheck();
    expect((await saved).status()).toBe(200);
    await page.reload();
    await expect
      .poll(() => page.getByRole('checkbox', { name: /A memo is frozen as a revision/ }).isChecked(), WAIT)
      .toBe(false);
    expect(
      (
        (await (await page.request.get(`${baseUrl}/api/me/notification-settings`)).json()) as {
          email: Record<string, boolean>;
        }
      ).email.frozen,
    ).toBe(false);
    await screenshot(page, 'notification-settings');
    await page.getByRole('checkbox', { name: /A memo is frozen as a revision/ }).check();
    await expect
      .poll(
        async () =>
          (
            (await (await page.request.get(`${baseUrl}/api/me/notification-settings`)).json()) as {
              email: Record<string, boolean>;
            }
          ).email.frozen,
        WAIT,
      )
      .toBe(true);
    await page.close();
  });
});
