'use client';

export default function ErrorPage({ reset }: { error: Error; reset: () => void }) {
  return (
    <main className="flex min-h-screen items-center justify-center px-4">
      <div className="sheet max-w-md px-6 py-10 text-center" role="alert">
        <h1 className="text-lead font-semibold">This page could not be shown</h1>
        <p className="mt-2 text-ink-soft">
          Nothing you saved was lost. Try again; if it keeps happening, tell your administrator.
        </p>
        <button type="button" className="btn-quiet mt-4" onClick={reset}>
          Try again
        </button>
      </div>
    </main>
  );
}
