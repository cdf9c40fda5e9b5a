import { Extension } from '@tiptap/core';
import type { Node as ProseMirrorNode } from '@tiptap/pm/model';
import { Plugin, PluginKey, type EditorState, type Transaction } from '@tiptap/pm/state';
import { Decoration, DecorationSet } from '@tiptap/pm/view';
import type { CommentAnchor } from '@/lib/comments/comment-schema';
import type { ThreadStatus } from '@/lib/comments/comment-status';
import { docText, textRangeToDocRange } from '@/lib/comments/doc-text';
import { locateAnchor } from '@/lib/comments/locate-anchor';

/** What the highlights need to know about a thread. */
export interface HighlightThread {
  id: number;
  anchor: CommentAnchor;
  status: ThreadStatus;
}

export interface DocRange {
  from: number;
  to: number;
}

export interface CommentHighlightsState {
  threads: readonly HighlightThread[];
  activeId: number | null;
  /** The selection a thread is being written for (not yet posted). */
  pending: DocRange | null;
  /** Where each thread's passage is in the document now; null = detached. Absent until first located. */
  ranges: ReadonlyMap<number, DocRange | null>;
  decorations: DecorationSet;
  /** The document changed since the threads were last located. */
  stale: boolean;
}

type Meta =
  | { type: 'threads'; threads: readonly HighlightThread[] }
  | { type: 'active'; id: number | null }
  | { type: 'pending'; range: DocRange | null }
  | { type: 'relocate' };

export const commentHighlightsKey = new PluginKey<CommentHighlightsState>('commentHighlights');

/** Wait after the last edit before finding every passage again (edits in between are mapped). */
const RELOCATE_AFTER_MS = 300;

export const HIGHLIGHT_CLASS = {
  open: 'comment-mark rounded-[2px] bg-orbit-50 border-b-2 border-orbit-500/70 cursor-pointer',
  active: 'comment-mark comment-mark-active rounded-[2px] bg-orbit-100 border-b-2 border-orbit-700 cursor-pointer',
  pending: 'comment-mark-pending rounded-[2px] bg-orbit-100 border-b-2 border-dashed border-orbit-600',
} as const;

function locate(doc: ProseMirrorNode, threads: readonly HighlightThread[]): Map<number, DocRange | null> {
  const ranges = new Map<number, DocRange | null>();
  if (threads.length === 0) return ranges;
  const dt = docText(doc);
  for (const t of threads) {
    const found = locateAnchor(dt.text, t.anchor);
    ranges.set(t.id, found ? textRangeToDocRange(dt, found) : null);
  }
  return ranges;
}

function mapRange(r: DocRange, tr: Transaction): DocRange | null {
  const from = tr.mapping.map(r.from, 1);
  const to = tr.mapping.map(r.to, -1);
  return from < to ? { from, to } : null;
}

function decorate(doc: ProseMirrorNode, s: Omit<CommentHighlightsState, 'decorations'>): DecorationSet {
  const decos: Decoration[] = [];
  for (const t of s.threads) {
    const r = s.ranges.get(t.id);
    const active = t.id === s.activeId;
    if (!r || (t.status !== 'open' && !active)) continue;
    decos.push(
      Decoration.inline(r.from, r.to, {
        class: active ? HIGHLIGHT_CLASS.active : HIGHLIGHT_CLASS.open,
        'data-comment-thread': String(t.id),
      }),
    );
  }
  if (s.pending)
    decos.push(
      Decoration.inline(s.pending.from, s.pending.to, {
        class: HIGHLIGHT_CLASS.pending,
        'data-comment-pending': 'true',
      }),
    );
  return DecorationSet.create(doc, decos);
}

/** The thread whose highlighted passage holds `pos`; the shortest when passages overlap. */
export function threadAt(state: CommentHighlightsState, pos: number): number | null {
  let best: { id: number; length: number } | null = null;
  for (const t of state.threads) {
    const r = state.ranges.get(t.id);
    if (!r || (t.status !== 'open' && t.id !== state.activeId) || pos < r.from || pos > r.to) continue;
    if (!best || r.to - r.from < best.length) best = { id: t.id, length: r.to - r.from };
  }
  return best?.id ?? null;
}

export interface CommentHighlightsOptions {
  /** A highlighted passage was clicked. */
  onActivate?: (threadId: number) => void;
}

/**
 * Highlights each thread's passage with decorations: the document is never
 * changed, so this works in the read-only view reviewers see as well as in
 * the editor. Passages move with edits at once (positions are mapped) and
 * are found again from their quotes shortly after the last edit
 * (lib/comments/locate-anchor.ts), so a rewritten passage is re-attached or
 * shown as detached.
 */
export function commentHighlightsPlugin(options: CommentHighlightsOptions = {}): Plugin<CommentHighlightsState> {
  return new Plugin<CommentHighlightsState>({
    key: commentHighlightsKey,
    state: {
      init: (_config, state: EditorState) => ({
        threads: [],
        activeId: null,
        pending: null,
        ranges: new Map(),
        decorations: DecorationSet.create(state.doc, []),
        stale: false,
      }),
      apply(tr, value, _old, newState) {
        const meta = tr.getMeta(commentHighlightsKey) as Meta | undefined;
        if (!tr.docChanged && !meta) return value;
        let { threads, activeId, pending, ranges, stale } = value;
        if (tr.docChanged) {
          const mapped = new Map<number, DocRange | null>();
          for (const [id, r] of ranges) mapped.set(id, r ? mapRange(r, tr) : null);
          ranges = mapped;
          pending = pending ? mapRange(pending, tr) : null;
          stale = true;
        }
        if (meta?.type === 'threads') threads = meta.threads;
        if (meta?.type === 'active') activeId = meta.id;
        if (meta?.type === 'pending') pending = meta.range;
        if (meta?.type === 'threads' || meta?.type === 'relocate') {
          ranges = locate(newState.doc, threads);
          stale = false;
        }
        const next = { threads, activeId, pending, ranges, stale };
        // A plain edit moves the existing decorations with the mapping (ProseMirror DecorationSet.map)
        // instead of building a new set, so unchanged node views keep the same decorations.
        if (!meta) return { ...next, decorations: value.decorations.map(tr.mapping, tr.doc) };
        return { ...next, decorations: decorate(newState.doc, next) };
      },
    },
    props: {
      decorations: (state) => commentHighlightsKey.getState(state)?.decorations,
      handleClick: (view, pos) => {
        const s = commentHighlightsKey.getState(view.state);
        const id = s ? threadAt(s, pos) : null;
        if (id === null) return false;
        options.onActivate?.(id);
        return false;
      },
    },
    view: () => {
      let timer: ReturnType<typeof setTimeout> | undefined;
      return {
        update: (view) => {
          if (!commentHighlightsKey.getState(view.state)?.stale) return;
          clearTimeout(timer);
          timer = setTimeout(() => {
            if (!view.isDestroyed)
              view.dispatch(
                view.state.tr
                  .setMeta(commentHighlightsKey, { type: 'relocate' } satisfies Meta)
                  .setMeta('addToHistory', false),
              );
          }, RELOCATE_AFTER_MS);
        },
        destroy: () => clearTimeout(timer),
      };
    },
  });
}

/** Commands on a view that carries the plugin. */
export const commentHighlights = {
  setThreads: (tr: Transaction, threads: readonly HighlightThread[]) =>
    tr.setMeta(commentHighlightsKey, { type: 'threads', threads } satisfies Meta).setMeta('addToHistory', false),
  setActive: (tr: Transaction, id: number | null) =>
    tr.setMeta(commentHighlightsKey, { type: 'active', id } satisfies Meta).setMeta('addToHistory', false),
  setPending: (tr: Transaction, range: DocRange | null) =>
    tr.setMeta(commentHighlightsKey, { type: 'pending', range } satisfies Meta).setMeta('addToHistory', false),
};

/** The same plugin as a Tiptap extension, for an editor that lists it among its extensions. */
export const CommentHighlights = Extension.create<CommentHighlightsOptions>({
  name: 'commentHighlights',
  addOptions: () => ({}),
  addProseMirrorPlugins() {
    return [commentHighlightsPlugin(this.options)];
  },
});
