import type { OpenRevision } from '@/lib/data/revision-others';
import { STATUS_LABEL } from './format';

/** Other drafts or reviews of the same cultivar: the first one published makes the rest stale. */
export function OpenRevisionsNotice({
  cultivar,
  others,
}: {
  cultivar: string;
  others: OpenRevision[];
}) {
  if (!others.length) return null;
  const list = others
    .map((o) => `revision ${o.number} (${STATUS_LABEL[o.status].toLowerCase()}, ${o.authorName})`)
    .join('; ');
  return (
    <p
      className="rounded-md border border-amber-200 bg-amber-50 px-3 py-2 text-sm text-amber-900"
      data-testid="open-revisions-notice"
      role="status"
    >
      Also open for {cultivar}: {list}. Whichever is published first, the others must be rebased on
      it; agree who changes which values.
    </p>
  );
}
