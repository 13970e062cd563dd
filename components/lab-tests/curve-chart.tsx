'use client';

import {
  CartesianGrid,
  ComposedChart,
  Label,
  Legend,
  Line,
  ReferenceArea,
  ResponsiveContainer,
  Scatter,
  Tooltip,
  XAxis,
  YAxis,
  ZAxis,
} from 'recharts';
import type { PlotSeries } from '@/lib/lab-tests/plot';

const tick = { fontSize: 12, fill: '#57534e' };
const number = (v: unknown) => (typeof v === 'number' ? String(Number(v.toPrecision(4))) : '');

/** Force against plate displacement as measured, with the fitted Hertz curve over the fit range. */
export function CurveChart({ series, fitToMm }: { series: PlotSeries; fitToMm: number }) {
  return (
    <figure
      data-testid="lab-test-chart"
      className="rounded-lg border border-stone-200 bg-white p-2 sm:p-4"
    >
      <div className="h-72 w-full sm:h-96">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart margin={{ top: 8, right: 12, bottom: 24, left: 4 }}>
            <CartesianGrid stroke="#e7e5e4" />
            <ReferenceArea
              x1={0}
              x2={fitToMm}
              fill="#dfeddc"
              fillOpacity={0.6}
              ifOverflow="hidden"
            />
            <XAxis
              type="number"
              dataKey="d"
              domain={[0, 'dataMax']}
              tick={tick}
              tickFormatter={number}
              allowDuplicatedCategory={false}
            >
              <Label value="Plate displacement (mm)" position="bottom" offset={6} style={tick} />
            </XAxis>
            <YAxis type="number" dataKey="f" tick={tick} tickFormatter={number} width={52}>
              <Label
                value="Force (N)"
                angle={-90}
                position="insideLeft"
                offset={4}
                style={{ ...tick, textAnchor: 'middle' }}
              />
            </YAxis>
            <ZAxis range={[10, 10]} />
            <Tooltip
              formatter={(value, name) => [
                `${number(value)} ${name === 'd' ? 'mm' : 'N'}`,
                name === 'd' ? 'Displacement' : 'Force',
              ]}
              labelFormatter={() => ''}
            />
            <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
            <Scatter
              name="Measured"
              data={series.measured}
              fill="#a8a29e"
              shape="circle"
              legendType="circle"
              isAnimationActive={false}
            />
            <Line
              name={`Hertz fit (0–${number(fitToMm)} mm)`}
              data={series.fitted}
              dataKey="f"
              stroke="#c2410c"
              strokeWidth={2}
              zIndex={700}
              dot={false}
              type="monotone"
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="px-2 pt-1 text-xs text-stone-600">
        Grey dots: readings from the file (thinned to at most 400 for drawing). Orange line: F = k·D
        <sup>3/2</sup> with the fitted k, over the fitted range (shaded) only.
      </figcaption>
    </figure>
  );
}
