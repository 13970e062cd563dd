import { fileError } from './decode';

/** Which cells of a row hold the curve; other columns (time, say) are carried but not read. */
export interface CurveColumns {
  displacement: number;
  force: number;
  /** a display name per column, for messages */
  names: string[];
}

const QUANTITY_NAMES: Record<string, 'displacement' | 'force'> = {
  displacement: 'displacement',
  deformation: 'displacement',
  deflection: 'displacement',
  travel: 'displacement',
  force: 'force',
  load: 'force',
};

const UNITS: Record<'displacement' | 'force', { unit: string; spellings: string[] }> = {
  displacement: {
    unit: 'mm',
    spellings: ['mm', 'millimetre', 'millimetres', 'millimeter', 'millimeters'],
  },
  force: { unit: 'N', spellings: ['n', 'newton', 'newtons'] },
};

const EXAMPLE = 'e.g. displacement_mm,force_n or displacement (mm),force (N)';

// "displacement_mm", "displacement mm", "displacement/mm", "Displacement (mm)", "force [N]".
const HEADER_CELL =
  /^([a-z]+)\s*(?:\(\s*([^)]*?)\s*\)|\[\s*([^\]]*?)\s*\]|[_/ ]\s*([^\s()[\]]+))?$/i;

function readCell(cell: string) {
  const m = HEADER_CELL.exec(cell.trim());
  if (!m) return null;
  const quantity = QUANTITY_NAMES[m[1].toLowerCase()];
  if (!quantity) return null;
  return { quantity, unit: m[2] ?? m[3] ?? m[4] ?? null };
}

function unitProblem(quantity: 'displacement' | 'force', unit: string | null): string | null {
  const { unit: wanted, spellings } = UNITS[quantity];
  if (unit === null || unit === '') {
    return `the ${quantity} column names no unit; write the header with units, ${EXAMPLE}`;
  }
  if (spellings.includes(unit.toLowerCase())) return null;
  return `${quantity} is in '${unit.slice(0, 20)}'; give it in ${wanted}`;
}

/** Find the displacement (mm) and force (N) columns in row 1, or refuse with why. */
export function readHeader(cells: string[]): CurveColumns {
  if (cells.every((c) => /^[-+.\d\s eE]*$/.test(c))) {
    throw fileError(`row 1: the first row must be a header naming columns and units, ${EXAMPLE}`);
  }
  const found: Partial<Record<'displacement' | 'force', number>> = {};
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
  for (const quantity of ['displacement', 'force'] as const) {
    if (found[quantity] === undefined) {
      throw fileError(`row 1: the header has no ${quantity} column with its unit, ${EXAMPLE}`);
    }
  }
  return { displacement: found.displacement!, force: found.force!, names };
}
