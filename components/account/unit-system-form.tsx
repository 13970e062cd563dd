'use client';

import { useActionState } from 'react';
import { setUnitSystemAction } from '@/lib/actions/account';
import { initialActionState } from '@/lib/actions/initial-state';
import type { UnitSystem } from '@/lib/units';
import { Button } from '@/components/ui/button';
import { FormMessage } from '@/components/ui/form-message';

/** SI or US customary, applied wherever values are shown and typed; stored values stay SI. */
export function UnitSystemForm({ current }: { current: UnitSystem }) {
  const [state, action, pending] = useActionState(setUnitSystemAction, initialActionState);
  return (
    <form action={action} className="max-w-sm space-y-3" data-testid="unit-system-form">
      <fieldset className="space-y-1 text-sm">
        <legend className="sr-only">Display units</legend>
        <label className="flex items-center gap-2">
          <input type="radio" name="unitSystem" value="si" defaultChecked={current === 'si'} /> SI
          (mm, N, kPa, MPa, g, kg/m³, J)
        </label>
        <label className="flex items-center gap-2">
          <input type="radio" name="unitSystem" value="us" defaultChecked={current === 'us'} /> US
          customary (in, lbf, psi, oz, lb/ft³, ft·lbf)
        </label>
      </fieldset>
      <FormMessage tone={state.ok ? 'success' : 'error'} message={state.message} />
      <Button type="submit" variant="secondary" disabled={pending}>
        {pending ? 'Saving…' : 'Save units'}
      </Button>
    </form>
  );
}
