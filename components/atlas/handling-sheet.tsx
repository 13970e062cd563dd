import { formatDate } from '@/lib/dates';
import { MACHINERY_CAUTION, STANDING_CAUTION } from '@/lib/cautions';
import { shortCitation } from '@/lib/atlas/citations';
import { LINE_STAGES } from '@/lib/atlas/frontmatter';
import type { HandlingSheet as Sheet } from '@/lib/atlas/sheet';

function ValuesTable({ cultivar }: { cultivar: Sheet['cultivars'][number] }) {
  return (
    <table className="w-full border-collapse text-left text-xs">
      <caption className="pb-1 text-left text-sm font-semibold text-stone-800">
        {cultivar.name}
        <span className="font-normal text-stone-500">
          {cultivar.revision ? ` · revision ${cultivar.revision}` : ' · nothing published yet'}
        </span>
      </caption>
      <tbody>
        {cultivar.rows.map((row, i) => (
          <tr key={`${row.quantity}-${i}`} className="border-t border-stone-200">
            <th scope="row" className="w-2/5 py-1 pr-2 font-normal text-stone-600">
              {row.label}
            </th>
            <td className="py-1 pr-2 sm:whitespace-nowrap">
              {row.value ? (
                <span className="num">{row.value}</span>
              ) : (
                <span className="text-stone-400 italic">no published value</span>
              )}
            </td>
            <td className="py-1 text-stone-500">{row.citation ?? ''}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}

/** The one- or two-page sheet for line staff and buyers; its print layout is in print.css. */
export function HandlingSheet({ sheet }: { sheet: Sheet }) {
  const fm = sheet.article.frontmatter;
  return (
    <div
      className="handling-sheet mx-auto max-w-4xl bg-white p-4 sm:p-6"
      data-testid="handling-sheet"
    >
      <div className="border-b-2 border-leaf-700 pb-3">
        <p className="text-xs tracking-wide text-leaf-700 uppercase">Tenderline handling sheet</p>
        <h1 className="text-2xl font-semibold text-stone-900">{sheet.commodity.name}</h1>
        <p className="mt-1 text-sm text-stone-700">{fm.summary}</p>
        <p className="mt-2 text-xs text-stone-500">
          Updated {formatDate(fm.updated)} · most bruise-prone stage:{' '}
          <strong className="text-clay-700">{LINE_STAGES[fm.mostProneStage]}</strong>
        </p>
      </div>
      <section aria-labelledby="sheet-rules" className="mt-4">
        <h2 id="sheet-rules" className="text-base font-semibold text-stone-900">
          Handling rules along the line
        </h2>
        <ol className="mt-2 grid gap-x-6 gap-y-3 sm:grid-cols-2">
          {fm.handling.map((h, i) => (
            <li key={h.stage} className="text-sm">
              <p className="font-semibold text-stone-800">
                {i + 1}. {LINE_STAGES[h.stage]}
                {h.stage === fm.mostProneStage ? (
                  <span className="ml-1 text-xs font-normal text-clay-700">(most prone)</span>
                ) : null}
              </p>
              <ul className="mt-0.5 list-disc pl-5 text-stone-700">
                {h.rules.map((rule) => (
                  <li key={rule}>{rule}</li>
                ))}
              </ul>
            </li>
          ))}
        </ol>
      </section>
      <section aria-labelledby="sheet-values" className="mt-5">
        <h2 id="sheet-values" className="text-base font-semibold text-stone-900">
          Key published values
        </h2>
        <div className="mt-2 grid gap-4 lg:grid-cols-2">
          {sheet.cultivars.map((c) => (
            <ValuesTable key={c.slug} cultivar={c} />
          ))}
        </div>
      </section>
      <section
        aria-labelledby="sheet-caution"
        className="mt-5 rounded border border-clay-200 bg-clay-50 p-3 text-xs text-stone-800"
      >
        <h2 id="sheet-caution" className="text-sm font-semibold text-clay-700">
          Caution
        </h2>
        <p className="mt-1">{STANDING_CAUTION}</p>
        <p className="mt-1">{MACHINERY_CAUTION}</p>
      </section>
      <section aria-labelledby="sheet-sources" className="mt-4 text-xs text-stone-600">
        <h2 id="sheet-sources" className="text-sm font-semibold text-stone-800">
          Sources
        </h2>
        <ul className="mt-1 space-y-0.5">
          {sheet.sources.map((s) => (
            <li key={s.key}>
              {shortCitation(s)}: {s.title}
              {s.venue ? `, ${s.venue}` : ''}.
            </li>
          ))}
        </ul>
      </section>
    </div>
  );
}
