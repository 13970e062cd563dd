import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { parseInput } from '@/lib/validation/parse';
import { dropCheckSchema } from '@/lib/checks/inputs';
import {
  heightForBruise,
  heightForPressure,
  impactAt,
  impactBruiseRadius,
  surfaceSI,
  type FruitSI,
} from './model';
import { pinnedSummary } from '../cultivar-inputs';
import { verdictEvidence } from '../evidence-summary';
import { fruitUsed, resolveFruit, type ResolvedFruit } from '../resolve-fruit';
import { DROP_SURFACE_KEYS, DROP_SURFACES, type DropSurface } from '../surfaces';
import { verdictOf } from '../verdict';
import { chooseGradeRule } from '@/lib/data/grade-rules';
import { bruiseRadiusLimit, judgeBruise, ruleView, type BruiseView } from '../bruise';
import type { Limit } from './limits';

/**
 * How the published drop figure (when there is one) and the bruise the Hertz field predicts from
 * the static threshold relate, and which one the verdict rests on.
 */
function relationOf(
  limit: Limit | null,
  bruise: BruiseView | null,
  withinM: number | null,
  heightM: number,
  surface: string,
): Text {
  const within =
    withinM === null || !bruise?.rule
      ? ''
      : ph` The Hertz estimate from the static threshold keeps the bruise within ${bruise.rule.name} up to ${m(round(withinM * 1000, 3), 'mm')}.`;
  if (limit) {
    const kind = limit.upperBound
      ? 'a height at which fruit bruised (an upper bound)'
      : 'a published no-bruise or recommended height';
    return ph`The verdict rests on the drop figure for ${surface.toLowerCase()}, ${limit.basis} (${limit.source ?? 'no source'}), ${kind}: a drop test of the fruit itself, which outranks an estimate.${within} The two differ because flesh withstands a brief impact better than the held load its static threshold was measured under, and the elastic Hertz peak is an upper bound.`;
  }
  if (bruise)
    return ph`No published drop figure for ${surface.toLowerCase()}: the verdict rests on the bruise the elastic Hertz field predicts from the static threshold at ${m(round(heightM * 1000, 3), 'mm')}, judged against the grade rule.${within}`;
  return 'No drop figure and no static threshold: no verdict can be given.';
}
import type { DropResult } from './result';
import { dynamicLimits } from './limits';
import { judgeDrop } from '../calibration-rules';
import { susceptibilityOf, volumeBruiseJson } from './volume';
import { m, ph, type Text } from '@/lib/phrase';

const round = (x: number, digits = 4) => Number(x.toPrecision(digits));

function fruitSI(f: ResolvedFruit): FruitSI {
  return {
    modulus: f.modulusMpa.value * 1e6,
    poisson: f.poisson.value,
    radius: f.diameterMm.value / 2000,
    mass: f.massG.value / 1000,
  };
}

/** The lowest published safe height of a surface first; each surface worked out once per check. */
function limitsOf(f: ResolvedFruit, fruit: FruitSI) {
  const known = new Map<DropSurface, ReturnType<typeof dynamicLimits>>();
  return (surface: DropSurface) => {
    let limits = known.get(surface);
    if (!limits) {
      limits = dynamicLimits(f, fruit, surface);
      known.set(surface, limits);
    }
    return limits;
  };
}

function safeHeights(
  f: ResolvedFruit,
  fruit: FruitSI,
  pad: { modulusMpa: number; thicknessMm: number } | undefined,
  limitsFor: ReturnType<typeof limitsOf>,
  bruiseLimit: number | null,
) {
  return DROP_SURFACE_KEYS.filter((s) => s !== 'foam' || pad).map((surface) => {
    const limits = limitsFor(surface);
    const staticKpa = f.staticThresholdKpa?.value;
    const staticM = staticKpa
      ? heightForPressure(fruit, surfaceSI(surface, fruit, pad), staticKpa * 1000)
      : null;
    return {
      surface,
      label: DROP_SURFACES[surface].label,
      dynamic_safe_height_mm: limits[0] ? round(limits[0].heightM * 1000) : null,
      dynamic_basis: limits[0]?.basis ?? null,
      dynamic_source: limits[0]?.source ?? null,
      dynamic_note: limits[0]?.note ?? null,
      dynamic_rung: limits[0]?.rung ?? null,
      dynamic_upper_bound: limits[0]?.upperBound ?? null,
      static_safe_height_mm: staticM === null ? null : round(staticM * 1000),
      within_tolerance_height_mm:
        staticKpa && bruiseLimit !== null
          ? round(
              heightForBruise(
                fruit,
                surfaceSI(surface, fruit, pad),
                staticKpa * 1000,
                bruiseLimit,
              ) * 1000,
            )
          : null,
    };
  });
}

/**
 * Where the verdict rests on the estimate: how the same estimate fares on the surfaces where this
 * fruit has a published drop figure (its own or its commodity's), judged as the calibration
 * table judges it — so a reader sees at once whether the estimate is to be trusted for this fruit.
 */
function estimateCheck(heights: ReturnType<typeof safeHeights>, surface: DropSurface): Text {
  const tested = heights.filter(
    (h) =>
      h.surface !== surface &&
      h.dynamic_safe_height_mm !== null &&
      h.static_safe_height_mm !== null &&
      (h.dynamic_rung === 'own' || h.dynamic_rung === 'commodity'),
  );
  if (tested.length === 0)
    return ' This fruit has no published drop figure on any surface to test the estimate against: treat it as untested.';
  const words = tested.map((h) => {
    const observation = h.dynamic_upper_bound ? 'bruised-at' : 'no-bruise';
    const judged = judgeDrop(observation, h.dynamic_safe_height_mm!, h.static_safe_height_mm!);
    const ratio = round(h.static_safe_height_mm! / h.dynamic_safe_height_mm!, 2);
    return {
      agrees: judged.agrees,
      text: ph`onto ${h.label.toLowerCase()} the estimate gives ${m(h.static_safe_height_mm!, 'mm')} against the published ${m(h.dynamic_safe_height_mm!, 'mm')} (${ratio}×; ${judged.agrees ? 'agrees' : 'disagrees'}: ${judged.rule})`,
    };
  });
  const verdict = words.every((w) => w.agrees)
    ? 'it agrees where it can be tested'
    : 'it disagrees with the published record for this fruit, so do not rely on it here — test drops of the fruit instead';
  const tested_ = words.flatMap((w, i) => (i === 0 ? w.text : ['; ', ...w.text]));
  return ph` Tested on this fruit's published drop figures: ${tested_} — ${verdict}.`;
}

/** The bruise from the fruit's published bruise susceptibility for this surface, if it has one. */
function volumeBruiseOf(
  f: ResolvedFruit,
  surface: DropSurface,
  energyJ: number,
  massKg: number,
  limitM: number | null,
) {
  const drop = DROP_SURFACES[surface];
  if (!('thresholdVariants' in drop) || surface === 'foam') return null;
  const hard = surface === 'steel' || surface === 'hard plastic';
  const bs = susceptibilityOf(f.evidence, drop.thresholdVariants, hard);
  return bs ? volumeBruiseJson(bs, energyJ, massKg, limitM === null ? null : limitM * 1000) : null;
}

/** Which figures the verdict rests on when the bruise is sized from a published susceptibility. */
function volumeRelation(v: ReturnType<typeof volumeBruiseJson>, limit: Limit | null): Text {
  const sized = ph`The bruise is sized from the published bruise susceptibility (${v.source ?? 'no source'}, ${m(v.susceptibility_mm3_j, 'mm³/J')}): ${m(v.impact_energy_j, 'J')} of impact energy leaves about ${m(v.volume_mm3, 'mm³')}, ${m(v.diameter_mm, 'mm')} across taken as ${v.shape}.`;
  if (!limit)
    return ph`${sized} No drop height is published for this surface, so the onset margin rests on the static threshold.`;
  if (limit.rung === 'typical')
    return ph`${sized} The onset margin rests on a typical drop figure, ${limit.basis} (${limit.source ?? 'typical'}), not a test of this fruit: the bruise size above is the stronger evidence.`;
  return ph`${sized} The onset margin rests on the drop figure ${limit.basis} (${limit.source ?? 'no source'}); the two come from different drop tests of the fruit.`;
}

/** Peak pressure and impact energy over a range of heights, for the chart. */
function series(fruit: FruitSI, surface: ReturnType<typeof surfaceSI>, heightM: number) {
  const top = Math.max(1, 2 * heightM);
  return Array.from({ length: 40 }, (_, i) => {
    const h = (top * (i + 1)) / 40;
    const s = impactAt(fruit, surface, h);
    return {
      height_mm: round(h * 1000),
      peak_pressure_kpa: round(s.peakPressure / 1000),
      impact_energy_j: round(s.impactEnergy),
    };
  });
}

/** The drop check: elastic Hertz impact, judged against the cultivar's dynamic threshold. */
export async function runDropCheck(actor: Actor, raw: unknown): Promise<DropResult> {
  const input = parseInput(dropCheckSchema, raw);
  const f = await resolveFruit(actor, input);
  const fruit = fruitSI(f);
  const pad =
    input.surface === 'foam'
      ? { modulusMpa: input.padModulusMpa!, thicknessMm: input.padThicknessMm! }
      : undefined;
  const surface = surfaceSI(input.surface, fruit, pad);
  const heightM = input.heightMm / 1000;
  const impact = impactAt(fruit, surface, heightM);
  const limitsFor = limitsOf(f, fruit);
  const limits = limitsFor(input.surface);
  const dynamicMargin = limits[0] ? limits[0].heightM / heightM : null;
  const staticMargin = f.staticThresholdKpa
    ? (f.staticThresholdKpa.value * 1000) / impact.peakPressure
    : null;
  const grade = await chooseGradeRule(f.pinned?.commodityId ?? null, input.gradeRule);
  const rule = grade && ruleView(grade, f.pinned?.commodity ?? null);
  const thresholdPa = f.staticThresholdKpa ? f.staticThresholdKpa.value * 1000 : null;
  const bruiseLimit = rule ? bruiseRadiusLimit(rule) : null;
  // A published bruise susceptibility (drop tests of the fruit) sizes the bruise before the
  // elastic estimate from the static threshold does.
  const volume = volumeBruiseOf(f, input.surface, impact.impactEnergy, fruit.mass, bruiseLimit);
  const bruise = volume
    ? judgeBruise(volume.diameter_mm / 2000, rule)
    : thresholdPa === null
      ? null
      : judgeBruise(impactBruiseRadius(fruit, surface, impact.contactRadius, thresholdPa), rule);
  const withinM = volume
    ? volume.within_tolerance_height_mm === null
      ? null
      : volume.within_tolerance_height_mm / 1000
    : thresholdPa !== null && bruiseLimit !== null
      ? heightForBruise(fruit, surface, thresholdPa, bruiseLimit)
      : null;
  const warnings: Text[] = [...f.warnings];
  const bound = limits[0]?.upperBound ? limits[0] : null;
  if (bound)
    warnings.push(
      ph`The only published figure for a drop onto ${DROP_SURFACES[input.surface].label.toLowerCase()} is a height at which fruit bruised (${m(round(bound.heightM * 1000), 'mm')}): an upper bound. The safe height lies somewhere below it, so a drop under it is at best "tight", never proven safe.`,
    );
  if (surface.thickness !== undefined && surface.thickness < 3 * impact.contactRadius) {
    warnings.push(
      ph`The padding (${m(input.padThicknessMm!, 'mm')}) is thin beside the contact (radius ${m(round(impact.contactRadius * 1000, 3), 'mm')}): the base under it stiffens it, so the real peak pressure is higher than shown.`,
    );
  }
  if (!limits.length) {
    warnings.push(
      `No published dynamic bruise threshold for a drop onto ${DROP_SURFACES[input.surface].label.toLowerCase()} for this fruit: the verdict below rests on the elastic estimate from the static threshold, which can be far stricter or far looser than drop tests (see how it fares on this fruit's published figures).`,
    );
  }
  const margin = dynamicMargin ?? staticMargin;
  const heights = safeHeights(f, fruit, pad, limitsFor, bruiseLimit);
  const inputsUsed = {
    ...fruitUsed(f),
    height_mm: input.heightMm,
    surface: input.surface,
    surface_basis: DROP_SURFACES[input.surface].basis,
  };
  return {
    check: 'drop' as const,
    pinned: pinnedSummary(f.pinned),
    inputs_used: inputsUsed,
    evidence: verdictEvidence(inputsUsed, limits[0] ? [['dynamic_threshold', limits[0].rung]] : []),
    impact: {
      impact_velocity_m_s: round(impact.velocity),
      impact_energy_j: round(impact.impactEnergy),
      peak_force_n: round(impact.peakForce),
      contact_radius_mm: round(impact.contactRadius * 1000),
      peak_pressure_kpa: round(impact.peakPressure / 1000),
      contact_time_ms: round(impact.contactTime * 1000),
      max_approach_mm: round(impact.maxApproach * 1000),
    },
    margin:
      margin === null
        ? null
        : {
            value: round(margin, 3),
            basis: dynamicMargin !== null ? 'dynamic' : 'static',
            verdict: bound && verdictOf(margin) === 'comfortable' ? 'tight' : verdictOf(margin),
            upper_bound: Boolean(bound),
          },
    dynamic: limits[0]
      ? {
          safe_height_mm: round(limits[0].heightM * 1000),
          margin: round(dynamicMargin!, 3),
          basis: limits[0].basis,
          source: limits[0].source,
          note: limits[0].note,
          rung: limits[0].rung,
          observation: limits[0].observation,
          upper_bound: limits[0].upperBound,
        }
      : null,
    static:
      staticMargin === null
        ? null
        : {
            margin: round(staticMargin, 3),
            threshold_kpa: f.staticThresholdKpa!.value,
            source: f.staticThresholdKpa!.source,
            rung: f.staticThresholdKpa!.rung,
          },
    safe_heights: heights,
    bruise,
    bruise_volume: volume,
    within_tolerance_height_mm: withinM === null ? null : round(withinM * 1000),
    // Which figure the verdict rests on, and how the two relate, in one sentence.
    relation: volume
      ? volumeRelation(volume, limits[0] ?? null)
      : ph`${relationOf(limits[0] ?? null, bruise, withinM, heightM, DROP_SURFACES[input.surface].label)}${limits[0] || !bruise ? '' : estimateCheck(heights, input.surface)}`,
    series: series(fruit, surface, heightM),
    warnings,
    units: {
      impact_velocity_m_s: 'm/s',
      impact_energy_j: 'J',
      peak_force_n: 'N',
      contact_radius_mm: 'mm',
      peak_pressure_kpa: 'kPa',
      contact_time_ms: 'ms',
      max_approach_mm: 'mm',
      safe_height_mm: 'mm',
      margin: 'threshold ÷ load (–)',
    },
  };
}

export type DropCheckResult = DropResult;
