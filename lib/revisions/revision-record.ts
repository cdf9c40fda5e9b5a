/** Shapes stored in a frozen revision and shown by the API. */
import type { SignatureRecord } from '@/lib/signatures/signature-record';

export interface FrozenBlock {
  blockId: string;
  kind: string;
  label: string;
  /** The block's stored inputs (typed text or references) as frozen. */
  storedInputs: Record<string, unknown>;
  /** The inputs the engine ran with (defaults filled). */
  inputs: Record<string, unknown>;
  outputs: Record<string, unknown>;
  warnings: string[];
  engineVersion: string;
}

export interface FrozenReviewer {
  id: number;
  name: string;
  decision: 'approve' | 'request-changes';
  note: string | null;
  decidedAt: string;
}

export interface FrozenApproval {
  author: { id: number; name: string; submittedAt: string | null };
  reviewers: FrozenReviewer[];
  configurationManager: { id: number; name: string; frozenAt: string };
  /** The electronic signatures the revision was frozen with: the approving round's reviewers, then the freeze. Absent in revisions frozen before signatures existed. */
  signatures?: SignatureRecord[];
}

export interface RevisionSummary {
  letter: string;
  memoVersion: number;
  title: string;
  changeSummary: string;
  frozenAt: string;
  frozenBy: { id: number; name: string };
  engineVersion: string;
  pdfSha256: string;
  pdfBytes: number;
  /** SHA-256 of the CCSDS OPM of the design orbit and of the OEM of its check; null when the revision carries none. */
  opmSha256: string | null;
  oemSha256: string | null;
}
