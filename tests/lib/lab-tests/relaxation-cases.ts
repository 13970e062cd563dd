import { PELEG, pelegCsv, relaxationWithRow } from '../../support/peleg-curve';

const GOOD = pelegCsv(PELEG);
const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(GOOD, 'utf16le')]);
const badByte = Buffer.concat([
  Buffer.from('time_s,force_n\n0,30\n1,'),
  Buffer.from([0xff, 0x32]),
  Buffer.from('\n2,24\n'),
]);
const tooMany = ['time (s),force (N)'];
for (let i = 0; i <= 50_000; i++) tooMany.push(`${i},${30 - i / 10_000}`);
const big = Buffer.alloc(2 * 1024 * 1024 + 1, ' ');
Buffer.from('time_s,force_n\n').copy(big);
const flat = ['time_s,force_n', '0,30', '1,30', '2,30', '3,30', '4,30'].join('\n');

/** Each bad file, with the message it must get: the row (the header is row 1) and the problem. */
export const BAD_RELAXATION_FILES: [string, BlobPart, RegExp][] = [
  [
    'wrong columns (a compression file)',
    relaxationWithRow(1, 'displacement_mm,force_n'),
    /^row 1: the header has no time column with its unit, e\.g\. time_s,force_n or time \(s\),force \(N\)$/,
  ],
  ['time in ms', relaxationWithRow(1, 'time_ms,force_n'), /^row 1: time is in 'ms'; give it in s$/],
  [
    'time in min',
    relaxationWithRow(1, 'time (min),force (N)'),
    /^row 1: time is in 'min'; give it in s$/,
  ],
  [
    'force in kN',
    relaxationWithRow(1, 'time (s),force (kN)'),
    /^row 1: force is in 'kN'; give it in N$/,
  ],
  [
    'a header without units',
    relaxationWithRow(1, 'time,force'),
    /^row 1: the time column names no unit/,
  ],
  [
    'no header',
    relaxationWithRow(1, '0,30'),
    /^row 1: the first row must be a header naming columns and units/,
  ],
  [
    'decreasing time',
    relaxationWithRow(6, '2.5,20'),
    /^row 6: time 2\.5 s does not increase on the row before \(3 s\); times must strictly increase$/,
  ],
  [
    'a repeated time',
    relaxationWithRow(6, '3,20'),
    /^row 6: time 3 s does not increase on the row before \(3 s\)/,
  ],
  [
    'first row not at t = 0',
    relaxationWithRow(2, '0.5,30'),
    /^row 2: the first reading is at 0\.5 s; it must be at t = 0 s, the end of loading/,
  ],
  [
    'a negative force',
    relaxationWithRow(8, '6,-0.5'),
    /^row 8: force is negative \(-0\.5 N\); give compressive force as positive/,
  ],
  [
    'a =SUM(…) cell',
    relaxationWithRow(4, '2,=SUM(B2:B3)'),
    /^row 4: force '=SUM\(B2:B3\)' looks like a spreadsheet formula; formulas are refused$/,
  ],
  [
    'an @ cell in the time column',
    relaxationWithRow(9, '@A1,3'),
    /^row 9: time '@A1' looks like a spreadsheet formula; formulas are refused$/,
  ],
  [
    'text in a number column',
    relaxationWithRow(7, '5,abc'),
    /^row 7: force is not a number \('abc'\)$/,
  ],
  ['a row short of cells', relaxationWithRow(5, '3'), /^row 5: 1 cells, but the header has 2$/],
  [
    'more than 50 000 rows',
    tooMany.join('\n'),
    /^row 50002: the file has more than 50 000 data rows; at most 50 000 are accepted$/,
  ],
  ['invalid UTF-8 bytes', badByte, /^row 3: the file is not UTF-8 text/],
  [
    'UTF-16 with a byte-order mark',
    utf16,
    /^the file is not UTF-8 text: it starts with a UTF-16 byte-order mark/,
  ],
  ['an empty file', '', /^the file is empty$/],
  ['a file larger than 2 MB', big, /^the file is larger than 2 MB \(2 097 153 bytes/],
  ['a header only', 'time_s,force_n\n', /^row 2: the file has a header but no data rows$/],
  [
    'a force that never falls',
    flat,
    /^the readings cannot be fitted: the force does not fall below its first reading: nothing relaxes$/,
  ],
  [
    'three readings',
    'time_s,force_n\n0,30\n1,27\n2,25\n',
    /^the readings cannot be fitted: at least four readings are needed for a fit$/,
  ],
  [
    'no force at t = 0',
    relaxationWithRow(2, '0,0'),
    /^the readings cannot be fitted: the force at t = 0 must be positive$/,
  ],
];
