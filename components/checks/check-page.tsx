import Link from 'next/link';
import type { ReactNode } from 'react';
import { CautionNote } from '@/components/shell/caution-note';
import { PageTitle } from '@/components/ui/page-title';

/** The frame of every check page: title and intro, the check, its assumptions, the cautions. */
export function CheckPage({
  title,
  intro,
  assumptions,
  children,
}: {
  title: string;
  intro: ReactNode;
  assumptions: ReactNode;
  children: ReactNode;
}) {
  return (
    <section className="space-y-6">
      <PageTitle title={title}>{intro}</PageTitle>
      {children}
      <div className="space-y-2 text-sm text-stone-700">
        <h2 className="font-semibold">Assumptions and limits</h2>
        {assumptions}
        <p>
          <Link href="/checks/calibration" className="text-leaf-700 underline">
            How far to trust the checks
          </Link>
          : every check against the outcomes published for it, agreements and disagreements.
        </p>
      </div>
      <CautionNote machinery />
    </section>
  );
}
