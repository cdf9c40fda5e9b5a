/**
 * PDFs in the worker pool: the same bytes as the renderer gives on the
 * calling thread (draft export and frozen revision alike; any two renders
 * differ only in the creation time stamp and the file identifier derived
 * from it, which are masked), a worker whose layout engine died on hostile
 * content is replaced so the next PDF works, a PDF over its time budget is
 * stopped with a 503, and the request thread stays free while a PDF renders.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { ApiError } from '@/lib/api/errors';
import { runCalcJob } from '@/lib/jobs/run-calc-job';
import { closeHeavyJobPool } from '@/lib/jobs/heavy-job-pool';
import { renderMemoPdfJob } from '@/lib/jobs/render-memo-pdf-job';
import type { TiptapDoc, TiptapNode } from '@/lib/memos/memo-schema';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { p } from '@/lib/templates/build-doc';
import { benchMemoDocument } from '@/scripts/support/bench-memo';
import { evaluate, pdfTestDocument, pdfTestMemo } from '../pdf/support/pdf-test-memo';

afterAll(closeHeavyJobPool);

const doc = pdfTestDocument();
const memo = pdfTestMemo(doc);
const frozen = {
  memo,
  paper: 'a4' as const,
  draft: false,
  revision: 'B',
  organisation: 'Brightwater Orbital',
  approvals: {
    author: { name: 'Ilse Marrow', date: '2027-05-30' },
    reviewer: { name: 'Tobias Quenby', date: '2027-05-31' },
    configurationManager: { name: 'Ruth Okafor-Lind', date: '2027-06-01' },
  },
  revisionRecord: [
    { revision: 'A', date: '2027-03-02', description: 'First issue.', author: 'Ruth Okafor-Lind' },
    { revision: 'B', date: '2027-06-01', description: 'Repeat cycle changed to 12 days.', author: 'Ruth Okafor-Lind' },
  ],
};

/** The PDF with its creation date (D:YYYYMMDDHHmmSSZ) and trailer /ID (an MD5 over the info dictionary, which holds that date) blanked. */
const stampless = (bytes: Buffer) =>
  bytes
    .toString('latin1')
    .replace(/\(D:\d{14}Z\)/g, '(D:00000000000000Z)')
    .replace(/\/ID \[<[0-9a-f]{32}> <[0-9a-f]{32}>\]/, '/ID [<0> <0>]');
const sameDocument = (a: Buffer | undefined, b: Buffer) => expect(a && stampless(a)).toBe(stampless(b));

/** 500 blockquotes inside each other: react-pdf 4.9's layout engine fails on it with "memory access out of bounds" and stays broken in that thread. */
function nestedQuotes(depth: number): TiptapDoc {
  let node: TiptapNode = p('Deep');
  for (let i = 0; i < depth; i++) node = { type: 'blockquote', content: [node] };
  return { type: 'doc', content: [node] };
}

describe('renderMemoPdfJob', () => {
  it('gives the bytes the calling thread gives, for a draft and for a frozen revision', async () => {
    const draft = await renderMemoPdfJob(1, 1, { memo, paper: 'a4', draft: true });
    sameDocument(draft.pdf, await renderMemoPdf({ memo, evaluations: evaluate(doc), paper: 'a4', draft: true }));
    const revision = await renderMemoPdfJob(1, 1, { ...frozen, requireAllResults: true });
    sameDocument(revision.pdf, await renderMemoPdf({ ...frozen, evaluations: evaluate(doc) }));
    // the evaluations come back with the PDF (the freeze stores them)
    expect([...revision.evaluations.values()].every((e) => e.status === 'ok')).toBe(true);
    expect(revision.evaluations.size).toBe(evaluate(doc).size);
  }, 120_000);

  it('stops before layout when a block has no result and requireAllResults is set', async () => {
    const broken: TiptapDoc = {
      type: 'doc',
      content: [
        ...doc.content,
        {
          type: 'calcBlock',
          attrs: { blockId: 'bad', kind: 'node-rate', label: 'Bad', inputs: { altitudeKm: { text: '-5 km' } } },
        },
      ],
    };
    const out = await renderMemoPdfJob(1, 1, { ...frozen, memo: pdfTestMemo(broken), requireAllResults: true });
    expect(out.pdf).toBeUndefined();
    expect(out.evaluations.get('bad')?.status).toBe('error');
  }, 60_000);

  it('answers content the renderer does not know with a 422 naming it, and keeps the worker', async () => {
    const unknown: TiptapDoc = { type: 'doc', content: [{ type: 'mathBlock', attrs: { latex: 'x' } }] };
    const err = await renderMemoPdfJob(1, 1, { memo: pdfTestMemo(unknown), paper: 'a4', draft: true }).catch(
      (e: unknown) => e,
    );
    expect(err).toBeInstanceOf(ApiError);
    expect((err as ApiError).status).toBe(422);
    expect((err as ApiError).message).toMatch(/node of type "mathBlock"/);
  }, 60_000);

  it('replaces a worker whose layout engine died: a clear 422, then the next PDF of another memo is right', async () => {
    const err = await renderMemoPdfJob(1, 2, { memo: pdfTestMemo(nestedQuotes(500)), paper: 'a4', draft: true }).catch(
      (e: unknown) => e,
    );
    expect(err).toBeInstanceOf(ApiError);
    expect((err as ApiError).status).toBe(422);
    expect((err as ApiError).message).toMatch(/The PDF renderer failed on this memo \(memory access out of bounds\)/);
    const next = await renderMemoPdfJob(1, 1, { memo, paper: 'a4', draft: true });
    sameDocument(next.pdf, await renderMemoPdf({ memo, evaluations: evaluate(doc), paper: 'a4', draft: true }));
  }, 120_000);

  it('stops a PDF over its time budget with 503 and Retry-After; the replaced worker renders the next one', async () => {
    const big = pdfTestMemo(benchMemoDocument()); // about 25 pages: 1.6–2.5 s warm here (npm run bench:pdf)
    await renderMemoPdfJob(1, 1, { memo, paper: 'a4', draft: true }); // a warm worker, so the budget is spent rendering
    process.env.NODEWRIGHT_PDF_TIME_BUDGET_SECONDS = '1';
    try {
      const err = await renderMemoPdfJob(1, 1, { memo: big, paper: 'a4', draft: true }).catch((e: unknown) => e);
      expect(err).toBeInstanceOf(ApiError);
      expect((err as ApiError).status).toBe(503);
      expect((err as ApiError).message).toMatch(/Rendering the PDF took longer than 1 s and was stopped/);
      expect((err as ApiError).retryAfterSeconds).toBeGreaterThan(0);
    } finally {
      delete process.env.NODEWRIGHT_PDF_TIME_BUDGET_SECONDS;
    }
    const next = await renderMemoPdfJob(1, 1, { memo, paper: 'a4', draft: true });
    sameDocument(next.pdf, await renderMemoPdf({ memo, evaluations: evaluate(doc), paper: 'a4', draft: true }));
  }, 120_000);

  it('leaves the calling thread free: a light calculation and a timer finish while a PDF renders', async () => {
    const order: string[] = [];
    const pdf = renderMemoPdfJob(1, 1, { memo, paper: 'a4', draft: true }).then(() => order.push('pdf'));
    await new Promise((r) => setTimeout(r, 50));
    const light = await runCalcJob(1, 'sso-inclination', { altitudeKm: 700 });
    order.push('light calc');
    await new Promise((r) => setTimeout(r, 50));
    order.push('timer');
    await pdf;
    expect(light.ok).toBe(true);
    expect(order).toEqual(['light calc', 'timer', 'pdf']);
  }, 60_000);
});
