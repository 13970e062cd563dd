import { readCsvRows } from './csv-rows';
import { fileError } from './decode';
import type { HeaderSpec } from './header';

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

// "time_s", "time s", "time/s", "Time (s)", "force [N]" — the spellings the compression header
// takes. A time in ms or min is refused rather than converted: a unit guessed wrong moves k₁ a
// thousand or sixty times, and the lab's own export can be set to seconds.
const RELAXATION_HEADER: HeaderSpec<'time' | 'force'> = {
  words: { time: 'time', t: 'time', force: 'force', load: 'force' },
  units: {
    time: { unit: 's', spellings: ['s', 'sec', 'secs', 'second', 'seconds'] },
    force: { unit: 'N', spellings: ['n', 'newton', 'newtons'] },
  },
  example: 'e.g. time_s,force_n or time (s),force (N)',
};

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
  const readings = readCsvRows(
    bytes,
    RELAXATION_HEADER,
    (values, row, previous: RelaxationReading | undefined) => {
      const reading = { timeS: values.time, forceN: values.force };
      checkReading(reading, previous, row);
      return reading;
    },
  );
  return { readings, rows: readings.length };
}
