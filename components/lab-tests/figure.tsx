/** One headline figure of a test's result, inside its `<dl>`. */
export function Figure({ label, value, testId }: { label: string; value: string; testId: string }) {
  return (
    <div className="rounded-md border border-stone-200 bg-white px-3 py-2">
      <dt className="text-xs text-stone-500">{label}</dt>
      <dd className="num text-lg font-semibold text-stone-900" data-testid={testId}>
        {value}
      </dd>
    </div>
  );
}
