import { assertNoFormula, delimiterOf, parseNumberCell, splitCells } from './cells';
import { decodeCsvBytes, fileError } from './decode';
import { readHeader } from './header';
import { MAX_DATA_ROWS, groupDigits } from './limits';

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
  const lines = decodeCsvBytes(bytes).split(/\r\n|\n|\r/);
  const delimiter = delimiterOf(lines[0]);
  const headerCells = splitCells(lines[0], delimiter, 1);
  assertNoFormula(headerCells, headerCells, 1);
  const columns = readHeader(headerCells);
  const points: CurvePoint[] = [];
  for (let i = 1; i < lines.length; i++) {
    const row = i + 1;
    if (lines[i].trim() === '') continue;
    if (points.length === MAX_DATA_ROWS) {
      throw fileError(
        `row ${row}: the file has more than ${groupDigits(MAX_DATA_ROWS)} data rows; at most ${groupDigits(MAX_DATA_ROWS)} are accepted`,
      );
    }
    const cells = splitCells(lines[i], delimiter, row);
    assertNoFormula(cells, columns.names, row);
    if (cells.length !== headerCells.length) {
      throw fileError(
        `row ${row}: ${cells.length} cells, but the header has ${headerCells.length}`,
      );
    }
    const point = {
      displacementMm: parseNumberCell(cells[columns.displacement], 'displacement', row),
      forceN: parseNumberCell(cells[columns.force], 'force', row),
    };
    checkSigns(point, row);
    const previous = points.at(-1);
    if (previous && !(point.displacementMm > previous.displacementMm)) {
      throw fileError(
        `row ${row}: displacement ${fmt(point.displacementMm)} mm does not increase on the row before (${fmt(previous.displacementMm)} mm); give the loading part only, displacement strictly increasing`,
      );
    }
    points.push(point);
  }
  if (points.length === 0) throw fileError('row 2: the file has a header but no data rows');
  return { points, rows: points.length };
}
