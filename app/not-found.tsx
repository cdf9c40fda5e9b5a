import Link from 'next/link';

export default function NotFound() {
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="sheet max-w-md px-6 py-10 text-center">
        <h1 className="text-lead font-semibold">No such page</h1>
        <p className="mt-2 text-ink-soft">The address does not lead to anything in Nodewright.</p>
        <p className="mt-4">
          <Link href="/memos">Go to memos</Link>
        </p>
      </div>
    </main>
  );
}
