'use client';

import { useActionState } from 'react';
import { resolveConflictAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';
import type { ConflictSide, ConflictView } from '@/lib/data/revision-conflicts';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { ValueText } from '@/components/units/value-text';
import { baseText, citation } from './format';

function Side({ title, value }: { title: string; value: ConflictSide | null }) {
  return (
    <div className="min-w-0 rounded-md border border-stone-200 bg-white p-2">
      <p className="text-xs text-stone-500">{title}</p>
      {value ? (
        <>
          <p className="num font-medium">
            <ValueText value={value} />
            {value.samples !== null ? `, n = ${value.samples}` : ''}
          </p>
          <p className="text-xs wrap-anywhere text-stone-600">
            {value.source ? citation(value.source) : 'Typical value (no source)'}
          </p>
          {value.method ? (
            <p className="text-xs wrap-anywhere text-stone-600">{value.method}</p>
          ) : null}
        </>
      ) : (
        <p className="text-stone-500">Not there (removed)</p>
      )}
    </div>
  );
}

/** One value both sides changed: base, the draft's and the published one, and the choice. */
function Conflict({ revisionId, c }: { revisionId: number; c: ConflictView }) {
  const [state, action, pending] = useActionState(resolveConflictAction, initialActionState);
  const theirs = baseText(c.theirsNumber);
  return (
    <li
      className="space-y-2 rounded-lg border border-amber-300 bg-amber-50 p-3"
      data-testid="conflict"
    >
      <p className="font-medium">{c.label}</p>
      <div className="grid gap-2 sm:grid-cols-3">
        <Side title="When your draft started" value={c.base} />
        <Side title="Yours (in this draft)" value={c.mine} />
        <Side title={`Published since (${theirs})`} value={c.theirs} />
      </div>
      <form action={action} className="flex flex-wrap items-center gap-2">
        <input type="hidden" name="revisionId" value={revisionId} />
        <input type="hidden" name="conflictId" value={c.id} />
        <Button type="submit" name="choice" value="mine" variant="secondary" disabled={pending}>
          Keep mine
        </Button>
        <Button type="submit" name="choice" value="theirs" variant="secondary" disabled={pending}>
          Take theirs
        </Button>
      </form>
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
    </li>
  );
}

/**
 * The conflicts a rebase left: each value both the draft and the newer published revision
 * changed since the draft began, side by side. The draft cannot be submitted until each is decided.
 */
export function ConflictPanel({
  revisionId,
  conflicts,
}: {
  revisionId: number;
  conflicts: ConflictView[];
}) {
  return (
    <div data-testid="conflict-panel" role="region" aria-label="Conflicts to decide">
      <p className="mb-2 text-sm text-amber-900">
        {conflicts.length === 1 ? 'One value was' : `${conflicts.length} values were`} changed both
        in your draft and in the revision published since. Keep yours or take the published one for
        each; the draft can be submitted once none is left. Save your other edits first.
      </p>
      <ol className="space-y-3">
        {conflicts.map((c) => (
          <Conflict key={c.id} revisionId={revisionId} c={c} />
        ))}
      </ol>
    </div>
  );
}
