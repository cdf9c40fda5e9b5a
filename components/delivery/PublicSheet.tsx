import type { ReactNode } from 'react';
import { Wordmark } from '@/components/brand/Wordmark';

/** The frame of the pages reached from an e-mail before signing in (delivery, invitation, password reset). */
export function PublicSheet({
  title,
  tone = 'plain',
  children,
}: {
  title: string;
  tone?: 'plain' | 'refused';
  children: ReactNode;
}) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-md">
        <div className="mb-6 text-center">
          <Wordmark size="lg" />
        </div>
        <div
          className={`sheet p-6 ${tone === 'refused' ? 'border-ember-500' : ''}`}
          role={tone === 'refused' ? 'alert' : undefined}
        >
          <h1 className={`mb-3 text-lead font-semibold ${tone === 'refused' ? 'text-ember-700' : ''}`}>{title}</h1>
          {children}
        </div>
      </div>
    </main>
  );
}
