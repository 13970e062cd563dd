'use client';

import {
  CartesianGrid,
  Legend,
  Line,
  LineChart,
  ReferenceLine,
  ResponsiveContainer,
  Tooltip,
  XAxis,
  YAxis,
} from 'recharts';
import { useUnits } from '@/components/units/units-provider';

const tick = (v: number) => String(Number(v.toPrecision(3)));

interface Point {
  depth_mm: number;
  vertical_pressure_kpa: number;
  contact_pressure_kpa: number;
  margin: number | null;
}

/**
 * Bin pressure and bottom-contact pressure against fill depth; the margin on its own axis.
 * `depthMm` and `safeMm` are SI millimetres from the result (never the form's text, which is in
 * the reader's units): the chart converts them once, like the series.
 */
export function StackCharts({
  series,
  depthMm,
  safeMm,
}: {
  series: Point[];
  depthMm: number;
  safeMm: number | null | undefined;
}) {
  const u = useUnits();
  const data = series.map((p) => ({
    ...p,
    depth_mm: u.toDisplay(p.depth_mm, 'mm'),
    vertical_pressure_kpa: u.toDisplay(p.vertical_pressure_kpa, 'kPa'),
    contact_pressure_kpa: u.toDisplay(p.contact_pressure_kpa, 'kPa'),
  }));
  return (
    <div className="h-72 w-full" data-testid="stack-chart">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 10, right: 8, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="#e7e5e4" />
          <XAxis
            tickFormatter={tick}
            dataKey="depth_mm"
            type="number"
            domain={[0, 'dataMax']}
            label={{ value: `fill depth (${u.unit('mm')})`, position: 'insideBottom', offset: -12 }}
          />
          <YAxis
            width={72}
            tickFormatter={tick}
            yAxisId="p"
            label={{ value: `pressure (${u.unit('kPa')})`, angle: -90, position: 'insideLeft' }}
          />
          <YAxis
            width={72}
            tickFormatter={tick}
            yAxisId="m"
            orientation="right"
            label={{ value: 'margin (–)', angle: 90, position: 'insideRight' }}
          />
          <Tooltip />
          <Legend verticalAlign="top" />
          <Line
            yAxisId="p"
            dataKey="vertical_pressure_kpa"
            name={`bin vertical pressure (${u.unit('kPa')})`}
            stroke="#57534e"
            dot={false}
            isAnimationActive={false}
          />
          <Line
            yAxisId="p"
            dataKey="contact_pressure_kpa"
            name={`bottom contact pressure (${u.unit('kPa')})`}
            stroke="#2f5f2c"
            dot={false}
            isAnimationActive={false}
          />
          <Line
            yAxisId="m"
            dataKey="margin"
            name="margin"
            stroke="#8a4b16"
            dot={false}
            isAnimationActive={false}
          />
          <ReferenceLine
            yAxisId="m"
            y={1}
            stroke="#b91c1c"
            strokeDasharray="2 2"
            label="margin 1"
          />
          <ReferenceLine
            yAxisId="p"
            x={u.toDisplay(depthMm, 'mm')}
            className="this-fill-marker"
            stroke="#57534e"
            strokeDasharray="4 4"
            label="this fill"
          />
          {safeMm ? (
            <ReferenceLine
              yAxisId="p"
              x={u.toDisplay(safeMm, 'mm')}
              stroke="#b91c1c"
              strokeDasharray="4 4"
              label="deepest safe"
            />
          ) : null}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
