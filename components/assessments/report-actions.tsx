'use client';

import { useRouter } from 'next/navigation';
import { useState } from 'react';
import { Button } from '@/components/ui/button';

/** Print, downloads, and a re-run on today's data when a newer revision exists. */
export function ReportActions({
  id,
  canRerun,
  openHref,
}: {
  id: number;
  canRerun: boolean;
  /** The check's page holding this assessment's inputs, to adjust them there. */
  openHref: string;
}) {
  const router = useRouter();
  const [state, setState] = useState<{ pending?: boolean; error?: string }>({});
  async function rerun() {
    setState({ pending: true });
    const res = await fetch(`/api/assessments/${id}/rerun`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: '{}',
    });
    const json = await res.json().catch(() => ({}));
    if (!res.ok) return setState({ error: json.message ?? 'The re-run failed.' });
    router.push(`/assessments/${json.assessment.id}`);
  }
  return (
    <div className="flex flex-wrap items-center gap-2 print:hidden" data-testid="report-actions">
      <Button type="button" variant="secondary" onClick={() => window.print()}>
        Print
      </Button>
      <a
        href={openHref}
        className="rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium"
      >
        Open in the check
      </a>
      <a
        href={`/api/assessments/${id}/report`}
        className="rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium"
      >
        Download PDF
      </a>
      <a
        href={`/api/assessments/${id}/curves`}
        className="rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium"
      >
        Curves as CSV
      </a>
      <a
        href={`/api/assessments/${id}/inputs`}
        className="rounded-md border border-stone-300 bg-white px-3 py-1.5 text-sm font-medium"
      >
        Inputs and evidence as CSV
      </a>
      {canRerun ? (
        <Button type="button" onClick={() => void rerun()} disabled={state.pending}>
          {state.pending ? 'Re-running…' : 'Re-run on the newer data'}
        </Button>
      ) : null}
      {state.error ? (
        <span className="text-sm text-red-700" aria-live="polite">
          {state.error}
        </span>
      ) : null}
    </div>
  );
}
