import { snippetOf, usefulRanges } from './snippet';
import {
  KIND_LABELS,
  SEARCH_KINDS,
  type Range,
  type SearchHit,
  type SearchRecord,
  type SearchResponse,
} from './types';
import { createWordMatcher, foldWord, type WordMatch } from './word-match';

/**
 * Search over one role class's records. Each query word is matched on its own (word-match.ts:
 * exactly, as the beginning of a word, or misspelt, by fuse.js), so words in any order, misspelt
 * ("Jonathn") or cut short ("kiwi") still find their record; a record is found when every word
 * of the query matches somewhere in it.
 *
 * Words are matched against the index's vocabulary — each distinct word once — and the records
 * holding the words a query word matched come from an inverted index.
 *
 * Ranking: names first. A record whose title is the query ("Kent", "Apple", or misspelt,
 * "avacado") leads; then titles that begin with it ("Apple (commodity record)"); then titles
 * holding every query word; then records whose names (title, subtitle, keywords: a cultivar's
 * commodity, a paper's title, its authors) hold every word ("pear cold chain" → the pear
 * article's "Cold chain and transport"); then the rest. Within a rank, records holding query
 * words side by side come first ("bruise threshold" as a phrase, not two words a paragraph
 * apart), then those whose names hold more of the words, then the score, which follows fuse.js's
 * token search: per field, the mean of the query words' match quality weighted by their inverse
 * document frequency; fields combined as the product of score^weight (title 3, keywords 1.5,
 * subtitle and text 1; field length ignored, so a long section body does not always rank below a
 * short title with the same match).
 */
const FIELDS = ['title', 'keywords', 'subtitle', 'text'] as const;
const WEIGHTS = [3, 1.5, 1, 1];
const TOTAL_WEIGHT = WEIGHTS.reduce((a, b) => a + b, 0);
const TITLE = 0;
const KEYWORDS = 1;
const TEXT = 3;
/** Two word ids as one number (room for two million words). */
const pairKey = (a: number, b: number) => a * 2 ** 21 + b;
/** What may stand between two words of one phrase: spaces, a hyphen, an apostrophe (not "|", "."). */
const PHRASE_GAP = /^[\s\-'’]*$/u;
/** Pairs of query words whose matches make more pairs than this are not checked side by side. */
const MAX_PAIRS = 4096;
const PER_GROUP = 6;

/** Ranks, best first: the title is the query, begins with it, holds it; names hold it; the rest. */
const Rank = { Title: 0, TitleStart: 1, TitleWords: 2, NameWords: 3, Other: 4 } as const;
type Rank = (typeof Rank)[keyof typeof Rank];

/** Letters, marks, digits and underscores, as fuse.js tokenises. */
const WORD = /[\p{L}\p{M}\p{N}_]+/gu;

/** The words of a text with their offsets: lower case, diacritics folded for matching. */
function wordsOf(text: string): { word: string; start: number; length: number }[] {
  const out: { word: string; start: number; length: number }[] = [];
  for (const m of text.toLowerCase().matchAll(WORD)) {
    out.push({ word: foldWord(m[0]), start: m.index, length: m[0].length });
  }
  return out;
}

export interface SearchIndex {
  size: number;
  /** What this index can find (tests read it to check a role class holds nothing more). */
  records: readonly SearchRecord[];
  search(query: string): SearchResponse;
}

export function createSearchIndex(records: SearchRecord[]): SearchIndex {
  const vocabulary: string[] = [];
  const idOf = new Map<string, number>();
  /** word id → the fields holding it, as record · 4 + field */
  const postings: number[][] = [];
  /** fields holding each word (fuse.js's document frequency, over fields) */
  const fieldFrequency = new Map<string, number>();
  /** words of some title or keyword list: names, preferred when correcting a misspelling */
  const nameWords = new Set<number>();
  /** per record, each pair of words side by side in one of its fields (see pairKey) */
  const adjacent: Set<number>[] = [];
  let fieldCount = 0;
  records.forEach((record, r) => {
    const pairs = new Set<number>();
    adjacent.push(pairs);
    FIELDS.forEach((field, f) => {
      const text = record[field];
      const words = wordsOf(text);
      const ids = words.map(({ word }) => {
        let id = idOf.get(word);
        if (id === undefined) {
          id = vocabulary.push(word) - 1;
          idOf.set(word, id);
          postings.push([]);
        }
        return id;
      });
      if (!ids.length) return;
      fieldCount++;
      for (let i = 1; i < ids.length; i++) {
        const gap = text.slice(words[i - 1].start + words[i - 1].length, words[i].start);
        if (PHRASE_GAP.test(gap)) pairs.add(pairKey(ids[i - 1], ids[i]));
      }
      for (const id of new Set(ids)) {
        postings[id].push(r * 4 + f);
        const word = vocabulary[id];
        fieldFrequency.set(word, (fieldFrequency.get(word) ?? 0) + 1);
        if (f === TITLE || f === KEYWORDS) nameWords.add(id);
      }
    });
  });
  const matchWord = createWordMatcher(
    vocabulary,
    vocabulary.map((w) => fieldFrequency.get(w) ?? 0),
    fieldCount,
    vocabulary.map((_, id) => nameWords.has(id)),
  );
  /** Each record's title as word ids, in order (for "the title is / begins with the query"). */
  const titleWords = records.map((r) => wordsOf(r.title).map((w) => idOf.get(w.word)!));

  /** How a record's names hold the query words (see Rank). */
  function rankOf(
    r: number,
    terms: string[],
    matched: Map<number, WordMatch>[],
    inTitle: Uint8Array,
    inNames: Uint8Array,
  ): Rank {
    if (!inNames.every((c) => c === 1)) return Rank.Other;
    if (!inTitle.every((c) => c === 1)) return Rank.NameWords;
    const title = titleWords[r];
    if (title.length < terms.length || !terms.every((_, t) => matched[t].has(title[t]))) {
      return Rank.TitleWords;
    }
    return title.length === terms.length ? Rank.Title : Rank.TitleStart;
  }

  /** For each two neighbouring query words, the word pairs they match (null: too many to check). */
  function queryPairs(matched: Map<number, WordMatch>[]): (number[] | null)[] {
    return matched.slice(1).map((next, t) => {
      const prev = matched[t];
      if (prev.size * next.size > MAX_PAIRS) return null;
      const keys: number[] = [];
      for (const a of prev.keys()) for (const b of next.keys()) keys.push(pairKey(a, b));
      return keys;
    });
  }

  /** How many neighbouring query words stand side by side in one of the record's fields. */
  function sideBySide(r: number, pairs: (number[] | null)[]): number {
    const held = adjacent[r];
    return pairs.filter((keys) => keys?.some((k) => held.has(k))).length;
  }

  /** Ranges of `text` covered by matched words, in its own offsets. */
  function rangesIn(text: string, matched: Map<number, WordMatch>[], query: string): Range[] {
    const ranges: Range[] = [];
    for (const w of wordsOf(text)) {
      const id = idOf.get(w.word);
      if (id === undefined) continue;
      for (const m of matched) {
        const hit = m.get(id);
        if (!hit) continue;
        // Offsets inside the word hold when folding kept its length; else mark the whole word.
        const inner = w.word.length === w.length ? hit.ranges : [[0, w.length - 1] as Range];
        for (const [s, e] of inner) ranges.push([w.start + s, w.start + e]);
      }
    }
    ranges.sort((a, b) => a[0] - b[0] || a[1] - b[1]);
    const merged: Range[] = [];
    for (const r of ranges) {
      const last = merged[merged.length - 1];
      if (last && r[0] <= last[1] + 1) last[1] = Math.max(last[1], r[1]);
      else merged.push([r[0], r[1]]);
    }
    return usefulRanges(merged, query);
  }

  function toHit(r: SearchRecord, matched: Map<number, WordMatch>[], query: string): SearchHit {
    const body = r.text || r.keywords;
    const { snippet, ranges } = snippetOf(body, rangesIn(body, matched, query));
    return {
      id: r.id,
      kind: r.kind,
      title: r.title,
      subtitle: r.subtitle,
      href: r.href,
      titleRanges: rangesIn(r.title, matched, query),
      snippet,
      snippetRanges: ranges,
    };
  }

  return {
    size: records.length,
    records,
    search(raw) {
      const query = raw.trim();
      const terms = wordsOf(query).map((w) => w.word);
      if (!terms.length) return { query, total: 0, groups: [] };
      const idf = terms.map((t) => {
        const df = fieldFrequency.get(t) ?? 0;
        return Math.log(1 + (fieldCount - df + 0.5) / (df + 0.5));
      });
      const idfTotal = idf.reduce((a, b) => a + b, 0);
      const matched = terms.map(matchWord);
      // Best score of each query word in each field that holds a match: field code → scores.
      const best = new Map<number, Float64Array>();
      matched.forEach((words, t) => {
        for (const [id, { score }] of words) {
          for (const code of postings[id]) {
            let scores = best.get(code);
            if (!scores) best.set(code, (scores = new Float64Array(terms.length).fill(2)));
            if (score < scores[t]) scores[t] = score;
          }
        }
      });
      // Per record: which query words each kind of field holds, and the combined score.
      const perRecord = new Map<
        number,
        { covered: Uint8Array; inTitle: Uint8Array; inNames: Uint8Array; score: number }
      >();
      for (const [code, scores] of best) {
        const r = Math.floor(code / 4);
        const f = code % 4;
        let entry = perRecord.get(r);
        if (!entry) {
          const n = terms.length;
          entry = {
            covered: new Uint8Array(n),
            inTitle: new Uint8Array(n),
            inNames: new Uint8Array(n),
            score: 1,
          };
          perRecord.set(r, entry);
        }
        let weighted = 0;
        scores.forEach((s, t) => {
          if (s > 1) return;
          entry.covered[t] = 1;
          if (f === TITLE) entry.inTitle[t] = 1;
          if (f !== TEXT) entry.inNames[t] = 1;
          weighted += idf[t] * (1 - s);
        });
        const fieldScore = Math.max(0.001, idfTotal > 0 ? 1 - weighted / idfTotal : 0);
        entry.score *= fieldScore ** (WEIGHTS[f] / TOTAL_WEIGHT);
      }
      const pairs = queryPairs(matched);
      const results = [...perRecord]
        .filter(([, e]) => e.covered.every((c) => c === 1))
        .map(([r, e]) => ({
          record: records[r],
          rank: rankOf(r, terms, matched, e.inTitle, e.inNames),
          phrase: sideBySide(r, pairs),
          named: e.inNames.reduce((a, b) => a + b, 0),
          score: e.score,
          order: r,
        }))
        .sort(
          (a, b) =>
            a.rank - b.rank ||
            b.phrase - a.phrase ||
            b.named - a.named ||
            a.score - b.score ||
            a.order - b.order,
        );
      // Groups come in the order of their best hit, so "Wang" shows sources before near-misses.
      const first = (kind: string) => results.findIndex((res) => res.record.kind === kind);
      const groups = SEARCH_KINDS.filter((kind) => first(kind) >= 0)
        .sort((a, b) => first(a) - first(b))
        .map((kind) => ({
          kind,
          label: KIND_LABELS[kind],
          hits: results
            .filter((res) => res.record.kind === kind)
            .slice(0, PER_GROUP)
            .map((res) => toHit(res.record, matched, query)),
        }));
      return { query, total: results.length, groups };
    },
  };
}
