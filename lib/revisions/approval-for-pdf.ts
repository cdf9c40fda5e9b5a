import { isRole, ROLE_LABELS } from '@/lib/auth/roles';
import type { ApprovalSignature, RevisionRecordRow } from '@/lib/pdf/memo-pdf-types';
import type { SignatureRecord } from '@/lib/signatures/signature-record';
import type { FrozenApproval } from './revision-record';

/** A stored signature as the PDF's approval block prints it (role by its label, as it was when signing). */
export const toApprovalSignature = (s: SignatureRecord): ApprovalSignature => ({
  role: isRole(s.role) ? ROLE_LABELS[s.role] : s.role,
  name: s.printedName,
  meaning: s.meaning,
  signedAt: s.signedAt,
});

/**
 * One row of the revision record from a revision's stored approval: the
 * author is the analyst who owns the memo, the reviewers are those whose
 * decisions the revision carries, and it was released (frozen) by the
 * configuration manager. `frozenByName` covers revisions stored before the
 * approval held the configuration manager's name.
 */
export function revisionRecordRow(
  letter: string,
  frozenAt: Date | string,
  changeSummary: string,
  approval: FrozenApproval | null | undefined,
  frozenByName?: string,
): RevisionRecordRow {
  return {
    revision: letter,
    date: new Date(frozenAt).toISOString().slice(0, 10),
    description: changeSummary,
    author: approval?.author.name || undefined,
    reviewers: approval?.reviewers.map((r) => r.name).join(', ') || undefined,
    releasedBy: approval?.configurationManager.name || frozenByName,
  };
}
