'use client';

import { useUnits } from '@/components/units/units-provider';
import type { RelaxationPlot } from '@/lib/lab-tests/relaxation-plot';
import { ReadingsChart } from './readings-chart';

/** Force against time at the held deformation as read, with Peleg's fitted curve. */
export function RelaxationChart({ plot }: { plot: RelaxationPlot }) {
  const units = useUnits();
  const shown = (points: { t: number; f: number }[]) =>
    points.map((p) => ({ t: p.t, f: units.toDisplay(p.f, 'N') }));
  return (
    <ReadingsChart
      testId="relaxation-chart"
      x={{ key: 't', label: 'Time since end of loading (s)', unit: 's', name: 'Time' }}
      forceUnit={units.unit('N')}
      measured={shown(plot.measured)}
      fitted={shown(plot.fitted)}
      fitName="Peleg fit"
      fitWidth={1.5}
      // Dots a little wider than the fitted line, so readings show either side of it.
      dotSize={28}
      fitCaption="F(t) = F₀·(1 − t ÷ (k₁ + k₂·t)) with the fitted constants."
    />
  );
}
