import Link from 'next/link';
import type { GapCell, GapRow } from '@/lib/checks/gaps';
import { cellSentence, cellWord, RUNG_TONE } from './rung-words';
import { START_DRAFT_FORM } from './start-draft-target';

const CELL = 'block w-full whitespace-nowrap px-2 py-1.5 text-left text-xs font-medium';

/** One cell: the rung in words; opens the actor's draft of the record, or starts one. */
function Cell({ row, figure, cell, draftId }: Props & { figure: string; cell: GapCell }) {
  const sentence = cellSentence(cell, row.isCommodityRecord);
  const does = draftId ? 'open your draft' : 'start a draft';
  const label = `${row.name}, ${figure}: ${cellWord(cell)}. ${sentence} Used by ${cell.checks.join(', ')}; ${does}.`;
  const style = `${CELL} ${RUNG_TONE[cell.rung]} underline-offset-2 hover:underline focus-visible:outline-2 focus-visible:outline-leaf-600`;
  return (
    <td className="border-b border-stone-200 p-0" data-rung={cell.rung}>
      {draftId ? (
        <Link
          href={`/editor/revisions/${draftId}`}
          className={style}
          title={sentence}
          aria-label={label}
        >
          {cellWord(cell)}
        </Link>
      ) : (
        <button
          type="submit"
          form={START_DRAFT_FORM}
          name="cultivar"
          value={row.slug}
          className={`${style} cursor-pointer`}
          title={sentence}
          aria-label={label}
        >
          {cellWord(cell)}
        </button>
      )}
    </td>
  );
}

interface Props {
  row: GapRow;
  draftId: number | undefined;
}

/**
 * Records × figures, each cell the rung the checks take that figure from. The table scrolls
 * sideways inside its own box on a narrow screen; the record column stays in view.
 */
export function GapMatrix({
  figures,
  rows,
  drafts,
}: {
  figures: string[];
  rows: GapRow[];
  drafts: Map<string, number>;
}) {
  if (!rows.length)
    return <p className="text-sm text-stone-600">No record matches these filters.</p>;
  return (
    <div
      className="max-w-full overflow-x-auto rounded-md border border-stone-200"
      data-testid="gap-matrix"
      tabIndex={0}
      role="region"
      aria-label="Data gaps by record and figure (scrolls sideways)"
    >
      <table className="min-w-max border-collapse text-sm">
        <thead className="bg-stone-50 text-left text-xs text-stone-700">
          <tr>
            <th scope="col" className="sticky left-0 z-10 bg-stone-50 px-2 py-2 font-semibold">
              Record
            </th>
            <th scope="col" className="px-2 py-2 font-semibold">
              Own
            </th>
            {figures.map((f) => (
              <th key={f} scope="col" className="max-w-28 px-2 py-2 align-bottom font-semibold">
                {f}
              </th>
            ))}
          </tr>
        </thead>
        <tbody>
          {rows.map((row) => (
            <tr key={row.slug} data-testid={`gap-row-${row.slug}`}>
              <th
                scope="row"
                className="sticky left-0 z-10 max-w-44 border-b border-stone-200 bg-white px-2 py-1.5 text-left font-normal"
              >
                <span className="block text-xs text-stone-500">{row.commodity}</span>
                <span className="font-medium text-stone-900">
                  {row.isCommodityRecord ? 'Commodity record' : row.name}
                </span>
              </th>
              <td className="border-b border-stone-200 px-2 py-1.5 text-right tabular-nums">
                {row.ownCount}
              </td>
              {figures.map((f) =>
                row.cells[f] ? (
                  <Cell
                    key={f}
                    row={row}
                    figure={f}
                    cell={row.cells[f]}
                    draftId={drafts.get(row.slug)}
                  />
                ) : (
                  <td key={f} className="border-b border-stone-200 px-2 text-xs text-stone-500">
                    not used
                  </td>
                ),
              )}
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
