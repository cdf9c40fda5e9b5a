/**
 * The jobs the worker pool runs: plain data in, plain data out (structured
 * clone), so nothing that holds a database handle or a function crosses
 * the thread boundary.
 */
import type { CalcOutcome } from '@/lib/calc';
import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import type { PdfImage, RenderMemoPdfInput } from '@/lib/pdf/memo-pdf-types';

/** A memo PDF as the worker renders it: the renderer's input without the callbacks, images already fetched. */
export type MemoPdfJobInput = Omit<RenderMemoPdfInput, 'evaluations' | 'resolveImage'> & {
  /** Image bytes by the image node's src, read from the database on the request thread. */
  images: Map<string, PdfImage | undefined>;
  /** Stop before layout when a calc block has no result (a freeze refuses such a memo). */
  requireAllResults?: boolean;
};

export type HeavyJob =
  | { type: 'calc'; kind: string; inputs: unknown }
  | { type: 'evaluate-document'; doc: TiptapNode }
  | { type: 'memo-pdf'; input: MemoPdfJobInput };

export interface MemoPdfJobResult {
  evaluations: Map<string, BlockEvaluation>;
  /** Absent when requireAllResults stopped the job. */
  pdf?: Uint8Array;
}

export interface HeavyJobValues {
  calc: CalcOutcome;
  'evaluate-document': Map<string, BlockEvaluation>;
  'memo-pdf': MemoPdfJobResult;
}

export type HeavyJobValue<J extends HeavyJob> = HeavyJobValues[J['type']];

/**
 * What a worker answers. A refusal the job foresaw (content the renderer
 * does not know) comes back as `ok: false`; anything unforeseen ends the
 * worker instead (see heavy-job-worker.ts).
 */
export type HeavyJobReply<J extends HeavyJob = HeavyJob> =
  { ok: true; value: HeavyJobValue<J> } | { ok: false; message: string };

/** Messages a worker posts to the pool besides its replies. */
export type HeavyJobSignal = { heavyJobStarted: number } | { heavyJobFailed: number; message: string };
