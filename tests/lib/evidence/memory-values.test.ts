import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { createElement } from 'react';
import { renderToStaticMarkup } from 'react-dom/server';
import { describe, expect, it } from 'vitest';
import { FromMemoryList } from '@/components/gaps/from-memory-list';
import { citationOf } from '@/lib/evidence/ladder';
import { valuesFromMemory } from '@/lib/evidence/memory-values';
import { SOURCE_KIND_LABELS } from '@/lib/properties/citation';
import type { CultivarRecord, RevisionValue, SourceRef } from '@/lib/properties/records';

// Hand-made records: every expected line below is read off these fixtures.
const source = (kind: SourceRef['kind'], authors: string, year: number): SourceRef => ({
  ...{ id: year, key: `${authors}-${year}`, kind, authors, year, title: 'T' },
  ...{ venue: null, pages: null, doi: null, url: null, note: null },
});
let id = 1;
const value = (p: Partial<RevisionValue>): RevisionValue => ({
  ...{ id: id++, quantity: 'youngs_modulus', variant: 'flesh', value: 2, unit: 'MPa' },
  ...{ low: null, high: null, sd: null, samples: null, method: null, ripeness: null },
  ...{ temperature: null, storage: null, loadingRate: null, probe: null, note: null },
  ...{ isTypicalDefault: false, stage: null, observation: null, typicalBasis: null },
  source: source('paper', 'Measured, M.', 2010),
  ...p,
});
const record = (name: string, isType: boolean, values: RevisionValue[]): CultivarRecord => ({
  ...{ id: id++, slug: `potato-${name.toLowerCase()}`, name, isType, published: null, values },
  commodity: { id: 1, slug: 'potato', name: 'Potato', family: 'vegetables' },
});

const RECORDS = [
  record('Type', true, [
    value({ source: source('memory', 'Finney, E. E.; Hall, C. W.', 1967) }),
    value({ quantity: 'density', variant: '', value: 1080, unit: 'kg/m³' }),
  ]),
  record('Nicola', false, [
    value({
      ...{ quantity: 'poisson_ratio', variant: '', value: 0.47, unit: '–', source: null },
      ...{ isTypicalDefault: true, typicalBasis: 'from memory' },
    }),
    value({
      ...{ quantity: 'density', variant: '', value: 1070, unit: 'kg/m³', source: null },
      ...{ isTypicalDefault: true, typicalBasis: 'common practice' },
    }),
  ]),
];

describe('values from memory', () => {
  it('lists every published value resting on memory, and nothing else', () => {
    expect(valuesFromMemory(RECORDS)).toEqual([
      {
        ...{ slug: 'potato-type', record: 'Potato', figure: "Young's modulus (flesh)" },
        ...{ value: 2, unit: 'MPa', from: 'Finney 1967 (from memory, not yet checked)' },
      },
      {
        ...{ slug: 'potato-nicola', record: 'Potato, Nicola', figure: "Poisson's ratio" },
        ...{ value: 0.47, unit: '–', from: 'typical value, from memory, not yet checked' },
      },
    ]);
  });

  it('shows them in the reader units on the data gaps page', () => {
    const html = renderToStaticMarkup(
      createElement(FromMemoryList, { values: valuesFromMemory(RECORDS), system: 'us' }),
    );
    // 2 MPa ÷ 0.006894757 MPa/psi = 290.08 psi, shown to four significant figures.
    expect(html).toContain('290.1 psi');
    expect(html).not.toContain('MPa');
    expect(html).toContain('href="/properties/potato-nicola"');
    expect(html.match(/data-testid="from-memory-value"/g)).toHaveLength(2);
  });

  it('says so when no value rests on memory', () => {
    const html = renderToStaticMarkup(
      createElement(FromMemoryList, { values: valuesFromMemory([]), system: 'si' }),
    );
    expect(html).toContain('No published value rests on memory.');
  });
});

/** Source files of the app (not the areas' tests), as text. */
function sources(dir: string): { file: string; text: string }[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return sources(full);
    return /\.(ts|tsx)$/.test(name) ? [{ file: full, text: readFileSync(full, 'utf8') }] : [];
  });
}

describe('one wording for a value from memory', () => {
  it('is the same in the source kind label, a citation and a typical value', () => {
    expect(SOURCE_KIND_LABELS.memory).toBe('From memory, not yet checked');
    expect(citationOf(source('memory', 'Mohsenin, N. N.', 1986))).toBe(
      'Mohsenin 1986 (from memory, not yet checked)',
    );
  });

  // Article prose may say more around it ("from memory, not yet checked against the paper");
  // labels, notes and generated text may not.
  it('no other wording is left in the pages, components, libraries or seed notes', () => {
    const root = path.resolve(import.meta.dirname, '../../..');
    const others = [
      /Recalled, not yet checked/i,
      /not yet checked against (a source|the original)/i,
      /From memory; not re-read/i,
    ];
    const hits = ['app', 'components', 'lib', 'seeds']
      .flatMap((dir) => sources(path.join(root, dir)))
      .filter(({ text }) => others.some((re) => re.test(text)))
      .map(({ file }) => path.relative(root, file));
    expect(hits).toEqual([]);
  });
});
