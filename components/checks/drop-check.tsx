'use client';

import { useState } from 'react';
import type { DropCheckResult } from '@/lib/checks/drop/check';
import { DROP_SURFACE_KEYS, DROP_SURFACES, type DropSurface } from '@/lib/checks/surfaces';
import { CultivarSelect, type CultivarOption } from './check-fields';
import {
  CheckFormError,
  FRUIT_FIELDS,
  FruitFieldset,
  MeasureFields,
  type FieldSpec,
} from './measure-fields';
import { DropCharts } from './drop-charts';
import { MarginPanel } from './margin-panel';
import { SaveAssessment } from './save-assessment';
import { CheckWarnings, UsedValues } from './used-values';
import { siFields, useCheck } from './use-check';
import { initialText } from './initial-text';
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
  const units = useUnits();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [surface, setSurface] = useState<DropSurface>('steel');
  const [text, setText] = useState<Record<string, string>>(() =>
    initialText(
      {
        heightMm: '150',
        padModulusMpa: '0.5',
        padThicknessMm: '25',
      },
      units.toDisplay,
    ),
  );
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    surface,
    ...(cultivar && { cultivar }),
    ...siFields(text, units.fromDisplay, (key) => !key.startsWith('pad') || surface === 'foam'),
  };
  const { result, pending, message, fieldErrors } = useCheck<DropCheckResult>(
    '/api/checks/drop',
    body,
  );
  const fields = { text, set, fieldErrors };
  const option = cultivars.find((o) => o.slug === cultivar);
  const used = result?.inputs_used;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
      <form className="space-y-3" onSubmit={(e) => e.preventDefault()} aria-label="Drop inputs">
        <CultivarSelect
          options={cultivars}
          value={cultivar}
          onChange={setCultivar}
          errors={fieldErrors.cultivar}
        />
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
        <FruitFieldset fields={FRUIT_FIELDS} state={fields} option={option} />
        <CheckFormError message={message} />
      </form>
      <div className="min-w-0 space-y-5">
        <MarginPanel
          hasResult={Boolean(result)}
          margin={result?.margin ?? null}
          pending={pending}
          basis={
            result?.margin?.basis === 'dynamic'
              ? `Published dynamic threshold: ${result.dynamic?.basis} (${result.dynamic?.source ?? 'no source'}) ÷ this drop.`
              : 'Static threshold ÷ elastic Hertz peak pressure — far stricter than drop tests (see below).'
          }
        />
        {result ? (
          <DropFigures result={result} />
        ) : (
          <p className="text-sm text-stone-600">Enter the inputs to see the result.</p>
        )}
        {used ? (
          <UsedValues
            rows={[
              ["Young's modulus", used.modulus_mpa],
              ["Poisson's ratio", used.poisson_ratio],
              ['Diameter', used.diameter_mm],
              ['Mass', used.mass_g],
              ['Static bruise threshold', used.static_bruise_threshold_kpa],
            ]}
          />
        ) : null}
        <SaveAssessment check="drop" inputs={body} disabled={!result} />
      </div>
    </div>
  );
}

function DropFigures({ result }: { result: DropCheckResult }) {
  const { show } = useUnits();
  const i = result.impact;
  return (
    <>
      <CheckWarnings warnings={result.warnings} />
      <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-3" data-testid="drop-figures">
        {[
          ['Impact speed', show(i.impact_velocity_m_s, 'm/s')],
          ['Impact energy', show(i.impact_energy_j, 'J')],
          ['Peak force', show(i.peak_force_n, 'N')],
          ['Contact radius', show(i.contact_radius_mm, 'mm')],
          ['Peak pressure', show(i.peak_pressure_kpa, 'kPa')],
          ['Contact time', show(i.contact_time_ms, 'ms')],
        ].map(([k, v]) => (
          <div key={k} className="rounded-md border border-stone-200 bg-white p-2">
            <dt className="text-xs text-stone-600">{k}</dt>
            <dd className="num">{v}</dd>
          </div>
        ))}
      </dl>
      {result.static ? (
        <p className="text-sm text-stone-700">
          Secondary, stricter figure: static threshold {show(result.static.threshold_kpa, 'kPa')} ÷
          elastic peak pressure = margin <span className="num">{result.static.margin}</span>.
          Elastic Hertz with the tissue&apos;s static strength ignores that flesh is stiffer and
          stronger at impact rates, that the skin spreads the load and that bruising starts below
          the surface; measured drop thresholds are far higher, so this figure is a conservative
          bound, not the verdict.
        </p>
      ) : null}
      <DropCharts
        series={result.series}
        heightMm={result.inputs_used.height_mm}
        thresholdKpa={result.static?.threshold_kpa ?? null}
      />
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
            <th className="py-1">From the static threshold (elastic, stricter)</th>
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
                      {r.dynamic_basis}
                      {r.dynamic_source ? ` — ${r.dynamic_source}` : ''}
                    </span>
                  </>
                )}
              </td>
              <td className="num py-1">
                {r.static_safe_height_mm === null ? '—' : show(r.static_safe_height_mm, 'mm')}
              </td>
            </tr>
          ))}
        </tbody>
      </table>
    </div>
  );
}
