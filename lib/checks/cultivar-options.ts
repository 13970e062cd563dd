import 'server-only';
import type { Actor } from '@/lib/auth/actor';
import { listPublishedCultivars } from '@/lib/data/cultivars';
import { allGradeRules } from '@/lib/data/grade-rules';
import type { Rung } from '@/lib/evidence/rungs';
import { ValidationError } from '@/lib/errors';
import { climb } from '@/lib/evidence/ladder';
import { evidenceForRecords } from './evidence-set';
import { FACING_KEYS, frictionSurfacesFor } from './facings';
import { fruitFromEvidence } from './resolve-fruit';
import type { UsedValue } from './used-value';

/** A figure a check form shows as a placeholder: the value the check would take, and its rung. */
export interface PrefillFigure {
  value: number;
  rung: Rung;
}

/** The figures a check form shows as placeholders, keyed like the form's fields. */
export type CultivarPrefill = Record<string, PrefillFigure | undefined>;

const figure = (u: UsedValue | null): PrefillFigure | undefined =>
  u ? { value: u.value, rung: u.rung } : undefined;

/**
 * Published cultivars and commodity records for a check's select, each with the figures the
 * evidence ladder gives it when nothing is typed (the same choice the check makes). A record
 * whose ladder runs dry somewhere is marked, and the missing figure must be typed in.
 */
export async function cultivarOptions(actor: Actor) {
  const records = await listPublishedCultivars(actor);
  const rules = await allGradeRules();
  const options = records.map((c) => {
    let prefill: CultivarPrefill = {};
    let complete = true;
    try {
      const f = fruitFromEvidence(null, evidenceForRecords(c, records, null), {});
      prefill = {
        modulusMpa: figure(f.modulusMpa),
        poisson: figure(f.poisson),
        diameterMm: figure(f.diameterMm),
        axialMm: figure(f.axialMm),
        massG: figure(f.massG),
        densityKgM3: figure(f.densityKgM3),
        staticThresholdKpa: figure(f.staticThresholdKpa),
      };
      for (const facing of FACING_KEYS) {
        const friction = climb(
          f.evidence,
          { quantity: 'friction_coefficient', variants: frictionSurfacesFor(facing) },
          { unit: '–' },
        );
        prefill[`friction@${facing}`] = figure(friction?.used ?? null);
      }
      complete = f.staticThresholdKpa !== null;
    } catch (error) {
      if (!(error instanceof ValidationError)) throw error;
      complete = false;
    }
    const name = c.isType ? 'commodity record (no cultivar named)' : c.name;
    const label = `${c.commodity.name} — ${name}${complete ? '' : ' (some figures to enter)'}`;
    // The grade rules a bruise of this fruit may be judged by: its commodity's, then any's.
    const grades = rules
      .filter((r) => r.commodity === c.commodity.name || r.commodity === null)
      .sort((a, b) => Number(a.commodity === null) - Number(b.commodity === null))
      .map((r) => ({ slug: r.slug, name: r.name }));
    return {
      slug: c.slug,
      label,
      prefill,
      complete,
      commodity: c.commodity.name,
      isType: c.isType,
      grades,
    };
  });
  return options.sort(
    (a, b) =>
      Number(b.complete) - Number(a.complete) ||
      a.commodity.localeCompare(b.commodity) ||
      Number(b.isType) - Number(a.isType) ||
      a.label.localeCompare(b.label),
  );
}

/** The cultivar a check page starts on: the one asked for, else the first with every figure. */
export function initialCultivar(options: { slug: string; complete: boolean }[], wanted?: string) {
  return (
    options.find((o) => o.slug === wanted)?.slug ?? options.find((o) => o.complete)?.slug ?? ''
  );
}
