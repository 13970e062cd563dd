import { SqueezeCheck } from '@/components/checks/squeeze-check';
import { CautionNote } from '@/components/shell/caution-note';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { ASSUMPTIONS } from '@/lib/checks/assumptions';
import { cultivarOptions } from '@/lib/checks/cultivar-options';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Squeeze check');

export default async function SqueezeCheckPage({
  searchParams,
}: {
  searchParams: Promise<{ cultivar?: string }>;
}) {
  const actor = await requirePageActor('checks:run');
  const options = await cultivarOptions(actor);
  const wanted = (await searchParams).cultivar;
  const initial =
    options.find((o) => o.slug === wanted)?.slug ?? options.find((o) => o.complete)?.slug ?? '';
  return (
    <section className="space-y-6">
      <PageTitle title="Squeeze check">
        Two opposed pads grip a fruit and lift it. A finite-element model of the fruit finds the
        least squeeze at which friction lifts it (the grip point), the contact pressure there, and
        the bruise margin against the static bruise threshold.
      </PageTitle>
      <SqueezeCheck cultivars={options} initialCultivar={initial} />
      <div className="space-y-2 text-sm text-stone-700">
        <h2 className="font-semibold">Assumptions and limits</h2>
        <p>{ASSUMPTIONS.squeeze}</p>
        <p>
          Not modelled: viscoelastic relaxation of the flesh under a held grip (the pressure falls
          and the grip loosens over seconds), large strain beyond the small-travel range, the skin
          as a separate layer, and grips off the fruit&apos;s axis. Treat a margin near 1 as a
          bruise. The grip rule 2μN ≥ SF·m(g + a) is common practice.
        </p>
      </div>
      <CautionNote machinery />
    </section>
  );
}
