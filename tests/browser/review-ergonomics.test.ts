import { afterAll, beforeAll, describe, expect, it, inject } from 'vitest';
import type { BrowserContext, Page } from 'playwright-core';
import { openBrowser, screenshot, signInAsDemo } from '../support/browser';
import { DEMO_PASSWORD, DEMO_USERS } from '@/lib/demo/demo-organisation';
import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';

/**
 * A review round worked as a reviewer and an analyst would, in Chromium:
 * a comment whose quote holds a live value keeps the number it showed; a
 * thread over two list items follows its passage through edits; the
 * analyst is warned about open threads at submit and may send anyway; the
 * reviewer comes back to the changes since their last review, steps
 * through them with buttons and keys, sees the table compared cell by
 * cell; the threads panel stays in view, a highlight leads to its thread
 * and the thread back to the passage.
 */

const baseUrl = inject('baseUrl');
const person = (role: string) => DEMO_USERS.find((u) => u.role === role)!;
const WAIT = { timeout: 15_000 };
const TITLE = 'TERNLIGHT-1 second review round';
const TWO_ITEMS =
  'Complete, gap-free coverage of the basin once per repeat cycle with the 240 km imager swath.\nConstant illumination';
const CANDIDATES = [
  ['Cycle', 'Revolutions', 'Mean altitude'],
  ['12 days', '175', 'from the repeat block'],
  ['13 days', '189', 'to be computed'],
];

let context: BrowserContext;
let close: () => Promise<void>;
beforeAll(async () => {
  ({ context, close } = await openBrowser());
});
afterAll(async () => close());

const signInAs = (role: string): Promise<Page> => signInAsDemo(context, baseUrl, person(role).email, DEMO_PASSWORD);
const cellNode = (type: string, text: string): TiptapNode => ({
  type,
  content: [{ type: 'paragraph', content: [{ type: 'text', text }] }],
});
const tableNode = (rows: string[][]): TiptapNode => ({
  type: 'table',
  content: rows.map((r, i) => ({
    type: 'tableRow',
    content: r.map((c) => cellNode(i === 0 ? 'tableHeader' : 'tableCell', c)),
  })),
});

/** Saves the memo's content as changed by `edit`, through the API as the editor does; returns the new version. */
async function saveEdited(page: Page, memoId: number, edit: (doc: TiptapDoc) => TiptapDoc): Promise<number> {
  const memo = (await (await page.request.get(`${baseUrl}/api/memos/${memoId}`)).json()) as {
    content: TiptapDoc;
    version: number;
  };
  const res = await page.request.patch(`${baseUrl}/api/memos/${memoId}`, {
    data: { content: edit(memo.content), baseVersion: memo.version },
  });
  expect(res.status(), await res.text()).toBe(200);
  return ((await (await page.request.get(`${baseUrl}/api/memos/${memoId}`)).json()) as { version: number }).version;
}

/** Replaces text in every text node of a document (the first match in each). */
const replaceText = (doc: TiptapDoc, from: string, to: string): TiptapDoc =>
  JSON.parse(
    JSON.stringify(doc).replace(JSON.stringify(from).slice(1, -1), JSON.stringify(to).slice(1, -1)),
  ) as TiptapDoc;

/** Whether an element's box is inside the window. */
const inView = (page: Page, selector: string) =>
  page.evaluate((sel) => {
    const el = document.querySelector(sel);
    if (!el) return false;
    const r = el.getBoundingClientRect();
    return r.bottom > 0 && r.top < window.innerHeight;
  }, selector);

describe('a review round, in Chromium', () => {
  let memoId = 0;
  let reviewedVersion = 0;
  let valueThread = 0;
  let listThread = 0;

  it('reviewer: a quote over a live value keeps the value’s text; a thread over two list items is placed', async () => {
    const analyst = await signInAs('analyst');
    const made = await analyst.request.post(`${baseUrl}/api/memos`, {
      data: { title: TITLE, templateId: 'sso-design-rationale' },
    });
    expect(made.status()).toBe(201);
    memoId = ((await made.json()) as { id: number }).id;
    // A table of candidates before the review, so that the next round can change one of its cells.
    reviewedVersion = await saveEdited(analyst, memoId, (d) => ({
      ...d,
      content: [...d.content, tableNode(CANDIDATES)],
    }));
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

    const page = await signInAs('reviewer');
    await page.goto(`${baseUrl}/memos/${memoId}`);
    const inclination = page.locator('section[data-block-id="sso"] td[data-output="inclinationDeg"]');
    await expect.poll(() => inclination.textContent(), { timeout: 30_000 }).toMatch(/°$/);
    const shownValue = (await page
      .locator('.ProseMirror p', { hasText: 'Sun-synchronism at this altitude' })
      .locator('[data-live-value="ok"]')
      .first()
      .textContent())!.trim();
    expect(shownValue).toMatch(/^\d+\.\d+°$/);

    // Select "requires an inclination of 98.…°, for a node rate" across the live value, as a mouse drag would.
    await page.evaluate(() => {
      const para = [...document.querySelectorAll('.ProseMirror p')].find((p) =>
        p.textContent?.includes('Sun-synchronism at this altitude'),
      )!;
      const walker = document.createTreeWalker(para, NodeFilter.SHOW_TEXT);
      const range = document.createRange();
      for (let n = walker.nextNode(); n; n = walker.nextNode()) {
        const t = n.textContent ?? '';
        if (t.includes('requires')) range.setStart(n, t.indexOf('requires'));
        if (t.includes(', for a node rate'))
          range.setEnd(n, t.indexOf(', for a node rate') + ', for a node rate'.length);
      }
      const sel = window.getSelection()!;
      sel.removeAllRanges();
      sel.addRange(range);
    });
    await page.getByRole('button', { name: 'Comment', exact: true }).click();
    const expectedQuote = `requires an inclination of ${shownValue}, for a node rate`;
    await expect.poll(() => page.locator('[data-new-thread]').textContent(), WAIT).toContain(`“${expectedQuote}”`);
    await page.getByLabel('New thread').fill('Which theory gives this inclination?');
    await page.getByRole('button', { name: 'Post comment' }).click();
    const card = page.locator('[data-thread-id]', { hasText: 'Which theory gives this inclination?' });
    await expect.poll(() => card.count(), WAIT).toBe(1);
    valueThread = Number(await card.getAttribute('data-thread-id'));
    expect(await card.textContent()).toContain(`“${expectedQuote}”`);
    expect(await card.textContent()).not.toContain('⟨value⟩');

    // A thread over the end of one list item and the start of the next (the text the editor's selection gives).
    const posted = await page.request.post(`${baseUrl}/api/memos/${memoId}/comments`, {
      data: {
        body: 'Coverage and illumination pull apart here; say which wins.',
        anchor: { quote: TWO_ITEMS, prefix: 'Mission drivers\n', suffix: ': descending node at 10:30 local mean sola' },
      },
    });
    expect(posted.status()).toBe(201);
    listThread = ((await posted.json()) as { id: number }).id;
    expect(
      (
        await page.request.post(`${baseUrl}/api/memos/${memoId}/transitions`, {
          data: { action: 'request-changes', note: 'See the two threads.', password: DEMO_PASSWORD },
        })
      ).status(),
    ).toBe(200);
    await page.close();
  });

  it('analyst: edits the text and the table; at submit is warned of the open threads and confirms', async () => {
    const page = await signInAs('analyst');
    await saveEdited(page, memoId, (d) => {
      let doc = replaceText(d, 'Constant illumination', 'Steady illumination');
      doc = replaceText(doc, 'to be computed', '668.4 km');
      return {
        ...doc,
        content: [
          {
            type: 'paragraph',
            content: [{ type: 'text', text: 'Round 2: coverage and illumination trade answered in section 2.' }],
          },
          ...doc.content,
        ],
      };
    });
    await page.goto(`${baseUrl}/memos/${memoId}`);
    // The two-item thread follows its edited passage, across both list items.
    const listMarks = page.locator(`.ProseMirror [data-comment-thread="${listThread}"]`);
    await expect
      .poll(async () => (await listMarks.allTextContents()).join('\n'), { timeout: 30_000 })
      .toBe(TWO_ITEMS.replace('Constant', 'Steady'));
    expect(await page.locator(`[data-thread-id="${listThread}"]`).getAttribute('data-thread-group')).toBe('open');

    await page.getByRole('button', { name: 'Submit for review' }).click();
    const warning = page.locator('[data-open-threads-warning]');
    await expect.poll(() => warning.textContent(), WAIT).toContain('2 review threads are still open.');
    const sendButton = page.getByRole('button', { name: 'Send to reviewers' });
    expect(await sendButton.isDisabled()).toBe(true);
    await screenshot(page, 'review-submit-open-threads-warning');
    await warning.getByLabel('Send with the 2 open threads').check();
    await expect.poll(() => sendButton.isDisabled(), WAIT).toBe(false);
    await sendButton.click();
    await expect.poll(() => page.locator('[data-read-only-reason]').count(), { timeout: 30_000 }).toBe(1);
    await page.close();
  });

  it('reviewer: compares from the version last reviewed, steps through the changes, sees the table cell by cell', async () => {
    const page = await signInAs('reviewer');
    await page.goto(`${baseUrl}/memos/${memoId}`);
    await page.getByRole('link', { name: 'Compare versions' }).click();
    await page.waitForURL(new RegExp(`/memos/${memoId}/compare$`));
    await expect
      .poll(() => page.locator('[data-since-review]').textContent(), WAIT)
      .toContain(`version ${reviewedVersion}`);
    expect(await page.locator('#cmp-from').inputValue()).toBe(`v${reviewedVersion}`);

    // Three changes in the text: the new paragraph, the list item, the table; no output changed.
    const changes = page.locator('[data-change]');
    expect(await changes.count()).toBe(3);
    const tableChange = changes.filter({ has: page.locator('table') });
    // The one edited cell, its old words deleted and the new ones inserted (the word diff may cut them into several runs).
    const words = async (tag: string) =>
      (await tableChange.locator(tag).allTextContents()).join(' ').replace(/\s+/g, ' ').trim();
    expect(await words('del')).toBe('to be computed');
    expect(await words('ins')).toBe('668.4 km');
    expect(await tableChange.locator('tr:has(del)').count()).toBe(1);
    expect(await tableChange.locator('tr').count()).toBe(3);
    expect(await changes.nth(1).locator('del').allTextContents()).toEqual(['Constant']);
    expect(await changes.nth(1).locator('ins').allTextContents()).toEqual(['Steady']);

    const position = page.locator('[data-change-position]');
    expect(await position.textContent()).toBe('3 changes');
    await page.locator('body').click({ position: { x: 5, y: 5 } });
    await page.keyboard.press('n');
    await expect.poll(() => position.textContent(), WAIT).toBe('Change 1 of 3');
    expect(await changes.nth(0).getAttribute('data-change-current')).toBe('');
    await page.keyboard.press('n');
    await page.keyboard.press('n');
    await expect.poll(() => position.textContent(), WAIT).toBe('Change 3 of 3');
    expect(await inView(page, '[data-change-current] table')).toBe(true);
    await page.keyboard.press('Alt+ArrowUp');
    await expect.poll(() => position.textContent(), WAIT).toBe('Change 2 of 3');
    await page.getByRole('button', { name: /Previous change/ }).click();
    await expect.poll(() => position.textContent(), WAIT).toBe('Change 1 of 3');
    await page.getByRole('button', { name: /Next change/ }).click();
    await expect.poll(() => position.textContent(), WAIT).toBe('Change 2 of 3');
    await screenshot(page, 'review-compare-since-last-review');
    await page.close();
  });

  it('reviewer: the threads panel stays in view; a highlight opens its thread and the thread leads back', async () => {
    const page = await signInAs('reviewer');
    await page.goto(`${baseUrl}/memos/${memoId}`);
    const mark = `.ProseMirror [data-comment-thread="${valueThread}"]`;
    // The passage holds a live value: its highlight is in three pieces (text, value, text).
    await expect.poll(() => page.locator(mark).count(), { timeout: 30_000 }).toBeGreaterThan(0);

    await page.evaluate(() => window.scrollTo(0, document.scrollingElement!.scrollHeight));
    await expect.poll(() => page.evaluate(() => window.scrollY), WAIT).toBeGreaterThan(1000);
    expect(await inView(page, '[data-review-panel]')).toBe(true);
    const top = await page.evaluate(() => document.querySelector('[data-review-panel]')!.getBoundingClientRect().top);
    expect(top).toBeGreaterThanOrEqual(0);

    await page.locator(mark).first().scrollIntoViewIfNeeded();
    await page.locator(mark).first().click();
    const card = page.locator(`[data-thread-id="${valueThread}"]`);
    await expect
      .poll(() => card.getByRole('button', { name: /Thread on/ }).getAttribute('aria-expanded'), WAIT)
      .toBe('true');
    await expect.poll(() => inView(page, `[data-thread-id="${valueThread}"]`), WAIT).toBe(true);

    await page.evaluate(() => window.scrollTo(0, document.scrollingElement!.scrollHeight));
    await expect.poll(() => inView(page, mark), WAIT).toBe(false);
    await card.locator('[data-show-passage]').click();
    await expect.poll(() => inView(page, mark), WAIT).toBe(true);
    await screenshot(page, 'review-sticky-threads-panel');
    await page.close();
  });
});
