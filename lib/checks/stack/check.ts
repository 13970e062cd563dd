import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { parseInput } from '@/lib/validation/parse';
import { stackCheckSchema } from '@/lib/checks/inputs';
import { pinnedSummary } from '../cultivar-inputs';
import { verdictEvidence } from '../evidence-summary';
import { fruitUsed, resolveFruit } from '../resolve-fruit';
import type { StackResult } from './result';
import { chooseGradeRule } from '@/lib/data/grade-rules';
import { bruiseRadiusLimit, judgeBruise, ruleView } from '../bruise';
import { bruiseAt, deepestFillWithin, deepestSafeFill, stackAt, type StackSI } from './model';
import { verdictOf } from '../verdict';
import { stackFigures } from './figures';
import { m, ph, type Text } from '@/lib/phrase';

const round = (x: number, digits = 4) => Number(x.toPrecision(digits));

/** The stack check: Janssen's wall-friction law down the bin, Hertz at the bottom contact. */
export async function runStackCheck(actor: Actor, raw: unknown): Promise<StackResult> {
  const input = parseInput(stackCheckSchema, raw);
  const f = await resolveFruit(actor, input);
  const p = f.pinned;
  const { bulk, wall, ratio } = stackFigures(f.evidence, f.densityKgM3, input);
  const s: StackSI = {
    length: input.binLengthMm / 1000,
    width: input.binWidthMm / 1000,
    bulkDensity: bulk.value,
    wallFriction: wall.value,
    lateralRatio: ratio.value,
    fruitRadius: f.diameterMm.value / 2000,
    modulus: f.modulusMpa.value * 1e6,
    poisson: f.poisson.value,
  };
  const depth = input.fillDepthMm / 1000;
  const bottom = stackAt(s, depth);
  const threshold = f.staticThresholdKpa ? f.staticThresholdKpa.value * 1000 : null;
  const margin = threshold === null ? null : threshold / bottom.peakPressure;
  const safe = threshold === null ? undefined : deepestSafeFill(s, threshold);
  const grade = await chooseGradeRule(p?.commodityId ?? null, input.gradeRule);
  const rule = grade && ruleView(grade, p?.commodity ?? null);
  const bruise = threshold === null ? null : judgeBruise(bruiseAt(s, depth, threshold), rule);
  const within =
    threshold === null || !rule
      ? undefined
      : deepestFillWithin(s, threshold, bruiseRadiusLimit(rule));
  const fruitMm = f.diameterMm.value;
  const layers = (mm: number | null | undefined) =>
    mm === undefined ? undefined : mm === null ? null : Math.floor(mm / fruitMm);
  const top = Math.max(1.5 * depth, safe ? 1.2 * safe : 0, within ? 1.1 * within : 0, 0.5);
  const series = Array.from({ length: 40 }, (_, i) => {
    const z = (top * (i + 1)) / 40;
    const at = stackAt(s, z);
    return {
      depth_mm: round(z * 1000),
      vertical_pressure_kpa: round(at.verticalPressure / 1000),
      contact_pressure_kpa: round(at.peakPressure / 1000),
      margin: threshold === null ? null : round(threshold / at.peakPressure, 3),
    };
  });
  const warnings: Text[] = [...f.warnings];
  if (threshold === null)
    warnings.push('No static bruise threshold: enter one to get a margin and a safe depth.');
  for (const [name, v] of [
    ['Bulk density', bulk],
    ['Wall friction', wall],
    ['Lateral pressure ratio', ratio],
  ] as const) {
    if (v.rung === 'typical')
      warnings.push(
        ph`${name} is a typical value (${m(v.value, v.unit)}), not a measured one: ${v.note ?? v.source ?? ''}`,
      );
  }
  if (bruise)
    warnings.push(
      'The bruise size is the surface region where the Hertz contact pressure exceeds the threshold; its depth is not predicted, so a grade rule’s depth limit is not checked.',
    );
  const inputsUsed = {
    ...fruitUsed(f),
    bulk_density_kg_m3: bulk,
    wall_friction: wall,
    lateral_pressure_ratio: ratio,
    fill_depth_mm: input.fillDepthMm,
    bin_length_mm: input.binLengthMm,
    bin_width_mm: input.binWidthMm,
  };
  return {
    check: 'stack' as const,
    pinned: pinnedSummary(p),
    inputs_used: inputsUsed,
    evidence: verdictEvidence(inputsUsed),
    bottom: {
      vertical_pressure_kpa: round(bottom.verticalPressure / 1000),
      contact_force_n: round(bottom.force),
      contact_radius_mm: round(bottom.contactRadius * 1000),
      contact_pressure_kpa: round(bottom.peakPressure / 1000),
    },
    margin:
      margin === null
        ? null
        : { value: round(margin, 3), basis: 'static', verdict: verdictOf(margin) },
    deepest_safe_fill_mm:
      safe === undefined ? undefined : safe === null ? null : round(safe * 1000),
    bruise,
    deepest_fill_within_tolerance_mm:
      within === undefined ? undefined : within === null ? null : round(within * 1000),
    layers: {
      no_bruise: layers(safe === undefined || safe === null ? safe : safe * 1000),
      within_tolerance: layers(within === undefined || within === null ? within : within * 1000),
      fruit_diameter_mm: round(fruitMm),
    },
    series,
    warnings,
    units: {
      vertical_pressure_kpa: 'kPa',
      contact_force_n: 'N',
      contact_radius_mm: 'mm',
      contact_pressure_kpa: 'kPa',
      deepest_safe_fill_mm: 'mm (null: any depth)',
      deepest_fill_within_tolerance_mm: 'mm (null: any depth)',
      diameter_mm: 'mm',
      area_mm2: 'mm²',
      depth_mm: 'mm',
      margin: 'threshold ÷ contact pressure (–)',
    },
  };
}

export type StackCheckResult = StackResult;
