import Link from 'next/link';
import type { LabTestRecord } from '@/lib/data/lab-tests';
import { dateText, rangeText, sig } from './format';

/** Uploaded tests, newest first: a card per test, its result in one line. */
export function TestList({ tests }: { tests: LabTestRecord[] }) {
  if (tests.length === 0) {
    return (
      <p
        className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600"
        data-testid="lab-tests-empty"
      >
        No compression tests yet. Upload one below: its apparent modulus is fitted at once.
      </p>
    );
  }
  return (
    <ul
      className="divide-y divide-stone-200 rounded-lg border border-stone-200 bg-white"
      data-testid="lab-test-list"
    >
      {tests.map((t) => (
        <li key={t.id} className="flex flex-wrap items-baseline gap-x-4 gap-y-1 px-3 py-2 text-sm">
          <Link
            href={`/editor/lab-tests/${t.id}`}
            className="font-medium text-leaf-700 underline-offset-2 hover:underline"
          >
            Test #{t.id}: {t.cultivar.commodityName} — {t.cultivar.name}
          </Link>
          {t.isDemo ? (
            <span className="rounded bg-clay-50 px-1.5 text-xs text-clay-700">demo</span>
          ) : null}
          <span className="num">E {sig(t.modulusMpa)} MPa</span>
          <span className="num">R² {t.rSquared.toFixed(3)}</span>
          <span className="num">{rangeText(t.fitFromMm, t.fitToMm)}</span>
          <span className="text-stone-500 wrap-anywhere">
            {t.fileName} · {t.uploadedBy.name} · {dateText(t.createdAt)}
          </span>
        </li>
      ))}
    </ul>
  );
}
