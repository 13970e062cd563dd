import { describe, expect, it } from 'vitest';
import { createWordMatcher, foldWord } from '@/lib/search/word-match';

describe('word matching', () => {
  // Vocabulary of an invented index of 600 fields: "mass" and "density" in 40 each (common: a
  // sixtieth is 10), the rest in a few.
  const vocabulary = [
    'mass',
    'hass',
    'kinnow',
    'know',
    'jonathan',
    'constant',
    'kiwifruit',
    'density',
    'fuji',
    'apple',
    '2018',
  ];
  const frequency = [40, 1, 1, 2, 1, 2, 3, 40, 1, 2, 1];
  const names = [false, true, true, false, true, false, true, false, true, true, false];
  const match = createWordMatcher(vocabulary, frequency, 600, names);
  const words = (term: string) =>
    [...match(term)].sort((a, b) => a[1].score - b[1].score).map(([id]) => vocabulary[id]);

  it('takes a word the index holds as meant', () => {
    expect(words('hass')).toEqual(['hass']);
    expect(words('mass')).toEqual(['mass']);
  });

  it('does not correct a short word into a common one', () => {
    // "lass" is one edit from "mass" (common, 40 of 600 fields) and "hass" (a name).
    expect(words('lass')).toEqual(['hass']);
  });

  it('corrects names, finds beginnings, and never a stretch inside a longer word', () => {
    // "jonatan" is two substitutions from "constan", the beginning of "constant", but three edits
    // from the whole word: only "jonathan" (one letter left out) is meant.
    expect(words('jonatan')).toEqual(['jonathan']);
    // "stant" is the end of "constant" letter for letter, but three edits from its beginning.
    expect(words('stant')).toEqual([]);
    expect(words('aple')).toEqual(['apple']);
    expect(words('kiwi')).toEqual(['kiwifruit']);
    // Still being typed: "kiwfr" and one more letter are one edit from "kiwifr".
    expect(words('kiwfru')).toEqual(['kiwifruit']);
    // Both one edit away and both rare; the name comes first.
    expect(words('kinow')).toEqual(['kinnow', 'know']);
  });

  it('counts two neighbouring letters swapped as one edit', () => {
    // "desnity": a swap, one edit, which a common seven-letter word may have (two less one).
    expect(words('desnity')).toEqual(['density']);
    expect(words('fjui')).toEqual(['fuji']);
    // "dansoty": two substitutions (e → a, i → o), other letters: two edits, over the one a
    // common word may have.
    expect(words('dansoty')).toEqual([]);
  });

  it('matches numbers exactly or as a beginning only', () => {
    expect(words('2017')).toEqual([]);
    expect(words('201')).toEqual(['2018']);
  });

  it('folds letters that decomposition leaves whole', () => {
    expect(foldWord('gołacki')).toBe('golacki');
    expect(foldWord('selçuk')).toBe('selcuk');
  });
});
