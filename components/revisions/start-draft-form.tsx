'use client';

import { useActionState } from 'react';
import { createDraftAction } from '@/lib/actions/revisions';
import { initialActionState } from '@/lib/actions/initial-state';
import type { CultivarChoice } from '@/lib/data/editor-queue';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';
import { SelectField } from './select-field';

/** Cultivars grouped by commodity, in the order given. */
function groups(choices: CultivarChoice[]): [string, CultivarChoice[]][] {
  const out = new Map<string, CultivarChoice[]>();
  for (const c of choices) out.set(c.commodityName, [...(out.get(c.commodityName) ?? []), c]);
  return [...out.entries()];
}

/** Pick any cultivar and start a draft from its published values; opens the draft. */
export function StartDraftForm({ cultivars }: { cultivars: CultivarChoice[] }) {
  const [state, action, pending] = useActionState(createDraftAction, initialActionState);
  return (
    <form
      action={action}
      className="flex max-w-xl flex-wrap items-start gap-x-3"
      data-testid="start-draft-form"
    >
      <div className="min-w-0 flex-1 basis-60">
        <SelectField
          label="Cultivar"
          name="cultivar"
          errors={state.fieldErrors?.cultivar}
          defaultValue=""
          required
        >
          <option value="" disabled>
            Choose a cultivar…
          </option>
          {groups(cultivars).map(([commodity, list]) => (
            <optgroup key={commodity} label={commodity}>
              {list.map((c) => (
                <option key={c.slug} value={c.slug}>
                  {commodity}, {c.name}
                </option>
              ))}
            </optgroup>
          ))}
        </SelectField>
      </div>
      <Button type="submit" disabled={pending} className="mt-6">
        {pending ? 'Starting…' : 'Start a draft'}
      </Button>
      <div className="basis-full">
        <FormMessage tone="error" message={state.ok ? undefined : state.message} />
      </div>
    </form>
  );
}
