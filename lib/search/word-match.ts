import Fuse, { type IFuseOptions } from 'fuse.js';
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
 * fuse.js (Bitap, after Wu and Manber, "Fast text searching allowing errors", Communications of
 * the ACM 35(10), 1992) over the vocabulary, anchored at the start of each word: `location` 0
 * with `distance` 1 adds one to the score of a match starting a letter or more into the word, so
 * only matches at its beginning pass the threshold — a resemblance to a stretch inside a longer
 * word ("jonatan" in "constant", which an unanchored search accepts) is never a match.
 * `findAllMatches` lets Bitap read the whole word, not only as many letters as were typed, so a
 * letter left out ("aple") is one edit. The score is then edits ÷ letters searched for. The
 * vocabulary is lower case and folded already, and which letters matched is not asked for
 * (`minMatchCharLength` 1, no `includeMatches`): the whole word, or the part typed, is marked.
 * The threshold depends on the length typed (searcherFor).
 */
const FUSE_OPTIONS: IFuseOptions<string> = {
  location: 0,
  distance: 1,
  ignoreLocation: false,
  findAllMatches: true,
  includeScore: true,
  isCaseSensitive: true,
  ignoreDiacritics: false,
  ignoreFieldNorm: true,
  minMatchCharLength: 1,
  shouldSort: false,
};

/**
 * Bitap lets a match end anywhere in the word. To see where a word ends, each word and the typed
 * word are searched with END after them (no word holds it): fuse's edits are then those from the
 * typed word to the whole word, or one more than to a beginning of it, whichever is fewer.
 * "jonatan" is two edits from "constan" but three from "constant": over the two a seven-letter
 * word may have.
 */
const END = '$';

/**
 * The same letters in another order. Bitap counts two neighbouring letters typed in the wrong
 * order ("desnity") as two edits; Damerau ("A technique for computer detection and correction of
 * spelling errors", Communications of the ACM 7(3), 1964) counts the swap as one typing error,
 * and so do we when fuse's two edits are between words of the same letters.
 */
const swapped = (a: string, b: string) =>
  a.length === b.length && [...a].sort().join('') === [...b].sort().join('');

/**
 * Finds the vocabulary words one query word stands for, in three steps:
 * 1. the word itself, and words it begins ("kiwi" → "kiwifruit", "apple" → "apples");
 * 2. only when the query word is not itself a word of the index: misspellings, by fuse.js (see
 *    FUSE_OPTIONS). A query word that the index holds is taken as meant — "Hass", "Luli",
 *    "Diamant" do not also find "mass", "Suli", "diamond";
 * 3. numbers and words of up to three letters match exactly or as a beginning only.
 *
 * The vocabulary's fuse.js index is built here, once per search index; the searchers for each
 * length of query word share it.
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
  const ended = vocabulary.map((word) => word + END);
  const fuseIndex = Fuse.createIndex<string>([], ended);
  const searchers = new Map<number, Fuse<string>>();
  /**
   * The threshold lets through one edit more than a word of this length may have (maxEdits), so
   * that a swap, two edits to fuse, reaches the post-filter (see `swapped`).
   */
  function searcherFor(length: number): Fuse<string> {
    let fuse = searchers.get(length);
    if (!fuse) {
      const threshold = (maxEdits(length) + 1) / (length + 1);
      fuse = new Fuse(ended, { ...FUSE_OPTIONS, threshold }, fuseIndex);
      searchers.set(length, fuse);
    }
    return fuse;
  }

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

  /**
   * fuse's candidates, filtered by the rules fuse cannot state: fewer edits for common words, and
   * a word longer than the typed one by more than its edits taken as still being typed ("kiwfru"
   * for "kiwifruit"), which it may be with one edit fewer than a whole word.
   */
  function misspelt(term: string, found: Map<number, WordMatch>) {
    const most = maxEdits(term.length);
    const candidates = searcherFor(term.length).search(term + END);
    for (const { refIndex: id, score: fuseScore = 1 } of candidates) {
      if (found.has(id)) continue;
      const word = vocabulary[id];
      const allowed = most - (fieldFrequency[id] >= commonAt ? 1 : 0);
      // fuse's score is edits ÷ letters searched for (END included).
      let edits = Math.round(fuseScore * (term.length + 1));
      if (edits === 2 && swapped(term, word)) edits = 1;
      if (edits > allowed) continue;
      const prose = isName[id] ? 0 : PROSE_PENALTY;
      if (word.length - term.length <= allowed) {
        const score = fuzzyScore(edits, term.length) + prose;
        found.set(id, { score, ranges: [[0, word.length - 1]] });
      } else {
        // Too long to be the whole word within `allowed`: the edits are one more than to the
        // beginning typed.
        const score = fuzzyScore(edits - 1, term.length) + PART_PENALTY + prose;
        found.set(id, { score, ranges: [[0, term.length - 1]] });
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
