'use client';

import { useCallback, useEffect, useMemo, useRef, useState, type KeyboardEvent, type ReactNode } from 'react';
import { EditorContent, useEditor, type Editor } from '@tiptap/react';
import { SWRConfig } from 'swr';
import type { CalcKindDescriptor, CalcResult } from '@/lib/calc';
import type { TiptapDoc } from '@/lib/memos/memo-schema';
import type { MemoDetail } from '@/lib/memos/memo-record';
import { patchJson, requestJson } from '@/lib/client/fetch-json';
import { swrKeys } from '@/lib/client/swr-keys';
import { formatDateTime } from '@/lib/format/format-date';
import { editorExtensions } from './editor-extensions';
import { CalcStore } from './calc/calc-store';
import { CalcContextProvider } from './calc/calc-context';
import { FigureContextProvider } from './calc/figure-context';
import type { FigureKindInfo } from '@/lib/figures/figure-types';
import { CalcRunner } from './calc/CalcRunner';
import { Toolbar, type PickerState } from './Toolbar';
import { clearBackup, readBackup, writeBackup, type LocalBackup } from './local-backup';
import { ConflictDialog, type ConflictInfo } from './ConflictDialog';
import { registerSaveFlush, type SaveOutcome } from './pending-save';
import { VersionPanel } from './VersionPanel';
import { ReviewLayer } from '@/components/comments/ReviewLayer';
import { useSWRConfig } from 'swr';
import { askImageCaption, IMAGE_CAPTION_MAX } from '@/lib/documents/model/nodes/captioned-image';
import { announceMemoSaved } from '@/components/memos/MemoSavedStamp';

/** Wait after the last keystroke before saving (common practice for autosave, no source). */
const AUTOSAVE_DEBOUNCE_MS = 1200;
/** Wait after the last keystroke before the local copy is written (well inside the autosave delay). */
const LOCAL_BACKUP_DEBOUNCE_MS = 250;

type SaveState =
  | { kind: 'saved'; at: string }
  | { kind: 'dirty' }
  | { kind: 'saving' }
  | { kind: 'conflict' }
  | { kind: 'failed'; message: string };

export interface MemoEditorProps {
  memo: MemoDetail;
  kinds: CalcKindDescriptor[];
  /** Results the server computed for the stored document, keyed by calc request key. */
  initialResults: Record<string, CalcResult>;
  editable: boolean;
  canCompute: boolean;
  /** When showing an old version read-only. */
  content?: TiptapDoc;
  /** Figure kinds (metadata only) offered by the figure blocks. */
  figureKinds: readonly FigureKindInfo[];
  /** Further panels for the right-hand column (revisions, …), rendered by the page. */
  aside?: ReactNode;
}

export function MemoEditor(props: MemoEditorProps) {
  return (
    <SWRConfig value={{ fallback: props.initialResults }}>
      <MemoEditorInner {...props} />
    </SWRConfig>
  );
}

function MemoEditorInner({ memo, kinds, figureKinds, editable, canCompute, content, aside }: MemoEditorProps) {
  const kindMap = useMemo(() => new Map(kinds.map((k) => [k.kind, k])), [kinds]);
  const store = useMemo(() => new CalcStore(), []);
  const { mutate } = useSWRConfig();
  const [title, setTitle] = useState(memo.title);
  const [save, setSave] = useState<SaveState>({ kind: 'saved', at: memo.updatedAt });
  const [conflict, setConflict] = useState<ConflictInfo | null>(null);
  const [restorable, setRestorable] = useState<LocalBackup | null>(null);
  const [picker, setPicker] = useState<PickerState>('none');
  const [notice, setNotice] = useState<string | null>(null);
  const [savedVersion, setSavedVersion] = useState(memo.version);
  /** Why the stored content could not be loaded; while set, the editor is read-only and nothing is saved. */
  const [loadError, setLoadError] = useState<string | null>(null);
  const loadFailed = useRef(false);
  const canEdit = editable && !loadError;

  const baseVersion = useRef(memo.version);
  const titleRef = useRef(memo.title);
  const timer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const backupTimer = useRef<ReturnType<typeof setTimeout> | undefined>(undefined);
  const inFlight = useRef<Promise<SaveOutcome> | null>(null);
  const changedSinceSend = useRef(false);
  /** The version whose text was put back, until the save that carries it is accepted (the history shows it as a restore). */
  const restoredFrom = useRef<number | undefined>(undefined);
  /** False from the first change until the server confirms a save with nothing changed since. */
  const confirmed = useRef(true);

  const editor = useEditor({
    extensions: editorExtensions(),
    content: content ?? memo.content,
    editable,
    immediatelyRender: false,
    // Content the schema cannot hold must not be silently dropped: Tiptap would load what it can (often an
    // empty document) and the next keystroke would autosave that over the memo. Refuse to edit instead.
    enableContentCheck: true,
    onContentError: ({ editor: failed, error }) => {
      if (failed.isInitialized) return;
      loadFailed.current = true;
      failed.setEditable(false, false);
      setLoadError(describeContentError(error));
    },
    editorProps: {
      attributes: {
        class: 'memo-prose min-h-[24rem] px-8 py-6 focus:outline-none',
        'aria-label': 'Memo text',
        role: 'textbox',
        'aria-multiline': 'true',
      },
    },
  });

  const snapshot = useCallback((): LocalBackup | null => {
    if (!editor) return null;
    return {
      memoId: memo.id,
      baseVersion: baseVersion.current,
      title: titleRef.current,
      content: editor.getJSON() as TiptapDoc,
      keptAt: new Date().toISOString(),
    };
  }, [editor, memo.id]);

  const send = useCallback((): Promise<SaveOutcome> => {
    if (inFlight.current) return inFlight.current;
    const saving = sendNow().finally(() => {
      inFlight.current = null;
    });
    inFlight.current = saving;
    return saving;

    async function sendNow(): Promise<SaveOutcome> {
      if (!editor || !editable || loadFailed.current) return { ok: true };
      const mine = snapshot();
      if (!mine) return { ok: true };
      changedSinceSend.current = false;
      setSave({ kind: 'saving' });
      const res = await patchJson<MemoDetail>(`/api/memos/${memo.id}`, {
        title: mine.title,
        content: mine.content,
        baseVersion: mine.baseVersion,
        restoredFrom: restoredFrom.current,
      });
      if (res.ok) {
        restoredFrom.current = undefined;
        baseVersion.current = res.data.version;
        setSavedVersion(res.data.version);
        void mutate(swrKeys.memoVersions(memo.id));
        announceMemoSaved({ memoId: memo.id, version: res.data.version, updatedAt: res.data.updatedAt });
        if (changedSinceSend.current) {
          writeBackup({ ...snapshot()!, baseVersion: res.data.version });
          setSave({ kind: 'dirty' });
          timer.current = setTimeout(() => void send(), AUTOSAVE_DEBOUNCE_MS);
        } else {
          confirmed.current = true;
          clearBackup(memo.id);
          setSave({ kind: 'saved', at: res.data.updatedAt });
        }
        return { ok: true };
      }
      if (res.status === 409 && typeof res.body.currentVersion === 'number') {
        setConflict({
          currentVersion: res.body.currentVersion,
          savedBy: (res.body.savedBy as { name: string } | null)?.name ?? null,
          savedAt: typeof res.body.savedAt === 'string' ? res.body.savedAt : null,
          message: res.error,
        });
        setSave({ kind: 'conflict' });
        return {
          ok: false,
          message:
            'Your latest changes are not saved: someone else saved this memo meanwhile. Choose which text to keep first.',
        };
      }
      const message =
        res.status === 0
          ? 'Not saved: the server cannot be reached. Your text is kept in this browser and will be sent when you retry.'
          : `Not saved: ${res.error}`;
      setSave({ kind: 'failed', message });
      return { ok: false, message };
    }
  }, [editor, editable, memo.id, mutate, snapshot]);

  // Workflow actions save pending edits first and wait for the server (a few rounds if typing goes on meanwhile).
  const flushSave = useCallback(async (): Promise<SaveOutcome> => {
    for (let round = 0; round < 3 && !confirmed.current && !loadFailed.current; round++) {
      clearTimeout(timer.current);
      const outcome = await send();
      if (!outcome.ok) return outcome;
    }
    return confirmed.current || loadFailed.current
      ? { ok: true }
      : { ok: false, message: 'Your latest changes are still being saved; try again in a moment.' };
  }, [send]);

  useEffect(() => (editable ? registerSaveFlush(memo.id, flushSave) : undefined), [editable, memo.id, flushSave]);

  const scheduleSave = useCallback(() => {
    if (loadFailed.current) return;
    changedSinceSend.current = true;
    confirmed.current = false;
    // Same state object when already dirty: typing must not re-render the page around the editor.
    setSave((s) => (s.kind === 'conflict' || s.kind === 'dirty' ? s : { kind: 'dirty' }));
    // Serialising a long memo takes milliseconds: keep the local copy a moment after the last key, not on every key.
    clearTimeout(backupTimer.current);
    backupTimer.current = setTimeout(() => {
      const b = snapshot();
      if (b) writeBackup(b);
    }, LOCAL_BACKUP_DEBOUNCE_MS);
    clearTimeout(timer.current);
    timer.current = setTimeout(() => void send(), AUTOSAVE_DEBOUNCE_MS);
  }, [send, snapshot]);

  // Save on every document change (typing never waits on the server: saving is debounced and asynchronous).
  useEffect(() => {
    if (!editor || !editable) return;
    const onUpdate = ({ transaction }: { transaction: { docChanged: boolean } }) =>
      transaction.docChanged && scheduleSave();
    editor.on('update', onUpdate);
    return () => {
      editor.off('update', onUpdate);
    };
  }, [editor, editable, scheduleSave]);

  // Work kept in this browser from an earlier session that the server never confirmed.
  useEffect(() => {
    if (!editable) return;
    const b = readBackup(memo.id);
    // eslint-disable-next-line react-hooks/set-state-in-effect -- the backup lives in localStorage, readable only in the browser after mount
    if (b && JSON.stringify(b.content) !== JSON.stringify(memo.content)) setRestorable(b);
    else if (b) clearBackup(memo.id);
  }, [editable, memo.id, memo.content]);

  // Leaving with unsaved work: send it now, and ask the browser to confirm.
  useEffect(() => {
    const onLeave = (e: BeforeUnloadEvent) => {
      if (save.kind === 'dirty' || save.kind === 'saving' || save.kind === 'failed' || save.kind === 'conflict') {
        e.preventDefault();
      }
    };
    window.addEventListener('beforeunload', onLeave);
    return () => window.removeEventListener('beforeunload', onLeave);
  }, [save.kind]);

  useEffect(() => {
    if (editor && loadError) editor.setEditable(false, false);
  }, [editor, loadError]);

  useEffect(
    () => () => {
      clearTimeout(timer.current);
      clearTimeout(backupTimer.current);
    },
    [],
  );

  const loadTheirs = useCallback(async () => {
    if (!editor) return;
    const mine = snapshot();
    if (mine) writeBackup(mine, 'set-aside');
    const res = await requestJson<MemoDetail>(`/api/memos/${memo.id}`);
    if (!res.ok) {
      setNotice(`Could not load the current version: ${res.error}`);
      return;
    }
    const refused = replaceContent(editor, res.data.content);
    if (refused) {
      setNotice(`Could not load the current version: ${refused}`);
      return;
    }
    baseVersion.current = res.data.version;
    announceMemoSaved({ memoId: memo.id, version: res.data.version, updatedAt: res.data.updatedAt });
    titleRef.current = res.data.title;
    setTitle(res.data.title);
    clearBackup(memo.id);
    setConflict(null);
    confirmed.current = true;
    setSave({ kind: 'saved', at: res.data.updatedAt });
    setNotice(
      'Loaded the current version. Your own text was set aside in this browser; the version history keeps every saved version.',
    );
  }, [editor, memo.id, snapshot]);

  const keepMine = useCallback(async () => {
    if (!conflict) return;
    baseVersion.current = conflict.currentVersion;
    setConflict(null);
    await send();
  }, [conflict, send]);

  const restoreBackup = useCallback(() => {
    if (!editor || !restorable) return;
    const refused = replaceContent(editor, restorable.content);
    if (refused) {
      setNotice(`The kept changes could not be restored: ${refused}`);
      return;
    }
    baseVersion.current = restorable.baseVersion;
    titleRef.current = restorable.title;
    setTitle(restorable.title);
    setRestorable(null);
    scheduleSave();
  }, [editor, restorable, scheduleSave]);

  const restoreVersion = useCallback(
    async (versionNumber: number) => {
      if (!editor) return;
      const res = await requestJson<{ content: TiptapDoc; title: string }>(
        `/api/memos/${memo.id}/versions/${versionNumber}`,
      );
      if (!res.ok) {
        setNotice(`Could not restore version ${versionNumber}: ${res.error}`);
        return;
      }
      const refused = replaceContent(editor, res.data.content);
      if (refused) {
        setNotice(`Could not restore version ${versionNumber}: ${refused}`);
        return;
      }
      titleRef.current = res.data.title;
      setTitle(res.data.title);
      // A whole valid version replaces content that could not be loaded: editing and saving may resume.
      if (loadFailed.current) {
        loadFailed.current = false;
        setLoadError(null);
        editor.setEditable(true, false);
      }
      restoredFrom.current = versionNumber;
      setNotice(`Version ${versionNumber} restored; it is being saved as a new version.`);
      scheduleSave();
    },
    [editor, memo.id, scheduleSave],
  );

  const uploadImage = useCallback(
    async (file: File) => {
      if (!editor) return;
      const body = new FormData();
      body.set('file', file);
      let res: Response;
      try {
        res = await fetch(`/api/memos/${memo.id}/attachments`, { method: 'POST', body });
      } catch {
        setNotice('The image could not be uploaded: the server cannot be reached.');
        return;
      }
      const data = (await res.json().catch(() => ({}))) as { url?: string; error?: string };
      if (!res.ok || !data.url) {
        setNotice(`The image was not added: ${data.error ?? `server answered ${res.status}`}`);
        return;
      }
      // The caption (also the alternative text) is the analyst's words, never the file name: the PDF prints it.
      const caption = (askImageCaption('') ?? '').trim().slice(0, IMAGE_CAPTION_MAX);
      editor
        .chain()
        .focus()
        .insertContent({ type: 'image', attrs: { src: data.url, alt: caption || null, caption: caption || null } })
        .run();
    },
    [editor, memo.id],
  );

  const onKeyDown = (e: KeyboardEvent<HTMLDivElement>) => {
    if (!editable || !(e.ctrlKey || e.metaKey) || !e.altKey) return;
    if (e.key.toLowerCase() === 'k') {
      e.preventDefault();
      setPicker('kind');
    } else if (e.key.toLowerCase() === 'v') {
      e.preventDefault();
      setPicker('value');
    }
  };

  return (
    <CalcContextProvider
      value={{ store, kinds: kindMap, canCompute, memo: { documentNumber: memo.documentNumber, title } }}
    >
      <FigureContextProvider value={{ memoId: memo.id, savedVersion, figureKinds }}>
        <CalcRunner editor={editor} store={store} kinds={kindMap} canCompute={canCompute} />
        <div className="grid gap-6 lg:grid-cols-[minmax(0,1fr)_16rem]">
          <div className="min-w-0" onKeyDown={onKeyDown}>
            <div className="mb-3 flex flex-wrap items-center gap-3">
              {canEdit ? (
                <>
                  <label htmlFor="memo-title" className="sr-only">
                    Title
                  </label>
                  <input
                    id="memo-title"
                    className="min-w-0 flex-1 rounded-chip border border-transparent bg-transparent px-1 text-title font-semibold hover:border-rule focus:border-orbit-500 sm:text-display"
                    value={title}
                    onChange={(e) => {
                      setTitle(e.target.value);
                      titleRef.current = e.target.value;
                      if (e.target.value.trim()) scheduleSave();
                    }}
                  />
                </>
              ) : (
                <h1 className="break-words text-title font-semibold sm:text-display">{title}</h1>
              )}
              {canEdit && <SaveIndicator state={save} onRetry={() => void send()} />}
            </div>
            {loadError && (
              <div
                role="alert"
                className="mb-3 rounded-card border border-ember-500 bg-ember-50 px-3 py-2 text-note text-ember-700"
              >
                <p className="font-semibold">This memo’s stored content could not be loaded: {loadError}</p>
                <p>
                  The editor is read-only so that nothing is saved over the stored memo, which is unchanged.
                  {editable
                    ? ' Restore a version from Saved versions to continue editing, or ask an administrator to repair the memo.'
                    : ''}
                </p>
              </div>
            )}
            {restorable && !loadError && (
              <div
                role="alert"
                className="mb-3 flex flex-wrap items-center gap-3 rounded-card border border-sunline-500 bg-sunline-50 px-3 py-2 text-note text-sunline-700"
              >
                <span className="flex-1">
                  Changes you made on {formatDateTime(restorable.keptAt)} never reached the server; they are kept in
                  this browser.
                </span>
                <button type="button" className="btn-primary" onClick={restoreBackup}>
                  Restore them
                </button>
                <button
                  type="button"
                  className="btn-quiet"
                  onClick={() => {
                    writeBackup(restorable, 'set-aside');
                    clearBackup(memo.id);
                    setRestorable(null);
                  }}
                >
                  Keep the saved version
                </button>
              </div>
            )}
            {notice && (
              <p
                role="status"
                className="mb-3 flex items-center gap-2 rounded-card border border-rule bg-paper-raised px-3 py-2 text-note"
              >
                <span className="flex-1">{notice}</span>
                <button type="button" className="text-micro underline" onClick={() => setNotice(null)}>
                  Dismiss
                </button>
              </p>
            )}
            <div className="sheet overflow-visible">
              {editor && canEdit && (
                <Toolbar
                  editor={editor}
                  kinds={kindMap}
                  figureKinds={figureKinds}
                  onUploadImage={uploadImage}
                  picker={picker}
                  setPicker={setPicker}
                />
              )}
              <EditorContent editor={editor} />
              {!editor && <p className="px-8 py-6 text-ink-faint">Opening the memo…</p>}
            </div>
          </div>
          <div className="space-y-6">
            <ReviewLayer
              editor={editor}
              memoId={memo.id}
              canComment={!content && memo.allowedActions.includes('memo.comment')}
              canResolve={!content && memo.allowedActions.includes('memo.resolve')}
            />
            {aside}
            <VersionPanel
              memoId={memo.id}
              // eslint-disable-next-line react-hooks/refs -- baseVersion changes only in save/load handlers that also set state, so this render reads the current value
              currentVersion={baseVersion.current}
              canRestore={editable}
              canName={!content && memo.allowedActions.includes('memo.name-version')}
              restoreCurrent={Boolean(loadError)}
              onRestore={restoreVersion}
            />
          </div>
        </div>
        {conflict && (
          <ConflictDialog info={conflict} onLoadTheirs={() => void loadTheirs()} onKeepMine={() => void keepMine()} />
        )}
      </FigureContextProvider>
    </CalcContextProvider>
  );
}

/** The schema's own words for why stored content cannot be loaded ("Unknown node type: sparkline"). */
function describeContentError(error: Error): string {
  const cause = error.cause instanceof Error ? error.cause.message : '';
  return cause || error.message.replace(/^\[tiptap error\]:\s*/, '');
}

/** Replaces the editor's document; returns why when the content does not fit the schema (nothing is replaced then). */
function replaceContent(editor: Editor, content: TiptapDoc): string | null {
  try {
    editor.commands.setContent(content, { emitUpdate: false });
    return null;
  } catch (err) {
    return err instanceof Error ? describeContentError(err) : 'the content does not fit the document schema';
  }
}

function SaveIndicator({ state, onRetry }: { state: SaveState; onRetry: () => void }) {
  const text =
    state.kind === 'saved'
      ? `Saved ${formatDateTime(state.at)}`
      : state.kind === 'saving'
        ? 'Saving…'
        : state.kind === 'dirty'
          ? 'Unsaved changes'
          : state.kind === 'conflict'
            ? 'Someone else saved'
            : state.message;
  const tone =
    state.kind === 'failed' || state.kind === 'conflict'
      ? 'text-ember-700'
      : state.kind === 'saved'
        ? 'text-moss-700'
        : 'text-ink-soft';
  return (
    <span
      className={`flex items-center gap-2 text-note ${tone}`}
      role="status"
      aria-live="polite"
      data-save-state={state.kind}
    >
      {text}
      {state.kind === 'failed' && (
        <button type="button" className="btn-quiet py-0.5" onClick={onRetry}>
          Retry
        </button>
      )}
    </span>
  );
}
