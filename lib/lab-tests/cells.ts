import { fileError } from './decode';

/** The delimiter a header uses: comma, or semicolon / tab as some regional exports write. */
export function delimiterOf(header: string): string {
  if (header.includes(',')) return ',';
  if (header.includes(';')) return ';';
  if (header.includes('\t')) return '\t';
  return ',';
}

/** One line's cells, RFC 4180 quoting (a quoted cell may hold the delimiter or ""), trimmed. */
export function splitCells(line: string, delimiter: string, row: number): string[] {
  const cells: string[] = [];
  let cell = '';
  let quoted = false;
  for (let i = 0; i < line.length; i++) {
    const c = line[i];
    if (quoted) {
      if (c === '"' && line[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (c === '"') quoted = false;
      else cell += c;
    } else if (c === '"' && cell.trim() === '') {
      quoted = true;
      cell = '';
    } else if (c === delimiter) {
      cells.push(cell.trim());
      cell = '';
    } else cell += c;
  }
  if (quoted) throw fileError(`row ${row}: a quoted cell is not closed`);
  cells.push(cell.trim());
  return cells;
}

const NUMBER = /^-?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?$/;

/** Cells a spreadsheet would run: =, +, @, or a '-' that does not start a plain number. */
export function isFormulaCell(cell: string): boolean {
  if (/^[=+@]/.test(cell)) return true;
  return cell.startsWith('-') && !NUMBER.test(cell);
}

const quote = (cell: string) => `'${cell.length > 40 ? `${cell.slice(0, 40)}…` : cell}'`;

/** Refuse any cell of a row that looks like a spreadsheet formula, naming its column. */
export function assertNoFormula(cells: string[], names: string[], row: number): void {
  cells.forEach((cell, i) => {
    if (isFormulaCell(cell)) {
      const column = names[i] ?? `column ${i + 1}`;
      throw fileError(
        `row ${row}: ${column} ${quote(cell)} looks like a spreadsheet formula; formulas are refused`,
      );
    }
  });
}

/** A number cell: plain decimal, point as the decimal mark, optional exponent. */
export function parseNumberCell(cell: string, name: string, row: number): number {
  if (cell === '') throw fileError(`row ${row}: ${name} is empty`);
  if (!NUMBER.test(cell)) {
    const hint = /^-?\d+,\d+$/.test(cell) ? '; use a point as the decimal mark' : '';
    throw fileError(`row ${row}: ${name} is not a number (${quote(cell)})${hint}`);
  }
  const value = Number(cell);
  if (!Number.isFinite(value)) throw fileError(`row ${row}: ${name} is too large (${quote(cell)})`);
  return value;
}
