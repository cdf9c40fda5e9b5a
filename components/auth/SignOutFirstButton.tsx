'use client';

import { signOut } from 'next-auth/react';

/** Signs this browser out and comes back to the same page (a delivery link meant for someone else). */
export function SignOutFirstButton({ name }: { name: string }) {
  return (
    <button
      type="button"
      className="btn-primary w-full justify-center"
      onClick={() => void signOut({ callbackUrl: window.location.href })}
    >
      Sign {name} out first
    </button>
  );
}
