'use client';

import { useState } from 'react';
import type { FacingPreset } from '@/lib/checks/facings';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';
import { useUnits } from '@/components/units/units-provider';
import type { CultivarOption } from './check-fields';
import { initialText } from './initial-text';
import { MarginPanel } from './margin-panel';
import { SaveAssessment } from './save-assessment';
import { SlipMap } from './slip-map';
import { SqueezeCharts } from './squeeze-charts';
import { SqueezeForm } from './squeeze-form';
import { SqueezeProbability } from './squeeze-probability';
import { siFields, useCheck } from './use-check';
import { CheckWarnings, UsedValues } from './used-values';

export function SqueezeCheck({
  cultivars,
  initialCultivar,
}: {
  cultivars: CultivarOption[];
  initialCultivar: string;
}) {
  const units = useUnits();
  const [cultivar, setCultivar] = useState(initialCultivar);
  const [facing, setFacing] = useState<FacingPreset>('rigid');
  const [text, setText] = useState<Record<string, string>>(() =>
    initialText(
      {
        padDiameterMm: '20',
        padEdgeMm: '2',
        safetyFactor: '2',
        accelerationMs2: '2',
        maxTravelMm: '2',
      },
      units.toDisplay,
    ),
  );
  const set = (key: string) => (value: string) => setText((t) => ({ ...t, [key]: value }));
  const body: Record<string, unknown> = {
    facing,
    ...(cultivar && { cultivar }),
    ...siFields(text, units.fromDisplay, (key) => !key.startsWith('facing') || facing === 'custom'),
  };
  const { result, pending, message, fieldErrors } = useCheck<SqueezeCheckResult>(
    '/api/checks/squeeze',
    body,
    500,
  );
  const grip = result?.model.liftability?.grip;
  return (
    <div className="grid gap-6 lg:grid-cols-[minmax(0,20rem)_minmax(0,1fr)]">
      <SqueezeForm
        cultivars={cultivars}
        cultivar={cultivar}
        setCultivar={setCultivar}
        facing={facing}
        setFacing={setFacing}
        text={text}
        set={set}
        fieldErrors={fieldErrors}
        message={message}
      />
      <div className="min-w-0 space-y-5">
        <MarginPanel
          hasResult={Boolean(result)}
          margin={result?.margin ?? null}
          pending={pending}
          basis="Static bruise threshold ÷ peak contact pressure at the grip point (the least squeeze that lifts the fruit)."
        />
        {result ? (
          <>
            <CheckWarnings warnings={result.warnings} />
            <dl
              className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4"
              data-testid="squeeze-figures"
            >
              {[
                [
                  'Grip force per pad',
                  grip
                    ? units.show((grip as Record<string, unknown>).force_n as number, 'N')
                    : 'not lifted',
                ],
                [
                  'Travel per pad at the grip',
                  grip ? units.show(grip.travel_per_pad_mm as number, 'mm') : '—',
                ],
                [
                  'Peak pressure at the grip',
                  grip ? units.show(grip.peak_pressure_kpa as number, 'kPa') : '—',
                ],
                [
                  'Largest subsurface shear',
                  grip?.max_shear_kpa != null
                    ? units.show(grip.max_shear_kpa, 'kPa')
                    : (grip?.max_shear_unavailable ?? '—'),
                ],
                [
                  'Shear margin',
                  grip?.shear_margin != null ? String(grip.shear_margin) : 'no failure stress',
                ],
                [
                  'Smallest safe pad in the sweep',
                  result.sweep?.smallest_safe_pad_mm
                    ? units.show(result.sweep.smallest_safe_pad_mm, 'mm')
                    : 'none',
                ],
              ].map(([k, v]) => (
                <div key={k} className="rounded-md border border-stone-200 bg-white p-2">
                  <dt className="text-xs text-stone-600">{k}</dt>
                  <dd className="num">{v}</dd>
                </div>
              ))}
            </dl>
            {result.model.liftability?.grip_reason ? (
              <p className="text-sm text-amber-900">{result.model.liftability.grip_reason}</p>
            ) : null}
            <SqueezeCharts result={result} />
            {result.slip ? <SlipMap slip={result.slip} /> : null}
          </>
        ) : (
          <p className="text-sm text-stone-600">Enter the inputs to see the result.</p>
        )}
        <SqueezeProbability body={body} disabled={!result?.margin} />
        {result ? (
          <UsedValues
            rows={[
              ["Young's modulus", result.inputs_used.modulus_mpa],
              ["Poisson's ratio", result.inputs_used.poisson_ratio],
              ['Diameter', result.inputs_used.diameter_mm],
              ['Mass', result.inputs_used.mass_g],
              ['Density', result.inputs_used.density_kg_m3],
              ['Friction', result.inputs_used.friction],
              ['Static bruise threshold', result.inputs_used.static_bruise_threshold_kpa],
              ['Failure stress', result.inputs_used.failure_stress_kpa],
            ]}
          />
        ) : null}
        <SaveAssessment check="squeeze" inputs={body} disabled={!result} />
      </div>
    </div>
  );
}
