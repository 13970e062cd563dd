'use client';

import type { ReactNode } from 'react';
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

const tick = { fontSize: 12, fill: '#57534e' };
const number = (v: unknown) => (typeof v === 'number' ? String(Number(v.toPrecision(4))) : '');

/** A point as drawn: the x quantity under its key, the force (in the shown unit) as `f`. */
type Point<K extends string> = Record<K | 'f', number>;

/**
 * Force against an x quantity (plate travel, time): a lab file's readings as grey dots and the
 * fitted curve as an orange line, with an optional shaded x range (the range fitted).
 */
export function ReadingsChart<K extends string>({
  testId,
  x,
  forceUnit,
  measured,
  fitted,
  fitName,
  fitWidth,
  dotSize,
  shadeTo,
  fitCaption,
}: {
  testId: string;
  /** the key of x in the points, its axis label, its unit and its name in the tooltip */
  x: { key: K; label: string; unit: string; name: string };
  forceUnit: string;
  measured: Point<K>[];
  fitted: Point<K>[];
  fitName: string;
  fitWidth: number;
  /** the dots' size (recharts ZAxis range) */
  dotSize: number;
  shadeTo?: number;
  /** what the orange line is, for the caption */
  fitCaption: ReactNode;
}) {
  return (
    <figure data-testid={testId} className="rounded-lg border border-stone-200 bg-white p-2 sm:p-4">
      <div className="h-72 w-full sm:h-96">
        <ResponsiveContainer width="100%" height="100%">
          <ComposedChart margin={{ top: 8, right: 12, bottom: 24, left: 4 }}>
            <CartesianGrid stroke="#e7e5e4" />
            {shadeTo === undefined ? null : (
              <ReferenceArea
                x1={0}
                x2={shadeTo}
                fill="#dfeddc"
                fillOpacity={0.6}
                ifOverflow="hidden"
              />
            )}
            <XAxis
              type="number"
              dataKey={x.key}
              domain={[0, 'dataMax']}
              tick={tick}
              tickFormatter={number}
              allowDuplicatedCategory={false}
            >
              <Label value={x.label} position="bottom" offset={6} style={tick} />
            </XAxis>
            <YAxis type="number" dataKey="f" tick={tick} tickFormatter={number} width={52}>
              <Label
                value={`Force (${forceUnit})`}
                angle={-90}
                position="insideLeft"
                offset={4}
                style={{ ...tick, textAnchor: 'middle' }}
              />
            </YAxis>
            <ZAxis range={[dotSize, dotSize]} />
            <Tooltip
              formatter={(value, name) => [
                `${number(value)} ${name === x.key ? x.unit : forceUnit}`,
                name === x.key ? x.name : 'Force',
              ]}
              labelFormatter={() => ''}
            />
            <Legend verticalAlign="top" height={28} wrapperStyle={{ fontSize: 12 }} />
            <Scatter
              name="Measured"
              data={measured}
              fill="#a8a29e"
              shape="circle"
              legendType="circle"
              isAnimationActive={false}
            />
            <Line
              name={fitName}
              data={fitted}
              dataKey="f"
              stroke="#c2410c"
              strokeWidth={fitWidth}
              zIndex={700}
              dot={false}
              type="monotone"
              isAnimationActive={false}
            />
          </ComposedChart>
        </ResponsiveContainer>
      </div>
      <figcaption className="px-2 pt-1 text-xs text-stone-600">
        Grey dots: readings from the file (thinned to at most 400 for drawing). Orange line:{' '}
        {fitCaption}
      </figcaption>
    </figure>
  );
}
