'use client';

import {
  CartesianGrid,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { useUnits } from '@/components/units/units-provider';
import type { ChartSpec } from '@/lib/checks/report';
import { niceTicks } from '@/lib/reports/nice-ticks';

const COLOURS = ['#2f5f2c', '#8a4b16', '#1d4ed8', '#7c3aed', '#be123c', '#0f766e'];
const tick = (v: number) => String(Number(v.toPrecision(3)));

/**
 * Any chart a check describes (see ChartSpec), in the reader's units: the report view and the
 * comparison draw every check's curves with this one frame.
 */
export function ChartFrame({ spec, testId }: { spec: ChartSpec; testId?: string }) {
  const u = useUnits();
  const label = (a: ChartSpec['x']) =>
    a.unit === '–' ? a.label : `${a.label} (${u.unit(a.unit)})`;
  // Round ticks in the reader's units (Heckbert's nice numbers, as the PDF): over the data and
  // the markers, the y axis from zero.
  const marks = spec.markers ?? [];
  const xs = [
    ...spec.series.flatMap((s) => s.points.map((p) => p[0])),
    ...marks.flatMap((m) => (m.x !== undefined ? [m.x] : [])),
  ].map((v) => u.toDisplay(v, spec.x.unit));
  const ys = [
    0,
    ...spec.series.flatMap((s) => s.points.map((p) => p[1])),
    ...marks.flatMap((m) => (m.y !== undefined ? [m.y] : [])),
  ].map((v) => u.toDisplay(v, spec.y.unit));
  const xAxis = niceTicks(Math.min(...xs), Math.max(...xs));
  const yAxis = niceTicks(Math.min(...ys), Math.max(...ys));
  return (
    <figure
      className="rounded-lg border border-stone-200 bg-white p-2"
      data-testid={testId ?? `chart-${spec.id}`}
    >
      <figcaption className="px-1 text-sm font-medium">{spec.title}</figcaption>
      {/* The y axis's title above the plot, level: a rotated title was clipped on short plots. */}
      <p className="px-1 text-xs text-stone-600">{label(spec.y)}</p>
      <div className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 8, right: 12, bottom: 22, left: 4 }}>
            <CartesianGrid stroke="#e7e5e4" />
            <XAxis
              dataKey="x"
              type="number"
              domain={[xAxis.min, xAxis.max]}
              ticks={xAxis.ticks}
              tickFormatter={tick}
              allowDuplicatedCategory={false}
              label={{ value: label(spec.x), position: 'insideBottom', offset: -10 }}
            />
            <YAxis
              width={52}
              domain={[yAxis.min, yAxis.max]}
              ticks={yAxis.ticks}
              tickFormatter={tick}
            />
            <Tooltip formatter={(v) => tick(Number(v))} labelFormatter={(v) => tick(Number(v))} />
            {spec.series.map((s, i) => (
              <Line
                key={s.label}
                name={s.label}
                data={s.points.map(([x, y]) => ({
                  x: u.toDisplay(x, spec.x.unit),
                  y: u.toDisplay(y, spec.y.unit),
                }))}
                dataKey="y"
                stroke={COLOURS[i % COLOURS.length]}
                dot={false}
                isAnimationActive={false}
              />
            ))}
            {(spec.markers ?? []).map((m) => (
              <ReferenceLine
                key={m.label}
                {...(m.x !== undefined
                  ? { x: u.toDisplay(m.x, spec.x.unit) }
                  : { y: u.toDisplay(m.y, spec.y.unit) })}
                className={`marker-${m.label.replace(/\W+/g, '-')}`}
                stroke={m.x !== undefined ? '#57534e' : '#b91c1c'}
                // A threshold line is drawn even when the curves stay below it.
                ifOverflow="extendDomain"
                strokeDasharray="4 4"
                // Beside the line, not over it: right of a vertical line, above a level one.
                label={{
                  value: m.label,
                  position: m.x !== undefined ? 'right' : 'insideBottomRight',
                  fontSize: 11,
                  fill: '#44403c',
                }}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
      {/* The series named below the plot, wrapping as the width asks (many on a comparison). */}
      {spec.series.length > 0 ? (
        <ul className="flex flex-wrap gap-x-3 gap-y-0.5 px-1 text-xs text-stone-700">
          {spec.series.map((s, i) => (
            <li key={s.label} className="flex items-center gap-1">
              <span
                aria-hidden
                className="inline-block h-0.5 w-4"
                style={{ background: COLOURS[i % COLOURS.length] }}
              />
              {s.label}
            </li>
          ))}
        </ul>
      ) : null}
    </figure>
  );
}
