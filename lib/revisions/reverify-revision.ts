import { getCalcKind, engineVersion, explainMovedOutput } from '@/lib/calc';
import type { Actor } from '@/lib/auth/permissions';
import { recordAudit } from '@/lib/audit/record-audit';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import { blockName } from '@/lib/documents/calc-nodes';
import { documentIndex } from '@/lib/documents/model/document-index';
import { checkRequirementWith } from '@/lib/requirements/check-requirements';
import { lookupInEvaluations, lookupInResults } from '@/lib/requirements/lookup-outputs';
import { getRevision } from './list-revisions';
import type { FrozenBlock } from './revision-record';

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

/** A requirement of the revision: its verdict on the frozen numbers and on the numbers recomputed now. */
export interface RequirementReverification {
  requirementId: string;
  text: string;
  condition: string;
  frozen: { status: 'pass' | 'fail' | 'undecided'; value: string; margin: string };
  now: { status: 'pass' | 'fail' | 'undecided'; value: string; margin: string };
}

export interface ReverifyReport {
  letter: string;
  frozenEngineVersion: string;
  currentEngineVersion: string;
  checkedOutputs: number;
  differences: OutputDifference[];
  /** Blocks that computed when frozen and do not now (with the reason). */
  failures: { blockId: string; block: string; error: string }[];
  /** Every requirement frozen with the revision, decided on the frozen and on the current numbers. */
  requirements: RequirementReverification[];
  /** The requirements whose verdict is not the one frozen. */
  changedVerdicts: RequirementReverification[];
}

/**
 * The requirements frozen with a revision (in its stored content), each
 * decided on the block outputs frozen with it and on the outputs recomputed
 * now.
 */
function reverifyRequirements(
  content: Parameters<typeof documentIndex>[0],
  frozenBlocks: FrozenBlock[],
  now: Parameters<typeof lookupInEvaluations>[0],
): RequirementReverification[] {
  const frozenLookup = lookupInResults(
    new Map(frozenBlocks.map((b) => [b.blockId, { result: b, name: b.label || blockName(b) }])),
  );
  const nowLookup = lookupInEvaluations(now);
  return documentIndex(content).requirements.map((r) => {
    const [a, b] = [checkRequirementWith(r, frozenLookup), checkRequirementWith(r, nowLookup)];
    return {
      requirementId: r.requirementId,
      text: r.text,
      condition: b.conditionText,
      frozen: { status: a.verdict.status, value: a.valueText, margin: a.marginText },
      now: { status: b.verdict.status, value: b.valueText, margin: b.marginText },
    };
  });
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
 * engine changes (lib/calc/engine-changes.ts) that can have moved it, and
 * every requirement whose verdict is no longer the frozen one. The
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
      failures.push({
        blockId: frozen.blockId,
        block: name,
        error: current?.status === 'error' ? current.error : 'the block is missing',
      });
      continue;
    }
    const kind = getCalcKind(frozen.kind);
    for (const field of kind?.outputs ?? []) {
      if (field.type === 'rows') continue;
      checked++;
      const a = frozen.outputs[field.name];
      const b = current.result.outputs[field.name];
      if (!agreesAtPrecision(a, b, field.precision)) {
        const reasons = explainMovedOutput(
          frozen.kind,
          field.name,
          frozen.engineVersion || rev.engineVersion,
          engineVersion,
        );
        differences.push({
          blockId: frozen.blockId,
          block: name,
          output: field.name,
          label: field.label,
          unit: field.unit,
          frozen: a,
          now: b,
          reasons,
        });
      }
    }
  }
  const requirements = reverifyRequirements(rev.content, rev.blocks, now);
  const changedVerdicts = requirements.filter((r) => r.frozen.status !== r.now.status);
  const report = {
    letter,
    frozenEngineVersion: rev.engineVersion,
    currentEngineVersion: engineVersion,
    checkedOutputs: checked,
    differences,
    failures,
    requirements,
    changedVerdicts,
  };
  await recordAudit({
    actor,
    action: 'revision.reverify',
    memoId,
    revisionLetter: letter,
    details: {
      checkedOutputs: checked,
      differences: differences.length,
      failures: failures.length,
      engineVersion,
      ...(changedVerdicts.length
        ? { changedVerdicts: changedVerdicts.map((r) => `${r.requirementId}: ${r.frozen.status} → ${r.now.status}`) }
        : {}),
    },
  });
  return report;
}
