'use client';

import { useCallback, useRef, useState } from 'react';
import Link from 'next/link';
import { signOut } from 'next-auth/react';
import { useDismiss } from './use-dismiss';

/** The signed-in person, their role, and sign-out; a disclosure button operable by keyboard. */
export function UserMenu({ name, email, roleLabel }: { name: string; email: string; roleLabel: string }) {
  const [open, setOpen] = useState(false);
  const ref = useRef<HTMLDivElement>(null);
  const close = useCallback(() => setOpen(false), []);

  useDismiss(ref, open, close);

  return (
    <div className="relative" ref={ref}>
      <button
        type="button"
        className="btn-quiet"
        aria-haspopup="true"
        aria-expanded={open}
        onClick={() => setOpen((o) => !o)}
      >
        <span className="font-medium">{name}</span>
        <span className="rounded-chip bg-orbit-50 px-1.5 py-0.5 text-micro uppercase text-orbit-700">{roleLabel}</span>
      </button>
      {open && (
        <div className="absolute right-0 z-20 mt-1 w-64 sheet p-3" role="menu">
          <p className="text-note font-medium">{name}</p>
          <p className="text-note text-ink-soft">{email}</p>
          <p className="mt-1 text-micro uppercase text-ink-faint">Role: {roleLabel}</p>
          <Link href="/settings/notifications" role="menuitem" className="mt-3 block text-note" onClick={close}>
            Notification e-mail
          </Link>
          <button
            type="button"
            role="menuitem"
            className="btn-quiet mt-3 w-full justify-center"
            onClick={() => signOut({ callbackUrl: '/signin' })}
          >
            Sign out
          </button>
        </div>
      )}
    </div>
  );
}
