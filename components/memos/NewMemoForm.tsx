'use client';

import { useState, type FormEvent } from 'react';
import { useRouter } from 'next/navigation';
import { postJson } from '@/lib/client/fetch-json';

export function NewMemoForm({ templates }: { templates: { id: string; title: string; description: string }[] }) {
  const router = useRouter();
  const [open, setOpen] = useState(false);
  const [busy, setBusy] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const [message, setMessage] = useState<string | null>(null);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const title = String(form.get('title') ?? '');
    const documentNumber = String(form.get('documentNumber') ?? '').trim();
    const templateId = String(form.get('templateId') ?? '');
    setBusy(true);
    const res = await postJson<{ id: number }>('/api/memos', {
      title,
      ...(documentNumber ? { documentNumber } : {}),
      ...(templateId ? { templateId } : {}),
    });
    setBusy(false);
    if (res.ok) {
      router.push(`/memos/${res.data.id}`);
      return;
    }
    setErrors(res.fields);
    setMessage(res.error);
  }

  if (!open) {
    return (
      <button type="button" className="btn-primary" onClick={() => setOpen(true)}>
        New memo
      </button>
    );
  }
  return (
    <form onSubmit={onSubmit} className="sheet flex flex-wrap items-end gap-3 p-4" aria-label="New memo">
      <div className="min-w-72 flex-1">
        <label htmlFor="new-title" className="label">
          Title
        </label>
        <input
          id="new-title"
          name="title"
          className="field"
          autoFocus
          aria-invalid={Boolean(errors.title)}
          aria-describedby="new-title-error"
        />
        {errors.title && (
          <p id="new-title-error" className="mt-1 text-note text-ember-700">
            {errors.title}
          </p>
        )}
      </div>
      <div className="w-56">
        <label htmlFor="new-docnum" className="label">
          Document number (optional)
        </label>
        <input
          id="new-docnum"
          name="documentNumber"
          className="field font-mono"
          placeholder="assigned if blank"
          aria-invalid={Boolean(errors.documentNumber)}
        />
        {errors.documentNumber && <p className="mt-1 text-note text-ember-700">{errors.documentNumber}</p>}
      </div>
      <fieldset className="w-full">
        <legend className="label">Start from</legend>
        <div className="grid gap-2 md:grid-cols-4">
          <label className="flex cursor-pointer gap-2 rounded-card border border-rule p-2 has-[:checked]:border-orbit-500 has-[:checked]:bg-orbit-50">
            <input type="radio" name="templateId" value="" defaultChecked />
            <span>
              <span className="block text-note font-medium">Blank memo</span>
              <span className="block text-micro text-ink-soft">An empty document.</span>
            </span>
          </label>
          {templates.map((t) => (
            <label
              key={t.id}
              className="flex cursor-pointer gap-2 rounded-card border border-rule p-2 has-[:checked]:border-orbit-500 has-[:checked]:bg-orbit-50"
            >
              <input type="radio" name="templateId" value={t.id} />
              <span>
                <span className="block text-note font-medium">{t.title}</span>
                <span className="block text-micro text-ink-soft">{t.description}</span>
              </span>
            </label>
          ))}
        </div>
      </fieldset>
      <button type="submit" className="btn-primary" disabled={busy}>
        {busy ? 'Creating…' : 'Create'}
      </button>
      <button type="button" className="btn-quiet" onClick={() => setOpen(false)}>
        Cancel
      </button>
      {message && !Object.keys(errors).length && (
        <p role="alert" className="w-full text-note text-ember-700">
          {message}
        </p>
      )}
    </form>
  );
}
