'use client';

import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { useUnits } from '@/components/units/units-provider';

const COLOURS = ['#2f5f2c', '#8a4b16', '#1d4ed8', '#7c3aed', '#be123c', '#0f766e'];
const tick = (v: number) => String(Number(v.toPrecision(3)));

export interface CompareSeries {
  name: string;
  points: { x: number; y: number }[];
}

/** Several assessments' curves on one chart, in the reader's units. */
export function CompareChart({
  title,
  series,
  x,
  y,
  testId,
}: {
  title: string;
  series: CompareSeries[];
  x: [string, string];
  y: [string, string];
  testId: string;
}) {
  const u = useUnits();
  const label = (name: string, si: string) => (si === '–' ? name : `${name} (${u.unit(si)})`);
  return (
    <figure className="rounded-lg border border-stone-200 bg-white p-2" data-testid={testId}>
      <figcaption className="px-1 text-sm font-medium">{title}</figcaption>
      <div className="h-64 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart margin={{ top: 8, right: 12, bottom: 22, left: 4 }}>
            <CartesianGrid stroke="#e7e5e4" />
            <XAxis
              dataKey="x"
              type="number"
              domain={['dataMin', 'dataMax']}
              tickFormatter={tick}
              allowDuplicatedCategory={false}
              label={{ value: label(x[0], x[1]), position: 'insideBottom', offset: -10 }}
            />
            <YAxis
              width={64}
              tickFormatter={tick}
              label={{ value: label(y[0], y[1]), angle: -90, position: 'insideLeft' }}
            />
            <Tooltip formatter={(v) => tick(Number(v))} labelFormatter={(v) => tick(Number(v))} />
            <Legend verticalAlign="top" />
            {series.map((s, i) => (
              <Line
                key={s.name}
                name={s.name}
                data={s.points.map((p) => ({
                  x: u.toDisplay(p.x, x[1]),
                  y: u.toDisplay(p.y, y[1]),
                }))}
                dataKey="y"
                stroke={COLOURS[i % COLOURS.length]}
                dot={false}
                isAnimationActive={false}
              />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </figure>
  );
}
