import { assertNoFormula, delimiterOf, parseNumberCell, splitCells } from './cells';
import { decodeCsvBytes, fileError } from './decode';
import { readUnitHeader, type HeaderSpec } from './header';
import { MAX_DATA_ROWS, groupDigits } from './limits';

/**
 * The readings of a lab-test CSV: row 1 a header naming the spec's quantities with their units,
 * then one reading per non-blank row. Each row is checked for size, formulas and its cell count;
 * its quantities are read as numbers, in the spec's order, and `reading` makes them a reading
 * (checking it against the one before). Every refusal names its row (1-based, the header is 1).
 */
export function readCsvRows<Q extends string, R>(
  bytes: Uint8Array,
  header: HeaderSpec<Q>,
  reading: (values: Record<Q, number>, row: number, previous: R | undefined) => R,
): R[] {
  const lines = decodeCsvBytes(bytes).split(/\r\n|\n|\r/);
  const delimiter = delimiterOf(lines[0]);
  const headerCells = splitCells(lines[0], delimiter, 1);
  assertNoFormula(headerCells, headerCells, 1);
  const columns = readUnitHeader(headerCells, header);
  const quantities = Object.keys(header.units) as Q[];
  const readings: R[] = [];
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
    const values = {} as Record<Q, number>;
    for (const q of quantities) values[q] = parseNumberCell(cells[columns[q]], q, row);
    readings.push(reading(values, row, readings.at(-1)));
  }
  if (readings.length === 0) throw fileError('row 2: the file has a header but no data rows');
  return readings;
}
