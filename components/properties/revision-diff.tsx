import type { SourceRef } from '@/lib/properties/records';
import { type DiffRow, type DiffValue } from '@/lib/properties/diff';
import { shortCitation } from '@/lib/properties/table-rows';
import { ValueText } from '@/components/units/value-text';

const ROW_TONE: Record<DiffRow['change'], string> = {
  added: 'bg-leaf-50',
  removed: 'bg-red-50',
  changed: 'bg-clay-50',
  same: 'text-stone-500',
};
const CHANGE_TONE: Record<DiffRow['change'], string> = {
  added: 'text-leaf-700',
  removed: 'text-red-800',
  changed: 'text-clay-700',
  same: 'text-stone-500',
};
const CHANGE_WORDS: Record<DiffRow['change'], string> = {
  added: 'added',
  removed: 'removed',
  changed: 'changed',
  same: 'unchanged',
};

type Sources = Record<string, SourceRef>;

function Values({
  values,
  sources,
  mark,
}: {
  values: DiffValue[];
  sources: Sources;
  mark?: 'old' | 'new';
}) {
  if (!values.length) return <span className="text-stone-400">no value</span>;
  return (
    <ul className="space-y-1">
      {values.map((v, i) => {
        const text = (
          <span className="num">
            <ValueText value={v} />
          </span>
        );
        return (
          <li key={i}>
            {mark === 'old' ? (
              <del className="text-red-800 decoration-red-700">{text}</del>
            ) : mark === 'new' ? (
              <ins className="font-semibold text-leaf-900 no-underline">{text}</ins>
            ) : (
              text
            )}
            <span className="block text-xs text-stone-500">
              {v.sourceKey
                ? shortCitation(sources[v.sourceKey] ?? null)
                : 'no source (typical default)'}
            </span>
          </li>
        );
      })}
    </ul>
  );
}

function DiffTable({
  rows,
  sources,
  before,
  after,
}: {
  rows: DiffRow[];
  sources: Sources;
  before: string;
  after: string;
}) {
  return (
    <div className="relative max-w-full overflow-x-auto rounded-lg border border-stone-200 bg-white">
      <table className="w-full text-left text-sm">
        <thead className="bg-stone-100 text-xs text-stone-700">
          <tr>
            <th scope="col" className="px-2 py-2 sm:px-3">
              Quantity
            </th>
            <th scope="col" className="px-2 py-2 sm:px-3">
              {before}
            </th>
            <th scope="col" className="px-2 py-2 sm:px-3">
              <span aria-hidden="true">→ </span>
              {after}
            </th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => {
            const marked = r.change !== 'same';
            return (
              <tr
                key={`${r.quantity}-${r.variant}`}
                className={`border-t border-stone-200 align-top ${ROW_TONE[r.change]}`}
                data-testid="diff-row"
                data-change={r.change}
              >
                <th scope="row" className="px-2 py-2 font-medium sm:px-3">
                  {r.label}
                  <span className={`mt-0.5 block text-xs font-normal ${CHANGE_TONE[r.change]}`}>
                    {CHANGE_WORDS[r.change]}
                  </span>
                </th>
                <td className="px-2 py-2 sm:px-3">
                  <Values values={r.before} sources={sources} mark={marked ? 'old' : undefined} />
                </td>
                <td className="px-2 py-2 sm:px-3">
                  <Values values={r.after} sources={sources} mark={marked ? 'new' : undefined} />
                </td>
              </tr>
            );
          })}
        </tbody>
      </table>
    </div>
  );
}

/** The changed values first, highlighted old → new with their sources; the unchanged folded away. */
export function RevisionDiff({
  rows,
  sources,
  before,
  after,
}: {
  rows: DiffRow[];
  sources: Sources;
  before: string;
  after: string;
}) {
  const changed = rows.filter((r) => r.change !== 'same');
  const same = rows.filter((r) => r.change === 'same');
  const count = (c: DiffRow['change']) => rows.filter((r) => r.change === c).length;
  return (
    <div className="space-y-4" data-testid="revision-diff">
      <p className="text-sm text-stone-700" data-testid="diff-summary">
        <span className="num">{count('changed')}</span> changed,{' '}
        <span className="num">{count('added')}</span> added,{' '}
        <span className="num">{count('removed')}</span> removed,{' '}
        <span className="num">{same.length}</span> unchanged (values, spreads and sources are
        compared; a change of conditions alone is not listed).
      </p>
      {changed.length ? (
        <DiffTable rows={changed} sources={sources} before={before} after={after} />
      ) : (
        <p className="rounded-md border border-dashed border-stone-300 bg-white px-4 py-4 text-sm text-stone-600">
          No value differs between these revisions.
        </p>
      )}
      {same.length ? (
        <details className="group">
          <summary className="cursor-pointer text-sm font-medium text-leaf-700">
            Show the <span className="num">{same.length}</span> unchanged value
            {same.length === 1 ? '' : 's'}
          </summary>
          <div className="mt-2">
            <DiffTable rows={same} sources={sources} before={before} after={after} />
          </div>
        </details>
      ) : null}
    </div>
  );
}
