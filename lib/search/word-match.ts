import { prefixDistances } from './edit-distance';
import type { Range } from './types';

/** A vocabulary word a query word matched: its score (0 exact … 1) and the matched characters. */
export interface WordMatch {
  score: number;
  ranges: Range[];
}

/**
 * Letters that Unicode decomposition leaves whole, spelt as a reader without them types them:
 * "Gołacki" is typed "golacki", "Ørsted" "orsted".
 */
const LETTERS: Record<string, string> = {
  ł: 'l',
  ø: 'o',
  đ: 'd',
  ħ: 'h',
  ı: 'i',
  æ: 'ae',
  œ: 'oe',
  ß: 'ss',
};

/** A lower-case word with its diacritics folded, for matching. */
export const foldWord = (word: string) =>
  word
    .normalize('NFD')
    .replace(/\p{M}/gu, '')
    .replace(/[łøđħıæœß]/g, (c) => LETTERS[c]);

/**
 * Edits a misspelt query word may need: none up to three letters ("Kent" is not "tent"), one up
 * to five, two from six. A word found in a sixtieth of the index's fields or more ("mass",
 * "density", "tipping") is a common word and needs one edit fewer: a short name is not taken for
 * a common word ("Hass" for "mass"), while a long misspelt common word ("desnity") still finds it.
 */
const maxEdits = (length: number) => (length <= 3 ? 0 : length <= 5 ? 1 : 2);
const COMMON_SHARE = 1 / 60;

/** Exact 0; a word typed in part by how much is missing; a misspelt one by its edits. */
const prefixScore = (term: string, word: string) => 0.1 + 0.3 * (1 - term.length / word.length);
const fuzzyScore = (edits: number, length: number) => 0.3 + (0.5 * edits) / length;
/** A misspelt word typed in part ("kiwfru" for "kiwifruit") ranks below a whole one. */
const PART_PENALTY = 0.1;
/**
 * Among corrections as close as each other, a name (a word of some title or keyword list) comes
 * first: "kinow" is the mandarin Kinnow before it is "know".
 */
const PROSE_PENALTY = 0.1;

/**
 * Finds the vocabulary words one query word stands for, in three steps:
 * 1. the word itself, and words it begins ("kiwi" → "kiwifruit", "apple" → "apples");
 * 2. only when the query word is not itself a word of the index: misspellings, words within the
 *    allowed edit distance of the whole word, or of its beginning when the word is still being
 *    typed. A query word that the index holds is taken as meant — "Hass", "Luli", "Diamant" do
 *    not also find "mass", "Suli", "diamond" — and a resemblance to a stretch inside a longer
 *    word ("jonatan" in "constant", which fuse.js's Bitap search accepted) is never a match;
 * 3. numbers and words of up to three letters match exactly or as a beginning only.
 */
export function createWordMatcher(
  vocabulary: readonly string[],
  fieldFrequency: readonly number[],
  fieldCount: number,
  isName: readonly boolean[],
): (term: string) => Map<number, WordMatch> {
  const idOf = new Map(vocabulary.map((w, i) => [w, i]));
  const sorted = [...vocabulary.keys()].sort((a, b) =>
    vocabulary[a] < vocabulary[b] ? -1 : vocabulary[a] > vocabulary[b] ? 1 : 0,
  );
  const commonAt = Math.max(3, COMMON_SHARE * fieldCount);
  /** Ids of the vocabulary words that begin with `term` (binary search in sorted order). */
  function beginningWith(term: string): number[] {
    let lo = 0;
    let hi = sorted.length;
    while (lo < hi) {
      const mid = (lo + hi) >> 1;
      if (vocabulary[sorted[mid]] < term) lo = mid + 1;
      else hi = mid;
    }
    const out: number[] = [];
    for (let i = lo; i < sorted.length && vocabulary[sorted[i]].startsWith(term); i++) {
      out.push(sorted[i]);
    }
    return out;
  }

  function misspelt(term: string, found: Map<number, WordMatch>) {
    const most = maxEdits(term.length);
    for (let id = 0; id < vocabulary.length; id++) {
      if (found.has(id)) continue;
      const word = vocabulary[id];
      const allowed = most - (fieldFrequency[id] >= commonAt ? 1 : 0);
      if (allowed < 1) continue;
      const whole = Math.abs(word.length - term.length) <= allowed;
      // A word still being typed: its beginning, one letter either side of the length typed.
      const part = allowed >= 2 && word.length > term.length;
      if (!whole && !part) continue;
      const seen = whole ? word : word.slice(0, term.length + 1);
      const d = prefixDistances(term, seen, allowed);
      if (!d) continue;
      const prose = isName[id] ? 0 : PROSE_PENALTY;
      if (whole && d[word.length] <= allowed) {
        const score = fuzzyScore(d[word.length], term.length) + prose;
        found.set(id, { score, ranges: [[0, word.length - 1]] });
        continue;
      }
      if (!part) continue;
      let best = allowed;
      let typed = 0;
      for (let n = term.length - 1; n <= Math.min(term.length + 1, word.length - 1); n++) {
        if (d[n] < best) [best, typed] = [d[n], n];
      }
      if (typed > 0) {
        const score = fuzzyScore(best, term.length) + PART_PENALTY + prose;
        found.set(id, { score, ranges: [[0, typed - 1]] });
      }
    }
  }

  return (term) => {
    const found = new Map<number, WordMatch>();
    const exact = idOf.get(term);
    if (exact !== undefined) found.set(exact, { score: 0, ranges: [[0, term.length - 1]] });
    if (term.length >= 2) {
      for (const id of beginningWith(term)) {
        if (id === exact) continue;
        const score = prefixScore(term, vocabulary[id]);
        found.set(id, { score, ranges: [[0, term.length - 1]] });
      }
    }
    if (exact === undefined && maxEdits(term.length) > 0 && !/^\p{N}+$/u.test(term)) {
      misspelt(term, found);
    }
    return found;
  };
}
