import { fullReference, sourceHref } from '@/lib/atlas/citations';
import type { SourceRef } from '@/lib/properties/records';

/** The article's sources from the database, each with the anchor its citations link to. */
export function Bibliography({ sources }: { sources: SourceRef[] }) {
  return (
    <section aria-labelledby="sources-heading" className="mt-10 border-t border-stone-200 pt-6">
      <h2 id="sources-heading" className="text-lg font-semibold text-stone-900">
        Sources
      </h2>
      <ol className="mt-3 list-decimal space-y-2 pl-6 text-sm text-stone-700">
        {sources.map((s) => {
          const link = sourceHref(s);
          return (
            <li key={s.key} id={`source-${s.key}`} className="scroll-mt-24 target:bg-leaf-50">
              {fullReference(s)}
              {link ? (
                <>
                  {' '}
                  <a href={link} className="break-all text-leaf-700 underline" rel="noreferrer">
                    {link}
                  </a>
                </>
              ) : null}
              {s.note ? <span className="block text-xs text-stone-500">{s.note}</span> : null}
            </li>
          );
        })}
      </ol>
    </section>
  );
}
