/** Shown while a data page renders on the server: the page's frame, without its numbers yet. */
export function PageSkeleton() {
  return (
    <div className="animate-pulse space-y-4" aria-busy="true" aria-live="polite">
      <span className="sr-only">Loading…</span>
      <div className="h-7 w-48 rounded bg-stone-200" />
      <div className="h-4 w-80 max-w-full rounded bg-stone-200" />
      <div className="space-y-2 rounded-lg border border-stone-200 bg-white p-4">
        {Array.from({ length: 6 }, (_, i) => (
          <div key={i} className="h-4 rounded bg-stone-100" />
        ))}
      </div>
    </div>
  );
}
