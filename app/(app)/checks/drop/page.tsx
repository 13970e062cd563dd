import { CheckPage } from '@/components/checks/check-page';
import { DropCheck } from '@/components/checks/drop-check';
import { requirePageActor } from '@/lib/auth/session';
import { ASSUMPTIONS } from '@/lib/checks/assumptions';
import { cultivarOptions, initialCultivar } from '@/lib/checks/cultivar-options';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Drop check');

export default async function DropCheckPage({
  searchParams,
}: {
  searchParams: Promise<{ cultivar?: string }>;
}) {
  const actor = await requirePageActor('checks:run');
  const options = await cultivarOptions(actor);
  const initial = initialCultivar(options, (await searchParams).cultivar);
  return (
    <CheckPage
      title="Drop check"
      intro={
        <>
          A fruit falls from a height onto a surface. Elastic Hertz impact gives the peak force,
          contact radius, peak pressure and contact time; the verdict compares the drop with the
          cultivar&apos;s published dynamic bruise threshold for that surface.
        </>
      }
      assumptions={
        <>
          <p>{ASSUMPTIONS.drop}</p>
        </>
      }
    >
      <DropCheck cultivars={options} initialCultivar={initial} />
    </CheckPage>
  );
}
