import { beforeAll, describe, expect, inject, it } from 'vitest';
import { paragraphDoc, signedInAnalystsWithMemos, type LoadAnalyst } from '../../scripts/support/load-clients';

/*
 * What is checked: twenty signed-in analysts save twenty different memos at
 * the same moment against the real server on its SQLite file. Before writes
 * were queued in-process, 16 of 20 such saves answered 500 (SQLITE_BUSY on
 * BEGIN IMMEDIATE: SQLite's busy wait held libuv's threadpool threads while
 * the lock holder needed one). Every save must answer 200, and every memo
 * must have the saved version with the saved text. Latency is printed by
 * `npm run bench:load`, not asserted here.
 */

let analysts: LoadAnalyst[];

beforeAll(async () => {
  analysts = await signedInAnalystsWithMemos(inject('baseUrl'), 20, { label: 'concurrent-save' });
}, 120_000);

describe('twenty analysts saving at once', () => {
  it('all twenty saves answer 200 and every saved version is there', async () => {
    const texts = analysts.map((a, i) => `Saved at once by analyst ${i + 1} (${a.email}).`);
    const responses = await Promise.all(
      analysts.map((a, i) =>
        a.session.json<{ version: number; error?: string }>(`/api/memos/${a.memoId}`, {
          method: 'PATCH',
          body: JSON.stringify({ content: paragraphDoc(texts[i]), baseVersion: a.version }),
        }),
      ),
    );
    expect(responses.map((r) => r.status)).toEqual(analysts.map(() => 200));
    expect(responses.map((r) => r.body.version)).toEqual(analysts.map((a) => a.version + 1));

    for (const [i, a] of analysts.entries()) {
      const versions = await a.session.json<{ versions: { versionNumber: number }[] }>(
        `/api/memos/${a.memoId}/versions?all=true`,
      );
      expect(versions.body.versions.map((v) => v.versionNumber)).toEqual([a.version + 1, a.version]);
      const saved = await a.session.json<{ content: unknown }>(`/api/memos/${a.memoId}/versions/${a.version + 1}`);
      expect(saved.body.content).toEqual(paragraphDoc(texts[i]));
    }
  });
});
