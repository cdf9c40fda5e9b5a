/**
 * Server-side evaluation of stored documents (lib/jobs/evaluate-document-job.ts):
 * the pool gives the same evaluations as evaluateDocument on the calling
 * thread, and a page and its figures asking for the same document at once
 * share one job, so they are not refused by the per-user limit of 2.
 */
import { afterAll, describe, expect, it } from 'vitest';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { closeHeavyJobPool, heavyJobPool } from '@/lib/jobs/heavy-job-pool';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { calc, from, p, typed } from '@/lib/templates/build-doc';

afterAll(closeHeavyJobPool);

const light: TiptapDoc = {
  type: 'doc',
  content: [
    calc('sso', 'sso-inclination', 'SSO inclination', { altitudeKm: typed('700 km') }),
    calc('rate', 'node-rate', 'Node rate', {
      altitudeKm: typed('700 km'),
      inclinationDeg: from('sso', 'inclinationDeg'),
    }),
  ],
};
const heavy: TiptapDoc = {
  type: 'doc',
  content: [
    ...light.content,
    p('Numerical check:'),
    calc('prop', 'propagation-check', 'Drift check', {
      altitudeKm: typed('700 km'),
      inclinationDeg: from('sso', 'inclinationDeg'),
      days: typed('2'),
    }),
  ],
};

describe('evaluateDocumentJob', () => {
  it('computes a document without heavy blocks on the calling thread, with the same results', async () => {
    const before = heavyJobPool().nextJobId;
    expect(await evaluateDocumentJob(1, light)).toEqual(evaluateDocument(light));
    expect(heavyJobPool().nextJobId).toBe(before);
  });

  it('sends a document with a heavy block to the pool whole and gets the same evaluations', async () => {
    const out = await evaluateDocumentJob(1, heavy);
    expect(out).toEqual(evaluateDocument(heavy));
    expect(out.get('prop')?.status).toBe('ok');
  }, 60_000);

  it('shares one job among concurrent requests for the same document (four at once, limit 2)', async () => {
    const before = heavyJobPool().nextJobId;
    const all = await Promise.all([1, 2, 3, 4].map(() => evaluateDocumentJob(5, heavy)));
    expect(heavyJobPool().nextJobId - before).toBe(1);
    for (const e of all) expect(e.get('prop')?.status).toBe('ok');
  }, 60_000);
});
