'use client';

import { useState, type FormEvent } from 'react';
import { postJson } from '@/lib/client/fetch-json';

export function PasswordResetRequestForm() {
  const [state, setState] = useState<{ sent: boolean; error: string | null; fields: Record<string, string> }>({
    sent: false,
    error: null,
    fields: {},
  });
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const res = await postJson('/api/password-resets', {
      email: String(new FormData(e.currentTarget).get('email') ?? ''),
    });
    setState(res.ok ? { sent: true, error: null, fields: {} } : { sent: false, error: res.error, fields: res.fields });
  }
  if (state.sent)
    return (
      <p role="status" className="text-body">
        If that address has an active account, a message with a reset link is on its way. The link works once, for an
        hour.
      </p>
    );
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <div>
        <label htmlFor="email" className="label">
          E-mail
        </label>
        <input id="email" name="email" type="email" className="field" autoComplete="username" required />
        {state.fields.email && <p className="mt-1 text-micro text-ember-700">{state.fields.email}</p>}
      </div>
      {state.error && !state.fields.email && (
        <p role="alert" className="text-note text-ember-700">
          {state.error}
        </p>
      )}
      <button type="submit" className="btn-primary w-full justify-center">
        Send a reset link
      </button>
    </form>
  );
}
