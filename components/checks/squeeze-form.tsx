'use client';

import { FACING_KEYS, FACING_PRESETS, type FacingPreset } from '@/lib/checks/facings';
import { CultivarSelect, type CultivarOption } from './check-fields';
import type { FormText } from './initial-text';
import { CheckFormError, FruitFieldset, MeasureFields, type FieldSpec } from './measure-fields';

const FRUIT: readonly FieldSpec[] = [
  ['modulusMpa', "Young's modulus"],
  ['poisson', "Poisson's ratio"],
  ['diameterMm', 'Diameter (equatorial)'],
  ['axialMm', 'Axial diameter (along the squeeze)'],
  ['massG', 'Mass'],
  ['densityKgM3', 'Density'],
  ['staticThresholdKpa', 'Static bruise threshold'],
  ['friction', 'Friction coefficient'],
];
const GRIP: readonly FieldSpec[] = [
  ['padDiameterMm', 'Pad diameter'],
  ['padEdgeMm', 'Pad edge radius'],
  ['safetyFactor', 'Safety factor on weight', 'our default 2'],
  ['accelerationMs2', 'Peak acceleration of the move', 'upward, beyond gravity'],
  ['horizontalAccelerationMs2', 'Sideways acceleration of the move', 'square to the pad axis'],
  ['gripOffsetMm', 'Grip offset from the centre of mass', 'pad axis to the centre; 0: centred'],
  ['holdSeconds', 'Hold time', 'the transfer, as the flesh relaxes; empty: not held'],
];
const ADVANCED: readonly FieldSpec[] = [
  [
    'maxTravelMm',
    'Maximum travel per pad',
    "empty: 5 % of the fruit's radius along the squeeze; at most 15 %",
  ],
];
const FACING: readonly FieldSpec[] = [
  ['facingModulusMpa', 'Facing modulus'],
  ['facingThicknessMm', 'Facing thickness'],
  ['facingPoisson', "Facing Poisson's ratio", 'empty: 0.45'],
];

export interface SqueezeFormProps {
  cultivars: CultivarOption[];
  cultivar: string;
  setCultivar: (slug: string) => void;
  stage: string;
  setStage: (stage: string) => void;
  grade: { value: string; onChange: (slug: string) => void };
  facing: FacingPreset;
  setFacing: (f: FacingPreset) => void;
  text: FormText;
  set: (key: string) => (value: string) => void;
  fieldErrors: Record<string, string[]>;
  message: string | null;
}

/** The squeeze check's inputs: fruit (or a cultivar's published values), pads and the move. */
export function SqueezeForm(p: SqueezeFormProps) {
  const chosen = p.cultivars.find((o) => o.slug === p.cultivar);
  // The friction the check takes depends on the pad's facing: show the one for this facing.
  const option = chosen && {
    ...chosen,
    prefill: { ...chosen.prefill, friction: chosen.prefill[`friction@${p.facing}`] },
  };
  const state = { text: p.text, set: p.set, fieldErrors: p.fieldErrors };
  return (
    <form className="space-y-3" onSubmit={(e) => e.preventDefault()} aria-label="Squeeze inputs">
      <CultivarSelect
        options={p.cultivars}
        value={p.cultivar}
        onChange={p.setCultivar}
        errors={p.fieldErrors.cultivar}
        stage={{ value: p.stage, onChange: p.setStage, errors: p.fieldErrors.stage }}
        grade={{ ...p.grade, errors: p.fieldErrors.gradeRule }}
      />
      <fieldset className="space-y-3 rounded-md border border-stone-200 p-3">
        <legend className="px-1 text-xs font-medium uppercase tracking-wide text-stone-600">
          Grip
        </legend>
        <MeasureFields fields={GRIP} state={state} />
        <div className="space-y-1">
          <label htmlFor="squeeze-facing" className="block text-sm font-medium">
            Pad facing
          </label>
          <select
            id="squeeze-facing"
            value={p.facing}
            onChange={(e) => p.setFacing(e.target.value as FacingPreset)}
            className="w-full max-w-xs rounded-md border border-stone-300 bg-white px-2 py-1.5 text-sm"
          >
            {FACING_KEYS.map((k) => (
              <option key={k} value={k}>
                {FACING_PRESETS[k].label}
              </option>
            ))}
          </select>
          <p className="text-xs text-stone-500">{FACING_PRESETS[p.facing].basis}</p>
          <p className="text-xs text-red-700" aria-live="polite">
            {p.fieldErrors.facing?.join(' ')}
          </p>
        </div>
        {p.facing === 'custom' ? <MeasureFields fields={FACING} state={state} /> : null}
        <details className="rounded-md border border-stone-200 p-2" data-testid="squeeze-advanced">
          <summary className="cursor-pointer text-sm font-medium">Advanced model settings</summary>
          <div className="mt-2">
            <MeasureFields fields={ADVANCED} state={state} />
          </div>
        </details>
      </fieldset>
      <FruitFieldset fields={FRUIT} state={state} option={option} />
      <CheckFormError message={p.message} />
    </form>
  );
}
