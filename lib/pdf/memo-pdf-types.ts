import type { BlockEvaluation } from '@/lib/documents/evaluate-document';
import type { MemoDetail } from '@/lib/memos/memo-record';
import type { PaperSize } from './pdf-theme';

export type { PaperSize };

/** What the PDF needs of a memo. */
export type MemoPdfSource = Pick<
  MemoDetail,
  'documentNumber' | 'title' | 'version' | 'owner' | 'reviewers' | 'content' | 'updatedAt'
>;

export interface ApprovalEntry {
  name?: string;
  /** ISO date or date-time */
  date?: string;
}

/** One electronic signature as the approval block prints it. */
export interface ApprovalSignature {
  /** The signer's role when signing, as a label ("Reviewer"). */
  role: string;
  /** Printed name. */
  name: string;
  /** What the signature means ("Reviewed and approved"). */
  meaning: string;
  /** ISO 8601 date-time, printed in UTC. */
  signedAt: string;
}

export interface Approvals {
  author?: ApprovalEntry;
  reviewer?: ApprovalEntry;
  configurationManager?: ApprovalEntry;
  /** A frozen revision's electronic signatures; when given, the block lists them instead of blank signature lines. */
  signatures?: ApprovalSignature[];
}

export interface RevisionRecordRow {
  revision: string;
  date: string;
  description: string;
  /** The analyst who owns the memo. */
  author?: string;
  /** The reviewers whose decisions the revision carries, comma-separated. */
  reviewers?: string;
  /** The configuration manager who froze it as a baseline. */
  releasedBy?: string;
}

/** An image the PDF can embed (react-pdf reads PNG and JPEG). */
export interface PdfImage {
  data: Buffer;
  format: 'png' | 'jpg';
}

/** Turns an image node's src (data URL or /api/attachments/<id>) into bytes; undefined when it cannot. */
export type ImageResolver = (src: string) => Promise<PdfImage | undefined>;

export interface RenderMemoPdfInput {
  memo: MemoPdfSource;
  /** Server-side results of every calc block (evaluateDocument of memo.content). */
  evaluations: ReadonlyMap<string, BlockEvaluation>;
  paper: PaperSize;
  /** Revision letter of a frozen revision (e.g. "A"); absent for a draft. */
  revision?: string;
  approvals?: Approvals;
  revisionRecord?: RevisionRecordRow[];
  draft: boolean;
  resolveImage?: ImageResolver;
  /** The issuing organisation's name (lib/organisation/get-organisation.ts); UNSET_ORGANISATION when absent. */
  organisation?: string;
  /** Its distribution statement; DEFAULT_DISTRIBUTION when absent. */
  distribution?: string;
}
