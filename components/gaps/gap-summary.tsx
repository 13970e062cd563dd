import type { CheckSummary } from '@/lib/checks/gaps';

const CHECK_NAMES = { squeeze: 'Squeeze', drop: 'Drop', stack: 'Stack' } as const;

/** Per check: cultivars running on their own data only, and running at all. */
export function GapSummary({ summaries }: { summaries: CheckSummary[] }) {
  return (
    <ul className="grid gap-3 sm:grid-cols-3" data-testid="gap-summary">
      {summaries.map((s) => (
        <li key={s.check} className="rounded-md border border-stone-200 bg-white p-3 text-sm">
          <h3 className="font-semibold text-stone-900">{CHECK_NAMES[s.check]} check</h3>
          <p className="mt-1">
            <strong className="tabular-nums">{s.ownOnly}</strong> of {s.cultivars} cultivars run on
            their own data only
          </p>
          <p className="mt-1 text-stone-600">
            <strong className="tabular-nums">{s.runs}</strong> of {s.cultivars} run at all
          </p>
        </li>
      ))}
    </ul>
  );
}
