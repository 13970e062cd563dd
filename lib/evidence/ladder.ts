import type { RevisionValue, SourceRef } from '@/lib/properties/records';
import { FROM_MEMORY } from '@/lib/properties/citation';
import {
  STAGE_LABELS,
  type Quantity,
  type Stage,
  type TypicalBasis,
} from '@/lib/properties/quantities';
import { propagateRelativeSd, type Relation } from './relations';
import { enteredValue, type UsedValue } from './used';

/**
 * Everything the knowledge base holds for one fruit: the chosen cultivar's published values, its
 * commodity's own record, and every record of the commodity (for the spread across cultivars).
 */
export interface EvidenceSet {
  commodityName: string;
  /** The chosen cultivar's published values; empty when the chosen record is the commodity's. */
  own: RevisionValue[];
  /** The commodity record's published values. */
  commodity: RevisionValue[];
  /** Each published record of the commodity (cultivars and the commodity record). */
  across: RevisionValue[][];
  /** The ripeness stage the user chose, or null for none. */
  stage: Stage | null;
}

export interface Need {
  quantity: Quantity;
  /** Acceptable variants, best first (any variant when omitted). */
  variants?: readonly string[];
  /** A further filter on candidate values (a drop figure's surface, say). */
  accept?: (v: RevisionValue) => boolean;
}

/** "Wang 2024", the short citation a table cell carries; null for a value with no source. */
export function citationOf(source: SourceRef | null): string | null {
  if (!source) return null;
  const who = source.authors?.split(/[;,]/)[0]?.trim() || source.title;
  const memory = source.kind === 'memory' ? ` (${FROM_MEMORY})` : '';
  return `${who}${source.year ? ` ${source.year}` : ''}${memory}`;
}

const matches = (need: Need) => (v: RevisionValue) =>
  v.quantity === need.quantity && (need.accept?.(v) ?? true);

/** Candidates of a need among some values, best variant first, keeping entry order within one. */
function candidates(values: RevisionValue[], need: Need): RevisionValue[] {
  const all = values.filter(matches(need));
  if (!need.variants) return all;
  return need.variants.flatMap((want) => all.filter((v) => v.variant === want));
}

/**
 * The value to take among candidates for the chosen stage: one measured at that stage, else an
 * unstaged one, else one from another stage with a note that says so. With no stage chosen, an
 * unstaged value first, else the first staged one, named.
 */
export function pickForStage(
  list: RevisionValue[],
  stage: Stage | null,
): { value: RevisionValue; note: string | null } | null {
  if (!list.length) return null;
  const atStage = stage ? list.find((v) => v.stage === stage) : undefined;
  if (atStage) return { value: atStage, note: null };
  const unstaged = list.find((v) => v.stage === null);
  if (unstaged) return { value: unstaged, note: null };
  const other = list[0];
  const at = STAGE_LABELS[other.stage!];
  return {
    value: other,
    note: stage
      ? `Measured on ${at} fruit, not on ${STAGE_LABELS[stage]} fruit as chosen: no value at the chosen stage.`
      : `Measured on ${at} fruit.`,
  };
}

/** Sample standard deviation of a list (n − 1). */
function sampleSd(xs: number[]): number {
  const mean = xs.reduce((a, b) => a + b, 0) / xs.length;
  return Math.sqrt(xs.reduce((a, x) => a + (x - mean) ** 2, 0) / (xs.length - 1));
}

const sig = (x: number) => Number(x.toPrecision(3));

/** The first figure of a need in each published record of the commodity (typical ones left out). */
export function acrossCultivars(set: EvidenceSet, need: Need): number[] {
  return set.across.flatMap((values) => {
    const hit = candidates(
      values.filter((v) => !v.isTypicalDefault),
      need,
    )[0];
    return hit ? [hit.value] : [];
  });
}

/** Fewer figures than this across a commodity give no spread of their own. */
const MIN_ACROSS = 3;
/** The band a typical value gets when it stores none: ±30 % of it, stated on the page. */
const TYPICAL_BAND = 0.3;

function basisWords(basis: TypicalBasis | null): string {
  return basis === 'from memory' ? FROM_MEMORY : 'common practice, no single source';
}

function fromRecord(
  v: RevisionValue,
  rung: 'own' | 'commodity' | 'typical',
  stageNote: string | null,
  set: EvidenceSet,
  need: Need,
): UsedValue {
  const own = {
    low: v.low,
    high: v.high,
    sd: v.sd,
  };
  const hasOwnSpread = v.sd !== null || (v.low !== null && v.high !== null && v.high > v.low);
  const notes = [stageNote];
  let spread: string | null = hasOwnSpread ? 'the spread its source gives' : null;
  let band = own;
  if (rung === 'commodity') {
    const xs = acrossCultivars(set, need);
    if (xs.length >= MIN_ACROSS) {
      band = { low: null, high: null, sd: sig(sampleSd(xs)) };
      spread = `SD of the ${xs.length} ${set.commodityName.toLowerCase()} figures in the database (${sig(Math.min(...xs))}–${sig(Math.max(...xs))} ${v.unit})`;
    } else if (!hasOwnSpread) {
      spread = null;
    }
    notes.unshift(`Inherited from the ${set.commodityName.toLowerCase()} commodity record.`);
  }
  if (rung === 'typical') {
    if (!hasOwnSpread) {
      band = {
        low: sig(v.value * (1 - TYPICAL_BAND)),
        high: sig(v.value * (1 + TYPICAL_BAND)),
        sd: null,
      };
      spread = `±${TYPICAL_BAND * 100} % band given to a typical value without one`;
    } else {
      spread = 'the band stored with the typical value';
    }
  }
  return {
    value: v.value,
    unit: v.unit,
    rung,
    source: rung === 'typical' ? basisWords(v.typicalBasis) : citationOf(v.source),
    note: notes.filter(Boolean).join(' ') || null,
    ...band,
    spread,
  };
}

/** The published (not typical) value of a need among some values, at the chosen stage. */
function publishedIn(values: RevisionValue[], need: Need, stage: Stage | null) {
  return pickForStage(
    candidates(values, need).filter((v) => !v.isTypicalDefault),
    stage,
  );
}

function typicalIn(values: RevisionValue[], need: Need, stage: Stage | null) {
  return pickForStage(
    candidates(values, need).filter((v) => v.isTypicalDefault),
    stage,
  );
}

export interface ClimbOptions {
  /** What the user typed, which always wins. */
  entered?: number;
  /** The unit of an entered figure. */
  unit: string;
  /** Rung 3: a value derived by a published relation, or null when its inputs are missing. */
  derive?: () => UsedValue | null;
  /** After the stored typical values: a typical value the check itself holds, or null. */
  fallback?: () => UsedValue | null;
}

/** The figure and, for a stored one, the record value it came from. */
export interface Climbed {
  used: UsedValue;
  picked: RevisionValue | null;
}

/**
 * Climb the evidence ladder for one figure: what the user typed; else the cultivar's own
 * published value; else the commodity's; else a derived value; else a typical value (the
 * cultivar's, the commodity's, then the check's own). Null when no rung has it.
 */
export function climb(set: EvidenceSet, need: Need, options: ClimbOptions): Climbed | null {
  if (options.entered !== undefined)
    return { used: enteredValue(options.entered, options.unit), picked: null };
  const own = publishedIn(set.own, need, set.stage);
  if (own) return { used: fromRecord(own.value, 'own', own.note, set, need), picked: own.value };
  const commodity = publishedIn(set.commodity, need, set.stage);
  if (commodity)
    return {
      used: fromRecord(commodity.value, 'commodity', commodity.note, set, need),
      picked: commodity.value,
    };
  const derived = options.derive?.();
  if (derived) return { used: derived, picked: null };
  const typical = typicalIn(set.own, need, set.stage) ?? typicalIn(set.commodity, need, set.stage);
  if (typical)
    return {
      used: fromRecord(typical.value, 'typical', typical.note, set, need),
      picked: typical.value,
    };
  const fallback = options.fallback?.();
  return fallback ? { used: fallback, picked: null } : null;
}

/** The relative SD of a used figure's band (a range read as ±2 SD), or null without one. */
export function relativeSd(u: UsedValue): number | null {
  if (u.value === 0) return null;
  if (u.sd !== null && u.sd > 0) return u.sd / Math.abs(u.value);
  if (u.low !== null && u.high !== null && u.high > u.low)
    return (u.high - u.low) / 4 / Math.abs(u.value);
  return null;
}

/**
 * A value derived by a published relation from used figures: rung "derived", the relation as its
 * source, the figures it came from in its note, and its inputs' spreads carried through.
 */
export function derivedValue<K extends string>(
  relation: Relation<K>,
  value: number,
  unit: string,
  inputs: Record<K, UsedValue>,
  words: string,
): UsedValue {
  const rel = propagateRelativeSd(
    relation,
    Object.fromEntries(
      (Object.keys(inputs) as K[]).map((k) => [k, relativeSd(inputs[k])]),
    ) as Record<K, number | null>,
  );
  return {
    value: sig(value),
    unit,
    rung: 'derived',
    source: relation.source,
    note: `${relation.statement}: ${words}.`,
    low: null,
    high: null,
    sd: rel === null ? null : Number((rel * Math.abs(value)).toPrecision(3)),
    spread: rel === null ? null : "carried through the relation from its inputs' spreads",
  };
}

/** A typical value the check itself holds (no record has one), stated as such. */
export function checkTypical(
  value: number,
  unit: string,
  why: string,
  band: { low: number; high: number },
): UsedValue {
  return {
    value,
    unit,
    rung: 'typical',
    source: 'common practice, no single source',
    note: why,
    low: band.low,
    high: band.high,
    sd: null,
    spread: 'the typical range stated with it',
  };
}
