import Link from 'next/link';
import type { ReactNode } from 'react';
import type { UploadedTestRecord } from '@/lib/data/uploaded-tests';
import { dateText } from './format';

/**
 * Uploaded tests of one kind, newest first: a line each, its link, a demo mark, the kind's
 * figures, then the file, uploader and date. With none, the `empty` note instead.
 */
export function UploadedTestList<T extends UploadedTestRecord>({
  tests,
  testIds,
  empty,
  name,
  href,
  figures,
}: {
  tests: T[];
  testIds: { list: string; empty: string };
  empty: ReactNode;
  /** the link's words before "#id" */
  name: string;
  href: (test: T) => string;
  figures: (test: T) => ReactNode;
}) {
  if (tests.length === 0) {
    return (
      <p
        className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-6 text-sm text-stone-600"
        data-testid={testIds.empty}
      >
        {empty}
      </p>
    );
  }
  return (
    <ul
      className="divide-y divide-stone-200 rounded-lg border border-stone-200 bg-white"
      data-testid={testIds.list}
    >
      {tests.map((t) => (
        <li key={t.id} className="flex flex-wrap items-baseline gap-x-4 gap-y-1 px-3 py-2 text-sm">
          <Link
            href={href(t)}
            className="font-medium text-leaf-700 underline-offset-2 hover:underline"
          >
            {name} #{t.id}: {t.cultivar.commodityName} — {t.cultivar.name}
          </Link>
          {t.isDemo ? (
            <span className="rounded bg-clay-50 px-1.5 text-xs text-clay-700">demo</span>
          ) : null}
          {figures(t)}
          <span className="text-stone-500 wrap-anywhere">
            {t.fileName} · {t.uploadedBy.name} · {dateText(t.createdAt)}
          </span>
        </li>
      ))}
    </ul>
  );
}
