'use client';

import { useState } from 'react';
import { signIn } from 'next-auth/react';

/** Spends the one-time link: signs its recipient in through the `delivery-link` provider, then opens the revision. */
export function OpenDeliveryButton({ token, letter, target }: { token: string; letter: string; target: string }) {
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);
  async function open() {
    setBusy(true);
    setError(null);
    const result = await signIn('delivery-link', { token, redirect: false });
    if (!result || result.error) {
      setBusy(false);
      // next-auth passes a message thrown by the provider (another person signed in) as the error; its own code otherwise.
      setError(
        result?.error && result.error !== 'CredentialsSignin'
          ? result.error
          : 'This link could not be used (it may have been used a moment ago). Sign in with your password instead.',
      );
      return;
    }
    window.location.assign(target);
  }
  return (
    <div className="space-y-3">
      <button type="button" className="btn-primary w-full justify-center" onClick={() => void open()} disabled={busy}>
        {busy ? 'Opening…' : `Open revision ${letter}`}
      </button>
      {error && (
        <p role="alert" className="rounded-chip border border-ember-500 bg-ember-50 px-3 py-2 text-note text-ember-700">
          {error} <a href="/signin?callbackUrl=/portal">Sign in</a>
        </p>
      )}
    </div>
  );
}
