import { execFileSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { selectInMemo } from '../support/select-text';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';

/**
 * The whole review-to-baseline flow with four people in Chromium: the
 * analyst drafts and submits; the reviewer comments and requests changes;
 * the analyst resolves and resubmits; the reviewer approves; the
 * configuration manager freezes revision A; its PDF shows revision A and
 * the approval block with each electronic signature (name, role, meaning,
 * UTC time). Approve, request changes and freeze are signed in a dialog that
 * asks for the password again; a wrong password is refused there and said so.
 */

const baseUrl = inject('baseUrl');
const person = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const TITLE = 'TERNLIGHT-1 orbit rationale, baseline trial';
const QUOTE = 'Five-year design life within the 28 m/s propellant allocation';

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

const signInAs = (role: string): Promise<Page> => signInAsDemo(context, baseUrl, person(role).email, DEMO_PASSWORD);

async function openMemo(page: Page): Promise<void> {
  await page.getByRole('link', { name: TITLE }).click();
  await page.waitForURL(/\/memos\/\d+$/);
  await expect
    .poll(() => page.locator('section[data-block-id="repeat"] td[data-output="altitudeKm"]').textContent(), {
      timeout: 20_000,
    })
    .toMatch(/km$/);
}

const stage = (page: Page) => page.locator('[aria-label="Memo lifecycle"] [aria-current="step"]').textContent();

describe('review to baseline with four users', () => {
  let memoPath = '';

  it('analyst drafts from the template and submits to the reviewer', async () => {
    const page = await signInAs('analyst');
    await page.getByRole('button', { name: 'New memo' }).click();
    await page.getByLabel('Title').fill(TITLE);
    await page.getByRole('radio', { name: /Sun-synchronous orbit design rationale/ }).check();
    await page.getByRole('button', { name: 'Create' }).click();
    await page.waitForURL(/\/memos\/\d+$/);
    memoPath = new URL(page.url()).pathname;
    await expect.poll(() => stage(page)).toBe('Draft');
    await page.getByRole('button', { name: 'Submit for review' }).click();
    await page.getByRole('checkbox', { name: person('reviewer').name }).check();
    await page.getByRole('button', { name: 'Send to reviewers' }).click();
    await expect.poll(() => stage(page), { timeout: 20_000 }).toBe('In review');
    expect(await page.getByRole('toolbar', { name: 'Formatting and calculations' }).count()).toBe(0);
    await screenshot(page, 'flow-1-submitted');
    await page.close();
  });

  it('reviewer comments on a passage and requests changes', async () => {
    const page = await signInAs('reviewer');
    await openMemo(page);
    await selectInMemo(page, QUOTE);
    await page.getByRole('button', { name: 'Comment', exact: true }).click();
    await page.getByLabel('New thread').fill('Show the ΔV budget that this allocation covers.');
    await page.getByRole('button', { name: 'Post comment' }).click();
    await expect
      .poll(() => page.locator('[data-thread-id]', { hasText: 'Show the ΔV budget' }).count(), { timeout: 20_000 })
      .toBe(1);
    await page.getByRole('button', { name: 'Request changes' }).click();
    const dialog = page.getByRole('dialog', { name: 'Sign your request for changes' });
    await dialog.getByLabel('What should change').fill('Add the ΔV budget table before the conclusion.');
    await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
    await dialog.getByRole('button', { name: 'Sign and send back to draft' }).click();
    await expect.poll(() => stage(page), { timeout: 20_000 }).toBe('Draft');
    await expect
      .poll(() => page.getByText('changes requested', { exact: false }).count(), { timeout: 20_000 })
      .toBeGreaterThan(0);
    await screenshot(page, 'flow-2-changes-requested');
    await page.close();
  });

  it('analyst resolves the thread and resubmits; the reviewer approves', async () => {
    const page = await signInAs('analyst');
    await openMemo(page);
    const card = page.locator('[data-thread-id]', { hasText: 'Show the ΔV budget' });
    await card.getByRole('button', { name: /Thread on/ }).click();
    await card.getByRole('button', { name: /Resolve thread/ }).click();
    await expect.poll(() => card.getAttribute('data-thread-group'), { timeout: 20_000 }).toBe('resolved');
    await page.getByRole('button', { name: 'Submit for review' }).click();
    // The reviewers of the last round are ticked again.
    await expect
      .poll(() => page.getByRole('checkbox', { name: person('reviewer').name }).isChecked(), { timeout: 20_000 })
      .toBe(true);
    await page.getByRole('button', { name: 'Send to reviewers' }).click();
    await expect.poll(() => stage(page), { timeout: 20_000 }).toBe('In review');
    await page.close();

    const reviewer = await signInAs('reviewer');
    await openMemo(reviewer);
    await reviewer.getByRole('button', { name: 'Approve', exact: true }).click();
    const dialog = reviewer.getByRole('dialog', { name: 'Sign your approval' });
    // Keyboard only: focus starts in the note; Tab reaches the meaning, then the password; Enter signs.
    await expect.poll(() => reviewer.evaluate(() => document.activeElement?.getAttribute('name'))).toBe('note');
    await reviewer.keyboard.type('Sound; the ΔV table closes the budget.');
    await reviewer.keyboard.press('Tab');
    expect(await dialog.getByLabel('Meaning of your signature').inputValue()).toBe('Reviewed and approved');
    await reviewer.keyboard.press('Tab');
    await reviewer.keyboard.type('not-the-password');
    await reviewer.keyboard.press('Enter');
    await expect
      .poll(() => dialog.getByRole('alert').textContent(), { timeout: 20_000 })
      .toMatch(/password is not right; nothing was signed/);
    expect(await dialog.getByLabel('Your password').inputValue()).toBe('');
    await expect.poll(() => stage(reviewer)).toBe('In review');
    await dialog.screenshot({
      path: path.resolve('test-results', 'screenshots', 'flow-3a-signature-wrong-password.png'),
    });
    await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
    await dialog.screenshot({ path: path.resolve('test-results', 'screenshots', 'flow-3b-signature-dialog.png') });
    await reviewer.keyboard.press('Enter');
    await expect.poll(() => stage(reviewer), { timeout: 20_000 }).toBe('Approved');
    expect(await reviewer.getByRole('dialog').count()).toBe(0);
    await screenshot(reviewer, 'flow-3-approved');
    await reviewer.close();
  });

  it('configuration manager freezes revision A; its PDF shows revision A and the approval block', async () => {
    const page = await signInAs('config-manager');
    await page.goto(baseUrl + memoPath);
    await expect.poll(() => stage(page), { timeout: 20_000 }).toBe('Approved');
    await page.getByRole('button', { name: 'Freeze as revision A' }).click();
    const dialog = page.getByRole('dialog', { name: 'Sign and freeze revision A' });
    await dialog
      .getByLabel('Change summary for revision A')
      .fill('First issue: orbit baseline for the system requirements review.');
    expect(await dialog.getByLabel('Meaning of your signature').inputValue()).toBe('Released as baseline');
    await dialog.getByLabel('Your password').fill(DEMO_PASSWORD);
    await dialog.getByRole('button', { name: 'Sign and freeze revision A' }).click();
    await expect.poll(() => stage(page), { timeout: 60_000 }).toBe('Frozen');
    const revisions = page.getByRole('region', { name: 'Frozen revisions' });
    await expect.poll(() => revisions.getByText('Revision A', { exact: true }).count(), { timeout: 20_000 }).toBe(1);
    await screenshot(page, 'flow-4-frozen');

    const pdfLink = revisions.getByRole('link', { name: 'PDF' });
    const href = await pdfLink.getAttribute('href');
    const res = await page.request.get(baseUrl + href);
    expect(res.status()).toBe(200);
    const bytes = await res.body();
    const file = path.join(fs.mkdtempSync(path.join(os.tmpdir(), 'nodewright-flow-')), 'revision-A.pdf');
    fs.writeFileSync(file, bytes);
    // Raw text order keeps each table cell's words together; wrapped lines are joined.
    const text = execFileSync('pdftotext', ['-raw', file, '-'], { encoding: 'utf8' }).replace(/\s+/g, ' ');
    expect(text).toMatch(/Revision A/);
    expect(text).not.toMatch(/DRAFT/);
    for (const name of [person('analyst').name, person('reviewer').name, person('config-manager').name])
      expect(text).toContain(name);
    expect(text).toContain('First issue: orbit baseline for the system requirements review.');
    // The approval block: each signer with role, meaning and UTC time.
    expect(text).toMatch(
      new RegExp(`Reviewer ${person('reviewer').name} Reviewed and approved \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2} UTC`),
    );
    expect(text).toMatch(
      new RegExp(
        `Configuration manager ${person('config-manager').name} Released as baseline \\d{4}-\\d{2}-\\d{2} \\d{2}:\\d{2} UTC`,
      ),
    );
    fs.mkdirSync(path.resolve('test-results', 'pdf'), { recursive: true });
    execFileSync('pdftoppm', [
      '-png',
      '-r',
      '60',
      '-f',
      '1',
      '-l',
      '1',
      file,
      path.resolve('test-results', 'pdf', 'flow-revision-A'),
    ]);
    await page.close();
  });

  it('the administrator reads the signatures in the audit trail as sentences, filtered by document number and person', async () => {
    const page = await signInAs('admin');
    const memoId = memoPath.split('/').at(-1);
    const memo = await page.request.get(`${baseUrl}/api/memos/${memoId}`);
    const { documentNumber } = (await memo.json()) as { documentNumber: string };
    await page.goto(`${baseUrl}/admin/audit`);
    await page.getByLabel('Document number').fill(documentNumber);
    await page.getByLabel('Person (name or e-mail)').fill('quenby');
    await page.getByLabel('Action').selectOption('signature.sign');
    await page.getByRole('button', { name: 'Filter' }).click();
    await page.waitForURL(/document=/);
    const rows = page.locator('tbody tr');
    await expect.poll(() => rows.count()).toBe(2);
    expect(await rows.first().textContent()).toMatch(
      new RegExp(
        `${person('reviewer').name} \\(Reviewer\\) electronically signed the approval of ${documentNumber} version \\d+, meaning “Reviewed and approved”`,
      ),
    );
    expect(await page.getByRole('link', { name: 'Export CSV' }).getAttribute('href')).toMatch(/format=csv/);
    await page.getByLabel('Person (name or e-mail)').fill('');
    await page.getByLabel('Action').selectOption('');
    await page.getByRole('button', { name: 'Filter' }).click();
    await expect.poll(() => rows.count()).toBeGreaterThan(8);
    await screenshot(page, 'flow-5-audit-trail');
    await page.close();
  });
});
