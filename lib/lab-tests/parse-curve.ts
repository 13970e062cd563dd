import { readCsvRows } from './csv-rows';
import { fileError } from './decode';
import type { HeaderSpec } from './header';

/** One reading: total plate travel in mm, plate force in N. */
export interface CurvePoint {
  displacementMm: number;
  forceN: number;
}

export interface ParsedCurve {
  points: CurvePoint[];
  /** data rows read (the header and blank lines not counted) */
  rows: number;
}

// "displacement_mm", "displacement mm", "displacement/mm", "Displacement (mm)", "force [N]".
const CURVE_HEADER: HeaderSpec<'displacement' | 'force'> = {
  words: {
    displacement: 'displacement',
    deformation: 'displacement',
    deflection: 'displacement',
    travel: 'displacement',
    force: 'force',
    load: 'force',
  },
  units: {
    displacement: {
      unit: 'mm',
      spellings: ['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters'],
    },
    force: { unit: 'N', spellings: ['n', 'newton', 'newtons'] },
  },
  example: 'e.g. displacement_mm,force_n or displacement (mm),force (N)',
};

const fmt = (x: number) => String(Number(x.toPrecision(6)));

/**
 * Negative readings are refused, not clipped or flipped: travel is measured from first contact
 * and force is compressive-positive, so a negative value means a tare offset or a machine
 * that signs compression negative — both change the fit if guessed at, so the file is fixed.
 */
function checkSigns(point: CurvePoint, row: number): void {
  if (point.displacementMm < 0) {
    throw fileError(
      `row ${row}: displacement is negative (${fmt(point.displacementMm)} mm); give plate travel from first contact, 0 or more`,
    );
  }
  if (point.forceN < 0) {
    throw fileError(
      `row ${row}: force is negative (${fmt(point.forceN)} N); give compressive force as positive, with the load cell zeroed`,
    );
  }
}

/**
 * Parse a parallel-plate compression CSV (row 1 a header naming displacement in mm and force in
 * N) into its loading curve. Every refusal names its row (1-based, the header is row 1).
 */
export function parseCompressionCsv(bytes: Uint8Array): ParsedCurve {
  const points = readCsvRows(
    bytes,
    CURVE_HEADER,
    (values, row, previous: CurvePoint | undefined) => {
      const point = { displacementMm: values.displacement, forceN: values.force };
      checkSigns(point, row);
      if (previous && !(point.displacementMm > previous.displacementMm)) {
        throw fileError(
          `row ${row}: displacement ${fmt(point.displacementMm)} mm does not increase on the row before (${fmt(previous.displacementMm)} mm); give the loading part only, displacement strictly increasing`,
        );
      }
      return point;
    },
  );
  return { points, rows: points.length };
}
