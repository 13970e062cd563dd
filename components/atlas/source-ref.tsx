import { fullReference, shortCitation } from '@/lib/atlas/citations';
import type { SourceRef as Source } from '@/lib/properties/records';

/** An in-text citation, `(Wang et al., 2024)`, linking to its entry in the bibliography. */
export function SourceRefLink({ source }: { source: Source }) {
  return (
    <a
      href={`#source-${source.key}`}
      title={fullReference(source)}
      className="text-leaf-700 underline decoration-leaf-600/40 underline-offset-2 hover:decoration-leaf-700"
    >
      ({shortCitation(source)})
    </a>
  );
}
