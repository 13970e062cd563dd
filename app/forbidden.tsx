import Link from 'next/link';

export default function Forbidden() {
  return (
    <main className="mx-auto max-w-lg px-4 py-24 text-center" data-testid="forbidden-page">
      <p className="num text-sm text-stone-500">403</p>
      <h1 className="mt-2 text-2xl font-semibold">Not open to your role</h1>
      <p className="mt-2 text-sm text-stone-600">
        You are signed in, but your role may not use this area. Ask an admin if you need access.
      </p>
      <Link href="/" className="mt-6 inline-block text-sm font-medium text-leaf-700 underline">
        Back to your areas
      </Link>
    </main>
  );
}
