import crypto from 'node:crypto';
import { Attachment, AuditEvent, MemoVersion, MemoVersionLabel, Signature } from '@/models';
import { freshDatabase, makeFrozenRevision, makeMemo, makeUser } from './factories';

const sha256 = (bytes: Buffer) => crypto.createHash('sha256').update(bytes).digest('hex');

/**
 * One row of each baseline table (a frozen revision with its PDF, an
 * attachment, a memo version, an audit event, a signature, a version's name) in a fresh database, with a
 * tampered set of column values for each: the fixture of the immutability
 * trigger tests on both dialects.
 */
export async function makeBaselineRows() {
  await freshDatabase();
  const analyst = await makeUser('analyst');
  const cm = await makeUser('config-manager');
  const memo = await makeMemo(analyst, { title: 'Baseline under test' });
  const image = Buffer.from('89504e470d0a1a0a', 'hex');
  const attachment = await Attachment.create({
    memoId: memo.id,
    filename: 'orbit.png',
    contentType: 'image/png',
    byteSize: image.length,
    sha256: sha256(image),
    data: image,
    uploadedBy: analyst.id,
  });
  const revision = await makeFrozenRevision(memo.id, cm, { pdf: Buffer.from('%PDF-1.7\n% the frozen bytes\n%%EOF\n') });
  const version = await MemoVersion.findOne({ where: { memoId: memo.id, versionNumber: 1 }, rejectOnEmpty: true });
  const audit = await AuditEvent.findOne({ where: { memoId: memo.id, action: 'memo.create' }, rejectOnEmpty: true });
  const signature = await Signature.create({
    memoId: memo.id,
    userId: cm.id,
    printedName: cm.name,
    role: cm.role,
    action: 'freeze',
    meaning: 'Released as baseline',
    memoVersion: 1,
    reviewRound: 1,
    revisionLetter: 'A',
    signedAt: new Date(),
  });
  const label = await MemoVersionLabel.create({
    memoId: memo.id,
    versionNumber: 1,
    label: 'Checkpoint: before review',
    authorId: analyst.id,
    createdAt: new Date(),
  });
  const forged = Buffer.from('%PDF-1.7\n% forged\n%%EOF\n');
  return {
    analyst,
    tampered: {
      revisions: { id: revision.id, tamper: { pdf_data: forged, pdf_sha256: sha256(forged) } },
      attachments: { id: attachment.id, tamper: { data: Buffer.from('forged image'), sha256: '0'.repeat(64) } },
      audit_events: { id: audit.id, tamper: { action: 'memo.save', actor_email: 'someone.else@example.org' } },
      memo_versions: { id: version.id, tamper: { title: 'Rewritten' } as Record<string, unknown> },
      // An electronic signature cannot be re-attributed or re-worded (migration 20261202120000).
      signatures: { id: signature.id, tamper: { printed_name: 'Someone Else', meaning: 'Not reviewed' } },
      // A version's name is renamed by a newer row, never rewritten (migration 20261202141000).
      memo_version_labels: { id: label.id, tamper: { label: 'Approved as is' } },
    },
  };
}
