'use client';

import { useState } from 'react';
import type { StackCheckResult } from '@/lib/checks/stack';
import { CultivarSelect, MeasureField, publishedHint, type CultivarOption } from './check-fields';
import { MarginPanel } from './margin-panel';
import { SaveAssessment } from './save-assessment';
import { StackCharts } from './stack-charts';
import { CheckWarnings, UsedValues } from './used-values';
import { numberOrUndefined, useCheck } from './use-check';
import { initialText } from './initial-text';
import { FIELD_UNITS } from './field-units';
import { useUnits } from '@/components/units/units-provider';

const BIN_FIELDS = [
  ['binLengthMm', 'Bin inside length', 'mm', ''],
  ['binWidthMm', 'Bin inside width', 'mm', ''],
  ['fillDepthMm', 'Fill depth', 'mm', ''],
  ['bulkDensityKgM3', 'Bulk density', 'kg/m³', 'empty: published, else 60 % of the fruit density'],
  [
    'wallFriction',
    'Wall friction coefficient',
    '–',
    'empty: published (plywood or wood), else 0.4 typical',
  ],
  ['lateralRatio', 'Lateral pressure ratio K', '–', 'empty: published, else 0.4 typical'],
] as const;
const FRUIT_FIELDS = [
  ['modulusMpa', "Young's modulus", 'MPa'],
  ['poisson', "Poisson's ratio", '–'],
  ['diameterMm', 'Diameter', 'mm'],
  ['massG', 'Mass', 'g'],
  ['staticThresholdKpa', 'Static bruise threshold', 'kPa'],
] as const;

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
  const body: Record<string, unknown> = { ...(cultivar && { cultivar }) };
  for (const [key, value] of Object.entries(text))
    body[key] = numberOrUndefined(value, (v) => units.fromDisplay(v, FIELD_UNITS[key] ?? '–'));
  const { result, pending, message, fieldErrors } = useCheck<StackCheckResult>(
    '/api/checks/stack',
    body,
  );
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
        {BIN_FIELDS.map(([key, label, unit, hint]) => (
          <MeasureField
            key={key}
            label={label}
            unit={unit}
            hint={hint}
            value={text[key] ?? ''}
            onChange={set(key)}
            errors={fieldErrors[key]}
          />
        ))}
        <fieldset className="space-y-3 rounded-md border border-stone-200 p-3">
          <legend className="px-1 text-xs font-medium uppercase tracking-wide text-stone-600">
            Fruit {cultivar ? '(leave empty to use the published value)' : ''}
          </legend>
          {FRUIT_FIELDS.map(([key, label, unit]) => (
            <MeasureField
              key={key}
              label={label}
              unit={unit}
              value={text[key] ?? ''}
              onChange={set(key)}
              errors={fieldErrors[key]}
              placeholder={publishedHint(
                cultivars.find((o) => o.slug === cultivar),
                key,
                (v) => units.toDisplay(v, FIELD_UNITS[key] ?? '–'),
              )}
            />
          ))}
        </fieldset>
        {message ? (
          <p
            className="rounded-md bg-red-50 px-3 py-2 text-sm text-red-800"
            data-testid="form-error"
            aria-live="polite"
          >
            {message}
          </p>
        ) : null}
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
              depthMm={Number(text.fillDepthMm)}
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
