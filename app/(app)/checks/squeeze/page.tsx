import { CheckPage } from '@/components/checks/check-page';
import { SqueezeCheck } from '@/components/checks/squeeze-check';
import { requirePageActor } from '@/lib/auth/session';
import { ASSUMPTIONS } from '@/lib/checks/assumptions';
import { cultivarOptions, initialCultivar } from '@/lib/checks/cultivar-options';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Squeeze check');

export default async function SqueezeCheckPage({
  searchParams,
}: {
  searchParams: Promise<{ cultivar?: string }>;
}) {
  const actor = await requirePageActor('checks:run');
  const options = await cultivarOptions(actor);
  const initial = initialCultivar(options, (await searchParams).cultivar);
  return (
    <CheckPage
      title="Squeeze check"
      intro={
        <>
          Two opposed pads grip a fruit and lift it. A finite-element model of the fruit finds the
          least squeeze at which friction lifts it (the grip point), the contact pressure there, and
          the bruise margin against the static bruise threshold.
        </>
      }
      assumptions={
        <>
          <p>{ASSUMPTIONS.squeeze}</p>
          <p>
            Not modelled: viscoelastic relaxation of the flesh under a held grip (the pressure falls
            and the grip loosens over seconds), large strain beyond the small-travel range, the skin
            as a separate layer, and grips off the fruit&apos;s axis. Treat a margin near 1 as a
            bruise. The grip rule 2μN ≥ SF·m(g + a) is common practice.
          </p>
        </>
      }
    >
      <SqueezeCheck cultivars={options} initialCultivar={initial} />
    </CheckPage>
  );
}
