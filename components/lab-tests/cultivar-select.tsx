import { FieldFrame } from '@/components/ui/field-frame';

/** The cultivar a test belongs to, with its error announced beside it. */
export function CultivarSelect({
  id,
  label,
  cultivars,
  errors,
}: {
  id: string;
  label: string;
  cultivars: { slug: string; label: string }[];
  errors?: string[];
}) {
  return (
    <FieldFrame id={id} label={label} errors={errors}>
      {(control) => (
        <select
          {...control}
          name="cultivar"
          defaultValue=""
          className="block w-full rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm aria-invalid:border-red-500"
        >
          <option value="">Choose a cultivar…</option>
          {cultivars.map((c) => (
            <option key={c.slug} value={c.slug}>
              {c.label}
            </option>
          ))}
        </select>
      )}
    </FieldFrame>
  );
}
