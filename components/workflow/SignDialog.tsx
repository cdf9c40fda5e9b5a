'use client';

import { useEffect, useId, useRef, useState, type FormEvent, type ReactNode } from 'react';
import {
  DEFAULT_MEANING,
  MEANING_MAX_CHARS,
  OFFERED_MEANINGS,
  type SignedAction,
} from '@/lib/signatures/signature-meaning';

export interface SignFields {
  note?: string;
  changeSummary?: string;
  meaning: string;
  password: string;
}

type Props = {
  action: SignedAction;
  nextLetter: string;
  signerName: string;
  busy: boolean;
  error: { text: string; fields: Record<string, string>; status: number } | null;
  onSign: (fields: SignFields) => void;
  onCancel: () => void;
  /** Shown above the fields, e.g. the requirements a freeze would baseline unmet. */
  warning?: ReactNode;
};

const TITLE: Record<SignedAction, (letter: string) => string> = {
  approve: () => 'Sign your approval',
  'request-changes': () => 'Sign your request for changes',
  freeze: (letter) => `Sign and freeze revision ${letter}`,
};
const SIGN_LABEL: Record<SignedAction, (letter: string) => string> = {
  approve: () => 'Sign and approve',
  'request-changes': () => 'Sign and send back to draft',
  freeze: (letter) => `Sign and freeze revision ${letter}`,
};
const RECORDED_IN: Record<SignedAction, string> = {
  approve: ', and printed in the approval block of the revision frozen from this round',
  'request-changes': '',
  freeze: ', and printed in the approval block of revision',
};
const OTHER = '__other__';

/**
 * The electronic-signature dialog of approve, request changes and freeze:
 * the action's own field (note, or change summary), the meaning of the
 * signature (the action's default, another offered one, or typed), and the
 * signer's password. A modal <dialog>: focus starts in the first field, Tab
 * stays inside, Esc cancels; a wrong password keeps everything typed but the
 * password and says so next to the field.
 */
export function SignDialog({ action, nextLetter, signerName, busy, error, onSign, onCancel, warning }: Props) {
  const ref = useRef<HTMLDialogElement>(null);
  const passwordRef = useRef<HTMLInputElement>(null);
  const id = useId();
  const [choice, setChoice] = useState<string>(DEFAULT_MEANING[action]);
  const [typed, setTyped] = useState('');

  useEffect(() => {
    const d = ref.current;
    if (d && !d.open) d.showModal();
    return () => d?.close();
  }, []);

  // A refused password: clear it and put the cursor back there.
  useEffect(() => {
    if (error?.fields.password && passwordRef.current) {
      passwordRef.current.value = '';
      passwordRef.current.focus();
    }
  }, [error]);

  function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const meaning = choice === OTHER ? typed.trim() : choice;
    onSign({
      ...(action === 'freeze'
        ? { changeSummary: String(f.get('changeSummary') ?? '') }
        : { note: String(f.get('note') ?? '').trim() }),
      meaning,
      password: String(f.get('password') ?? ''),
    });
  }

  const fieldError = (name: string) =>
    error?.fields[name] ? (
      <p id={`${id}-${name}-error`} className="mt-1 text-note text-ember-700">
        {error.fields[name]}
      </p>
    ) : null;
  const described = (name: string) => (error?.fields[name] ? `${id}-${name}-error` : undefined);
  const otherErrors = error && !['password', 'note', 'changeSummary', 'meaning'].some((k) => error.fields[k]);

  return (
    <dialog
      ref={ref}
      className="sheet m-auto w-full max-w-lg p-6 backdrop:bg-ink/30"
      aria-labelledby={`${id}-title`}
      aria-describedby={`${id}-what`}
      onCancel={(e) => {
        e.preventDefault();
        if (!busy) onCancel();
      }}
    >
      <form onSubmit={onSubmit} noValidate className="space-y-3">
        <h2 id={`${id}-title`} className="text-lead font-semibold">
          {TITLE[action](nextLetter)}
        </h2>
        <p id={`${id}-what`} className="text-note text-ink-soft">
          This is your electronic signature as <span className="font-semibold text-ink">{signerName}</span>: your name,
          your role, the meaning below and the time (UTC) are recorded with the memo and in its audit trail
          {RECORDED_IN[action]}
          {action === 'freeze' ? ` ${nextLetter}` : ''}, and cannot be changed afterwards.
        </p>
        {warning}
        {action === 'freeze' ? (
          <div>
            <label htmlFor={`${id}-summary`} className="label">
              Change summary for revision {nextLetter}
            </label>
            <textarea
              id={`${id}-summary`}
              name="changeSummary"
              className="field"
              rows={2}
              required
              autoFocus
              aria-invalid={Boolean(error?.fields.changeSummary)}
              aria-describedby={described('changeSummary')}
            />
            {fieldError('changeSummary')}
            <p className="mt-1 text-micro text-ink-faint">
              Every calc block is recomputed with the current engine; the text, numbers, figures and PDF are stored and
              can no longer change.
            </p>
          </div>
        ) : (
          <div>
            <label htmlFor={`${id}-note`} className="label">
              {action === 'request-changes' ? 'What should change' : 'Note (optional)'}
            </label>
            <textarea
              id={`${id}-note`}
              name="note"
              className="field"
              rows={2}
              autoFocus
              aria-invalid={Boolean(error?.fields.note)}
              aria-describedby={described('note')}
            />
            {fieldError('note')}
          </div>
        )}
        <div>
          <label htmlFor={`${id}-meaning`} className="label">
            Meaning of your signature
          </label>
          <select id={`${id}-meaning`} className="field" value={choice} onChange={(e) => setChoice(e.target.value)}>
            {OFFERED_MEANINGS[action].map((m) => (
              <option key={m} value={m}>
                {m}
              </option>
            ))}
            <option value={OTHER}>Other (type it)…</option>
          </select>
          {choice === OTHER && (
            <input
              aria-label="Meaning in your words"
              className="field mt-2"
              maxLength={MEANING_MAX_CHARS}
              value={typed}
              onChange={(e) => setTyped(e.target.value)}
              placeholder="e.g. Reviewed for orbit maintenance only"
              aria-invalid={Boolean(error?.fields.meaning)}
              aria-describedby={described('meaning')}
            />
          )}
          {fieldError('meaning')}
        </div>
        <div>
          <label htmlFor={`${id}-password`} className="label">
            Your password
          </label>
          <input
            ref={passwordRef}
            id={`${id}-password`}
            name="password"
            type="password"
            autoComplete="current-password"
            className="field"
            required
            aria-invalid={Boolean(error?.fields.password)}
            aria-describedby={described('password')}
          />
          {error?.fields.password && (
            <p id={`${id}-password-error`} role="alert" className="mt-1 text-note text-ember-700">
              {error.text}
            </p>
          )}
        </div>
        {otherErrors && (
          <p role="alert" className="text-note text-ember-700">
            {error.text}
          </p>
        )}
        {error && !otherErrors && !error.fields.password && (
          <p role="alert" className="sr-only">
            {error.text}
          </p>
        )}
        <div className="flex justify-end gap-2 pt-1">
          <button type="button" className="btn-quiet" onClick={onCancel} disabled={busy}>
            Cancel
          </button>
          <button type="submit" className="btn-primary" disabled={busy}>
            {busy ? 'Signing…' : SIGN_LABEL[action](nextLetter)}
          </button>
        </div>
      </form>
    </dialog>
  );
}
