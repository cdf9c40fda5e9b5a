import Link from 'next/link';
import { ApiError } from '@/lib/api/errors';

/** A page-level message for a refused or missing resource. */
export function Problem({ title, message }: { title: string; message: string }) {
  return (
    <div className="sheet mx-auto max-w-xl px-6 py-10 text-center" role="alert">
      <h1 className="text-lead font-semibold">{title}</h1>
      <p className="mt-2 text-body text-ink-soft">{message}</p>
      <p className="mt-4">
        <Link href="/memos">Back to memos</Link>
      </p>
    </div>
  );
}

export function problemFor(err: unknown): { title: string; message: string } | null {
  if (!(err instanceof ApiError)) return null;
  if (err.code === 'not_found') return { title: 'Not found', message: err.message };
  if (err.code === 'forbidden') return { title: 'Not available to you', message: err.message };
  if (err.code === 'bad_request') return { title: 'Bad address', message: err.message };
  return { title: 'Cannot show this', message: err.message };
}
