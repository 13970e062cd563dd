import { climb, type EvidenceSet } from '@/lib/evidence/ladder';
import type { Rung } from '@/lib/evidence/rungs';
import type { Quantity } from '@/lib/properties/quantities';
import type { CultivarRecord, RevisionValue, SourceRef } from '@/lib/properties/records';
import { COVERED_CHECKS, coverageOf, type CoveredCheck, type RecordCoverage } from './coverage';
import { evidenceForRecords } from './evidence-set';

/**
 * The data gaps of the knowledge base, with no I/O: per record and per figure the checks take
 * (from coverageOf, so it is the checks' own answer), the rung it comes from; per check how many
 * cultivars run on their own data; and which measurement would move the most check inputs to
 * a record's own value. A commodity record's published values are its own.
 */
export type GapRung = Exclude<Rung, 'entered'> | 'missing';
export const GAP_RUNGS: readonly GapRung[] = ['own', 'commodity', 'derived', 'typical', 'missing'];

export interface GapCell {
  rung: GapRung;
  /** Derived from the record's own values only (counts as own data). */
  fromOwn: boolean;
  /** The checks that take this figure for this record. */
  checks: CoveredCheck[];
  /** Why the rung is not what coverage says, when it is not. */
  note?: string;
}

export interface GapRow {
  slug: string;
  name: string;
  commodity: string;
  commoditySlug: string;
  isCommodityRecord: boolean;
  cells: Record<string, GapCell>;
  /** Figures on the record's own values (own, or derived from own). */
  ownCount: number;
  runs: Record<CoveredCheck, boolean>;
  /** The check runs and every figure it takes is the record's own (or derived from it). */
  ownOnly: Record<CoveredCheck, boolean>;
}

export interface DataGaps {
  /** Figure names in the order the checks list them, each once. */
  figures: string[];
  rows: GapRow[];
}

// When the fruit cannot be resolved, coverageOf stops at the first missing figure. To learn the
// rungs of the others, a stand-in value is put where the figure is missing and coverage is asked
// again; the stand-in's figures (and anything derived from them) are then shown as missing.
const PROBE_SOURCE: SourceRef = {
  ...{ id: -1, key: '(gaps probe)', kind: 'paper', authors: null, year: null },
  ...{ title: '(gaps probe)', venue: null, pages: null, doi: null, url: null, note: null },
};
const PROBES: Record<string, { quantity: Quantity; variant: string; value: number; unit: string }> =
  {
    modulusMpa: { quantity: 'youngs_modulus', variant: 'apparent', value: 3, unit: 'MPa' },
    poisson: { quantity: 'poisson_ratio', variant: '', value: 0.3, unit: '–' },
    diameterMm: { quantity: 'diameter', variant: 'equatorial', value: 70, unit: 'mm' },
    massG: { quantity: 'density', variant: '', value: 900, unit: 'kg/m³' },
  };
const PROBED_FIGURES: Record<string, string[]> = {
  modulusMpa: ["Young's modulus"],
  poisson: ["Poisson's ratio"],
  diameterMm: ['Diameter'],
  massG: ['Mass', 'Density'],
};

/** The figures a derived figure is computed from (lib/checks/fruit.ts, nothing typed). */
const DERIVED_FROM: Record<string, string[]> = {
  Mass: ['Density', 'Diameter', 'Axial diameter'],
  Density: ['Mass', 'Diameter', 'Axial diameter'],
};

/** Figures derived from one quantity the matrix does not show (lib/checks/fruit.ts, stack/figures.ts). */
const DERIVED_FROM_QUANTITY: Record<string, Quantity> = {
  'Static bruise threshold': 'bioyield_stress',
  'Lateral pressure ratio': 'angle_of_repose',
};

function probeValue(field: string): RevisionValue {
  const p = PROBES[field];
  return {
    ...{ id: -1, quantity: p.quantity, variant: p.variant, value: p.value, unit: p.unit },
    ...{ low: null, high: null, sd: null, samples: null, method: null, ripeness: null },
    ...{ temperature: null, storage: null, loadingRate: null, probe: null, note: null },
    ...{ isTypicalDefault: false, stage: null, observation: null, typicalBasis: null },
    source: PROBE_SOURCE,
  };
}

const AXIAL = 'Axial diameter';
const ROUND_NOTE = 'No axial diameter on any rung: the checks take the fruit as round.';

const FRUIT_FAILED = /^fruit \((\w+)\)$/;

/** Coverage of a record, every figure reached; the probed figures are returned as missing. */
function fullCoverage(record: CultivarRecord, all: CultivarRecord[]) {
  const first = coverageOf(record, all);
  let coverage = first;
  const probed: string[] = [];
  for (let i = 0; i < Object.keys(PROBES).length; i++) {
    const failed = coverage.figures.map((f) => FRUIT_FAILED.exec(f.figure)?.[1]).find(Boolean);
    if (!failed || !PROBES[failed] || probed.includes(failed)) break;
    probed.push(failed);
    const values = [...record.values, ...probed.map(probeValue)];
    coverage = coverageOf({ ...record, values }, all);
  }
  const missing = new Set(probed.flatMap((f) => PROBED_FIGURES[f]));
  return { runs: first.runs, coverage, missing };
}

/** Whether a figure derived from one quantity (a bioyield stress, an angle of repose) used the record's own. */
function quantityIsOwn(record: CultivarRecord, set: EvidenceSet, quantity: Quantity): boolean {
  const rung = climb(set, { quantity }, { unit: '' })?.used.rung;
  return rung === (record.isType ? 'commodity' : 'own');
}

function cellsOf(
  record: CultivarRecord,
  all: CultivarRecord[],
  coverage: RecordCoverage,
  probed: Set<string>,
): Record<string, GapCell> {
  const cells: Record<string, GapCell> = {};
  for (const f of coverage.figures) {
    if (FRUIT_FAILED.test(f.figure)) continue;
    const cell = (cells[f.figure] ??= { rung: 'missing', fromOwn: false, checks: [] });
    cell.checks.push(f.check);
    let rung: GapRung = f.rung === 'entered' ? 'own' : f.rung;
    if (probed.has(f.figure) || f.source === PROBE_SOURCE.title) rung = 'missing';
    // A commodity record's published values are its own.
    if (record.isType && rung === 'commodity') rung = 'own';
    cell.rung = rung;
  }
  const set = evidenceForRecords(record, all, null);
  const inputsOf = (figure: string) => (DERIVED_FROM[figure] ?? []).map((i) => cells[i]);
  // Derived from a stand-in is derived from nothing.
  for (const [figure, cell] of Object.entries(cells))
    if (cell.rung === 'derived' && inputsOf(figure).some((i) => i?.rung === 'missing'))
      cell.rung = 'missing';
  // An axial diameter no rung holds is the equatorial one, assumed: not a measurement.
  if (cells[AXIAL] && !climb(set, { quantity: 'diameter', variants: ['axial'] }, { unit: 'mm' }))
    Object.assign(cells[AXIAL], { rung: 'missing', note: ROUND_NOTE });
  for (const [figure, cell] of Object.entries(cells)) {
    if (cell.rung !== 'derived') continue;
    if (DERIVED_FROM[figure]) cell.fromOwn = inputsOf(figure).every((i) => i?.rung === 'own');
    else if (DERIVED_FROM_QUANTITY[figure])
      cell.fromOwn = quantityIsOwn(record, set, DERIVED_FROM_QUANTITY[figure]);
  }
  return cells;
}

const isOwnData = (c: GapCell) => c.rung === 'own' || (c.rung === 'derived' && c.fromOwn);

/** The matrix of every record against every figure the checks take. */
export function dataGaps(records: CultivarRecord[]): DataGaps {
  const figures: string[] = [];
  const rows = records.map((record): GapRow => {
    const { runs, coverage, missing } = fullCoverage(record, records);
    const cells = cellsOf(record, records, coverage, missing);
    for (const f of Object.keys(cells)) if (!figures.includes(f)) figures.push(f);
    const list = Object.values(cells);
    const ownOnly = Object.fromEntries(
      COVERED_CHECKS.map((check) => {
        const taken = list.filter((c) => c.checks.includes(check));
        return [check, runs[check] && taken.length > 0 && taken.every(isOwnData)];
      }),
    ) as Record<CoveredCheck, boolean>;
    return {
      slug: record.slug,
      name: record.name,
      commodity: record.commodity.name,
      commoditySlug: record.commodity.slug,
      isCommodityRecord: record.isType,
      cells,
      ownCount: list.filter(isOwnData).length,
      runs,
      ownOnly,
    };
  });
  return { figures, rows };
}

export interface CheckSummary {
  check: CoveredCheck;
  /** Cultivars (commodity records left out) that run with every figure their own. */
  ownOnly: number;
  /** Cultivars the check runs for at all. */
  runs: number;
  cultivars: number;
}

/** Per check, over the cultivars (not the commodity records): own data only, and at all. */
export function checkSummaries(rows: GapRow[]): CheckSummary[] {
  const cultivars = rows.filter((r) => !r.isCommodityRecord);
  return COVERED_CHECKS.map((check) => ({
    check,
    ownOnly: cultivars.filter((r) => r.ownOnly[check]).length,
    runs: cultivars.filter((r) => r.runs[check]).length,
    cultivars: cultivars.length,
  }));
}

export interface WantedMeasurement {
  slug: string;
  name: string;
  commodity: string;
  isCommodityRecord: boolean;
  figure: string;
  rung: GapRung;
  /** Check inputs of the record itself that the measurement would make its own. */
  ownInputs: number;
  /** Check inputs of cultivars that would take it from the commodity record instead. */
  inheritedInputs: number;
  /** How many cultivars those are. */
  inheritingCultivars: number;
  score: number;
}

const INHERITS_GAP: GapRung[] = ['typical', 'missing'];

/**
 * Measurements not yet a record's own, ranked by the check inputs they would move to own data:
 * each check taking the figure counts once; a commodity record's gap also counts for every
 * cultivar of it that falls to a typical value or nothing for that figure.
 */
export function mostWanted(rows: GapRow[], limit = 20): WantedMeasurement[] {
  const out: WantedMeasurement[] = [];
  for (const row of rows) {
    for (const [figure, cell] of Object.entries(row.cells)) {
      if (isOwnData(cell)) continue;
      const heirs = row.isCommodityRecord
        ? rows.filter(
            (r) =>
              !r.isCommodityRecord &&
              r.commoditySlug === row.commoditySlug &&
              INHERITS_GAP.includes(r.cells[figure]?.rung ?? 'own'),
          )
        : [];
      const inherited = heirs.reduce((n, r) => n + r.cells[figure].checks.length, 0);
      out.push({
        ...{ slug: row.slug, name: row.name, commodity: row.commodity, figure },
        isCommodityRecord: row.isCommodityRecord,
        rung: cell.rung,
        ownInputs: cell.checks.length,
        inheritedInputs: inherited,
        inheritingCultivars: heirs.length,
        score: cell.checks.length + inherited,
      });
    }
  }
  const name = (w: WantedMeasurement) => `${w.commodity} ${w.name} ${w.figure}`;
  return out.sort((a, b) => b.score - a.score || name(a).localeCompare(name(b))).slice(0, limit);
}

export type GapSort = 'name' | 'own';

/** Rows of one commodity (slug) and with at least one cell on a rung, sorted. */
export function selectRows(
  rows: GapRow[],
  query: { commodity?: string; rung?: GapRung; sort?: GapSort },
): GapRow[] {
  const picked = rows.filter(
    (r) =>
      (!query.commodity || r.commoditySlug === query.commodity) &&
      (!query.rung || Object.values(r.cells).some((c) => c.rung === query.rung)),
  );
  const byName = (a: GapRow, b: GapRow) =>
    a.commodity.localeCompare(b.commodity) ||
    Number(b.isCommodityRecord) - Number(a.isCommodityRecord) ||
    a.name.localeCompare(b.name);
  return picked.sort(
    query.sort === 'own' ? (a, b) => b.ownCount - a.ownCount || byName(a, b) : byName,
  );
}
