import type { CalcResult } from '@/lib/calc';

/** What a calc block shows: its result, or why it has none (with the last good result kept). */
export type BlockState =
  | { status: 'ok'; result: CalcResult }
  | { status: 'pending'; lastGood?: CalcResult }
  | { status: 'waiting'; message: string; fields: Record<string, string>; lastGood?: CalcResult }
  | { status: 'error'; error: string; fields: Record<string, string>; lastGood?: CalcResult };

type Listener = () => void;

/**
 * The editor's results, one entry per calc block, outside React state so
 * that a result arriving re-renders only the block and live values that
 * show it (useSyncExternalStore), never the text being typed.
 */
export class CalcStore {
  private states = new Map<string, BlockState>();
  private byBlock = new Map<string, Set<Listener>>();
  private any = new Set<Listener>();
  private present = new Map<string, { label: string; kind: string }>();

  get(blockId: string): BlockState | undefined {
    return this.states.get(blockId);
  }

  /** Current good result of a block (what downstream blocks and live values read). */
  result(blockId: string): CalcResult | undefined {
    const s = this.states.get(blockId);
    return s?.status === 'ok' ? s.result : undefined;
  }

  /** The result to show while a block recomputes or fails: the current one, else the last good one. */
  lastGood(blockId: string): CalcResult | undefined {
    const s = this.states.get(blockId);
    if (!s) return undefined;
    return s.status === 'ok' ? s.result : s.lastGood;
  }

  set(blockId: string, state: BlockState): void {
    const prev = this.states.get(blockId);
    if (prev && sameState(prev, state)) return;
    this.states.set(blockId, state);
    this.byBlock.get(blockId)?.forEach((l) => l());
    this.any.forEach((l) => l());
  }

  /** Blocks in the document now, with label and kind (live values use it to tell a removed block). */
  setPresent(blocks: { blockId: string; label: string; kind: string }[]): void {
    const next = new Map(blocks.map((b) => [b.blockId, { label: b.label, kind: b.kind }]));
    const changed =
      next.size !== this.present.size ||
      [...next].some(([id, v]) => this.present.get(id)?.label !== v.label || this.present.get(id)?.kind !== v.kind);
    if (!changed) return;
    const gone = [...this.present.keys()].filter((id) => !next.has(id));
    this.present = next;
    for (const id of gone) this.states.delete(id);
    this.byBlock.forEach((set) => set.forEach((l) => l()));
  }

  block(blockId: string): { label: string; kind: string } | undefined {
    return this.present.get(blockId);
  }

  blocks(): { blockId: string; label: string; kind: string }[] {
    return [...this.present].map(([blockId, v]) => ({ blockId, ...v }));
  }

  subscribe(blockId: string, listener: Listener): () => void {
    let set = this.byBlock.get(blockId);
    if (!set) this.byBlock.set(blockId, (set = new Set()));
    set.add(listener);
    return () => set!.delete(listener);
  }

  subscribeAll(listener: Listener): () => void {
    this.any.add(listener);
    return () => this.any.delete(listener);
  }
}

function sameState(a: BlockState, b: BlockState): boolean {
  if (a.status !== b.status) return false;
  switch (a.status) {
    case 'ok':
      return a.result === (b as typeof a).result;
    case 'pending':
      return a.lastGood === (b as typeof a).lastGood;
    case 'waiting':
    case 'error': {
      const o = b as typeof a;
      return (
        JSON.stringify([a.fields, 'message' in a ? a.message : a.error, a.lastGood?.engineVersion]) ===
          JSON.stringify([o.fields, 'message' in o ? o.message : o.error, o.lastGood?.engineVersion]) &&
        a.lastGood === o.lastGood
      );
    }
  }
}
