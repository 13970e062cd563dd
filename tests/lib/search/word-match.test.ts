import { describe, expect, it } from 'vitest';
import { editDistance, prefixDistances } from '@/lib/search/edit-distance';
import { createWordMatcher, foldWord } from '@/lib/search/word-match';

describe('editDistance (optimal string alignment)', () => {
  it('gives the published values', () => {
    // kitten → sitting: 3 (two substitutions, one insertion), the usual worked example of
    // Wagner and Fischer's programme.
    expect(editDistance('kitten', 'sitting', 5)).toBe(3);
    // A swap of neighbours costs one (Damerau 1964): "desnity" is one edit from "density".
    expect(editDistance('desnity', 'density', 3)).toBe(1);
    // "ca" → "abc" is 3 by optimal string alignment (2 only if a swapped pair could be edited
    // again, which this variant forbids).
    expect(editDistance('ca', 'abc', 5)).toBe(3);
    // Over the limit: limit + 1, however far.
    expect(editDistance('jonatan', 'constant', 2)).toBe(3);
  });

  it('gives the distance to every beginning of the second word', () => {
    // "kiwfr" against "", k, ki, kiw: 5, 4, 3, 2 (deletions); kiwi and kiwif: 2 ("fr" against
    // "i" or "if", two edits either way); kiwifr: 1 (the missing i).
    expect([...prefixDistances('kiwfr', 'kiwifr', 5)!]).toEqual([5, 4, 3, 2, 2, 2, 1]);
    expect(prefixDistances('zzzz', 'kiwi', 1)).toBeNull();
  });
});

describe('word matching', () => {
  // Vocabulary of an invented index of 600 fields: "mass" in 40 (common: a sixtieth is 10),
  // the rest in a few.
  const vocabulary = ['mass', 'hass', 'kinnow', 'know', 'jonathan', 'constant', 'kiwifruit'];
  const frequency = [40, 1, 1, 2, 1, 2, 3];
  const names = [false, true, true, false, true, false, true];
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
    expect(words('jonatan')).toEqual(['jonathan']);
    expect(words('kiwi')).toEqual(['kiwifruit']);
    expect(words('kiwfru')).toEqual(['kiwifruit']);
    // Both one edit away and both rare; the name comes first.
    expect(words('kinow')).toEqual(['kinnow', 'know']);
  });

  it('folds letters that decomposition leaves whole', () => {
    expect(foldWord('gołacki')).toBe('golacki');
    expect(foldWord('selçuk')).toBe('selcuk');
  });
});
