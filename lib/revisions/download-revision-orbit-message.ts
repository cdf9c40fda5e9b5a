import type { Actor } from '@/lib/auth/permissions';
import { notFound } from '@/lib/api/errors';
import { recordAudit } from '@/lib/audit/record-audit';
import { noteRevisionOpened } from '@/lib/delivery/note-revision-opened';
import { getRevision } from './list-revisions';

export type OrbitMessageKind = 'opm' | 'oem';

export interface OrbitMessageFile {
  text: string;
  filename: string;
  sha256: string;
}

/**
 * The CCSDS OPM (design orbit) or OEM (its one-day numerical check) stored in a
 * frozen revision: the same text every time, with the SHA-256 stored at the freeze.
 * Who may read the revision's PDF may read these. 404 when the revision carries
 * none (its memo had no dated state when frozen, or it was frozen before).
 */
export async function downloadRevisionOrbitMessage(
  actor: Actor,
  memoId: number,
  letter: string,
  kind: OrbitMessageKind,
): Promise<OrbitMessageFile> {
  const rev = await getRevision(actor, memoId, letter);
  const text = kind === 'opm' ? rev.opmKvn : rev.oemKvn;
  const sha256 = kind === 'opm' ? rev.opmSha256 : rev.oemSha256;
  if (!text || !sha256)
    throw notFound(
      `The ${kind.toUpperCase()} of revision ${rev.letter} (its memo had no calc block with a dated state when it was frozen)`,
    );
  await recordAudit({
    actor,
    action: 'orbit-message.download',
    memoId,
    revisionLetter: rev.letter,
    details: { kind, sha256 },
  });
  await noteRevisionOpened(actor, rev, 'pdf');
  return {
    text,
    filename: `${rev.documentNumber.replace(/[^A-Za-z0-9._-]+/g, '-')}-rev-${rev.letter}.${kind}`,
    sha256,
  };
}
