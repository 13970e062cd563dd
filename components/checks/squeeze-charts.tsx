'use client';

import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceDot,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { useUnits } from '@/components/units/units-provider';
import type { SqueezeCheckResult } from '@/lib/checks/squeeze/check';

const tick = (v: number) => String(Number(v.toPrecision(3)));
type Row = Record<string, number | null>;

/** One small chart: x and y keys with their SI units, converted to the reader's units. */
function Chart({
  title,
  rows,
  x,
  y,
  mark,
  hLine,
  testId,
}: {
  title: string;
  rows: Row[];
  x: [string, string, string];
  y: [string, string, string];
  mark?: { x: number; y: number; label?: string } | null;
  hLine?: { y: number; label: string } | null;
  testId: string;
}) {
  const u = useUnits();
  const data = rows.map((r) => ({
    x: r[x[0]] === null ? null : u.toDisplay(r[x[0]] as number, x[1]),
    y: r[y[0]] === null ? null : u.toDisplay(r[y[0]] as number, y[1]),
  }));
  const label = (name: string, si: string) => (si === '–' ? name : `${name} (${u.unit(si)})`);
  return (
    <figure className="rounded-lg border border-stone-200 bg-white p-2" data-testid={testId}>
      <figcaption className="px-1 text-sm font-medium">{title}</figcaption>
      <div className="h-56 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data} margin={{ top: 8, right: 12, bottom: 22, left: 4 }}>
            <CartesianGrid stroke="#e7e5e4" />
            <XAxis
              dataKey="x"
              type="number"
              domain={['dataMin', 'dataMax']}
              tickFormatter={tick}
              label={{ value: label(x[2], x[1]), position: 'insideBottom', offset: -10 }}
            />
            <YAxis
              width={64}
              tickFormatter={tick}
              label={{ value: label(y[2], y[1]), angle: -90, position: 'insideLeft' }}
            />
            <Tooltip formatter={(v) => tick(Number(v))} labelFormatter={(v) => tick(Number(v))} />
            <Line dataKey="y" stroke="#2f5f2c" dot={false} isAnimationActive={false} connectNulls />
            {hLine ? (
              <ReferenceLine
                y={u.toDisplay(hLine.y, y[1])}
                stroke="#b91c1c"
                strokeDasharray="3 3"
                label={hLine.label}
              />
            ) : null}
            {mark ? (
              <ReferenceDot
                x={u.toDisplay(mark.x, x[1])}
                y={u.toDisplay(mark.y, y[1])}
                r={5}
                fill="#8a4b16"
                stroke="none"
                label="grip"
              />
            ) : null}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}

/** Force, lift ratio, pressure at the grip, subsurface shear and the pad sweep. */
export function SqueezeCharts({ result }: { result: SqueezeCheckResult }) {
  const steps = result.model.steps as unknown as Row[];
  const grip = result.model.liftability?.grip as unknown as Row | null;
  const threshold = result.inputs_used.static_bruise_threshold_kpa?.value ?? null;
  const at = (key: string) =>
    grip && grip.travel_per_pad_mm !== null && grip[key] !== null
      ? { x: grip.travel_per_pad_mm as number, y: grip[key] as number }
      : null;
  const sweep = result.sweep?.points as unknown as Row[] | undefined;
  return (
    <div className="grid gap-3 md:grid-cols-2">
      <Chart
        testId="chart-force"
        title="Pad force against travel"
        rows={steps}
        x={['travel_per_pad_mm', 'mm', 'travel per pad']}
        y={['force_n', 'N', 'force']}
        mark={at('force_n')}
      />
      <Chart
        testId="chart-lift"
        title="Lift ratio against travel (1 = lifts)"
        rows={steps}
        x={['travel_per_pad_mm', 'mm', 'travel per pad']}
        y={['lift_ratio', '–', 'lift ratio']}
        mark={at('lift_ratio')}
        hLine={{ y: 1, label: 'lifts' }}
      />
      {result.grip_profile ? (
        <Chart
          testId="chart-profile"
          title="Contact pressure across the pad at the grip point"
          rows={result.grip_profile as unknown as Row[]}
          x={['r_mm', 'mm', 'radius']}
          y={['pressure_kpa', 'kPa', 'pressure']}
          hLine={threshold ? { y: threshold, label: 'bruise threshold' } : null}
        />
      ) : null}
      <Chart
        testId="chart-shear"
        title="Largest subsurface shear against travel"
        rows={steps}
        x={['travel_per_pad_mm', 'mm', 'travel per pad']}
        y={['max_shear_kpa', 'kPa', 'shear']}
        mark={at('max_shear_kpa')}
      />
      {sweep ? (
        <Chart
          testId="chart-sweep"
          title={`Bruise margin against pad diameter${result.sweep?.smallest_safe_pad_mm ? '' : ' (no pad in the sweep reaches 1)'}`}
          rows={sweep}
          x={['pad_diameter_mm', 'mm', 'pad diameter']}
          y={['bruise_margin', '–', 'margin']}
          hLine={{ y: 1, label: 'margin 1' }}
          mark={
            result.inputs_used.pad_diameter_mm && result.margin
              ? { x: result.inputs_used.pad_diameter_mm, y: result.margin.value, label: 'this pad' }
              : null
          }
        />
      ) : null}
    </div>
  );
}
