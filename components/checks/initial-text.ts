import { FIELD_UNITS } from './field-units';

/** A form's starting figures, given in SI, as text in the user's units. */
export function initialText(
  si: Record<string, string>,
  toDisplay: (value: number, unit: string) => number,
): Record<string, string> {
  return Object.fromEntries(
    Object.entries(si).map(([key, value]) => [
      key,
      String(Number(toDisplay(Number(value), FIELD_UNITS[key] ?? '–').toPrecision(4))),
    ]),
  );
}
