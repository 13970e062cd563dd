import Link from 'next/link';
import type { ReactNode } from 'react';
import type { CultivarRecord } from '@/lib/properties/records';
import { shortDate } from '@/lib/properties/citation';

/** Commodity and cultivar, which revision is published, and the reader's controls beside them. */
export function CultivarHeader({
  cultivar,
  children,
}: {
  cultivar: CultivarRecord;
  children?: ReactNode;
}) {
  const p = cultivar.published;
  return (
    <header className="mb-6 border-b border-stone-200 pb-4">
      <Link href="/properties" className="text-sm text-leaf-700 underline">
        ← All cultivars
      </Link>
      <div className="mt-2 flex flex-wrap items-start justify-between gap-4">
        <div className="min-w-0">
          <p className="text-sm text-stone-600" data-testid="cultivar-commodity">
            {cultivar.commodity.name} · {cultivar.commodity.family}
          </p>
          <h1 className="text-2xl font-semibold tracking-tight text-stone-900">{cultivar.name}</h1>
          {cultivar.isType ? (
            <p className="mt-1 text-sm text-stone-600">
              Values for the commodity in general: their sources name no cultivar.
            </p>
          ) : null}
          <p className="mt-1 text-sm text-stone-600">
            {p ? (
              <>
                Revision <span className="num">{p.number}</span>, published{' '}
                <span className="num">{shortDate(p.publishedAt)}</span>
                {p.isDemo ? ' · demo data, invented' : ''}
              </>
            ) : (
              'Nothing published yet.'
            )}
          </p>
        </div>
        {children ? <div className="flex flex-wrap items-start gap-3">{children}</div> : null}
      </div>
    </header>
  );
}
