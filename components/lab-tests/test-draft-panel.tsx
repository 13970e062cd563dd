import Link from 'next/link';
import { DraftFromTestButton } from './draft-from-test-button';

/** The way from a test to a draft: the draft already started from it, if any, and the button. */
export function TestDraftPanel({
  draftRevisionId,
  startedFrom,
  endpoint,
  label,
}: {
  draftRevisionId: number | null;
  /** what the page calls the test: "A draft was started from this …" */
  startedFrom: string;
  endpoint: string;
  label: string;
}) {
  return (
    <div className="space-y-2">
      {draftRevisionId ? (
        <p className="text-sm text-stone-600">
          A draft was started from this {startedFrom}:{' '}
          <Link
            href={`/editor/revisions/${draftRevisionId}`}
            className="text-leaf-700 underline underline-offset-2"
          >
            open that draft
          </Link>
          .
        </p>
      ) : null}
      <DraftFromTestButton endpoint={endpoint} label={label} />
    </div>
  );
}
