'use client';

import { useId, useState, type FormEvent, type KeyboardEvent } from 'react';
import { MAX_COMMENT_CHARS } from '@/lib/comments/comment-schema';
import type { JsonResult } from '@/lib/client/fetch-json';

/**
 * A text box that sends its text and keeps it until the server accepted
 * it: a refusal or a lost connection shows the reason and leaves the text
 * where it was. Ctrl+Enter sends.
 */
export function CommentBox<T>({
  label,
  submitLabel,
  placeholder,
  autoFocus,
  onSubmit,
  onSent,
  onCancel,
}: {
  label: string;
  submitLabel: string;
  placeholder?: string;
  autoFocus?: boolean;
  onSubmit: (body: string) => Promise<JsonResult<T>>;
  onSent: (data: T) => void;
  onCancel?: () => void;
}) {
  const id = useId();
  const [text, setText] = useState('');
  const [sending, setSending] = useState(false);
  const [problem, setProblem] = useState<string | null>(null);
  const tooLong = text.length > MAX_COMMENT_CHARS;

  const send = async () => {
    if (sending || !text.trim() || tooLong) return;
    setSending(true);
    setProblem(null);
    const res = await onSubmit(text);
    setSending(false);
    if (res.ok) {
      setText('');
      onSent(res.data);
    } else {
      setProblem(res.fields.body ? `Not sent: ${res.fields.body}.` : `Not sent: ${res.error} Your text is still here.`);
    }
  };
  const onFormSubmit = (e: FormEvent) => {
    e.preventDefault();
    void send();
  };
  const onKeyDown = (e: KeyboardEvent<HTMLTextAreaElement>) => {
    if (e.key === 'Enter' && (e.ctrlKey || e.metaKey)) {
      e.preventDefault();
      void send();
    } else if (e.key === 'Escape' && onCancel && !text) onCancel();
  };

  return (
    <form onSubmit={onFormSubmit} className="space-y-1.5">
      <label htmlFor={id} className="label">
        {label}
      </label>
      <textarea
        id={id}
        className="field min-h-[4.5rem] resize-y text-note"
        value={text}
        placeholder={placeholder}
        autoFocus={autoFocus}
        aria-invalid={tooLong || problem !== null}
        aria-describedby={`${id}-help`}
        onChange={(e) => setText(e.target.value)}
        onKeyDown={onKeyDown}
      />
      <p id={`${id}-help`} className={`text-micro ${tooLong ? 'text-ember-700' : 'text-ink-faint'}`}>
        {tooLong
          ? `${text.length - MAX_COMMENT_CHARS} characters over the ${MAX_COMMENT_CHARS} allowed.`
          : `${text.length} / ${MAX_COMMENT_CHARS} · Ctrl+Enter sends`}
      </p>
      {problem && (
        <p role="alert" className="text-micro text-ember-700">
          {problem}
        </p>
      )}
      <div className="flex gap-2">
        <button type="submit" className="btn-primary py-1" disabled={sending || !text.trim() || tooLong}>
          {sending ? 'Sending…' : submitLabel}
        </button>
        {onCancel && (
          <button type="button" className="btn-quiet py-1" onClick={onCancel}>
            Cancel
          </button>
        )}
      </div>
    </form>
  );
}
