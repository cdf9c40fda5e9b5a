'use client';

import { useState, type FormEvent } from 'react';
import { signIn } from 'next-auth/react';
import { postJson } from '@/lib/client/fetch-json';

/**
 * Accepting an invitation (name and password) or choosing a new password
 * after a reset: posts the one-time token, then signs in with the new password.
 */
export function AccountLinkForm({
  kind,
  token,
  defaultName,
}: {
  kind: 'invitation' | 'password-reset';
  token: string;
  defaultName?: string;
}) {
  const [error, setError] = useState<{ text: string; fields: Record<string, string> } | null>(null);
  const [busy, setBusy] = useState(false);
  async function onSubmit(e: FormEvent<HTMLFormElement>) {
    e.preventDefault();
    const f = new FormData(e.currentTarget);
    const password = String(f.get('password') ?? '');
    if (password !== String(f.get('repeat') ?? '')) {
      setError({ text: 'The two passwords differ.', fields: { repeat: 'does not match' } });
      return;
    }
    setBusy(true);
    setError(null);
    const body = kind === 'invitation' ? { token, name: String(f.get('name') ?? ''), password } : { token, password };
    const res = await postJson<{ email: string }>(
      kind === 'invitation' ? '/api/invitations/accept' : '/api/password-resets/complete',
      body,
    );
    if (!res.ok) {
      setBusy(false);
      setError({ text: res.error, fields: res.fields });
      return;
    }
    const signedIn = await signIn('credentials', { email: res.data.email, password, redirect: false });
    window.location.assign(signedIn && !signedIn.error ? '/portal' : '/signin');
  }
  const fieldError = (name: string) =>
    error?.fields[name] && <p className="mt-1 text-micro text-ember-700">{error.fields[name]}</p>;
  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      {kind === 'invitation' && (
        <div>
          <label htmlFor="name" className="label">
            Your name
          </label>
          <input id="name" name="name" className="field" defaultValue={defaultName} autoComplete="name" required />
          {fieldError('name')}
        </div>
      )}
      <div>
        <label htmlFor="password" className="label">
          {kind === 'invitation' ? 'Password' : 'New password'}
        </label>
        <input id="password" name="password" type="password" className="field" autoComplete="new-password" required />
        {fieldError('password')}
      </div>
      <div>
        <label htmlFor="repeat" className="label">
          Repeat the password
        </label>
        <input id="repeat" name="repeat" type="password" className="field" autoComplete="new-password" required />
        {fieldError('repeat')}
      </div>
      {error && (
        <p role="alert" className="rounded-chip border border-ember-500 bg-ember-50 px-3 py-2 text-note text-ember-700">
          {error.text}
        </p>
      )}
      <button type="submit" className="btn-primary w-full justify-center" disabled={busy}>
        {busy ? 'Saving…' : kind === 'invitation' ? 'Open my account' : 'Set the new password'}
      </button>
    </form>
  );
}
