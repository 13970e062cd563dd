'use client';

import { TextInUnits } from '@/components/units/text-in-units';
import { ph } from '@/lib/phrase';

import type { DropCheckResult } from '@/lib/checks/drop/check';
import { DROP_SURFACE_KEYS, DROP_SURFACES, type DropSurface } from '@/lib/checks/surfaces';
import type { CultivarOption } from './check-fields';
import { CheckForm, MeasureFields, type FieldSpec } from './measure-fields';
import { dropDescriptor } from '@/lib/checks/drop/report';
import { CheckWorkbench } from './check-workbench';
import { useAddressChoice, useCheckForm } from './use-check-form';
import { useUnits } from '@/components/units/units-provider';

const PAD_FIELDS: readonly FieldSpec[] = [
  ['padModulusMpa', 'Padding modulus'],
  ['padThicknessMm', 'Padding thickness'],
];

export function DropCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const [surface, setSurface] = useAddressChoice<DropSurface>(
    'surface',
    DROP_SURFACE_KEYS,
    'steel',
  );
  const { cultivar, setCultivar, stage, setStage, grade, body, state, fields } =
    useCheckForm<DropCheckResult>({
      endpoint: '/api/checks/drop',
      initialCultivar,
      defaults: { heightMm: '150', padModulusMpa: '0.5', padThicknessMm: '25' },
      choices: { surface },
      keep: (key) => !key.startsWith('pad') || surface === 'foam',
    });
  const form = (
    <CheckForm
      label="Drop inputs"
      cultivars={cultivars}
      cultivar={cultivar}
      setCultivar={setCultivar}
      stage={stage}
      setStage={setStage}
      grade={grade}
      fields={fields}
      message={state.message}
    >
      <MeasureFields fields={[['heightMm', 'Drop height']]} state={fields} />
      <div className="space-y-1">
        <label htmlFor="drop-surface" className="block text-sm font-medium">
          Surface
        </label>
        <select
          id="drop-surface"
          value={surface}
          onChange={(e) => setSurface(e.target.value as DropSurface)}
          className="rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm"
        >
          {DROP_SURFACE_KEYS.map((s) => (
            <option key={s} value={s}>
              {DROP_SURFACES[s].label}
            </option>
          ))}
        </select>
        <p className="text-xs text-stone-500">{DROP_SURFACES[surface].basis}</p>
      </div>
      {surface === 'foam' ? <MeasureFields fields={PAD_FIELDS} state={fields} /> : null}
    </CheckForm>
  );
  return (
    <CheckWorkbench
      check="drop"
      descriptor={dropDescriptor}
      state={state}
      body={body}
      form={form}
      figuresTestId="drop-figures"
      basis={(r) =>
        ph`${
          r?.margin?.basis === 'dynamic'
            ? ph`Published dynamic threshold: ${r.dynamic?.basis ?? ''} (${r.dynamic?.source ?? 'no source'}) ÷ this drop.`
            : 'Static threshold ÷ elastic Hertz peak pressure — an estimate, tested below against this fruit’s published drop figures.'
        }${r?.relation ? ph` ${r.relation}` : ''}`
      }
      extras={(r) => <DropExtras result={r} />}
    />
  );
}

/** What only the drop check shows: the elastic estimate in words, and safe heights. */
function DropExtras({ result }: { result: DropCheckResult }) {
  const { show } = useUnits();
  return (
    <>
      {result.static ? (
        <p className="text-sm text-stone-700">
          Elastic estimate: static threshold {show(result.static.threshold_kpa, 'kPa')} ÷ elastic
          peak pressure = margin <span className="num">{result.static.margin}</span>. Elastic Hertz
          with the tissue&apos;s static strength ignores that flesh is stiffer and stronger at
          impact rates, that the skin spreads the load and that bruising starts below the surface;
          against published drop tests it has run both far below and well above them — see how far
          to trust the checks.
        </p>
      ) : null}
      {result.relation ? (
        <p className="text-sm text-stone-700" data-testid="drop-relation">
          <TextInUnits text={result.relation} />
        </p>
      ) : null}
      <SafeHeights rows={result.safe_heights} />
    </>
  );
}

function SafeHeights({ rows }: { rows: DropCheckResult['safe_heights'] }) {
  const { show } = useUnits();
  return (
    <div className="overflow-x-auto">
      <table className="w-full text-left text-sm" data-testid="safe-heights">
        <caption className="mb-1 text-left text-xs font-medium uppercase tracking-wide text-stone-600">
          Largest safe drop height per surface
        </caption>
        <thead className="text-xs text-stone-600">
          <tr>
            <th className="py-1 pr-2">Surface</th>
            <th className="py-1 pr-2">From the published drop threshold</th>
            <th className="py-1 pr-2">No bruise, elastic estimate from the static threshold</th>
            <th className="py-1">Bruise within the grade (Hertz field)</th>
          </tr>
        </thead>
        <tbody>
          {rows.map((r) => (
            <tr key={r.surface} className="border-t border-stone-200 align-top">
              <td className="py-1 pr-2">{r.label}</td>
              <td className="py-1 pr-2">
                {r.dynamic_safe_height_mm === null ? (
                  <span className="text-stone-500">no published value</span>
                ) : (
                  <>
                    <span className="num">{show(r.dynamic_safe_height_mm, 'mm')}</span>
                    <span className="block text-xs text-stone-500">
                      {r.dynamic_basis === null ? null : <TextInUnits text={r.dynamic_basis} />}
                      {r.dynamic_source ? ` — ${r.dynamic_source}` : ''}
                    </span>
                  </>
                )}
              </td>
              <td className="num py-1 pr-2">
                {r.static_safe_height_mm === null ? '—' : show(r.static_safe_height_mm, 'mm')}
              </td>
              <td className="num py-1">
                {r.within_tolerance_height_mm == null
                  ? '—'
                  : show(r.within_tolerance_height_mm, 'mm')}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
