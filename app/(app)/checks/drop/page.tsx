import { DropCheck } from '@/components/checks/drop-check';
import { CautionNote } from '@/components/shell/caution-note';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { cultivarOptions } from '@/lib/checks/cultivar-options';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Drop check');

export default async function DropCheckPage({
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
      <PageTitle title="Drop check">
        A fruit falls from a height onto a surface. Elastic Hertz impact gives the peak force,
        contact radius, peak pressure and contact time; the verdict compares the drop with the
        cultivar&apos;s published dynamic bruise threshold for that surface.
      </PageTitle>
      <DropCheck cultivars={options} initialCultivar={initial} />
      <div className="space-y-2 text-sm text-stone-700">
        <h2 className="font-semibold">Assumptions</h2>
        <p>
          Elastic, lossless, quasi-static Hertz impact of a sphere (K. L. Johnson, Contact
          Mechanics, 1985, §11.4); the fruit does not rotate or bounce off at an angle; surfaces are
          smooth; a struck fruit is held still. Real tissue is viscoelastic and stiffer at impact
          rates, so the elastic peak pressure is an upper bound and the published drop threshold is
          the figure to trust.
        </p>
      </div>
      <CautionNote machinery />
    </section>
  );
}
