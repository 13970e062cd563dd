'use client';

import { useEffect } from 'react';

export default function ErrorPage({
  error,
  reset,
}: {
  error: Error & { digest?: string };
  reset: () => void;
}) {
  // The server logged the full error under this digest; the browser console gets what it has.
  useEffect(() => {
    console.error(error);
  }, [error]);
  return (
    <main className="mx-auto max-w-lg px-4 py-24 text-center">
      <h1 className="text-2xl font-semibold">Something went wrong</h1>
      <p className="mt-2 text-sm text-stone-600">
        The page could not be shown. Try again; if it keeps happening, tell the site admin
        {error.digest ? (
          <>
            {' '}
            and quote <span className="num">{error.digest}</span>
          </>
        ) : null}
        .
      </p>
      <button
        type="button"
        onClick={reset}
        className="mt-6 rounded-md bg-leaf-700 px-3 py-1.5 text-sm text-white"
      >
        Try again
      </button>
    </main>
  );
}
