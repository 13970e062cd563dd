import { FemInputError } from '@/fem';
import { ValidationError } from '@/lib/errors';

/**
 * The model's input names (SI, see fem/squeeze/01-input.ts) → the form's field and its label,
 * so a refusal of the model appears beside the input the user typed, in the user's words.
 */
const FORM_FIELDS: Record<string, { field: string; label: string }> = {
  travel: { field: 'maxTravelMm', label: 'Maximum travel per pad' },
  equatorialRadius: { field: 'diameterMm', label: 'Diameter' },
  axialRadius: { field: 'axialMm', label: 'Axial diameter' },
  aspect: { field: 'axialMm', label: 'Axial diameter' },
  modulus: { field: 'modulusMpa', label: "Young's modulus" },
  poisson: { field: 'poisson', label: "Poisson's ratio" },
  padDiameter: { field: 'padDiameterMm', label: 'Pad diameter' },
  edgeRadius: { field: 'padEdgeMm', label: 'Pad edge radius' },
  facingModulus: { field: 'facingModulusMpa', label: 'Facing modulus' },
  facingThickness: { field: 'facingThicknessMm', label: 'Facing thickness' },
  facingPoisson: { field: 'facingPoisson', label: "Facing Poisson's ratio" },
  density: { field: 'densityKgM3', label: 'Density' },
  friction: { field: 'friction', label: 'Friction coefficient' },
  safetyFactor: { field: 'safetyFactor', label: 'Safety factor' },
  accelG: { field: 'accelerationMs2', label: 'Peak acceleration of the move' },
  bruiseThreshold: { field: 'staticThresholdKpa', label: 'Static bruise threshold' },
  padDiameters: { field: 'padDiameterMm', label: 'Pad diameter' },
  mesh: { field: 'mesh', label: 'Mesh' },
};

/** What the model's travel limit means for this fruit, in the form's words. */
function travelHint(message: string, axialMm: number): string {
  if (/15 %/.test(message)) {
    const limit = Number((0.15 * (axialMm / 2)).toPrecision(3));
    return `Maximum travel per pad must not exceed 15 % of the fruit's axial radius (small-strain model): at most ${limit} mm for this fruit.`;
  }
  if (/past the modelled contact zone/.test(message))
    return 'Maximum travel per pad spreads the contact past the modelled contact zone: reduce the travel.';
  return message;
}

/**
 * A model refusal as a 400 on the form's field. Errors of other kinds pass through unchanged;
 * a model field without a form counterpart keeps the model's message under `input`.
 */
export function toFormError(error: unknown, context: { axialMm: number }): unknown {
  if (!(error instanceof FemInputError)) return error;
  const form = FORM_FIELDS[error.field];
  if (!form) return new ValidationError(error.message, { input: [error.message] });
  const message =
    error.field === 'travel'
      ? travelHint(error.message, context.axialMm)
      : error.message.replace(new RegExp(`^${error.field}\\b`), form.label);
  return new ValidationError(message, { [form.field]: [message] });
}
