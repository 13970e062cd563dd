import Fuse from 'fuse.js';
import { snippetOf, usefulRanges } from './snippet';
import {
  KIND_LABELS,
  SEARCH_KINDS,
  type Range,
  type SearchHit,
  type SearchRecord,
  type SearchResponse,
} from './types';

/**
 * Fuzzy search over one role class's records. Each query word is matched on its own, so words in
 * any order, misspelt ("Jonathn") or cut short ("kiwi") still find their record; a record is
 * found when every word of the query matches somewhere in it.
 *
 * The fuzzy matching is fuse.js's (Bitap, threshold 0.3, anywhere in a word, at least two
 * characters), run over the index's vocabulary — each distinct word once — rather than over
 * every record's full text: a query word is compared with a few thousand short words instead of
 * the 150 000 characters of the articles, and the records holding the words it matched come from
 * an inverted index. Scores follow fuse.js's token search: per field, the mean of the query
 * words' match quality weighted by their inverse document frequency; fields combined as the
 * product of score^weight (title 3, keywords 1.5, subtitle and text 1; field length ignored, so a
 * long section body does not always rank below a short title with the same match).
 */
const FIELDS = ['title', 'keywords', 'subtitle', 'text'] as const;
const WEIGHTS = [3, 1.5, 1, 1];
const TOTAL_WEIGHT = WEIGHTS.reduce((a, b) => a + b, 0);
const PER_GROUP = 6;

/** Letters, marks, digits and underscores, as fuse.js tokenises. */
const WORD = /[\p{L}\p{M}\p{N}_]+/gu;
const fold = (word: string) => word.normalize('NFD').replace(/\p{M}/gu, '');

/** The words of a text with their offsets: lower case, diacritics folded for matching. */
function wordsOf(text: string): { word: string; start: number; length: number }[] {
  const out: { word: string; start: number; length: number }[] = [];
  for (const m of text.toLowerCase().matchAll(WORD)) {
    out.push({ word: fold(m[0]), start: m.index, length: m[0].length });
  }
  return out;
}

export interface SearchIndex {
  size: number;
  /** What this index can find (tests read it to check a role class holds nothing more). */
  records: readonly SearchRecord[];
  search(query: string): SearchResponse;
}

/** A vocabulary word a query word matched: its score (0 exact … 1) and the matched characters. */
interface WordMatch {
  score: number;
  ranges: Range[];
}

export function createSearchIndex(records: SearchRecord[]): SearchIndex {
  const vocabulary: string[] = [];
  const idOf = new Map<string, number>();
  /** word id → the fields holding it, as record · 4 + field */
  const postings: number[][] = [];
  /** fields holding each word (fuse.js's document frequency, over fields) */
  const fieldFrequency = new Map<string, number>();
  let fieldCount = 0;
  records.forEach((record, r) => {
    FIELDS.forEach((field, f) => {
      const words = new Set(wordsOf(record[field]).map((w) => w.word));
      if (!words.size) return;
      fieldCount++;
      for (const word of words) {
        let id = idOf.get(word);
        if (id === undefined) {
          id = vocabulary.push(word) - 1;
          idOf.set(word, id);
          postings.push([]);
        }
        postings[id].push(r * 4 + f);
        fieldFrequency.set(word, (fieldFrequency.get(word) ?? 0) + 1);
      }
    });
  });
  const fuse = new Fuse(vocabulary, {
    includeMatches: true,
    includeScore: true,
    ignoreLocation: true,
    ignoreDiacritics: true,
    threshold: 0.3,
    minMatchCharLength: 2,
    shouldSort: false,
  });

  /** Vocabulary words matching one query word. */
  function matchWord(term: string): Map<number, WordMatch> {
    const found = new Map<number, WordMatch>();
    for (const m of fuse.search(term)) {
      found.set(m.refIndex, {
        score: m.score ?? 0,
        ranges: (m.matches?.[0]?.indices ?? []).map(([s, e]) => [s, e] as Range),
      });
    }
    return found;
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
      // Per record: every query word matched in some field, and the combined score.
      const perRecord = new Map<number, { covered: Uint8Array; score: number }>();
      for (const [code, scores] of best) {
        const r = Math.floor(code / 4);
        const f = code % 4;
        let entry = perRecord.get(r);
        if (!entry) perRecord.set(r, (entry = { covered: new Uint8Array(terms.length), score: 1 }));
        let weighted = 0;
        scores.forEach((s, t) => {
          if (s > 1) return;
          entry.covered[t] = 1;
          weighted += idf[t] * (1 - s);
        });
        const fieldScore = Math.max(0.001, idfTotal > 0 ? 1 - weighted / idfTotal : 0);
        entry.score *= fieldScore ** (WEIGHTS[f] / TOTAL_WEIGHT);
      }
      const results = [...perRecord]
        .filter(([, e]) => e.covered.every((c) => c === 1))
        .map(([r, e]) => ({ record: records[r], score: e.score, order: r }))
        .sort((a, b) => a.score - b.score || a.order - b.order);
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
