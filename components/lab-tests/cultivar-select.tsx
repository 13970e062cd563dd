/** The cultivar a test belongs to, with its error announced beside it. */
export function CultivarSelect({
  cultivars,
  errors,
}: {
  cultivars: { slug: string; label: string }[];
  errors?: string[];
}) {
  return (
    <div className="space-y-1">
      <label htmlFor="cultivar" className="block text-sm font-medium text-stone-800">
        Cultivar
      </label>
      <select
        id="cultivar"
        name="cultivar"
        defaultValue=""
        aria-invalid={errors?.length ? true : undefined}
        aria-describedby={errors?.length ? 'cultivar-error' : undefined}
        className="block w-full rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm aria-invalid:border-red-500"
      >
        <option value="">Choose a cultivar…</option>
        {cultivars.map((c) => (
          <option key={c.slug} value={c.slug}>
            {c.label}
          </option>
        ))}
      </select>
      <p id="cultivar-error" aria-live="polite" className="text-xs text-red-700">
        {errors?.join(' ')}
      </p>
    </div>
  );
}
