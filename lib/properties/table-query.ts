import { isQuantity, type Quantity } from './quantities';

/**
 * The properties table's view as it lives in the address: `?sort=-density&commodity=apple&q=jon
 * &range=density&min=1000&max=1100&cols=youngs_modulus,density&page=2&size=25`. Parsing never
 * throws: an unknown column, a bad number or a stray parameter (`__proto__`) is dropped.
 */
export type SortColumn = 'name' | 'commodity' | Quantity;

export interface TableQuery {
  sort: { id: SortColumn; desc: boolean } | null;
  commodity: string | null;
  q: string;
  range: { column: Quantity; min: number | null; max: number | null } | null;
  columns: Quantity[];
  /** Zero-based, as TanStack Table counts. */
  pageIndex: number;
  pageSize: number;
}

export const DEFAULT_COLUMNS: Quantity[] = [
  'youngs_modulus',
  'poisson_ratio',
  'density',
  'diameter',
  'mass',
  'static_bruise_threshold',
  'failure_stress',
];
export const PAGE_SIZES = [10, 25, 50, 100];
export const DEFAULT_PAGE_SIZE = 10;

type Params = Record<string, string | string[] | undefined> | URLSearchParams;

function read(params: Params, key: string): string | null {
  if (params instanceof URLSearchParams) return params.get(key);
  if (!Object.hasOwn(params, key)) return null;
  const v = params[key];
  return (Array.isArray(v) ? v[0] : v) ?? null;
}

function finite(text: string | null): number | null {
  if (text === null || text.trim() === '') return null;
  const n = Number(text);
  return Number.isFinite(n) ? n : null;
}

function wholeIn(text: string | null, min: number, max: number): number | null {
  const n = finite(text);
  return n !== null && Number.isInteger(n) && n >= min && n <= max ? n : null;
}

function parseSort(text: string | null): TableQuery['sort'] {
  if (!text) return null;
  const desc = text.startsWith('-');
  const id = desc ? text.slice(1) : text;
  if (id === 'name' || id === 'commodity' || isQuantity(id)) return { id, desc };
  return null;
}

function parseColumns(text: string | null): Quantity[] {
  if (text === null) return DEFAULT_COLUMNS;
  return [...new Set(text.split(',').filter(isQuantity))];
}

export function parseTableQuery(params: Params): TableQuery {
  const column = read(params, 'range');
  const range = isQuantity(column)
    ? { column, min: finite(read(params, 'min')), max: finite(read(params, 'max')) }
    : null;
  const commodity = read(params, 'commodity');
  return {
    sort: parseSort(read(params, 'sort')),
    commodity: commodity && /^[a-z0-9-]{1,80}$/.test(commodity) ? commodity : null,
    q: (read(params, 'q') ?? '').slice(0, 100),
    range,
    columns: parseColumns(read(params, 'cols')),
    pageIndex: (wholeIn(read(params, 'page'), 1, 100_000) ?? 1) - 1,
    pageSize: wholeIn(read(params, 'size'), 1, 100) ?? DEFAULT_PAGE_SIZE,
  };
}

const sameColumns = (a: Quantity[], b: Quantity[]) =>
  a.length === b.length && a.every((x, i) => x === b[i]);

/** The query string of a view, leaving out what is at its default. */
export function tableQueryString(q: TableQuery): string {
  const p = new URLSearchParams();
  if (q.sort) p.set('sort', `${q.sort.desc ? '-' : ''}${q.sort.id}`);
  if (q.commodity) p.set('commodity', q.commodity);
  if (q.q) p.set('q', q.q);
  if (q.range) {
    p.set('range', q.range.column);
    if (q.range.min !== null) p.set('min', String(q.range.min));
    if (q.range.max !== null) p.set('max', String(q.range.max));
  }
  if (!sameColumns(q.columns, DEFAULT_COLUMNS)) p.set('cols', q.columns.join(','));
  if (q.pageIndex > 0) p.set('page', String(q.pageIndex + 1));
  if (q.pageSize !== DEFAULT_PAGE_SIZE) p.set('size', String(q.pageSize));
  // Commas may stand bare in a query; the column list reads better without %2C.
  const text = p.toString().replace(/%2C/g, ',');
  return text ? `?${text}` : '';
}
