import { getCalcKind, engineVersion, explainMovedOutput } from '@/lib/calc';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import { blockName } from '@/lib/documents/calc-nodes';
import { getRevision } from './list-revisions';

export interface OutputDifference {
  blockId: string;
  block: string;
  output: string;
  label: string;
  unit: string | null;
  frozen: unknown;
  now: unknown;
  /** the engine changes since the frozen engine version that can move this output ("version: reason"); empty = none known */
  reasons: string[];
}

export interface ReverifyReport {
  letter: string;
  frozenEngineVersion: string;
  currentEngineVersion: string;
  checkedOutputs: number;
  differences: OutputDifference[];
  /** Blocks that computed when frozen and do not now (with the reason). */
  failures: { blockId: string; block: string; error: string }[];
}

/** True when two output values agree to the output's display precision (half a unit in the last shown decimal). */
export function agreesAtPrecision(a: unknown, b: unknown, precision: number): boolean {
  if (typeof a === 'number' && typeof b === 'number') return Math.abs(a - b) <= 0.5 * 10 ** -precision;
  // vectors (e.g. a position [x, y, z]) agree when every component does
  if (Array.isArray(a) && Array.isArray(b) && a.length === b.length && a.every((x) => typeof x === 'number')) {
    return a.every((x, k) => agreesAtPrecision(x, b[k], precision));
  }
  return JSON.stringify(a) === JSON.stringify(b);
}

/**
 * Recomputes a frozen revision's blocks from its stored content with the
 * current engine and reports every scalar output that now differs beyond
 * its display precision: a regression check of the numbers, each with the
 * engine changes (lib/calc/engineChanges.ts) that can have moved it. The
 * revision itself is never changed.
 */
export async function reverifyRevision(actor: Actor, memoId: number, letter: string): Promise<ReverifyReport> {
  const rev = await getRevision(actor, memoId, letter);
  const now = await evaluateDocumentJob(actor.id, rev.content);
  const differences: OutputDifference[] = [];
  const failures: ReverifyReport['failures'] = [];
  let checked = 0;
  for (const frozen of rev.blocks) {
    const current = now.get(frozen.blockId);
    const name = blockName({ label: frozen.label, kind: frozen.kind, blockId: frozen.blockId });
    if (!current || current.status !== 'ok') {
      failures.push({ blockId: frozen.blockId, block: name, error: current?.status === 'error' ? current.error : 'the block is missing' });
      continue;
    }
    const kind = getCalcKind(frozen.kind);
    for (const field of kind?.outputs ?? []) {
      if (field.type === 'rows') continue;
      checked++;
      const a = frozen.outputs[field.name];
      const b = current.result.outputs[field.name];
      if (!agreesAtPrecision(a, b, field.precision)) {
        const reasons = explainMovedOutput(frozen.kind, field.name, frozen.engineVersion || rev.engineVersion, engineVersion);
        differences.push({ blockId: frozen.blockId, block: name, output: field.name, label: field.label, unit: field.unit, frozen: a, now: b, reasons });
      }
    }
  }
  const report = { letter, frozenEngineVersion: rev.engineVersion, currentEngineVersion: engineVersion, checkedOutputs: checked, differences, failures };
  await recordAudit({ actor, action: 'revision.reverify', memoId, revisionLetter: letter, details: { checkedOutputs: checked, differences: differences.length, failures: failures.length, engineVersion } });
  return report;
}
