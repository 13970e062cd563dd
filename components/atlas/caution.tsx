import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';
import type { ReactNode } from 'react';

/** A boxed warning inside an article; the text is the author's, the look is the product's. */
export function Caution({ title = 'Caution', children }: { title?: string; children: ReactNode }) {
  return (
    <aside
      role="note"
      aria-label={title}
      className="my-5 rounded-md border-l-4 border-clay-700 bg-clay-50 px-4 py-3 text-sm text-stone-800 break-inside-avoid [&_p]:my-1.5"
    >
      <p className="font-semibold text-clay-700">{title}</p>
      {children}
    </aside>
  );
}

/** The product's standing cautions, word for word, as every article's closing caution. */
export function StandingCaution() {
  return (
    <Caution title="Before you act on this article">
      <p>{STANDING_CAUTION}</p>
      <p>{MACHINERY_CAUTION}</p>
    </Caution>
  );
}
