import Link from 'next/link';
import { PageTitle } from '@/components/ui/page-title';
import { areaDescription } from '@/lib/area-descriptions';
import { can } from '@/lib/auth/roles';
import { areasFor } from '@/lib/navigation';
import { requirePageActor } from '@/lib/auth/session';

export default async function HomePage() {
  const actor = await requirePageActor();
  return (
    <section>
      <PageTitle title={`Welcome, ${actor.name}`}>
        Tenderline keeps sourced firmness and bruise data for soft produce beside handling guidance
        {can(actor.role, 'checks:run')
          ? ', and estimates what a gripper pad, a drop or a deep bin does to the fruit.'
          : '.'}
      </PageTitle>
      <ul className="grid gap-4 sm:grid-cols-2 lg:grid-cols-3" data-testid="home-areas">
        {areasFor(actor.role).map((area) => (
          <li key={area.href}>
            <Link
              href={area.href}
              className="block h-full rounded-lg border border-stone-200 bg-white p-4 shadow-sm hover:border-leaf-600"
            >
              <h2 className="font-semibold text-leaf-900">{area.label}</h2>
              <p className="mt-1 text-sm text-stone-600">
                {areaDescription(area.href, actor.role)}
              </p>
            </Link>
          </li>
        ))}
      </ul>
    </section>
  );
}
