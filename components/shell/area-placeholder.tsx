import type { ReactNode } from 'react';
import { PageTitle } from '@/components/ui/page-title';
import { areaDescription } from '@/lib/area-descriptions';
import type { Role } from '@/lib/auth/roles';

/** An area page that says what will live there, in the words that fit the reader's role. */
export function AreaPlaceholder({
  title,
  href,
  role,
  children,
}: {
  title: string;
  href: string;
  role: Role;
  children?: ReactNode;
}) {
  return (
    <section>
      <PageTitle title={title}>{areaDescription(href, role)}</PageTitle>
      <p className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600">
        This area is being built; it will hold what is described above.
      </p>
      {children}
    </section>
  );
}
