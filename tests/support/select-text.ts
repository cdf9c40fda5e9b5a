import type { Page } from 'playwright-core';

/** Selects `text` inside the memo body the way a mouse drag would (a DOM selection ProseMirror reads). */
export async function selectInMemo(page: Page, text: string): Promise<void> {
  await page.evaluate((wanted) => {
    const root = document.querySelector('.ProseMirror');
    if (!root) throw new Error('no memo body');
    const walker = document.createTreeWalker(root, NodeFilter.SHOW_TEXT);
    for (let n = walker.nextNode(); n; n = walker.nextNode()) {
      const at = (n.textContent ?? '').indexOf(wanted);
      if (at < 0) continue;
      const range = document.createRange();
      range.setStart(n, at);
      range.setEnd(n, at + wanted.length);
      const sel = window.getSelection()!;
      sel.removeAllRanges();
      sel.addRange(range);
      return;
    }
    throw new Error(`"${wanted}" is not in the memo body`);
  }, text);
}
