'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';
import { sendJson } from './json-request';

/** Start a draft from the published revision, then open it in the editor. */
export function StartDraftButton({ slug }: { slug: string }) {
  const router = useRouter();
  const [busy, setBusy] = useState(false);
  const [error, setError] = useState<string | null>(null);

  async function start() {
    setBusy(true);
    setError(null);
    const result = await sendJson(`/api/cultivars/${slug}/revisions`, 'POST', {});
    const id = result.ok ? (result.data.revision as { id?: unknown } | undefined)?.id : undefined;
    if (typeof id === 'number') return router.push(`/editor/revisions/${id}`);
    setBusy(false);
    setError(
      result.ok ? 'The draft was made but gave no number; reload the page.' : result.message,
    );
  }

  return (
    <div className="space-y-1">
      <Button type="button" onClick={start} disabled={busy} aria-describedby="draft-error">
        {busy ? 'Starting a draft…' : 'Start a draft'}
      </Button>
      <p id="draft-error" aria-live="assertive" className="text-sm text-red-700 empty:hidden">
        {error ?? ''}
      </p>
    </div>
  );
}
