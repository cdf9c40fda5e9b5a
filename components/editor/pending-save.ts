/**
 * Lets a panel outside the editor (the workflow actions) make sure the
 * editor's unsaved text has reached the server before it changes the memo's
 * state: a submitted memo is rebuilt read-only, and text still waiting for the
 * autosave delay would otherwise stay behind in this browser only.
 */

export type SaveOutcome = { ok: true } | { ok: false; message: string };

const flushers = new Map<number, () => Promise<SaveOutcome>>();

/** The open editor of a memo registers how to save now; returns the unregister function. */
export function registerSaveFlush(memoId: number, flush: () => Promise<SaveOutcome>): () => void {
  flushers.set(memoId, flush);
  return () => {
    if (flushers.get(memoId) === flush) flushers.delete(memoId);
  };
}

/** Saves the memo's pending edits now and waits for the server to confirm; ok when nothing is pending or no editor is open. */
export function flushPendingSave(memoId: number): Promise<SaveOutcome> {
  const flush = flushers.get(memoId);
  return flush ? flush() : Promise.resolve({ ok: true });
}
