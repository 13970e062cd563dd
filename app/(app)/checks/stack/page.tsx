import { CheckPage } from '@/components/checks/check-page';
import { StackCheck } from '@/components/checks/stack-check';
import { requirePageActor } from '@/lib/auth/session';
import { ASSUMPTIONS } from '@/lib/checks/assumptions';
import { cultivarOptions, initialCultivar } from '@/lib/checks/cultivar-options';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Stack check');

export default async function StackCheckPage({
  searchParams,
}: {
  searchParams: Promise<{ cultivar?: string }>;
}) {
  const actor = await requirePageActor('checks:run');
  const options = await cultivarOptions(actor);
  const initial = initialCultivar(options, (await searchParams).cultivar);
  return (
    <CheckPage
      title="Stack check"
      intro={
        <>
          Fruit in a bin or tote. Janssen&apos;s wall-friction law gives the vertical pressure with
          depth; the load on one bottom-layer fruit and the Hertz contact pressure between two fruit
          give the margin against the static bruise threshold.
        </>
      }
      assumptions={
        <>
          <p>{ASSUMPTIONS.stack}</p>
        </>
      }
    >
      <StackCheck cultivars={options} initialCultivar={initial} />
    </CheckPage>
  );
}
