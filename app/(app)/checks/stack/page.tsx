import { StackCheck } from '@/components/checks/stack-check';
import { CautionNote } from '@/components/shell/caution-note';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { cultivarOptions } from '@/lib/checks/cultivar-options';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'Stack check');

export default async function StackCheckPage({
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
      <PageTitle title="Stack check">
        Fruit in a bin or tote. Janssen&apos;s wall-friction law gives the vertical pressure with
        depth; the load on one bottom-layer fruit and the Hertz contact pressure between two fruit
        give the margin against the static bruise threshold.
      </PageTitle>
      <StackCheck cultivars={options} initialCultivar={initial} />
      <div className="space-y-2 text-sm text-stone-700">
        <h2 className="font-semibold">Assumptions</h2>
        <p>
          Janssen (1895) vertical pressure with a constant lateral pressure ratio K and wall
          friction; the bottom layer stacked simple cubic, so one contact carries the pressure over
          one fruit&apos;s square (a dense random packing shares it between three or four contacts,
          so this is the harsher case); Hertz between two like spheres (K. L. Johnson, Contact
          Mechanics, 1985, ch. 4); static, elastic, no creep during storage. Vibration in transport
          adds dynamic load on top of this.
        </p>
      </div>
      <CautionNote machinery />
    </section>
  );
}
