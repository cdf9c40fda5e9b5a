/**
 * The editor never autosaves over content it could not load (issue 11, item 3):
 * a memo row holding a node type the schema does not know (written by direct
 * SQL, as a row stored before the save-time check existed) opens with a clear
 * message, read-only; typing changes nothing on the server (same version, same
 * content). Before the fix the editor loaded an empty document and the next
 * keystroke saved it over the memo. Restoring a saved version resumes editing.
 */
import path from 'node:path';
import sqlite3 from 'sqlite3';
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { HttpSession } from '../../scripts/support/http-session';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

const baseUrl = inject('baseUrl');
const analystEmail = DEMO_USERS.find((u) => u.role === 'analyst')!.email;

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

describe('memo editor with stored content it cannot load', () => {
  it('says so, stays read-only and saves nothing when the analyst types', async () => {
    const api = new HttpSession(baseUrl);
    expect(await api.signIn(analystEmail, DEMO_PASSWORD)).toBe(true);
    const created = await api.json<{ id: number }>('/api/memos', {
      method: 'POST',
      body: JSON.stringify({ title: 'Unloadable content trial' }),
    });
    expect(created.status).toBe(201);
    const memoId = created.body.id;
    const stored = {
      type: 'doc',
      content: [
        { type: 'paragraph', content: [{ type: 'text', text: 'The drag budget assumes a solar-maximum atmosphere.' }] },
        { type: 'sparkline', attrs: { series: [1, 2, 3] } },
      ],
    };
    const db = new sqlite3.Database(path.join(inject('appDataDir'), 'app.sqlite'));
    await new Promise<void>((resolve, reject) =>
      db.run('UPDATE memos SET content_json = ? WHERE id = ?', [JSON.stringify(stored), memoId], (err) =>
        err ? reject(err) : resolve(),
      ),
    );
    await new Promise((r) => db.close(r));
    const before = await api.json<{ version: number; content: unknown }>(`/api/memos/${memoId}`);

    const page = await signInAsDemo(context, baseUrl, analystEmail, DEMO_PASSWORD);
    await page.goto(`${baseUrl}/memos/${memoId}`);
    const message = page.getByRole('alert').filter({ hasText: 'could not be loaded' });
    await expect.poll(() => message.count(), { timeout: 20_000 }).toBe(1);
    expect(await message.textContent()).toMatch(/sparkline/);
    expect(await page.locator('.memo-prose[contenteditable="true"]').count()).toBe(0);

    await page.locator('.memo-prose').click();
    await page.keyboard.type('overwrite everything');
    await page.keyboard.press('Enter');
    // Longer than the autosave delay (1.2 s) and a save's round trip.
    await page.waitForTimeout(4000);
    await screenshot(page, 'editor-content-could-not-load');

    const after = await api.json<{ version: number; content: unknown }>(`/api/memos/${memoId}`);
    expect(after.body.version).toBe(before.body.version);
    expect(after.body.content).toEqual(stored);

    // Restoring a saved version (here version 1, the empty memo as created) replaces the content whole: editing resumes.
    await page
      .getByRole('complementary', { name: 'Version history' })
      .getByRole('button', { name: 'Restore as new version' })
      .click();
    await expect.poll(() => message.count(), { timeout: 10_000 }).toBe(0);
    await expect
      .poll(() => page.locator('[data-save-state]').getAttribute('data-save-state'), { timeout: 20_000 })
      .toBe('saved');
    await page.locator('.memo-prose').click();
    await page.keyboard.type('Drag budget rewritten.');
    await expect
      .poll(async () => (await api.json<{ version: number }>(`/api/memos/${memoId}`)).body.version, { timeout: 20_000 })
      .toBeGreaterThan(before.body.version + 1);
    const restored = await api.json<{ content: { content: { type: string }[] } }>(`/api/memos/${memoId}`);
    expect(restored.body.content.content.map((n) => n.type)).not.toContain('sparkline');
    expect(JSON.stringify(restored.body.content)).toContain('Drag budget rewritten.');
    await screenshot(page, 'editor-content-restored');
    await page.close();
  });
});
