import { FIELD_UNITS } from './field-units';

/**
 * A check's inputs in its page's address, so a check can be shared, reloaded, gone back to, and
 * reopened from a saved assessment. Figures travel in SI (the unit the route takes), so an address
 * means the same to a reader in either unit system; a field the user emptied travels empty.
 */
export function checkQuery(inputs: Record<string, unknown>): string {
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(inputs)) {
    if (value === undefined || value === null) continue;
    if (typeof value === 'object') continue;
    params.set(key, String(value));
  }
  return params.toString();
}

/** The check page's address holding these inputs. */
export function checkHref(check: string, inputs: Record<string, unknown>): string {
  const query = checkQuery(inputs);
  return `/checks/${check}${query ? `?${query}` : ''}`;
}

/**
 * The typed figures an address holds, in SI, for the form's known fields only: a finite number,
 * or '' for a field left empty. Anything else in the address is ignored.
 */
export function figuresFromQuery(params: URLSearchParams): Record<string, string> {
  const out: Record<string, string> = {};
  for (const key of Object.keys(FIELD_UNITS)) {
    const raw = params.get(key);
    if (raw === null) continue;
    if (raw.trim() === '') out[key] = '';
    else if (Number.isFinite(Number(raw))) out[key] = raw;
  }
  return out;
}
