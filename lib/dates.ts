/**
 * The one way dates are shown: the calendar date as `2026-12-02` and a moment as
 * `2026-12-02 14:05 UTC` (ISO 8601 order, which reads the same in every locale; UTC, as stored).
 * Every page, e-mail and export that shows a date goes through here, so one screen never mixes
 * two formats.
 */

type DateInput = string | number | Date | null | undefined;

function toDate(value: DateInput): Date | null {
  if (value === null || value === undefined || value === '') return null;
  const date = value instanceof Date ? value : new Date(value);
  return Number.isNaN(date.getTime()) ? null : date;
}

/** `2026-12-02` (UTC), or a dash for no date or one that cannot be read. */
export function formatDate(value: DateInput): string {
  const date = toDate(value);
  return date ? date.toISOString().slice(0, 10) : '—';
}

/** `2026-12-02 14:05 UTC`, or a dash for no date or one that cannot be read. */
export function formatDateTime(value: DateInput): string {
  const date = toDate(value);
  return date ? `${date.toISOString().slice(0, 10)} ${date.toISOString().slice(11, 16)} UTC` : '—';
}
