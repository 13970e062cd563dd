import { CURVE, csvWithRow, hertzCsv } from './lab-tests-support';

const GOOD = hertzCsv({ ...CURVE, seed: 1 });
const utf16 = Buffer.concat([Buffer.from([0xff, 0xfe]), Buffer.from(GOOD, 'utf16le')]);
const badByte = Buffer.concat([
  Buffer.from('displacement_mm,force_n\n0,0\n0.1,'),
  Buffer.from([0xff, 0x31]),
  Buffer.from('\n0.2,2\n'),
]);
const tooMany = ['displacement (mm),force (N)'];
for (let i = 0; i <= 50_000; i++) tooMany.push(`${i},${i}`);
const big = Buffer.alloc(2 * 1024 * 1024 + 1, ' ');
Buffer.from('displacement_mm,force_n\n').copy(big);
/** Each bad file, with the message it must get: the row (the header is row 1) and the problem. */
export const BAD_FILES: [string, BlobPart, RegExp][] = [
  ['text in a number column', csvWithRow(7, '0.6,abc'), /^row 7: force is not a number \('abc'\)$/],
  [
    'decreasing displacement',
    csvWithRow(5, '0.1,4'),
    /^row 5: displacement 0\.1 mm does not increase on the row before \(0\.2 mm\)/,
  ],
  ['an empty file', '', /^the file is empty$/],
  ['a file of blank lines', '\n\n  \n', /^the file is empty$/],
  ['a file larger than 2 MB', big, /^the file is larger than 2 MB \(2 097 153 bytes/],
  [
    'more than 50 000 rows',
    tooMany.join('\n'),
    /^row 50002: the file has more than 50 000 data rows/,
  ],
  [
    'UTF-16 with a byte-order mark',
    utf16,
    /^the file is not UTF-8 text: it starts with a UTF-16 byte-order mark/,
  ],
  ['invalid UTF-8 bytes', badByte, /^row 3: the file is not UTF-8 text/],
  [
    'a =HYPERLINK(…) cell',
    csvWithRow(4, '0.3,"=HYPERLINK(""http://evil.example"",""x"")"'),
    /^row 4: force '=HYPERLINK\("http:\/\/evil\.example","x"\)' looks like a spreadsheet formula; formulas are refused$/,
  ],
  [
    'a + cell',
    csvWithRow(6, '0.5,+1+2'),
    /^row 6: force '\+1\+2' looks like a spreadsheet formula/,
  ],
  [
    'an @ cell',
    csvWithRow(9, '@SUM(A1),3'),
    /^row 9: displacement '@SUM\(A1\)' looks like a spreadsheet formula/,
  ],
  [
    'a - that starts no number',
    csvWithRow(3, '-A1+B1,3'),
    /^row 3: displacement '-A1\+B1' looks like a spreadsheet formula/,
  ],
  ['a negative force', csvWithRow(3, '0.1,-0.02'), /^row 3: force is negative \(-0\.02 N\)/],
  [
    'a header without units',
    csvWithRow(1, 'displacement,force'),
    /^row 1: the displacement column names no unit/,
  ],
  [
    'a header in other units',
    csvWithRow(1, 'displacement (mm),force (kN)'),
    /^row 1: force is in 'kN'; give it in N$/,
  ],
  [
    'no header',
    csvWithRow(1, '0,0'),
    /^row 1: the first row must be a header naming columns and units/,
  ],
  ['a header only', 'displacement_mm,force_n\n', /^row 2: the file has a header but no data rows$/],
  [
    'too few readings in the fitted range',
    csvWithRow(1, 'displacement_mm,force_n').split('\n').slice(0, 5).join('\n'),
    /^only 3 readings lie in the fitted range \(0 < displacement ≤ 3\.5 mm, 5 % of the 70 mm diameter\); at least 5 are needed$/,
  ],
];

/** Bad sample fields with a good file: the field named and its message. */
export const BAD_FIELDS: [string, Record<string, string>, string, RegExp][] = [
  [
    'diameter not a number',
    { diameterMm: 'abc', poisson: '0.35' },
    'diameterMm',
    /must be a number in mm/,
  ],
  [
    'diameter zero',
    { diameterMm: '0', poisson: '0.35' },
    'diameterMm',
    /above 0 and at most 500 mm/,
  ],
  ['no diameter or radii', { poisson: '0.35' }, 'diameterMm', /Give the sample's diameter in mm/],
  [
    'diameter and radii',
    { diameterMm: '70', radius1Mm: '30', radius2Mm: '40', poisson: '0.35' },
    'diameterMm',
    /not both/,
  ],
  ['one radius only', { radius1Mm: '30', poisson: '0.35' }, 'radius2Mm', /Give both radii/],
  ['ν of 0.5', { diameterMm: '70', poisson: '0.5' }, 'poisson', /above 0 and below 0\.5/],
  ['ν negative', { diameterMm: '70', poisson: '-0.1' }, 'poisson', /above 0 and below 0\.5/],
  ['ν missing', { diameterMm: '70' }, 'poisson', /Give Poisson's ratio/],
];
