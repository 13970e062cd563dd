import Link from 'next/link';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Checks');

const CHECKS = [
  {
    href: '/checks/squeeze',
    title: 'Squeeze',
    text: 'Two opposed pads grip a fruit: grip force, contact pressure and the bruise margin at the point where it lifts.',
  },
  {
    href: '/checks/drop',
    title: 'Drop',
    text: 'A fruit falls onto steel, plastic, belt rubber, padding or another fruit: impact force and pressure against its drop threshold.',
  },
  {
    href: '/checks/stack',
    title: 'Stack',
    text: 'Fruit in a bin: pressure with depth from wall friction, the load on the bottom layer, and the deepest safe fill.',
  },
];

export default async function ChecksPage() {
  await requirePageActor('checks:run');
  return (
    <section>
      <PageTitle title="Checks">
        Screening estimates from linear-elastic contact models and published property values.
      </PageTitle>
      <ul className="grid gap-4 sm:grid-cols-3">
        {CHECKS.map((c) => (
          <li key={c.href}>
            <Link
              href={c.href}
              className="block h-full rounded-lg border border-stone-200 bg-white p-4 hover:border-leaf-600"
            >
              <span className="font-semibold">{c.title}</span>
              <span className="mt-1 block text-sm text-stone-600">{c.text}</span>
            </Link>
          </li>
        ))}
      </ul>
      <p className="mt-4 text-sm text-stone-700">
        <Link href="/checks/calibration" className="text-leaf-700 underline">
          How far to trust the checks
        </Link>{' '}
        — each check against the outcomes published for it.
      </p>
    </section>
  );
}
