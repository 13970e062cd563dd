import Link from 'next/link';
import type { Actor } from '@/lib/auth/actor';
import { areasFor } from '@/lib/navigation';
import { SearchBox } from '@/components/search/search-box';
import { SignOutButton } from './sign-out-button';

export function SiteHeader({ actor }: { actor: Actor }) {
  const areas = areasFor(actor.role);
  return (
    <header className="bg-leaf-700 text-white print:hidden">
      <div className="mx-auto flex max-w-6xl flex-wrap items-center gap-x-6 gap-y-2 px-4 py-3">
        <Link href="/" className="text-lg font-semibold tracking-tight">
          Tenderline
        </Link>
        <nav aria-label="Areas" data-testid="area-nav" className="flex flex-wrap gap-1">
          {areas.map((area) => (
            <Link
              key={area.href}
              href={area.href}
              className="rounded-md px-2 py-1 text-sm text-leaf-50 hover:bg-leaf-900"
            >
              {area.label}
            </Link>
          ))}
        </nav>
        <SearchBox />
        <div className="ml-auto flex items-center gap-2 text-sm">
          <Link
            href="/account"
            className="rounded-md px-2 py-1 text-leaf-50 hover:bg-leaf-900"
            data-testid="account-link"
          >
            {actor.name} <span className="text-leaf-100">({actor.role})</span>
          </Link>
          <SignOutButton />
        </div>
      </div>
    </header>
  );
}
