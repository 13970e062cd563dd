'use client';

import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { sendJson } from './json-request';

/** Follow a cultivar to be e-mailed what changed when a new revision of it is published. */
export function FollowToggle({ slug, initial }: { slug: string; initial: boolean }) {
  const [following, setFollowing] = useState(initial);
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function toggle() {
    setBusy(true);
    setError(null);
    const result = await sendJson(`/api/cultivars/${slug}/follow`, 'PUT', { follow: !following });
    setBusy(false);
    if (result.ok) setFollowing(result.data.following === true);
    else setError(result.message);
  }

  return (
    <div className="space-y-1" data-testid="follow">
      <div className="flex flex-wrap items-center gap-2">
        <Button
          type="button"
          variant={following ? 'secondary' : 'primary'}
          aria-pressed={following}
          aria-describedby="follow-state follow-error"
          disabled={busy}
          onClick={toggle}
        >
          {following ? 'Unfollow' : 'Follow'}
        </Button>
        <span id="follow-state" className="text-sm text-stone-600" aria-live="polite">
          {busy
            ? 'Saving…'
            : following
              ? 'You are following: new revisions are e-mailed to you.'
              : 'Not following.'}
        </span>
      </div>
      <p id="follow-error" aria-live="assertive" className="text-sm text-red-700 empty:hidden">
        {error ?? ''}
      </p>
    </div>
  );
}
