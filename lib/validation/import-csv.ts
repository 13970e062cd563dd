import { toCsv } from '@/lib/csv';
import { displayUnit, fromDisplay, type UnitSystem } from '@/lib/units';
import { revisionValueSchema, type RevisionValueInput } from '@/lib/validation/revisions';
import { QUANTITIES, QUANTITY_KEYS, type Quantity } from '@/lib/properties/quantities';

/**
 * Values for a draft from a CSV file, one value a row, with no I/O: the columns, the parse, and
 * every row checked as the draft form checks it (revisionValueSchema) plus the file's own rules
 * (unit, known source, no repeated value). Errors carry the file's line numbers (1 = header).
 */
export const IMPORT_COLUMNS = {
  quantity: 'key of the quantity (youngs_modulus, diameter, …) or its name',
  variant: 'which kind: apparent or flesh modulus, equatorial or axial diameter, the surface…',
  value: 'the number, a point as the decimal mark',
  unit: "the quantity's unit (MPa, mm, g, kPa, kg/m³, – for none), or its US unit if you use US units",
  low: 'low end of the range (with high, or neither)',
  high: 'high end of the range',
  sd: 'standard deviation, in the same unit',
  samples: 'number of fruit or specimens',
  method: 'how it was measured',
  ripeness: 'ripeness in the source’s words',
  stage: 'firm, firm-ripe or ripe (or empty)',
  observation: 'drop and impact figures: no-bruise, bruised-at or recommended-max',
  temperature: 'test temperature',
  storage: 'storage before the test',
  loading_rate: 'loading rate',
  probe: 'probe or indenter',
  note: 'anything else (up to 1000 characters)',
  typical: 'yes for a typical value of the trade, no (or empty) for a published one',
  typical_basis: 'a typical value: common practice or from memory',
  source_key: 'key of an existing source (a published value must name one)',
} as const;
export type ImportColumn = keyof typeof IMPORT_COLUMNS;
const COLUMNS = Object.keys(IMPORT_COLUMNS) as ImportColumn[];
/** Columns a file must have; the others may be left out (read as empty). */
export const REQUIRED_COLUMNS: ImportColumn[] = ['quantity', 'variant', 'value', 'unit'];

/** Rows of values one file may hold. */
export const MAX_IMPORT_ROWS = 2000;
/** The largest file read: 2 MiB (written "2 MB"). */
export const MAX_IMPORT_BYTES = 2 * 1024 * 1024;
/** Errors listed at most; the rest are counted. */
const MAX_LISTED = 100;

export interface LineError {
  /** 1 is the header; a quoted cell may span lines, so a row is named by its first line. */
  line: number;
  message: string;
}

export interface ImportContext {
  system: UnitSystem;
  /** Keys of the sources a value may name. */
  sourceKeys: ReadonlySet<string>;
  /** Values the draft already holds, so a row repeating one is refused. */
  existing?: readonly Pick<
    RevisionValueInput,
    'quantity' | 'variant' | 'value' | 'sourceKey' | 'stage'
  >[];
}

export interface ImportResult {
  values: RevisionValueInput[];
  errors: LineError[];
}

/** Bytes as UTF-8 text (a byte-order mark dropped); anything else is one error on line 1. */
export function decodeImport(bytes: Uint8Array): { text: string } | { error: LineError } {
  const fail = (message: string) => ({ error: { line: 1, message } });
  if (bytes.length === 0) return fail('The file is empty.');
  if (bytes.length > MAX_IMPORT_BYTES) return fail('The file is larger than 2 MB.');
  try {
    const text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
    if (text.includes('\u0000')) return fail('The file is not UTF-8 text: save it as "CSV UTF-8".');
    return { text };
  } catch {
    return fail('The file is not UTF-8 text: save it as "CSV UTF-8".');
  }
}

interface Record_ {
  line: number;
  cells: string[];
}

/** RFC 4180 records (quoted cells may hold the delimiter, "" and line breaks), blank rows left out. */
function records(text: string, delimiter: string): Record_[] | LineError {
  const out: Record_[] = [];
  let cells: string[] = [];
  let cell = '';
  let quoted = false;
  let line = 1;
  let start = 1;
  const end = () => {
    cells.push(cell);
    if (cells.length > 1 || cells[0].trim() !== '') out.push({ line: start, cells });
    cells = [];
    cell = '';
  };
  for (let i = 0; i < text.length; i++) {
    const c = text[i];
    if (quoted) {
      if (c === '"' && text[i + 1] === '"') {
        cell += '"';
        i++;
      } else if (c === '"') quoted = false;
      else {
        if (c === '\n' || (c === '\r' && text[i + 1] !== '\n')) line++;
        cell += c;
      }
    } else if (c === '"' && cell.trim() === '') {
      quoted = true;
      cell = '';
    } else if (c === delimiter) {
      cells.push(cell);
      cell = '';
    } else if (c === '\n' || c === '\r') {
      if (c === '\r' && text[i + 1] === '\n') i++;
      end();
      start = ++line;
    } else cell += c;
  }
  if (quoted) return { line: start, message: 'A quoted cell is not closed.' };
  end();
  return out;
}

const headerName = (cell: string) =>
  cell
    .trim()
    .toLowerCase()
    .replace(/[\s-]+/g, '_');

/** The column of each header cell, or the errors naming wrong, repeated and missing columns. */
function readHeader(cells: string[]): ImportColumn[] | LineError[] {
  const names = cells.map(headerName);
  const messages: string[] = [];
  const unknown = names.filter((n) => !(COLUMNS as string[]).includes(n));
  if (unknown.length)
    messages.push(
      `Unknown column${unknown.length > 1 ? 's' : ''}: ${unknown.map((n) => `"${n.slice(0, 40)}"`).join(', ')}. The columns are: ${COLUMNS.join(', ')}.`,
    );
  const twice = [...new Set(names.filter((n, i) => names.indexOf(n) !== i))];
  if (twice.length)
    messages.push(`Column${twice.length > 1 ? 's' : ''} given twice: ${twice.join(', ')}.`);
  const missing = REQUIRED_COLUMNS.filter((c) => !names.includes(c));
  if (missing.length)
    messages.push(`Missing column${missing.length > 1 ? 's' : ''}: ${missing.join(', ')}.`);
  return messages.length
    ? messages.map((message) => ({ line: 1, message }))
    : (names as ImportColumn[]);
}

const NUMBER = /^[-+]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][-+]?\d+)?$/;
const UNIT_SPELLINGS: Record<string, string> = { 'kg/m3': 'kg/m³', 'lb/ft3': 'lb/ft³', '-': '–' };

function quantityOf(text: string): Quantity | null {
  const t = text.trim().toLowerCase();
  return QUANTITY_KEYS.find((q) => q === t || QUANTITIES[q].label.toLowerCase() === t) ?? null;
}

/** How a unit cell converts to the quantity's canonical unit: a function, or the refusal. */
function unitOf(q: Quantity, cell: string, system: UnitSystem): ((x: number) => number) | string {
  const canonical = QUANTITIES[q].unit;
  const unit = UNIT_SPELLINGS[cell.trim()] ?? cell.trim();
  if (unit === canonical || (canonical === '–' && unit === '')) return (x) => x;
  const shown = displayUnit(canonical, system);
  if (shown !== canonical && unit === shown)
    return (x) => Number(fromDisplay(x, canonical, system).toPrecision(12));
  const expected = canonical === '–' ? '– (no unit; or leave it empty)' : canonical;
  const also = shown !== canonical ? ` or ${shown} (your US units)` : '';
  return `unit "${cell.trim().slice(0, 20)}" does not match ${QUANTITIES[q].label}: use ${expected}${also}.`;
}

const FIELD_COLUMN: Record<string, ImportColumn> = {
  loadingRate: 'loading_rate',
  isTypicalDefault: 'typical',
  typicalBasis: 'typical_basis',
  sourceKey: 'source_key',
};

type Row = Record<ImportColumn, string>;

/** One row checked: its value in the canonical unit, or what is wrong with it. */
function readRow(row: Row, context: ImportContext): RevisionValueInput | string[] {
  const errors: string[] = [];
  const quantity = quantityOf(row.quantity);
  if (!quantity) {
    const shown = row.quantity.trim().slice(0, 40);
    return [
      `quantity: ${shown ? `"${shown}" is not a quantity` : 'empty'}; use one of ${QUANTITY_KEYS.join(', ')}.`,
    ];
  }
  const convert = unitOf(quantity, row.unit, context.system);
  if (typeof convert === 'string') errors.push(convert);
  const numbers: Record<'value' | 'low' | 'high' | 'sd', number | null> = {
    value: null,
    low: null,
    high: null,
    sd: null,
  };
  for (const key of ['value', 'low', 'high', 'sd'] as const) {
    const cell = row[key].trim();
    if (cell === '') {
      if (key === 'value') errors.push('value: empty.');
      continue;
    }
    if (!NUMBER.test(cell)) {
      const hint = /^-?\d+,\d+$/.test(cell) ? ' (use a point as the decimal mark)' : '';
      errors.push(`${key}: "${cell.slice(0, 20)}" is not a number${hint}.`);
    } else numbers[key] = typeof convert === 'string' ? Number(cell) : convert(Number(cell));
  }
  const typical = row.typical.trim().toLowerCase();
  if (!['', 'yes', 'no'].includes(typical))
    errors.push(`typical: "${row.typical.trim().slice(0, 20)}" must be yes or no.`);
  if (errors.length) return errors;
  const parsed = revisionValueSchema.safeParse({
    quantity,
    variant: row.variant,
    ...numbers,
    samples: row.samples.trim(),
    method: row.method,
    ripeness: row.ripeness,
    temperature: row.temperature,
    storage: row.storage,
    loadingRate: row.loading_rate,
    probe: row.probe,
    note: row.note,
    stage: row.stage.trim(),
    observation: row.observation.trim(),
    isTypicalDefault: typical === 'yes',
    typicalBasis: row.typical_basis.trim(),
    sourceKey: row.source_key,
  });
  if (!parsed.success)
    return parsed.error.issues.map((issue) => {
      const field = String(issue.path[0] ?? '');
      return `${FIELD_COLUMN[field] ?? field}: ${issue.message}`;
    });
  const key = parsed.data.sourceKey;
  if (key && !context.sourceKeys.has(key))
    return [`source_key: no source with the key "${key.slice(0, 80)}".`];
  return parsed.data;
}

type Identity = Pick<RevisionValueInput, 'quantity' | 'variant' | 'value' | 'sourceKey' | 'stage'>;
const identity = (v: Identity) =>
  [v.quantity, v.variant, v.value, v.sourceKey ?? '', v.stage ?? ''].join('\u0000');

/** A file's values, each checked; nothing is returned as a value unless every row passed. */
export function parseValueCsv(text: string, context: ImportContext): ImportResult {
  const body = text.replace(/^\uFEFF/, '');
  const firstLine = body.split(/\r\n|\n|\r/, 1)[0] ?? '';
  const delimiter = !firstLine.includes(',') && firstLine.includes(';') ? ';' : ',';
  const all = records(body, delimiter);
  if (!Array.isArray(all)) return { values: [], errors: [all] };
  if (!all.length) return { values: [], errors: [{ line: 1, message: 'The file is empty.' }] };
  const [head, ...rows] = all;
  const columns = readHeader(head.cells);
  if (typeof columns[0] !== 'string') return { values: [], errors: columns as LineError[] };
  if (!rows.length)
    return { values: [], errors: [{ line: 2, message: 'The file has a header but no values.' }] };
  if (rows.length > MAX_IMPORT_ROWS) {
    const message = `The file has ${rows.length} rows of values; at most ${MAX_IMPORT_ROWS} are imported at a time. Split the file.`;
    return { values: [], errors: [{ line: rows[MAX_IMPORT_ROWS].line, message }] };
  }
  const errors: LineError[] = [];
  const values: RevisionValueInput[] = [];
  const seen = new Map<string, number>();
  const held = new Set((context.existing ?? []).map(identity));
  for (const { line, cells } of rows) {
    if (cells.length !== columns.length) {
      const message = `${cells.length} cell${cells.length === 1 ? '' : 's'}, but the header has ${columns.length} columns.`;
      errors.push({ line, message });
      continue;
    }
    const row = Object.fromEntries(COLUMNS.map((c) => [c, ''])) as Row;
    columns.forEach((c, i) => (row[c as ImportColumn] = cells[i]));
    const read = readRow(row, context);
    if (Array.isArray(read)) {
      errors.push(...read.map((message) => ({ line, message })));
      continue;
    }
    const id = identity(read);
    const first = seen.get(id);
    if (first !== undefined)
      errors.push({
        line,
        message: `The same value as line ${first} (quantity, variant, value, source and stage): lines ${first} and ${line} repeat each other.`,
      });
    else if (held.has(id))
      errors.push({
        line,
        message:
          'The draft already holds this value (same quantity, variant, value, source and stage).',
      });
    seen.set(id, first ?? line);
    values.push(read);
  }
  return errors.length ? { values: [], errors } : { values, errors: [] };
}

/** The errors as field messages keyed "line N", the first MAX_LISTED of them and a count. */
export function lineErrors(errors: LineError[]): Record<string, string[]> {
  const out: Record<string, string[]> = {};
  for (const e of errors.slice(0, MAX_LISTED)) (out[`line ${e.line}`] ??= []).push(e.message);
  if (errors.length > MAX_LISTED)
    out.more = [`${errors.length - MAX_LISTED} more errors not listed; fix these first.`];
  return out;
}

/** The template: the header and one example row (a spreadsheet-safe CSV). */
export function templateCsv(sourceKey: string): string {
  const example: Record<ImportColumn, string | number> = {
    quantity: 'youngs_modulus',
    variant: 'flesh',
    value: 3.1,
    unit: 'MPa',
    low: 2.5,
    high: 3.8,
    sd: 0.4,
    samples: 20,
    method: 'Flesh cylinders in compression',
    ripeness: 'at harvest',
    stage: 'firm',
    observation: '',
    temperature: '20 °C',
    storage: '2 weeks at 1 °C',
    loading_rate: '20 mm/min',
    probe: '',
    note: 'Example row: replace it with your values.',
    typical: 'no',
    typical_basis: '',
    source_key: sourceKey,
  };
  return toCsv(COLUMNS, [COLUMNS.map((c) => example[c])]);
}
