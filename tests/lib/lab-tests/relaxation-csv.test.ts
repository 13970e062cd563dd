import { describe, expect, it } from 'vitest';
import { ValidationError } from '@/lib/errors';
import { parseRelaxationCsv } from '@/lib/lab-tests/relaxation-csv';
import { fitRelaxation } from '@/lib/lab-tests/relaxation-fit';
import { PELEG, pelegCsv } from '../../support/peleg-curve';
import { BAD_RELAXATION_FILES } from './relaxation-cases';

const bytes = (part: BlobPart) =>
  typeof part === 'string' ? new TextEncoder().encode(part) : new Uint8Array(part as Buffer);

/** Parse and fit as an upload does; the refusal, if any, as it reaches the form. */
function read(part: BlobPart) {
  try {
    const { readings } = parseRelaxationCsv(bytes(part));
    return { fit: fitRelaxation(readings), error: null };
  } catch (error) {
    if (!(error instanceof ValidationError)) throw error;
    return { fit: null, error };
  }
}

describe('relaxation CSV refusals', () => {
  for (const [name, file, message] of BAD_RELAXATION_FILES) {
    it(`${name}: a file error naming the row`, () => {
      const { error } = read(file);
      expect(error?.message).toMatch(message);
      // The message goes beside the file field, as the compression upload's do.
      expect(error?.fieldErrors).toEqual({ file: [error?.message] });
    });
  }
});

describe('relaxation CSV reading', () => {
  it('reads every row of a good file, time in s and force in N as written', () => {
    const { readings, rows } = parseRelaxationCsv(bytes(pelegCsv(PELEG)));
    // 0 … 120 s every 0.5 s: 241 rows.
    expect(rows).toBe(241);
    expect(readings[0]).toEqual({ timeS: 0, forceN: 30 });
    // F(1) = 30·(1 − 1 ÷ (8 + 1.6)) = 30·(1 − 0.1041667) = 26.875000, written to 6 decimals.
    expect(readings[2]).toEqual({ timeS: 1, forceN: 26.875 });
    expect(readings.at(-1)!.timeS).toBe(120);
  });

  it('accepts the header spellings it promises, semicolons, tabs and extra columns', () => {
    const body = pelegCsv(PELEG).trimEnd().split('\n').slice(1);
    const files = [
      ['time (s),force (N)', body.join('\n')],
      ['Time [s];Force [N]', body.map((l) => l.replace(',', ';')).join('\n')],
      ['t_s\tdeformation_mm\tload_n', body.map((l) => l.replace(',', '\t5\t')).join('\n')],
      ['force newton,time seconds', body.map((l) => l.split(',').reverse().join(',')).join('\n')],
      ['\uFEFFtime_s,force_n', body.join('\r\n')],
    ];
    for (const [header, rows] of files) {
      const { readings } = parseRelaxationCsv(bytes(`${header}\n${rows}\n`));
      expect([header, readings.length, readings[2]]).toEqual([
        header,
        241,
        { timeS: 1, forceN: 26.875 },
      ]);
    }
  });

  it('skips blank lines, and still names the right row after them', () => {
    const text = 'time_s,force_n\n0,30\n\n1,27\n\n2,-1\n';
    const { error } = read(text);
    expect(error?.message).toMatch(/^row 6: force is negative/);
  });
});
