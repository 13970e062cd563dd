'use client';

import { useState } from 'react';
import type { StackCheckResult } from '@/lib/checks/stack/check';
import { CultivarSelect, type CultivarOption } from './check-fields';
import {
  CheckFormError,
  FRUIT_FIELDS,
  FruitFieldset,
  MeasureFields,
  type FieldSpec,
} from './measure-fields';
import { MarginPanel } from './margin-panel';
import { SaveAssessment } from './save-assessment';
import { StackCharts } from './stack-charts';
import { CheckWarnings, UsedValues } from './used-values';
import { siFields, useCheck } from './use-check';
import { initialText } from './initial-text';
import { useUnits } from '@/components/units/units-provider';

const BIN_FIELDS: readonly FieldSpec[] = [
  ['binLengthMm', 'Bin inside length'],
  ['binWidthMm', 'Bin inside width'],
  ['fillDepthMm', 'Fill depth'],
  ['bulkDensityKgM3', 'Bulk density', 'empty: published, else 60 % of the fruit density'],
  [
    'wallFriction',
    'Wall friction coefficient',
    'empty: published (plywood or wood), else 0.4 typical',
  ],
  ['lateralRatio', 'Lateral pressure ratio K', 'empty: published, else 0.4 typical'],
];

export function StackCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const units = useUnits();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [text, setText] = useState<Record<string, string>>(() =>
    initialText(
      {
        binLengthMm: '1200',
        binWidthMm: '1000',
        fillDepthMm: '600',
      },
      units.toDisplay,
    ),
  );
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    ...(cultivar && { cultivar }),
    ...siFields(text, units.fromDisplay),
  };
  const { result, pending, message, fieldErrors } = useCheck<StackCheckResult>(
    '/api/checks/stack',
    body,
  );
  const fields = { text, set, fieldErrors };
  const option = cultivars.find((o) => o.slug === cultivar);
  const used = result?.inputs_used;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
      <form className="space-y-3" onSubmit={(e) => e.preventDefault()} aria-label="Stack inputs">
        <CultivarSelect
          options={cultivars}
          value={cultivar}
          onChange={setCultivar}
          errors={fieldErrors.cultivar}
        />
        <MeasureFields fields={BIN_FIELDS} state={fields} />
        <FruitFieldset fields={FRUIT_FIELDS} state={fields} option={option} />
        <CheckFormError message={message} />
      </form>
      <div className="min-w-0 space-y-5">
        <MarginPanel
          hasResult={Boolean(result)}
          margin={result?.margin ?? null}
          pending={pending}
          basis="Static bruise threshold ÷ Hertz contact pressure between two bottom-layer fruit."
        />
        {result ? (
          <>
            <CheckWarnings warnings={result.warnings} />
            <p className="text-sm" data-testid="deepest-safe">
              Deepest safe fill:{' '}
              <strong className="num">
                {result.deepest_safe_fill_mm === undefined
                  ? 'needs a threshold'
                  : result.deepest_safe_fill_mm === null
                    ? 'any depth (the bin pressure levels off below the limit)'
                    : units.show(result.deepest_safe_fill_mm, 'mm')}
              </strong>
            </p>
            <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
              {[
                [
                  'Bin pressure at the bottom',
                  units.show(result.bottom.vertical_pressure_kpa, 'kPa'),
                ],
                ['Load on one contact', units.show(result.bottom.contact_force_n, 'N')],
                ['Contact radius', units.show(result.bottom.contact_radius_mm, 'mm')],
                ['Contact pressure', units.show(result.bottom.contact_pressure_kpa, 'kPa')],
              ].map(([k, v]) => (
                <div key={k} className="rounded-md border border-stone-200 bg-white p-2">
                  <dt className="text-xs text-stone-600">{k}</dt>
                  <dd className="num">{v}</dd>
                </div>
              ))}
            </dl>
            <StackCharts
              series={result.series}
              depthMm={result.inputs_used.fill_depth_mm}
              safeMm={result.deepest_safe_fill_mm}
            />
          </>
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
              ['Bulk density', used.bulk_density_kg_m3],
              ['Wall friction', used.wall_friction],
              ['Lateral pressure ratio', used.lateral_pressure_ratio],
            ]}
          />
        ) : null}
        <SaveAssessment check="stack" inputs={body} disabled={!result} />
      </div>
    </div>
  );
}
