import { assertNoFormula, delimiterOf, parseNumberCell, splitCells } from './cells';
import { decodeCsvBytes, fileError } from './decode';
import { MAX_DATA_ROWS, groupDigits } from './limits';
import { readRelaxationHeader } from './relaxation-header';

/** One reading of a held deformation: time since the end of loading in s, plate force in N. */
export interface RelaxationReading {
  timeS: number;
  forceN: number;
}

export interface ParsedRelaxation {
  readings: RelaxationReading[];
  /** data rows read (the header and blank lines not counted) */
  rows: number;
}

const fmt = (x: number) => String(Number(x.toPrecision(6)));

/**
 * Peleg's fit normalises by the force at the end of loading and measures time from it, so the
 * first reading must be that instant; a file timed from the start of loading is refused rather
 * than shifted, since where loading ended is the lab's to say.
 */
function checkReading(
  reading: RelaxationReading,
  previous: RelaxationReading | undefined,
  row: number,
) {
  if (!previous && reading.timeS !== 0) {
    throw fileError(
      `row ${row}: the first reading is at ${fmt(reading.timeS)} s; it must be at t = 0 s, the end of loading (shift the times so the hold starts at 0)`,
    );
  }
  if (previous && !(reading.timeS > previous.timeS)) {
    throw fileError(
      `row ${row}: time ${fmt(reading.timeS)} s does not increase on the row before (${fmt(previous.timeS)} s); times must strictly increase`,
    );
  }
  if (reading.forceN < 0) {
    throw fileError(
      `row ${row}: force is negative (${fmt(reading.forceN)} N); give compressive force as positive, with the load cell zeroed`,
    );
  }
}

/**
 * Parse a stress-relaxation CSV (row 1 a header naming time in s and force in N; the first data
 * row at t = 0, the end of loading). Every refusal names its row (1-based, the header is row 1).
 */
export function parseRelaxationCsv(bytes: Uint8Array): ParsedRelaxation {
  const lines = decodeCsvBytes(bytes).split(/\r\n|\n|\r/);
  const delimiter = delimiterOf(lines[0]);
  const headerCells = splitCells(lines[0], delimiter, 1);
  assertNoFormula(headerCells, headerCells, 1);
  const columns = readRelaxationHeader(headerCells);
  const readings: RelaxationReading[] = [];
  for (let i = 1; i < lines.length; i++) {
    const row = i + 1;
    if (lines[i].trim() === '') continue;
    if (readings.length === MAX_DATA_ROWS) {
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
    const reading = {
      timeS: parseNumberCell(cells[columns.time], 'time', row),
      forceN: parseNumberCell(cells[columns.force], 'force', row),
    };
    checkReading(reading, readings.at(-1), row);
    readings.push(reading);
  }
  if (readings.length === 0) throw fileError('row 2: the file has a header but no data rows');
  return { readings, rows: readings.length };
}
