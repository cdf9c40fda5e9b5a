'use client';

import { useState, type FormEvent } from 'react';
import { signIn } from 'next-auth/react';

export function SignInForm({ returnTo }: { returnTo: string }) {
  const [error, setError] = useState<string | null>(null);
  const [busy, setBusy] = useState(false);

  async function onSubmit(event: FormEvent<HTMLFormElement>) {
    event.preventDefault();
    const form = new FormData(event.currentTarget);
    const email = String(form.get('email') ?? '').trim();
    const password = String(form.get('password') ?? '');
    if (!email || !password) {
      setError('Enter your e-mail address and password.');
      return;
    }
    setBusy(true);
    setError(null);
    const result = await signIn('credentials', { email, password, redirect: false });
    if (!result || result.error) {
      setBusy(false);
      // A refusal thrown by the provider (too many wrong passwords: when to try again) arrives as the error text.
      setError(
        result?.error && result.error !== 'CredentialsSignin'
          ? result.error
          : 'That e-mail and password do not match an active account. Check both and try again.',
      );
      return;
    }
    window.location.assign(returnTo);
  }

  return (
    <form onSubmit={onSubmit} noValidate className="space-y-4">
      <div>
        <label htmlFor="email" className="label">
          E-mail
        </label>
        <input id="email" name="email" type="email" autoComplete="username" required className="field" autoFocus />
      </div>
      <div>
        <label htmlFor="password" className="label">
          Password
        </label>
        <input
          id="password"
          name="password"
          type="password"
          autoComplete="current-password"
          required
          className="field"
        />
      </div>
      {error && (
        <p role="alert" className="rounded-chip border border-ember-500 bg-ember-50 px-3 py-2 text-note text-ember-700">
          {error}
        </p>
      )}
      <button type="submit" className="btn-primary w-full justify-center" disabled={busy}>
        {busy ? 'Signing in…' : 'Sign in'}
      </button>
    </form>
  );
}
