import { CalibrationTable } from '@/components/checks/calibration-table';
import { PageTitle } from '@/components/ui/page-title';
import { requirePageActor } from '@/lib/auth/session';
import { calibrationTable } from '@/lib/checks/calibration';
import { titleFor } from '@/lib/page-title';

export const generateMetadata = titleFor('checks:run', 'How far to trust the checks');

export default async function CalibrationPage() {
  const actor = await requirePageActor('checks:run');
  const rows = await calibrationTable(actor);
  return (
    <section className="space-y-6">
      <PageTitle title="How far to trust the checks">
        Each row is an outcome someone published — a drop that bruised or did not, a bin depth the
        trade fills, a pressure film under a squeezed apple — beside what the check predicts for it
        from the knowledge base today, with the rule the two are judged by. Disagreements stay in
        the table: they say where a check is not to be relied on.
      </PageTitle>
      <CalibrationTable rows={rows} />
      <p className="text-sm text-stone-700">
        The drop rows test the elastic estimate the drop check falls back on where a fruit has no
        published drop figure for a surface (Hertz impact with the fruit&apos;s static threshold).
        Where a published figure exists the check rests its verdict on that figure instead, and
        where it does not, the check says how the estimate fares on the fruit&apos;s other published
        figures.
      </p>
    </section>
  );
}
