import { RebaseForm } from './rebase-form';
import { baseText } from './format';

/**
 * The base of this revision is no longer the published one: say which is newer, and offer the
 * author a rebase (publishing would be refused with a 409 until then).
 */
export function StaleNotice({
  revisionId,
  baseNumber,
  publishedNumber,
  canRebase,
}: {
  revisionId: number;
  baseNumber: number | null;
  publishedNumber: number | null;
  canRebase: boolean;
}) {
  const newer = baseText(publishedNumber);
  return (
    <div
      className="rounded-md border border-clay-200 bg-clay-50 px-3 py-2 text-sm text-clay-700"
      data-testid="stale-notice"
      role="status"
    >
      <p>
        This revision was started from {baseText(baseNumber)}, but {newer} has been published since:{' '}
        {newer} is newer. It cannot be published until it is rebased on {newer}.
      </p>
      {canRebase ? (
        <>
          <p className="mt-1">
            Rebasing brings {newer} into this revision: values only {newer} changed are carried in,
            yours stay, and any value you both changed is shown side by side for you to decide
            before submitting. Save your changes first; the revision becomes a draft again.
          </p>
          <RebaseForm revisionId={revisionId} target={newer} />
        </>
      ) : null}
    </div>
  );
}
