import { fileError } from './decode';

/** What a lab file's header must name: its quantities, each with the one unit it is read in. */
export interface HeaderSpec<Q extends string> {
  /** header words (lower case) and the quantity each names */
  words: Record<string, Q>;
  /** per quantity, in the order columns are checked and read: its unit and accepted spellings */
  units: Record<Q, { unit: string; spellings: string[] }>;
  /** a header the messages offer as a model */
  example: string;
}

/** Which cell of a row holds each quantity; other columns are carried but not read. */
export type Columns<Q extends string> = Record<Q, number> & {
  /** a display name per column, for messages */
  names: string[];
};

// "force_n", "force n", "force/n", "Force (N)", "force [N]", and likewise for every quantity.
const HEADER_CELL =
  /^([a-z]+)\s*(?:\(\s*([^)]*?)\s*\)|\[\s*([^\]]*?)\s*\]|[_/ ]\s*([^\s()[\]]+))?$/i;

function readCell<Q extends string>(cell: string, spec: HeaderSpec<Q>) {
  const m = HEADER_CELL.exec(cell.trim());
  if (!m) return null;
  const quantity = spec.words[m[1].toLowerCase()];
  if (!quantity) return null;
  return { quantity, unit: m[2] ?? m[3] ?? m[4] ?? null };
}

// A unit other than the one named is refused rather than converted: a unit guessed wrong moves
// the fit by a factor, and the lab's own export can be set to the unit asked for.
function unitProblem<Q extends string>(spec: HeaderSpec<Q>, quantity: Q, unit: string | null) {
  const { unit: wanted, spellings } = spec.units[quantity];
  if (unit === null || unit === '') {
    return `the ${quantity} column names no unit; write the header with units, ${spec.example}`;
  }
  if (spellings.includes(unit.toLowerCase())) return null;
  return `${quantity} is in '${unit.slice(0, 20)}'; give it in ${wanted}`;
}

/** Find each quantity's column, in its unit, in row 1, or refuse with why. */
export function readUnitHeader<Q extends string>(cells: string[], spec: HeaderSpec<Q>): Columns<Q> {
  if (cells.every((c) => /^[-+.\d\s eE]*$/.test(c))) {
    throw fileError(
      `row 1: the first row must be a header naming columns and units, ${spec.example}`,
    );
  }
  const found: Partial<Record<Q, number>> = {};
  const names = cells.map((c) => c || 'an unnamed column');
  cells.forEach((cell, i) => {
    const read = readCell(cell, spec);
    if (!read) return;
    if (found[read.quantity] !== undefined) {
      throw fileError(
        `row 1: two ${read.quantity} columns (${found[read.quantity]! + 1} and ${i + 1})`,
      );
    }
    const problem = unitProblem(spec, read.quantity, read.unit);
    if (problem) throw fileError(`row 1: ${problem}`);
    found[read.quantity] = i;
    names[i] = read.quantity;
  });
  for (const quantity of Object.keys(spec.units) as Q[]) {
    if (found[quantity] === undefined) {
      throw fileError(`row 1: the header has no ${quantity} column with its unit, ${spec.example}`);
    }
  }
  return { ...(found as Record<Q, number>), names };
}
