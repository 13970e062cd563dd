import Link from 'next/link';
import { Measure } from '@/components/units/measure';
import type { RelaxationTestRecord } from '@/lib/data/relaxation-tests';
import { dateText, sig } from './format';

/** Recent relaxation tests, newest first: a line each, its link showing the fit above. */
export function RelaxationList({ tests }: { tests: RelaxationTestRecord[] }) {
  if (tests.length === 0) {
    return (
      <p
        className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600"
        data-testid="relaxation-empty"
      >
        No relaxation tests yet. Upload one above: Peleg&apos;s k₁ and k₂ are fitted at once.
      </p>
    );
  }
  return (
    <ul
      className="divide-y divide-stone-200 rounded-lg border border-stone-200 bg-white"
      data-testid="relaxation-list"
    >
      {tests.map((t) => (
        <li key={t.id} className="flex flex-wrap items-baseline gap-x-4 gap-y-1 px-3 py-2 text-sm">
          <Link
            href={`/editor/lab-tests?relaxation=${t.id}#relaxation-result`}
            className="font-medium text-leaf-700 underline-offset-2 hover:underline"
          >
            Relaxation #{t.id}: {t.cultivar.commodityName} — {t.cultivar.name}
          </Link>
          {t.isDemo ? (
            <span className="rounded bg-clay-50 px-1.5 text-xs text-clay-700">demo</span>
          ) : null}
          <span className="num">k₁ {sig(t.k1S)} s</span>
          <span className="num">k₂ {sig(t.k2)}</span>
          <span className="num">R² {t.r2Force.toFixed(3)}</span>
          <span>
            F₀ <Measure value={t.f0N} unit="N" />
          </span>
          <span className="text-stone-500 wrap-anywhere">
            {t.fileName} · {t.uploadedBy.name} · {dateText(t.createdAt)}
          </span>
        </li>
      ))}
    </ul>
  );
}
