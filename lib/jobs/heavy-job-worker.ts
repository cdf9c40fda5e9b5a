/**
 * The worker side of the heavy-job pool (lib/jobs/heavy-job-pool.ts), loaded
 * by piscina in a worker thread from the source tree through tsx's loader,
 * never bundled by Next. It holds no database connection: every job carries
 * its data.
 *
 * A job that throws something unforeseen ends this thread: react-pdf's
 * layout engine (yoga, WebAssembly) can fail with "memory access out of
 * bounds" on deeply nested content and stays broken for every later layout
 * in the same thread, so the thread is discarded and the pool starts a
 * fresh one.
 */
import { parentPort } from 'node:worker_threads';
import { runCalc } from '@/lib/calc';
import { evaluateDocument } from '@/lib/documents/evaluate-document';
import { renderMemoPdf } from '@/lib/pdf/render-memo-pdf';
import { UnknownContentTypeError } from '@/lib/pdf/render-inline';
import type {
  HeavyJob,
  HeavyJobReply,
  HeavyJobSignal,
  HeavyJobValue,
  MemoPdfJobInput,
  MemoPdfJobResult,
} from './heavy-job';

const signal = (message: HeavyJobSignal) => parentPort?.postMessage(message);

async function renderPdfJob(input: MemoPdfJobInput): Promise<MemoPdfJobResult> {
  const evaluations = evaluateDocument(input.memo.content);
  if (input.requireAllResults && [...evaluations.values()].some((e) => e.status === 'error')) return { evaluations };
  const { images, requireAllResults: _, ...rest } = input;
  const bytes = await renderMemoPdf({
    ...rest,
    evaluations,
    // structured clone delivers Uint8Array; react-pdf embeds a Buffer
    resolveImage: async (src) => {
      const image = images.get(src);
      return image && { data: Buffer.from(image.data), format: image.format };
    },
  });
  return { evaluations, pdf: new Uint8Array(bytes.buffer, bytes.byteOffset, bytes.byteLength) };
}

async function perform(job: HeavyJob): Promise<HeavyJobValue<HeavyJob>> {
  switch (job.type) {
    case 'calc':
      return runCalc(job.kind, job.inputs);
    case 'evaluate-document':
      return evaluateDocument(job.doc);
    case 'memo-pdf':
      return renderPdfJob(job.input);
  }
}

export async function runHeavyJobInWorker(task: { jobId: number; job: HeavyJob }): Promise<HeavyJobReply> {
  signal({ heavyJobStarted: task.jobId });
  try {
    return { ok: true, value: await perform(task.job) };
  } catch (err) {
    if (err instanceof UnknownContentTypeError) return { ok: false, message: err.message };
    const message = err instanceof Error ? err.message : String(err);
    console.error(
      `[nodewright] heavy job ${task.job.type} failed in its worker, which is replaced: ${err instanceof Error ? (err.stack ?? message) : message}`,
    );
    signal({ heavyJobFailed: task.jobId, message });
    process.exit(1);
  }
}
