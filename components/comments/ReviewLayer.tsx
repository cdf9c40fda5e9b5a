'use client';

import { useCallback, useEffect, useLayoutEffect, useRef, useState } from 'react';
import { createPortal } from 'react-dom';
import useSWR, { useSWRConfig } from 'swr';
import type { Editor } from '@tiptap/core';
import { TextSelection } from '@tiptap/pm/state';
import type { ThreadRecord } from '@/lib/comments/comment-record';
import type { CommentAnchor } from '@/lib/comments/comment-schema';
import { buildAnchor } from '@/lib/comments/build-anchor';
import { docRangeToTextRange, docText, INLINE_OBJECT, shownText, textRangeToDocRange } from '@/lib/comments/doc-text';
import { postJson, swrFetcher } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import {
  commentHighlights,
  commentHighlightsKey,
  commentHighlightsPlugin,
  type CommentHighlightsState,
} from './comment-highlights';
import { CommentsPanel } from './CommentsPanel';
import { groupOf, type ThreadGroup } from './thread-groups';

/** How often the panel asks for threads others wrote (the badge uses the same pace). */
const REFRESH_MS = 30_000;

export interface ReviewLayerProps {
  editor: Editor | null;
  memoId: number;
  /** May start threads and reply (permission memo.comment). */
  canComment: boolean;
  /** May resolve and reopen threads (permission memo.resolve). */
  canResolve: boolean;
}

const isShortcut = (e: KeyboardEvent) => (e.ctrlKey || e.metaKey) && e.altKey && !e.shiftKey && e.code === 'KeyM';
const mounted = (editor: Editor | null): editor is Editor => !!editor && editor.isInitialized && !editor.isDestroyed;

/** What the inline node at `pos` shows the reader; null while a live value has no number (pending, failed or broken). */
function displayedText(editor: Editor, pos: number): string | null {
  const el = editor.view.nodeDOM(pos);
  if (!(el instanceof HTMLElement)) return null;
  const state =
    el.getAttribute('data-live-value') ?? el.querySelector('[data-live-value]')?.getAttribute('data-live-value');
  if (state && state !== 'ok') return null;
  return el.textContent?.replace(/\s+/g, ' ').trim() || null;
}

/**
 * Inline review for one memo: registers the highlights plugin on the given
 * editor (read-only or not; the document is never changed), shows the
 * threads panel, and lets analysts and assigned reviewers start a thread
 * from a text selection with the Comment button or Ctrl+Alt+M. Opening the
 * memo marks its notifications read.
 */
function sameAttachment(a: CommentHighlightsState, b: CommentHighlightsState): boolean {
  if (
    a.threads !== b.threads ||
    a.activeId !== b.activeId ||
    (a.pending === null) !== (b.pending === null) ||
    a.ranges.size !== b.ranges.size
  )
    return false;
  for (const [id, r] of a.ranges) if (!b.ranges.has(id) || (r === null) !== (b.ranges.get(id) === null)) return false;
  return true;
}

export function ReviewLayer({ editor, memoId, canComment, canResolve }: ReviewLayerProps) {
  const { mutate } = useSWRConfig();
  const key = swrKeys.memoComments(memoId);
  const {
    data,
    error,
    mutate: mutateThreads,
  } = useSWR<{ threads: ThreadRecord[] }>(key, swrFetcher, { refreshInterval: REFRESH_MS });
  const threads = data?.threads;
  const [hl, setHl] = useState<CommentHighlightsState | undefined>(undefined);
  const [activeId, setActiveId] = useState<number | null>(null);
  const [group, setGroup] = useState<ThreadGroup>('open');
  const [pending, setPending] = useState<CommentAnchor | null>(null);
  const [notice, setNotice] = useState<string | null>(null);
  const [button, setButton] = useState<{ top: number; left: number } | null>(null);
  const threadsRef = useRef(threads);
  // Refs are written after commit, not during render (https://react.dev/reference/react/useRef#caveats).
  useLayoutEffect(() => {
    threadsRef.current = threads;
  }, [threads]);
  const activate = useRef<(id: number | null, scrollEditor: boolean) => void>(() => {});

  // The highlights plugin lives as long as this layer, on whatever editor it is given.
  useEffect(() => {
    if (!editor) return;
    editor.registerPlugin(commentHighlightsPlugin({ onActivate: (id) => activate.current(id, false) }));
    const list = threadsRef.current;
    if (list)
      editor.view.dispatch(
        commentHighlights.setThreads(
          editor.state.tr,
          list.map(({ id, anchor, status }) => ({ id, anchor, status })),
        ),
      );
    const onTransaction = () => {
      const s = commentHighlightsKey.getState(editor.state);
      // Typing moves every passage's positions; the panel only needs to know which threads are attached,
      // so the state changes (and React commits) only when that does — a commit while the caret is in a
      // long memo costs a walk of its whole DOM.
      setHl((prev) => (prev === s || (prev && s && sameAttachment(prev, s)) ? prev : s));
      const sel = editor.state.selection;
      if (!canComment || sel.empty || !mounted(editor)) {
        setButton(null);
        return;
      }
      const c = editor.view.coordsAtPos(sel.to);
      setButton({ top: c.bottom + window.scrollY + 6, left: c.left + window.scrollX });
    };
    editor.on('transaction', onTransaction);
    onTransaction();
    return () => {
      editor.off('transaction', onTransaction);
      editor.unregisterPlugin(commentHighlightsKey);
    };
  }, [editor, canComment]);

  useEffect(() => {
    if (!editor || !threads || !commentHighlightsKey.getState(editor.state)) return;
    editor.view.dispatch(
      commentHighlights.setThreads(
        editor.state.tr,
        threads.map(({ id, anchor, status }) => ({ id, anchor, status })),
      ),
    );
  }, [editor, threads]);

  useLayoutEffect(() => {
    activate.current = (id, scrollEditor) => {
      setActiveId(id);
      if (editor && commentHighlightsKey.getState(editor.state))
        editor.view.dispatch(commentHighlights.setActive(editor.state.tr, id));
      const t = id === null ? undefined : threadsRef.current?.find((x) => x.id === id);
      if (t) setGroup(groupOf(t, editor ? commentHighlightsKey.getState(editor.state)?.ranges : undefined));
      if (!scrollEditor || id === null || !mounted(editor)) return;
      const mark = editor.view.dom.querySelector(`[data-comment-thread="${id}"]`);
      const range = commentHighlightsKey.getState(editor.state)?.ranges.get(id);
      if (mark) mark.scrollIntoView({ block: 'center', behavior: 'smooth' });
      else if (range) {
        const at = editor.view.domAtPos(range.from).node;
        (at instanceof Element ? at : at.parentElement)?.scrollIntoView({ block: 'center', behavior: 'smooth' });
      }
    };
  });

  const startThread = useCallback(() => {
    if (!editor || !canComment) return;
    const sel = editor.state.selection;
    const dt = docText(editor.state.doc);
    const built = buildAnchor(dt.text, docRangeToTextRange(dt, sel.from, sel.to));
    if (!built.ok) {
      setNotice(built.reason);
      return;
    }
    setNotice(null);
    // The quote as displayed: each live value's text as its node view shows it now.
    const shown = built.anchor.quote.includes(INLINE_OBJECT)
      ? shownText(dt, built.range, (pos) => displayedText(editor, pos))
      : undefined;
    setPending(shown && shown !== built.anchor.quote ? { ...built.anchor, shown } : built.anchor);
    setButton(null);
    editor.view.dispatch(commentHighlights.setPending(editor.state.tr, textRangeToDocRange(dt, built.range)));
  }, [editor, canComment]);

  const finishThread = useCallback(
    (created: ThreadRecord | null) => {
      setPending(null);
      if (editor && commentHighlightsKey.getState(editor.state))
        editor.view.dispatch(commentHighlights.setPending(editor.state.tr, null));
      if (!created) return;
      // The selection has served; collapse it so the Comment button goes away.
      if (editor)
        editor.view.dispatch(
          editor.state.tr.setSelection(TextSelection.create(editor.state.doc, editor.state.selection.to)),
        );
      void mutateThreads((d) => ({ threads: [...(d?.threads ?? []).filter((t) => t.id !== created.id), created] }), {
        revalidate: true,
      });
      setGroup('open');
      setActiveId(created.id);
      if (editor && commentHighlightsKey.getState(editor.state))
        editor.view.dispatch(commentHighlights.setActive(editor.state.tr, created.id));
    },
    [editor, mutateThreads],
  );

  const onChanged = useCallback(
    (changed: ThreadRecord) => {
      void mutateThreads((d) => ({ threads: (d?.threads ?? []).map((t) => (t.id === changed.id ? changed : t)) }), {
        revalidate: false,
      });
      void mutate(swrKeys.memo(memoId));
      // A thread just resolved or reopened stays in view: follow it to its group.
      if (changed.id === activeId) setGroup(groupOf(changed, hl?.ranges));
    },
    [mutateThreads, mutate, memoId, activeId, hl],
  );

  // Ctrl+Alt+M starts a thread on the selection, in the editor or the read-only view.
  useEffect(() => {
    if (!canComment) return;
    const onKey = (e: KeyboardEvent) => {
      if (!isShortcut(e) || !editor || editor.state.selection.empty) return;
      e.preventDefault();
      startThread();
    };
    document.addEventListener('keydown', onKey);
    return () => document.removeEventListener('keydown', onKey);
  }, [canComment, editor, startThread]);

  // Opening the memo reads its notifications.
  useEffect(() => {
    void postJson(swrKeys.notificationsRead(), { memoId }).then((r) => r.ok && mutate(swrKeys.notifications()));
  }, [memoId, mutate]);

  // A link to a thread (?thread=ID, from a notification) opens it once it is placed.
  const linked = useRef<number | null | undefined>(undefined);
  useEffect(() => {
    if (linked.current === undefined) {
      const n = Number(new URLSearchParams(window.location.search).get('thread'));
      linked.current = Number.isSafeInteger(n) && n > 0 ? n : null;
    }
    const id = linked.current;
    if (id === null || !threads || !hl || !hl.ranges.has(id) || !threads.some((t) => t.id === id)) return;
    linked.current = null;
    activate.current(id, true);
  }, [threads, hl]);

  return (
    <>
      <CommentsPanel
        memoId={memoId}
        threads={threads}
        loadError={error ? (error as Error).message : null}
        ranges={hl?.ranges}
        group={group}
        onGroup={setGroup}
        activeId={activeId}
        onActivate={(id) => activate.current(id, true)}
        onShowPassage={(id) => activate.current(id, true)}
        pending={pending}
        onPendingDone={finishThread}
        onChanged={onChanged}
        notice={notice}
        onNotice={setNotice}
        canComment={canComment}
        canResolve={canResolve}
      />
      {button &&
        !pending &&
        createPortal(
          <button
            type="button"
            className="btn-primary absolute z-30 py-1 shadow-sheet"
            style={{ top: button.top, left: button.left }}
            onMouseDown={(e) => e.preventDefault()}
            onClick={startThread}
            title="Comment on the selected text (Ctrl+Alt+M)"
          >
            Comment
          </button>,
          document.body,
        )}
    </>
  );
}
