import { FIELD_UNITS, type CheckField } from '@/lib/checks/field-units';

/** A check form's figures as typed, by field; only fields with a declared unit exist. */
export type FormText = Partial<Record<CheckField, string>>;

/** The fields of a form's text with their values, keys typed. */
export const formEntries = (text: FormText) => Object.entries(text) as [CheckField, string][];

/** A form's starting figures, given in SI, as text in the user's units (sensibly rounded). */
export function initialText(
  si: FormText,
  toDisplay: (value: number, unit: string) => number,
): FormText {
  return Object.fromEntries(
    formEntries(si).map(([key, value]) => [
      key,
      // A field left empty (an address can say so) stays empty.
      value.trim() === ''
        ? ''
        : String(Number(toDisplay(Number(value), FIELD_UNITS[key]).toPrecision(4))),
    ]),
  );
}
