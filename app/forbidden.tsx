import Link from 'next/link';
import { getCurrentActor } from '@/lib/auth/session';

/**
 * The 403 page; it renders inside the layout of the refused page, header included. Its own
 * title replaces the refused page's, so the browser tab does not name a page the role cannot see.
 */
export default async function Forbidden() {
  const actor = await getCurrentActor();
  const role = actor ? `the ${actor.role} role` : 'your role';
  return (
    <div className="mx-auto max-w-lg px-4 py-24 text-center" data-testid="forbidden-page">
      <title>{`Not open to ${role} · Tenderline`}</title>
      <p className="num text-sm text-stone-500">403</p>
      <h1 className="mt-2 text-2xl font-semibold">Not open to your role</h1>
      <p className="mt-2 text-sm text-stone-600">
        You are signed in, but {role} may not use this area. Ask an admin if you need access.
      </p>
      <Link href="/" className="mt-6 inline-block text-sm font-medium text-leaf-700 underline">
        Back to your areas
      </Link>
    </div>
  );
}
