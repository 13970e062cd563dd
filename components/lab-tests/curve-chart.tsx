'use client';

import type { PlotSeries } from '@/lib/lab-tests/plot';
import { ReadingsChart } from './readings-chart';

const number = (v: number) => String(Number(v.toPrecision(4)));

/** Force against plate displacement as measured, with the fitted Hertz curve over the fit range. */
export function CurveChart({ series, fitToMm }: { series: PlotSeries; fitToMm: number }) {
  return (
    <ReadingsChart
      testId="lab-test-chart"
      x={{ key: 'd', label: 'Plate displacement (mm)', unit: 'mm', name: 'Displacement' }}
      forceUnit="N"
      measured={series.measured}
      fitted={series.fitted}
      fitName={`Hertz fit (0–${number(fitToMm)} mm)`}
      fitWidth={2}
      dotSize={10}
      shadeTo={fitToMm}
      fitCaption={
        <>
          F = k·D<sup>3/2</sup> with the fitted k, over the fitted range (shaded) only.
        </>
      }
    />
  );
}
