import type { ReactNode } from 'react';
import { SiteFooter } from '@/components/shell/site-footer';
import { QueryProvider } from '@/components/shell/query-provider';
import { SiteHeader } from '@/components/shell/site-header';
import { requirePageActor } from '@/lib/auth/session';
import { UnitsProvider } from '@/components/units/units-provider';
import { getUnitSystem } from '@/lib/data/users';

export default async function AppLayout({ children }: { children: ReactNode }) {
  const actor = await requirePageActor();
  return (
    <UnitsProvider system={await getUnitSystem(actor)}>
      <QueryProvider>
        <div className="flex min-h-screen flex-col">
          <SiteHeader actor={actor} />
          <main className="mx-auto w-full max-w-6xl flex-1 px-4 py-8">{children}</main>
          <SiteFooter />
        </div>
      </QueryProvider>
    </UnitsProvider>
  );
}
