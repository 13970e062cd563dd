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
  height_mm: number;
  peak_pressure_kpa: number;
  impact_energy_j: number;
}

/** Peak contact pressure and impact energy against drop height, the chosen height marked. */
export function DropCharts({
  series,
  heightMm,
  thresholdKpa,
}: {
  series: Point[];
  heightMm: number;
  thresholdKpa: number | null;
}) {
  const u = useUnits();
  const data = series.map((p) => ({
    height_mm: u.toDisplay(p.height_mm, 'mm'),
    peak_pressure_kpa: u.toDisplay(p.peak_pressure_kpa, 'kPa'),
    impact_energy_j: u.toDisplay(p.impact_energy_j, 'J'),
  }));
  return (
    <div className="h-72 w-full" data-testid="drop-chart">
      <ResponsiveContainer width="100%" height="100%">
        <LineChart data={data} margin={{ top: 10, right: 8, bottom: 24, left: 8 }}>
          <CartesianGrid stroke="#e7e5e4" />
          <XAxis
            tickFormatter={tick}
            dataKey="height_mm"
            type="number"
            domain={[0, 'dataMax']}
            label={{
              value: `drop height (${u.unit('mm')})`,
              position: 'insideBottom',
              offset: -12,
            }}
          />
          <YAxis
            width={72}
            tickFormatter={tick}
            yAxisId="p"
            label={{
              value: `peak pressure (${u.unit('kPa')})`,
              angle: -90,
              position: 'insideLeft',
            }}
          />
          <YAxis
            width={72}
            tickFormatter={tick}
            yAxisId="e"
            orientation="right"
            label={{ value: `energy (${u.unit('J')})`, angle: 90, position: 'insideRight' }}
          />
          <Tooltip />
          <Legend verticalAlign="top" />
          <Line
            yAxisId="p"
            dataKey="peak_pressure_kpa"
            name={`peak pressure (${u.unit('kPa')})`}
            stroke="#2f5f2c"
            dot={false}
            isAnimationActive={false}
          />
          <Line
            yAxisId="e"
            dataKey="impact_energy_j"
            name={`impact energy (${u.unit('J')})`}
            stroke="#8a4b16"
            dot={false}
            isAnimationActive={false}
          />
          <ReferenceLine
            yAxisId="p"
            x={u.toDisplay(heightMm, 'mm')}
            stroke="#57534e"
            strokeDasharray="4 4"
            label="this drop"
          />
          {thresholdKpa ? (
            <ReferenceLine
              yAxisId="p"
              y={u.toDisplay(thresholdKpa, 'kPa')}
              stroke="#b91c1c"
              strokeDasharray="2 2"
              label="static threshold"
            />
          ) : null}
        </LineChart>
      </ResponsiveContainer>
    </div>
  );
}
