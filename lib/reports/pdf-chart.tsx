import { G, Line, Polyline, Svg, Text } from '@react-pdf/renderer';

export interface PdfSeries {
  label: string;
  color: string;
  points: [number, number][];
}

const W = 480;
const H = 200;
const PAD = { left: 44, right: 12, top: 12, bottom: 30 };

const fmt = (x: number) => String(Number(x.toPrecision(3)));

/** A plain line chart drawn with react-pdf's SVG primitives (axes, ticks, one line a series). */
export function PdfLineChart({
  series,
  xLabel,
  yLabel,
}: {
  series: PdfSeries[];
  xLabel: string;
  yLabel: string;
}) {
  const all = series.flatMap((s) => s.points);
  const xMax = Math.max(...all.map((p) => p[0]), 1e-9);
  const yMax = Math.max(...all.map((p) => p[1]), 1e-9);
  const x = (v: number) => PAD.left + (v / xMax) * (W - PAD.left - PAD.right);
  const y = (v: number) => H - PAD.bottom - (v / yMax) * (H - PAD.top - PAD.bottom);
  const ticks = [0, 0.25, 0.5, 0.75, 1];
  return (
    <Svg width={W} height={H}>
      <Line
        x1={PAD.left}
        y1={H - PAD.bottom}
        x2={W - PAD.right}
        y2={H - PAD.bottom}
        stroke="#57534e"
        strokeWidth={0.8}
      />
      <Line
        x1={PAD.left}
        y1={PAD.top}
        x2={PAD.left}
        y2={H - PAD.bottom}
        stroke="#57534e"
        strokeWidth={0.8}
      />
      {ticks.map((t) => (
        <G key={t}>
          <Text x={x(t * xMax) - 8} y={H - PAD.bottom + 10} style={{ fontSize: 7 }}>
            {fmt(t * xMax)}
          </Text>
          <Text x={4} y={y(t * yMax) + 2} style={{ fontSize: 7 }}>
            {fmt(t * yMax)}
          </Text>
        </G>
      ))}
      {series.map((s) => (
        <Polyline
          key={s.label}
          points={s.points.map(([a, b]) => `${x(a)},${y(b)}`).join(' ')}
          stroke={s.color}
          strokeWidth={1.2}
          fill="none"
        />
      ))}
      <Text x={W / 2 - 40} y={H - 4} style={{ fontSize: 8 }}>
        {xLabel}
      </Text>
      <Text x={PAD.left + 4} y={PAD.top + 2} style={{ fontSize: 8 }}>
        {yLabel}
      </Text>
    </Svg>
  );
}
