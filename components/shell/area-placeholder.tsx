import { PageTitle } from '@/components/ui/page-title';
import { AREA_DESCRIPTIONS } from '@/lib/area-descriptions';

/** An area page that says what will live there. */
export function AreaPlaceholder({
  title,
  href,
  children,
}: {
  title: string;
  href: string;
  children?: React.ReactNode;
}) {
  return (
    <section>
      <PageTitle title={title}>{AREA_DESCRIPTIONS[href]}</PageTitle>
      <p className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600">
        This area is being built; it will hold what is described above.
      </p>
      {children}
    </section>
  );
}
