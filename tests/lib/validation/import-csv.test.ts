import { describe, expect, it } from 'vitest';
import { toCsv } from '@/lib/csv';
import {
  decodeImport,
  lineErrors,
  parseValueCsv,
  templateCsv,
  type ImportContext,
} from '@/lib/validation/import-csv';

const HEADER =
  'quantity,variant,value,unit,low,high,sd,samples,method,ripeness,stage,observation,temperature,storage,loading_rate,probe,note,typical,typical_basis,source_key';
const SI: ImportContext = { system: 'si', sourceKeys: new Set(['lab-2024', 'thesis-1979']) };
const US: ImportContext = { ...SI, system: 'us' };

/** A row from the cells that matter, the rest empty. */
function row(cells: Partial<Record<string, string>>): string {
  return HEADER.split(',')
    .map((c) => cells[c] ?? '')
    .join(',');
}
const modulus = (value: string, extra: Partial<Record<string, string>> = {}) =>
  row({
    quantity: 'youngs_modulus',
    variant: 'flesh',
    value,
    unit: 'MPa',
    source_key: 'lab-2024',
    ...extra,
  });
const file = (...rows: string[]) => [HEADER, ...rows].join('\r\n') + '\r\n';

describe('a good file', () => {
  it('gives every row as a draft value in the canonical unit', () => {
    const text = file(
      modulus('3.1', { low: '2.5', high: '3.8', sd: '0.4', samples: '20', stage: 'firm' }),
      row({
        quantity: "Poisson's ratio",
        value: '0.35',
        unit: '–',
        typical: 'yes',
        typical_basis: 'common practice',
      }),
      row({
        quantity: 'drop_threshold_height',
        variant: 'steel',
        value: '300',
        unit: 'mm',
        observation: 'no-bruise',
        source_key: 'thesis-1979',
        note: '"Dropped onto a plate, ""no bruise"", at 20 °C"',
      }),
    );
    const { values, errors } = parseValueCsv(text, SI);
    expect(errors).toEqual([]);
    expect(values).toHaveLength(3);
    expect(values[0]).toMatchObject({
      quantity: 'youngs_modulus',
      variant: 'flesh',
      value: 3.1,
      low: 2.5,
      high: 3.8,
      sd: 0.4,
      samples: 20,
      stage: 'firm',
      isTypicalDefault: false,
      sourceKey: 'lab-2024',
    });
    expect(values[1]).toMatchObject({
      quantity: 'poisson_ratio',
      isTypicalDefault: true,
      typicalBasis: 'common practice',
      sourceKey: null,
    });
    expect(values[2].note).toBe('Dropped onto a plate, "no bruise", at 20 °C');
  });

  it('takes the columns in any order and leaves optional ones out', () => {
    const text = 'source_key,Value,unit,quantity,variant\nlab-2024,62,mm,diameter,equatorial\n';
    expect(parseValueCsv(text, SI).values).toMatchObject([
      { quantity: 'diameter', variant: 'equatorial', value: 62, sourceKey: 'lab-2024' },
    ]);
  });

  it('converts the US unit of a US user exactly (1 in = 25.4 mm; 1 psi = 6.894757… kPa)', () => {
    const text = file(
      row({
        quantity: 'diameter',
        variant: 'axial',
        value: '2.5',
        unit: 'in',
        source_key: 'lab-2024',
      }),
      row({
        quantity: 'static_bruise_threshold',
        value: '10',
        low: '5',
        high: '20',
        unit: 'psi',
        source_key: 'lab-2024',
      }),
    );
    const { values, errors } = parseValueCsv(text, US);
    expect(errors).toEqual([]);
    expect(values[0].value).toBe(63.5);
    // 1 lbf / in² = 4.4482216152605 N / 0.00064516 m² = 6894.757293168 Pa.
    expect(values[1].value).toBeCloseTo(68.94757293168, 9);
    expect(values[1].low).toBeCloseTo(34.47378646584, 9);
    expect(values[1].high).toBeCloseTo(137.89514586336, 9);
  });

  it('skips blank lines and still names rows by their line in the file', () => {
    const text = [HEADER, '', modulus('3'), '', modulus('x')].join('\n');
    expect(parseValueCsv(text, SI).errors).toEqual([
      { line: 5, message: 'value: "x" is not a number.' },
    ]);
  });

  it('counts the lines of a quoted cell that spans lines', () => {
    const text = [HEADER, modulus('3', { note: '"two\nlines"' }), modulus('-1')].join('\n');
    expect(parseValueCsv(text, SI).errors[0]).toMatchObject({ line: 4 });
  });

  it('reads a semicolon file and drops a byte-order mark', () => {
    const text = `\uFEFF${HEADER.replaceAll(',', ';')}\n${modulus('3').replaceAll(',', ';')}\n`;
    expect(parseValueCsv(text, SI).values).toHaveLength(1);
  });
});

describe('a file with errors', () => {
  const errorsOf = (text: string, context = SI) => {
    const result = parseValueCsv(text, context);
    expect(result.values).toEqual([]);
    return result.errors;
  };

  it('names unknown, repeated and missing columns on line 1', () => {
    const errors = errorsOf('quantity,variant,value,value,colour\nyoungs_modulus,flesh,3,3,red\n');
    expect(errors.map((e) => e.line)).toEqual([1, 1, 1]);
    expect(errors[0].message).toMatch(/^Unknown column: "colour"\. The columns are: quantity,/);
    expect(errors[1].message).toBe('Column given twice: value.');
    expect(errors[2].message).toBe('Missing column: unit.');
  });

  it('refuses a unit that is not the quantity’s, naming the one expected', () => {
    const errors = errorsOf(file(modulus('3000', { unit: 'kPa' }), modulus('3', { unit: 'psi' })));
    expect(errors).toEqual([
      { line: 2, message: `unit "kPa" does not match Young's modulus: use MPa.` },
      { line: 3, message: `unit "psi" does not match Young's modulus: use MPa.` },
    ]);
    // A US user may also use psi, and is told so.
    expect(errorsOf(file(modulus('3', { unit: 'GPa' })), US)[0].message).toBe(
      `unit "GPa" does not match Young's modulus: use MPa or psi (your US units).`,
    );
  });

  it('refuses a source that does not exist', () => {
    expect(errorsOf(file(modulus('3'), modulus('4', { source_key: 'nobody-2030' })))).toEqual([
      { line: 3, message: 'source_key: no source with the key "nobody-2030".' },
    ]);
  });

  it('refuses a repeated value, naming both lines', () => {
    const errors = errorsOf(file(modulus('3'), modulus('4'), modulus('3')));
    expect(errors).toEqual([
      {
        line: 4,
        message:
          'The same value as line 2 (quantity, variant, value, source and stage): lines 2 and 4 repeat each other.',
      },
    ]);
    // The same number at another stage is another value.
    expect(parseValueCsv(file(modulus('3'), modulus('3', { stage: 'ripe' })), SI).errors).toEqual(
      [],
    );
  });

  it('refuses a value the draft already holds', () => {
    const existing = [
      {
        quantity: 'youngs_modulus' as const,
        variant: 'flesh',
        value: 3,
        sourceKey: 'lab-2024',
        stage: null,
      },
    ];
    expect(errorsOf(file(modulus('3')), { ...SI, existing })[0]).toEqual({
      line: 2,
      message:
        'The draft already holds this value (same quantity, variant, value, source and stage).',
    });
  });

  it('applies the draft form’s rules to every row, naming the column', () => {
    const errors = errorsOf(
      file(
        modulus('3', { low: '2' }),
        modulus('3', { source_key: '' }),
        row({
          quantity: 'drop_threshold_height',
          variant: 'steel',
          value: '300',
          unit: 'mm',
          source_key: 'lab-2024',
        }),
        row({ quantity: 'poisson_ratio', value: '0.7', unit: '-', typical: 'yes' }),
        modulus('3', { variant: 'skin' }),
        row({ quantity: 'hardness', value: '3', unit: 'MPa' }),
        modulus('"3,5"'),
        modulus('3', { typical: 'maybe' }),
      ),
    );
    expect(errors).toEqual([
      { line: 2, message: 'high: Give both ends of the range, or neither.' },
      {
        line: 3,
        message: 'source_key: Name the source of this value, or mark it as a typical default.',
      },
      {
        line: 4,
        message:
          'observation: Say what kind of observation this is: no bruise at this level, fruit bruised at it, or a recommended maximum.',
      },
      { line: 5, message: "value: Poisson's ratio must be from 0 and below 0.5." },
      {
        line: 5,
        message:
          'typical_basis: Say why this typical value is kept: common practice or from memory.',
      },
      { line: 6, message: 'variant: Choose one of: apparent, flesh.' },
      {
        line: 7,
        message: expect.stringMatching(
          /^quantity: "hardness" is not a quantity; use one of youngs_modulus,/,
        ),
      },
      { line: 8, message: 'value: "3,5" is not a number (use a point as the decimal mark).' },
      { line: 9, message: 'typical: "maybe" must be yes or no.' },
    ]);
  });

  it('refuses a row whose cells do not match the header', () => {
    expect(errorsOf(`${HEADER}\nyoungs_modulus,flesh,3\n`)).toEqual([
      { line: 2, message: '3 cells, but the header has 20 columns.' },
    ]);
  });

  it('refuses more than 2000 rows at once, quickly, naming the count', () => {
    const many = Array.from({ length: 10_000 }, (_, i) => modulus(String(1 + i / 10_000)));
    const started = performance.now();
    const errors = errorsOf(file(...many));
    expect(performance.now() - started).toBeLessThan(1000);
    expect(errors).toEqual([
      {
        line: 2002,
        message:
          'The file has 10000 rows of values; at most 2000 are imported at a time. Split the file.',
      },
    ]);
    // 2000 rows are read.
    expect(parseValueCsv(file(...many.slice(0, 2000)), SI).values).toHaveLength(2000);
  });

  it('refuses an empty file, a header alone and an unclosed quote', () => {
    expect(errorsOf('')).toEqual([{ line: 1, message: 'The file is empty.' }]);
    expect(errorsOf(`${HEADER}\n`)).toEqual([
      { line: 2, message: 'The file has a header but no values.' },
    ]);
    expect(errorsOf(`${HEADER}\n${modulus('3', { note: '"open' })}`)).toEqual([
      { line: 2, message: 'A quoted cell is not closed.' },
    ]);
  });

  it('lists errors by line, at most 100, and counts the rest', () => {
    const errors = Array.from({ length: 150 }, (_, i) => ({ line: i + 2, message: 'bad' }));
    const listed = lineErrors(errors);
    expect(Object.keys(listed)).toHaveLength(101);
    expect(listed['line 2']).toEqual(['bad']);
    expect(listed.more).toEqual(['50 more errors not listed; fix these first.']);
  });
});

describe('decoding the bytes', () => {
  it('takes UTF-8 and refuses other encodings and oversized files', () => {
    expect(decodeImport(new TextEncoder().encode('a,b'))).toEqual({ text: 'a,b' });
    expect(decodeImport(new Uint8Array([0x61, 0xff, 0x62]))).toEqual({
      error: { line: 1, message: 'The file is not UTF-8 text: save it as "CSV UTF-8".' },
    });
    expect(decodeImport(new Uint8Array(2 * 1024 * 1024 + 1))).toEqual({
      error: { line: 1, message: 'The file is larger than 2 MB.' },
    });
  });
});

describe('the template', () => {
  it('is the header and one example row that imports as it is', () => {
    const csv = templateCsv('lab-2024');
    expect(csv.split('\r\n')[0]).toBe(HEADER);
    expect(csv.split('\r\n')).toHaveLength(3);
    expect(parseValueCsv(csv, SI)).toMatchObject({ errors: [], values: [{ value: 3.1 }] });
  });
});

describe('formula-safe CSV out (lib/csv, every export)', () => {
  it('neutralises text cells a spreadsheet would run, and keeps numbers as numbers', () => {
    const cells = ['=1+1', '+1', '-1+2', '@SUM(A1)', '\tx', '\rx', 'plain'];
    const csv = toCsv(['a'], [...cells.map((c) => [c]), [-3]]);
    expect(csv.split('\r\n').slice(1, -1)).toEqual([
      "'=1+1",
      "'+1",
      "'-1+2",
      "'@SUM(A1)",
      "'\tx",
      '"\'\rx"',
      'plain',
      '-3',
    ]);
    expect(templateCsv('=HYPERLINK("http://x")')).toContain(`"'=HYPERLINK(""http://x"")"`);
  });
});
