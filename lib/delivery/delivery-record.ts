/** Shapes the delivery API shows. */
import type { ApprovalSignature } from '@/lib/pdf/memo-pdf-types';
import type { DeliveryStatus } from '@/models/delivery';

export interface ContactRecord {
  userId: number;
  name: string;
  email: string;
  /** active: can sign in · invited: invitation not accepted yet · inactive: deactivated by an administrator. */
  state: 'active' | 'invited' | 'inactive';
  addedAt: string;
}

export interface DeliveryRecord {
  id: number;
  releaseId: number;
  recipient: { id: number; name: string; email: string };
  status: DeliveryStatus;
  attempts: number;
  /** When the last attempt to hand the message to the SMTP server started. */
  sentAt: string | null;
  /** When the SMTP server accepted it. */
  deliveredAt: string | null;
  error: string | null;
  nextAttemptAt: string | null;
  pdfAttached: boolean | null;
  firstOpenedAt: string | null;
  acknowledgedAt: string | null;
}

export interface ReleaseRecord {
  id: number;
  memoId: number;
  letter: string;
  coverNote: string;
  releasedAt: string;
  releasedBy: { id: number; name: string };
  deliveries: DeliveryRecord[];
}

export interface RevisionDeliveries {
  letter: string;
  releases: ReleaseRecord[];
}

/** One revision as a customer sees it in the portal list. */
export interface PortalEntry {
  memoId: number;
  documentNumber: string;
  title: string;
  letter: string;
  frozenAt: string;
  changeSummary: string;
  releasedAt: string;
  coverNote: string;
  releasedBy: string;
  pdfSha256: string;
  pdfBytes: number;
  /** SHA-256 of the CCSDS OPM (design orbit) and OEM (its one-day check) stored in the revision; null when it carries none. */
  opmSha256: string | null;
  oemSha256: string | null;
  firstOpenedAt: string | null;
  acknowledgedAt: string | null;
}

export interface PortalRevision extends PortalEntry {
  approval: {
    author: string;
    reviewers: { name: string; decision: string; decidedAt: string }[];
    configurationManager: string;
    frozenAt: string;
    signatures: ApprovalSignature[];
  };
  /** Letter, date, summary and who froze it (`by`), with the author, the reviewers and who released it, for this revision and those before it (as in the PDF). */
  revisionRecord: {
    letter: string;
    date: string;
    summary: string;
    by: string;
    author: string;
    reviewers: string;
    releasedBy: string;
  }[];
  releases: { releasedAt: string; coverNote: string; releasedBy: string }[];
}
