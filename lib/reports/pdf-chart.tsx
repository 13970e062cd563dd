import { G, Line, Polyline, Svg, Text } from '@react-pdf/renderer';
import type { PdfChartText } from './pdf-text';

const W = 480;
const H = 200;
const PAD = { left: 44, right: 12, top: 12, bottom: 30 };
export const COLOURS = ['#2f5f2c', '#8a4b16', '#1d4ed8', '#7c3aed', '#be123c', '#0f766e'];

/**
 * A plain line chart drawn with react-pdf's SVG primitives: axes over the round ranges the text
 * model chose, a label at every round tick, one line a series.
 */
export function PdfLineChart({ chart }: { chart: PdfChartText }) {
  const { x: ax, y: ay } = chart;
  const x = (v: number) =>
    PAD.left + ((v - ax.min) / (ax.max - ax.min)) * (W - PAD.left - PAD.right);
  const y = (v: number) =>
    H - PAD.bottom - ((v - ay.min) / (ay.max - ay.min)) * (H - PAD.top - PAD.bottom);
  const stroke = { stroke: '#57534e', strokeWidth: 0.8 };
  return (
    <Svg width={W} height={H}>
      <Line x1={PAD.left} y1={H - PAD.bottom} x2={W - PAD.right} y2={H - PAD.bottom} {...stroke} />
      <Line x1={PAD.left} y1={PAD.top} x2={PAD.left} y2={H - PAD.bottom} {...stroke} />
      {ax.ticks.map((t) => (
        <G key={`x${t}`}>
          <Line x1={x(t)} y1={H - PAD.bottom} x2={x(t)} y2={H - PAD.bottom + 3} {...stroke} />
          <Text x={x(t) - 8} y={H - PAD.bottom + 11} style={{ fontSize: 7 }}>
            {String(t)}
          </Text>
        </G>
      ))}
      {ay.ticks.map((t) => (
        <G key={`y${t}`}>
          <Line x1={PAD.left - 3} y1={y(t)} x2={PAD.left} y2={y(t)} {...stroke} />
          <Text x={4} y={y(t) + 2} style={{ fontSize: 7 }}>
            {String(t)}
          </Text>
        </G>
      ))}
      {chart.series.map((s, i) => (
        <Polyline
          key={s.label}
          points={s.points.map(([a, b]) => `${x(a)},${y(b)}`).join(' ')}
          stroke={COLOURS[i % COLOURS.length]}
          strokeWidth={1.2}
          fill="none"
        />
      ))}
      <Text x={W / 2 - 40} y={H - 4} style={{ fontSize: 8 }}>
        {chart.xLabel}
      </Text>
      <Text x={PAD.left + 4} y={PAD.top + 2} style={{ fontSize: 8 }}>
        {chart.yLabel}
      </Text>
    </Svg>
  );
}
