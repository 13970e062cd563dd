import { fileError } from './decode';

/** Which cells of a row hold the relaxation readings; other columns are carried but not read. */
export interface RelaxationColumns {
  time: number;
  force: number;
  /** a display name per column, for messages */
  names: string[];
}

type Quantity = 'time' | 'force';

const QUANTITY_NAMES: Record<string, Quantity> = {
  time: 'time',
  t: 'time',
  force: 'force',
  load: 'force',
};

const UNITS: Record<Quantity, { unit: string; spellings: string[] }> = {
  time: { unit: 's', spellings: ['s', 'sec', 'secs', 'second', 'seconds'] },
  force: { unit: 'N', spellings: ['n', 'newton', 'newtons'] },
};

const EXAMPLE = 'e.g. time_s,force_n or time (s),force (N)';

// "time_s", "time s", "time/s", "Time (s)", "force [N]" — the spellings the compression header takes.
const HEADER_CELL =
  /^([a-z]+)\s*(?:\(\s*([^)]*?)\s*\)|\[\s*([^\]]*?)\s*\]|[_/ ]\s*([^\s()[\]]+))?$/i;

function readCell(cell: string) {
  const m = HEADER_CELL.exec(cell.trim());
  if (!m) return null;
  const quantity = QUANTITY_NAMES[m[1].toLowerCase()];
  if (!quantity) return null;
  return { quantity, unit: m[2] ?? m[3] ?? m[4] ?? null };
}

// A time in ms or min is refused rather than converted: a unit guessed wrong moves k₁ a thousand
// or sixty times, and the lab's own export can be set to seconds.
function unitProblem(quantity: Quantity, unit: string | null): string | null {
  const { unit: wanted, spellings } = UNITS[quantity];
  if (unit === null || unit === '') {
    return `the ${quantity} column names no unit; write the header with units, ${EXAMPLE}`;
  }
  if (spellings.includes(unit.toLowerCase())) return null;
  return `${quantity} is in '${unit.slice(0, 20)}'; give it in ${wanted}`;
}

/** Find the time (s) and force (N) columns in row 1, or refuse with why. */
export function readRelaxationHeader(cells: string[]): RelaxationColumns {
  if (cells.every((c) => /^[-+.\d\s eE]*$/.test(c))) {
    throw fileError(`row 1: the first row must be a header naming columns and units, ${EXAMPLE}`);
  }
  const found: Partial<Record<Quantity, number>> = {};
  const names = cells.map((c) => c || 'an unnamed column');
  cells.forEach((cell, i) => {
    const read = readCell(cell);
    if (!read) return;
    if (found[read.quantity] !== undefined) {
      throw fileError(
        `row 1: two ${read.quantity} columns (${found[read.quantity]! + 1} and ${i + 1})`,
      );
    }
    const problem = unitProblem(read.quantity, read.unit);
    if (problem) throw fileError(`row 1: ${problem}`);
    found[read.quantity] = i;
    names[i] = read.quantity;
  });
  for (const quantity of ['time', 'force'] as const) {
    if (found[quantity] === undefined) {
      throw fileError(`row 1: the header has no ${quantity} column with its unit, ${EXAMPLE}`);
    }
  }
  return { time: found.time!, force: found.force!, names };
}
