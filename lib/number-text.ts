/**
 * Typed numbers as people write them: "20.5", "20,5" where the reader's locale writes a decimal
 * comma, "1 234,5" or "1,234.5" with grouping. A text is read only when it has one meaning;
 * otherwise the answer says why, in words a form can show beside the field.
 */
export type DecimalMark = '.' | ',';

export type ParsedNumber = { ok: true; value: number | null } | { ok: false; message: string };

/** The decimal mark a locale writes ("de-DE" → ",", "en-US" → "."); "." when unknown. */
export function decimalMarkOf(locale?: string): DecimalMark {
  try {
    const parts = new Intl.NumberFormat(locale).formatToParts(1.5);
    return parts.find((p) => p.type === 'decimal')?.value === ',' ? ',' : '.';
  } catch {
    return '.';
  }
}

/** The decimal mark of the browser's language (the server's default during a server render). */
export function readerDecimalMark(): DecimalMark {
  return decimalMarkOf(typeof navigator === 'undefined' ? undefined : navigator.language);
}

const SHAPE = /^([+-]?)([\d.,]*\d[\d.,]*|[.,]\d+)([eE][+-]?\d+)?$/;

const grouped = (body: string, group: string) =>
  new RegExp(`^\\d{1,3}(\\${group}\\d{3})+$`).test(body);

const count = (text: string, ch: string) => text.split(ch).length - 1;

/** The body (digits and marks, no sign or exponent) with "." as its only mark, or a refusal. */
function normalise(body: string, mark: DecimalMark): string | { message: string } {
  const commas = count(body, ',');
  const dots = count(body, '.');
  if (commas && dots) {
    const decimal = body.lastIndexOf(',') > body.lastIndexOf('.') ? ',' : '.';
    const group = decimal === ',' ? '.' : ',';
    const [whole, fraction] = body.split(decimal);
    if (count(body, decimal) === 1 && grouped(whole, group) && /^\d+$/.test(fraction)) {
      return `${whole.split(group).join('')}.${fraction}`;
    }
    return { message: `"${body}" mixes commas and points; type the number with one decimal mark.` };
  }
  const only = commas ? ',' : dots ? '.' : null;
  if (only === null) return body;
  const n = commas || dots;
  if (n > 1) {
    // Several of one mark can only be thousands groups, and only where the locale groups so.
    if (only !== mark && grouped(body, only)) return body.split(only).join('');
    return {
      message: `"${body}" has more than one ${only === ',' ? 'comma' : 'point'}; a number takes one decimal mark (e.g. 1234.5).`,
    };
  }
  const [whole, fraction] = body.split(only);
  // "1,234" reads 1234 to one reader and 1.234 to another: ask, rather than guess.
  if (only !== mark && fraction.length === 3 && /^[1-9]\d{0,2}$/.test(whole)) {
    return {
      message: `"${body}" could be ${whole}${fraction} or ${whole}.${fraction}; type it without the ${only === ',' ? 'comma' : 'point'} or with the decimal mark you mean.`,
    };
  }
  return `${whole}.${fraction}`;
}

/**
 * A typed number: `{ ok: true, value: null }` for an empty text, the number when the text has
 * one meaning, or a message saying why not. A comma is read as the decimal mark ("20,5" = 20.5)
 * unless it could be a thousands separator in the reader's locale ("1,234" with mark ".").
 */
export function parseNumberText(text: string, mark: DecimalMark = '.'): ParsedNumber {
  // The minus sign (U+2212) and spaces between digits (plain, no-break, thin) as people type them.
  const t = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(/(\d)[ \u00a0\u2009\u202f]+(?=\d)/g, '$1');
  if (t === '') return { ok: true, value: null };
  const m = SHAPE.exec(t);
  if (!m) return { ok: false, message: 'Type a number, e.g. 20.5.' };
  const body = normalise(m[2], mark);
  if (typeof body !== 'string') return { ok: false, ...body };
  const value = Number(`${m[1]}${body}${m[3] ?? ''}`);
  if (!Number.isFinite(value)) return { ok: false, message: 'Type a number, e.g. 20.5.' };
  return { ok: true, value };
}
