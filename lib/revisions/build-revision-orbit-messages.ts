import crypto from 'node:crypto';
import { documentIndex } from '@/lib/documents/model/document-index';
import type { TiptapNode } from '@/lib/memos/memo-schema';
import { readStateResult } from '@/lib/orbit-data/read-state-result';
import { writeStateOem, writeStateOpm } from '@/lib/orbit-data/write-state-messages';
import type { FrozenBlock } from './revision-record';

export interface RevisionOrbitMessages {
  opmKvn: string | null;
  opmSha256: string | null;
  oemKvn: string | null;
  oemSha256: string | null;
  /** Label of the block whose state is the design orbit, or null when the memo has none. */
  designBlock: string | null;
}

const sha256 = (text: string) => crypto.createHash('sha256').update(text, 'utf8').digest('hex');

/**
 * The CCSDS messages a frozen revision carries: the design orbit is the first calc
 * block, in document order, whose frozen result is a dated state (a mean-to-osculating
 * block with an epoch, or an imported orbit data message); its OPM, and the OEM of
 * its one-day numerical check, are written from the frozen outputs with their
 * SHA-256. A memo without such a block gets none (all null).
 */
export function buildRevisionOrbitMessages(
  memo: { documentNumber: string; title: string; content: TiptapNode },
  letter: string,
  blocks: FrozenBlock[],
  organisation: string,
  frozenAt: Date,
): RevisionOrbitMessages {
  const byId = new Map(blocks.map((b) => [b.blockId, b]));
  for (const { blockId } of documentIndex(memo.content).calc.blocks) {
    const block = byId.get(blockId);
    if (!block) continue;
    const read = readStateResult(block);
    if (!read.ok) continue;
    const label = block.label || block.kind;
    const subject = {
      originator: organisation,
      creationDate: frozenAt,
      objectName: memo.title.slice(0, 80),
      objectId: memo.documentNumber,
      comments: [
        `Design orbit of ${memo.documentNumber} revision ${letter}, calc block "${label}" (${block.kind}).`,
        "OBJECT_ID is the design memo's document number: no international designator is assigned before launch.",
      ],
    };
    const opmKvn = writeStateOpm(subject, read.state);
    const oemKvn = writeStateOem(subject, read.state);
    return { opmKvn, opmSha256: sha256(opmKvn), oemKvn, oemSha256: sha256(oemKvn), designBlock: label };
  }
  return { opmKvn: null, opmSha256: null, oemKvn: null, oemSha256: null, designBlock: null };
}
