import { Memo, MemoVersion, Revision } from '@/models';
import { badRequest, notFound } from '@/lib/api/errors';
import type { Actor } from '@/lib/auth/permissions';
import { getCalcKind } from '@/lib/calc';
import { isRef, type InputEntry } from '@/lib/documents/calc-nodes';
import { docPlainText } from '@/lib/documents/doc-plain-text';
import { summariseInputText } from '@/lib/format/summarise-input-text';
import { evaluateDocumentJob } from '@/lib/jobs/evaluate-document-job';
import { formatValue } from '@/lib/format/format-output';
import { loadMemoFor } from '@/lib/memos/load-memo';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import { compareBlocks, compareUnits, wordDiff, type BlockChange, type TextSegment } from './compare-blocks';
import { agreesAtPrecision } from './reverify-revision';
import { isRevisionLetter } from './revision-letter';

/** A side of a comparison: `v7` (a saved version), `rA` (a frozen revision) or `current`. */
export type VersionRef =
  { type: 'version'; number: number } | { type: 'revision'; letter: string } | { type: 'current' };

export function parseVersionRef(text: string | undefined, name: string): VersionRef {
  const t = (text ?? '').trim();
  if (t === 'current') return { type: 'current' };
  const v = /^v(\d{1,9})$/.exec(t);
  if (v) return { type: 'version', number: Number(v[1]) };
  const r = /^r([A-Z]{1,3})$/.exec(t);
  if (r && isRevisionLetter(r[1])) return { type: 'revision', letter: r[1] };
  throw badRequest(`${name} must be v<number> (a saved version), r<letter> (a revision) or current; got “${t}”.`, {
    [name]: 'use v<number>, r<letter> or current',
  });
}

interface SideBlock {
  label: string;
  kind: string;
  inputs: Record<string, InputEntry>;
  outputs: Record<string, unknown> | null;
}

interface Side {
  label: string;
  content: TiptapDoc;
  blocks: Map<string, SideBlock>;
}

async function loadSide(actor: Actor, memoId: number, ref: VersionRef): Promise<Side> {
  if (ref.type === 'revision') {
    const rev = await Revision.findOne({
      where: { memoId, letter: ref.letter },
      attributes: ['letter', 'content', 'blocks'],
    });
    if (!rev) throw notFound(`Revision ${ref.letter}`);
    return {
      label: `revision ${rev.letter}`,
      content: rev.content,
      blocks: new Map(
        rev.blocks.map((b) => [
          b.blockId,
          { label: b.label, kind: b.kind, inputs: b.storedInputs as Record<string, InputEntry>, outputs: b.outputs },
        ]),
      ),
    };
  }
  let content: TiptapDoc;
  let label: string;
  if (ref.type === 'version') {
    const v = await MemoVersion.findOne({ where: { memoId, versionNumber: ref.number } });
    if (!v) throw notFound(`Version ${ref.number}`);
    content = v.content;
    label = `version ${ref.number}`;
  } else {
    const m = await Memo.findByPk(memoId);
    if (!m) throw notFound(`Memo ${memoId}`);
    content = m.content;
    label = `current (version ${m.version})`;
  }
  const evaluations = await evaluateDocumentJob(actor.id, content);
  const blocks = new Map<string, SideBlock>();
  for (const e of evaluations.values())
    blocks.set(e.blockId, {
      label: e.block.label,
      kind: e.block.kind,
      inputs: e.block.inputs,
      outputs: e.status === 'ok' ? e.result.outputs : null,
    });
  return { label, content, blocks };
}

export type { BlockChange, TextSegment };
export interface OutputChange {
  blockId: string;
  block: string;
  output: string;
  label: string;
  unit: string | null;
  from: string;
  to: string;
}
export interface InputChange {
  blockId: string;
  block: string;
  input: string;
  label: string;
  from: string;
  to: string;
}
export interface Comparison {
  from: string;
  to: string;
  /** The whole text, word by word. */
  text: TextSegment[];
  /** Part by part (paragraphs, tables cell by cell, images), in document order. */
  blocks: BlockChange[];
  outputs: OutputChange[];
  inputs: InputChange[];
}

const entryText = (e: InputEntry | undefined): string =>
  !e ? '—' : isRef(e) ? `← ${e.ref.blockId}.${e.ref.output}` : summariseInputText(e.text) || '(default)';

function quoteFrom(side: Side) {
  return (blockId: string, output: string) => {
    const b = side.blocks.get(blockId);
    const field = b ? getCalcKind(b.kind)?.outputs.find((o) => o.name === output) : undefined;
    if (!b || !field || !b.outputs) return '[missing value]';
    return formatValue(b.outputs[output], field.unit, field.precision);
  };
}

/**
 * Compares two versions or revisions of a memo: the text (word-level
 * insertions and deletions, Myers' O(ND) difference algorithm as
 * implemented by the `diff` package), the same part by part with images
 * and tables compared as such (compare-blocks.ts), every calc output that changed beyond
 * its display precision, and every input that changed.
 */
export async function compareVersions(
  actor: Actor,
  memoId: number,
  fromRef: VersionRef,
  toRef: VersionRef,
): Promise<Comparison> {
  await loadMemoFor(actor, memoId, 'memo.versions');
  const [a, b] = await Promise.all([loadSide(actor, memoId, fromRef), loadSide(actor, memoId, toRef)]);
  const text = wordDiff(docPlainText(a.content, quoteFrom(a)), docPlainText(b.content, quoteFrom(b)));
  const blocks = compareBlocks(compareUnits(a.content, quoteFrom(a)), compareUnits(b.content, quoteFrom(b)));

  const outputs: OutputChange[] = [];
  const inputs: InputChange[] = [];
  const ids = [...new Set([...a.blocks.keys(), ...b.blocks.keys()])];
  for (const id of ids) {
    const before = a.blocks.get(id);
    const after = b.blocks.get(id);
    const any = after ?? before;
    if (any === undefined) throw new Error(`compare: block ${id} is in neither version`);
    const kind = getCalcKind(any.kind);
    const name = any.label || any.kind;
    for (const field of kind?.outputs ?? []) {
      if (field.type === 'rows') continue;
      const x = before?.outputs?.[field.name];
      const y = after?.outputs?.[field.name];
      if (before?.kind === after?.kind && agreesAtPrecision(x, y, field.precision)) continue;
      outputs.push({
        blockId: id,
        block: name,
        output: field.name,
        label: field.label,
        unit: field.unit,
        from: before?.outputs ? formatValue(x, field.unit, field.precision) : '—',
        to: after?.outputs ? formatValue(y, field.unit, field.precision) : '—',
      });
    }
    for (const field of kind?.inputs ?? []) {
      const x = entryText(before?.inputs[field.name]);
      const y = entryText(after?.inputs[field.name]);
      if (x !== y)
        inputs.push({
          blockId: id,
          block: name,
          input: field.name,
          label: field.label,
          from: before ? x : '—',
          to: after ? y : '—',
        });
    }
  }
  return { from: a.label, to: b.label, text, blocks, outputs, inputs };
}
