import type { Metadata } from 'next';
import Link from 'next/link';
import { redirect } from 'next/navigation';
import { Wordmark } from '@/components/brand/Wordmark';
import { SignInForm } from '@/components/auth/SignInForm';
import { currentActor } from '@/lib/auth/current-actor';

export const metadata: Metadata = { title: 'Sign in' };
export const dynamic = 'force-dynamic';

function safeReturnPath(value: string | string[] | undefined): string {
  const v = typeof value === 'string' ? value : '';
  // Without a page asked for, "/" sends each role to its own home (lib/auth/home-path-for.ts).
  return v.startsWith('/') && !v.startsWith('//') ? v : '/';
}

export default async function SignInPage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const params = await searchParams;
  const returnTo = safeReturnPath(params.callbackUrl);
  if (await currentActor()) redirect(returnTo);
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="w-full max-w-sm">
        <div className="mb-6 text-center">
          <Wordmark size="lg" />
          <p className="mt-2 text-note text-ink-soft">Orbit design memos with computed numbers.</p>
        </div>
        <div className="sheet p-6">
          <h1 className="mb-4 text-lead font-semibold">Sign in</h1>
          <SignInForm returnTo={returnTo} />
          <p className="mt-4 text-center text-note">
            <Link href="/password-reset">Forgot your password?</Link>
          </p>
        </div>
      </div>
    </main>
  );
}
