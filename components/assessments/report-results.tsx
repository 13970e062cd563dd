import { Fragment, type ReactNode } from 'react';
import { Measure } from '@/components/units/measure';
import { DropCharts } from '@/components/checks/drop-charts';
import { SlipMap } from '@/components/checks/slip-map';
import { SqueezeCharts } from '@/components/checks/squeeze-charts';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';
import { StackCharts } from '@/components/checks/stack-charts';
import { CheckWarnings, UsedValues, type UsedValueView } from '@/components/checks/used-values';
import type { DropCheckResult } from '@/lib/checks/drop/check';
import type { StackCheckResult } from '@/lib/checks/stack/check';

type Used = Record<string, UsedValueView | null | number | string>;
const LABELS: Record<string, string> = {
  modulus_mpa: "Young's modulus",
  poisson_ratio: "Poisson's ratio",
  diameter_mm: 'Diameter',
  mass_g: 'Mass',
  static_bruise_threshold_kpa: 'Static bruise threshold',
  bulk_density_kg_m3: 'Bulk density',
  density_kg_m3: 'Density',
  friction: 'Friction',
  failure_stress_kpa: 'Failure stress',
  wall_friction: 'Wall friction',
  lateral_pressure_ratio: 'Lateral pressure ratio',
};

function usedRows(used: Used): [string, UsedValueView | null][] {
  return Object.entries(LABELS)
    .filter(([key]) => key in used)
    .map(([key, label]) => [label, used[key] as UsedValueView | null]);
}

function Figures({ rows }: { rows: [string, ReactNode][] }) {
  return (
    <dl className="grid grid-cols-2 gap-3 text-sm sm:grid-cols-4">
      {rows.map(([k, v]) => (
        <div key={k} className="rounded-md border border-stone-200 bg-white p-2">
          <dt className="text-xs text-stone-600">{k}</dt>
          <dd className="num">{v}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The saved results of a check exactly as they were computed, with their charts. */
export function ReportResults({ check, results }: { check: string; results: unknown }) {
  if (check === 'drop') {
    const r = results as DropCheckResult;
    const i = r.impact;
    return (
      <div className="space-y-4">
        <CheckWarnings warnings={r.warnings} />
        <Figures
          rows={[
            [
              'Drop height',
              <Fragment key="f10">
                <Measure value={r.inputs_used.height_mm} unit="mm" /> onto {r.inputs_used.surface}
              </Fragment>,
            ],
            ['Impact energy', <Measure key="m1" value={i.impact_energy_j} unit="J" />],
            ['Peak force', <Measure key="m2" value={i.peak_force_n} unit="N" />],
            ['Peak pressure', <Measure key="m3" value={i.peak_pressure_kpa} unit="kPa" />],
            ['Contact radius', <Measure key="m4" value={i.contact_radius_mm} unit="mm" />],
            ['Contact time', <Measure key="m5" value={i.contact_time_ms} unit="ms" />],
            ['Impact speed', <Measure key="m6" value={i.impact_velocity_m_s} unit="m/s" />],
            ['Static margin (stricter)', r.static ? String(r.static.margin) : '—'],
          ]}
        />
        <DropCharts
          series={r.series}
          heightMm={r.inputs_used.height_mm}
          thresholdKpa={r.static?.threshold_kpa ?? null}
        />
        <UsedValues rows={usedRows(r.inputs_used as unknown as Used)} />
      </div>
    );
  }
  if (check === 'squeeze') {
    const r = results as SqueezeCheckResult;
    const g = r.model.liftability?.grip as Record<string, number | null> | null | undefined;
    return (
      <div className="space-y-4">
        <CheckWarnings warnings={r.warnings} />
        <Figures
          rows={[
            [
              'Grip force per pad',
              g?.force_n != null ? <Measure key="gf" value={g.force_n} unit="N" /> : 'not lifted',
            ],
            [
              'Travel per pad at the grip',
              g?.travel_per_pad_mm != null ? (
                <Measure key="gt" value={g.travel_per_pad_mm} unit="mm" />
              ) : (
                '—'
              ),
            ],
            [
              'Peak pressure at the grip',
              g?.peak_pressure_kpa != null ? (
                <Measure key="gp" value={g.peak_pressure_kpa} unit="kPa" />
              ) : (
                '—'
              ),
            ],
            [
              'Smallest safe pad in the sweep',
              r.sweep?.smallest_safe_pad_mm ? (
                <Measure key="sp" value={r.sweep.smallest_safe_pad_mm} unit="mm" />
              ) : (
                'none'
              ),
            ],
          ]}
        />
        <SqueezeCharts result={r} />
        {r.slip ? <SlipMap slip={r.slip} /> : null}
        <UsedValues rows={usedRows(r.inputs_used as unknown as Used)} />
      </div>
    );
  }
  const r = results as StackCheckResult;
  return (
    <div className="space-y-4">
      <CheckWarnings warnings={r.warnings} />
      <Figures
        rows={[
          [
            'Bin',
            <Fragment key="f11">
              <Measure value={r.inputs_used.bin_length_mm} unit="mm" /> ×{' '}
              <Measure value={r.inputs_used.bin_width_mm} unit="mm" />, filled{' '}
              <Measure value={r.inputs_used.fill_depth_mm} unit="mm" />
            </Fragment>,
          ],
          [
            'Bin pressure at the bottom',
            <Measure key="m7" value={r.bottom.vertical_pressure_kpa} unit="kPa" />,
          ],
          ['Load on one contact', <Measure key="m8" value={r.bottom.contact_force_n} unit="N" />],
          [
            'Contact pressure',
            <Measure key="m9" value={r.bottom.contact_pressure_kpa} unit="kPa" />,
          ],
          [
            'Deepest safe fill',
            r.deepest_safe_fill_mm === null ? (
              'any depth'
            ) : r.deepest_safe_fill_mm === undefined ? (
              'needs a threshold'
            ) : (
              <Measure value={r.deepest_safe_fill_mm} unit="mm" />
            ),
          ],
        ]}
      />
      <StackCharts
        series={r.series}
        depthMm={r.inputs_used.fill_depth_mm}
        safeMm={r.deepest_safe_fill_mm}
      />
      <UsedValues rows={usedRows(r.inputs_used as unknown as Used)} />
    </div>
  );
}
