import Link from 'next/link';

/** The words of the 404 page, shared by the root page and the one inside the signed-in shell. */
export function NotFoundNotice() {
  return (
    <div className="mx-auto w-full max-w-lg flex-1 px-4 py-24 text-center">
      <p className="num text-sm text-stone-500">404</p>
      <h1 className="mt-2 text-2xl font-semibold">No page here</h1>
      <p className="mt-2 text-sm text-stone-600">
        The address may be mistyped, or the page has moved.
      </p>
      <Link href="/" className="mt-6 inline-block text-sm font-medium text-leaf-700 underline">
        Back to Tenderline
      </Link>
    </div>
  );
}
