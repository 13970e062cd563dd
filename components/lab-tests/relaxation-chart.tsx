'use client';

import {
  CartesianGrid,
  ComposedChart,
  Label,
  Legend,
  Line,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
  ZAxis,
} from 'recharts';
import { useUnits } from '@/components/units/units-provider';
import type { RelaxationPlot } from '@/lib/lab-tests/relaxation-plot';

const tick = { fontSize: 12, fill: '#57534e' };
const number = (v: unknown) => (typeof v === 'number' ? String(Number(v.toPrecision(4))) : '');

/** Force against time at the held deformation as read, with Peleg's fitted curve. */
export function RelaxationChart({ plot }: { plot: RelaxationPlot }) {
  const units = useUnits();
  const force = units.unit('N');
  const shown = (points: { t: number; f: number }[]) =>
    points.map((p) => ({ t: p.t, f: units.toDisplay(p.f, 'N') }));
  return (
    <figure
      data-testid="relaxation-chart"
      className="rounded-lg border border-stone-200 bg-white p-2 sm:p-4"
    >
      <div className="h-72 w-full sm:h-96">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart margin={{ top: 8, right: 12, bottom: 24, left: 4 }}>
            <CartesianGrid stroke="#e7e5e4" />
            <XAxis
              type="number"
              dataKey="t"
              domain={[0, 'dataMax']}
              tick={tick}
              tickFormatter={number}
              allowDuplicatedCategory={false}
            >
              <Label
                value="Time since end of loading (s)"
                position="bottom"
                offset={6}
                style={tick}
              />
            </XAxis>
            <YAxis type="number" dataKey="f" tick={tick} tickFormatter={number} width={52}>
              <Label
                value={`Force (${force})`}
                angle={-90}
                position="insideLeft"
                offset={4}
                style={{ ...tick, textAnchor: 'middle' }}
              />
            </YAxis>
            {/* Dots a little wider than the fitted line, so readings show either side of it. */}
            <ZAxis range={[28, 28]} />
            <Tooltip
              formatter={(value, name) => [
                `${number(value)} ${name === 't' ? 's' : force}`,
                name === 't' ? 'Time' : 'Force',
              ]}
              labelFormatter={() => ''}
            />
            <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
            <Scatter
              name="Measured"
              data={shown(plot.measured)}
              fill="#a8a29e"
              shape="circle"
              legendType="circle"
              isAnimationActive={false}
            />
            <Line
              name="Peleg fit"
              data={shown(plot.fitted)}
              dataKey="f"
              stroke="#c2410c"
              strokeWidth={1.5}
              zIndex={700}
              dot={false}
              type="monotone"
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="px-2 pt-1 text-xs text-stone-600">
        Grey dots: readings from the file (thinned to at most 400 for drawing). Orange line: F(t) =
        F₀·(1 − t ÷ (k₁ + k₂·t)) with the fitted constants.
      </figcaption>
    </figure>
  );
}
