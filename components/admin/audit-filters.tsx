import Link from 'next/link';
import { Field } from '@/components/ui/field';
import { FieldFrame } from '@/components/ui/field-frame';
import { actionLabel } from './audit-words';

const SELECT =
  'block w-full rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm focus:outline-none focus-visible:ring-2 focus-visible:ring-leaf-600 aria-invalid:border-red-500';

export interface AuditFilterValues {
  action?: string;
  actor?: string;
  from?: string;
  to?: string;
}

/** Plain GET controls: the filter lives in the address, so a link opens the same view. */
export function AuditFilters({
  actions,
  people,
  values,
  errors = {},
}: {
  actions: string[];
  people: { id: number; name: string; email: string }[];
  values: AuditFilterValues;
  errors?: Record<string, string[] | undefined>;
}) {
  return (
    <form
      method="get"
      className="mb-4 grid gap-3 sm:grid-cols-2 lg:grid-cols-[1fr_1fr_10rem_10rem_auto]"
      data-testid="audit-filters"
    >
      <FieldFrame id="audit-action" label="Action" errors={errors.action}>
        {(control) => (
          <select {...control} name="action" defaultValue={values.action ?? ''} className={SELECT}>
            <option value="">Any action</option>
            {actions.map((a) => (
              <option key={a} value={a}>
                {actionLabel(a)}
              </option>
            ))}
          </select>
        )}
      </FieldFrame>
      <FieldFrame id="audit-actor" label="Who" errors={errors.actor}>
        {(control) => (
          <select {...control} name="actor" defaultValue={values.actor ?? ''} className={SELECT}>
            <option value="">Anyone</option>
            {people.map((p) => (
              <option key={p.id} value={String(p.id)}>
                {p.name} ({p.email})
              </option>
            ))}
          </select>
        )}
      </FieldFrame>
      <Field
        label="From (UTC)"
        name="from"
        type="date"
        defaultValue={values.from}
        errors={errors.from}
      />
      <Field label="To (UTC)" name="to" type="date" defaultValue={values.to} errors={errors.to} />
      <div className="flex items-center gap-3 self-center pt-1 text-sm">
        <button
          type="submit"
          className="rounded-md border border-stone-300 bg-white px-3 py-1.5 font-medium text-stone-800 hover:bg-stone-100 focus-visible:ring-2 focus-visible:ring-leaf-600"
        >
          Filter
        </button>
        <Link href="/admin/audit" className="text-leaf-700 underline">
          Clear
        </Link>
      </div>
    </form>
  );
}
