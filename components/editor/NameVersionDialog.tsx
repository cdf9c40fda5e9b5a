'use client';

import { useEffect, useId, useRef, useState } from 'react';
import { postJson } from '@/lib/client/fetch-json';
import { VERSION_LABEL_MAX } from '@/lib/memos/memo-schema';

/**
 * Names a saved version ("Checkpoint: before review") in a modal dialog of the page: Escape or Cancel
 * closes it, the server's refusal is shown under the field. The name ends the version's editing session.
 */
export function NameVersionDialog({
  memoId,
  versionNumber,
  initialLabel,
  onNamed,
  onClose,
}: {
  memoId: number;
  versionNumber: number;
  initialLabel: string;
  onNamed: (label: string) => void;
  onClose: () => void;
}) {
  const id = useId();
  const ref = useRef<HTMLDialogElement>(null);
  const [label, setLabel] = useState(initialLabel);
  const [problem, setProblem] = useState('');
  const [busy, setBusy] = useState(false);
  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
    return () => d?.close();
  }, []);

  const submit = async () => {
    const text = label.trim();
    if (!text) return setProblem('Give the version a name, for example “Checkpoint: before review”.');
    setBusy(true);
    const res = await postJson<{ label: string }>(`/api/memos/${memoId}/versions/${versionNumber}/label`, {
      label: text,
    });
    setBusy(false);
    if (res.ok) onNamed(res.data.label);
    else setProblem(res.fields.label ? `The name was not saved: ${res.fields.label}.` : res.error);
  };

  return (
    <dialog
      ref={ref}
      className="sheet m-auto w-[28rem] max-w-[calc(100vw-2rem)] p-5 backdrop:bg-ink/30"
      aria-labelledby={`${id}-title`}
      onCancel={(e) => {
        e.preventDefault();
        onClose();
      }}
    >
      <form
        method="dialog"
        className="space-y-3"
        onSubmit={(e) => {
          e.preventDefault();
          void submit();
        }}
      >
        <h2 id={`${id}-title`} className="text-lead font-semibold">
          Name version {versionNumber}
        </h2>
        <p className="text-note text-ink-soft">
          A named version stands on its own in the history; the next change starts a new entry.
        </p>
        <div>
          <label className="label" htmlFor={`${id}-label`}>
            Name
          </label>
          <input
            id={`${id}-label`}
            className="field"
            value={label}
            maxLength={VERSION_LABEL_MAX}
            placeholder="Checkpoint: before review"
            autoFocus
            aria-invalid={Boolean(problem)}
            aria-describedby={`${id}-hint${problem ? ` ${id}-problem` : ''}`}
            onChange={(e) => {
              setLabel(e.target.value);
              setProblem('');
            }}
          />
          <p id={`${id}-hint`} className="mt-1 text-micro text-ink-soft">
            {label.length} of {VERSION_LABEL_MAX} characters
          </p>
          {problem && (
            <p id={`${id}-problem`} role="alert" className="mt-1 text-note text-ember-700">
              {problem}
            </p>
          )}
        </div>
        <div className="flex justify-end gap-2">
          <button type="button" className="btn-quiet" onClick={onClose}>
            Cancel
          </button>
          <button type="submit" className="btn-primary" disabled={busy}>
            {busy ? 'Saving…' : 'Save name'}
          </button>
        </div>
      </form>
    </dialog>
  );
}
