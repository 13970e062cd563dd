import { describe, expect, it } from 'vitest';
import { decimalMarkOf, parseNumberText } from '@/lib/number-text';

// Expected values are written out by hand from how each text is read by a person of the locale.
describe('typed numbers', () => {
  it('reads a decimal comma as a decimal mark in either locale when it has one meaning', () => {
    expect(parseNumberText('20,5', ',')).toEqual({ ok: true, value: 20.5 });
    expect(parseNumberText('20,5', '.')).toEqual({ ok: true, value: 20.5 });
    expect(parseNumberText('0,125', '.')).toEqual({ ok: true, value: 0.125 });
    expect(parseNumberText(',5', ',')).toEqual({ ok: true, value: 0.5 });
  });

  it('reads grouping that fits the locale, with spaces, points or commas', () => {
    expect(parseNumberText('1.234,5', ',')).toEqual({ ok: true, value: 1234.5 });
    expect(parseNumberText('1,234.5', '.')).toEqual({ ok: true, value: 1234.5 });
    expect(parseNumberText('1 234,5', ',')).toEqual({ ok: true, value: 1234.5 });
    expect(parseNumberText('1\u202f234.5', '.')).toEqual({ ok: true, value: 1234.5 });
    expect(parseNumberText('1,234,567', '.')).toEqual({ ok: true, value: 1234567 });
    expect(parseNumberText('1.234.567', ',')).toEqual({ ok: true, value: 1234567 });
  });

  it('reads plain numbers, signs (also U+2212) and exponents as before', () => {
    expect(parseNumberText('20.5', '.')).toEqual({ ok: true, value: 20.5 });
    expect(parseNumberText(' -3 ', '.')).toEqual({ ok: true, value: -3 });
    expect(parseNumberText('\u22123', '.')).toEqual({ ok: true, value: -3 });
    expect(parseNumberText('1e3', '.')).toEqual({ ok: true, value: 1000 });
    expect(parseNumberText('', '.')).toEqual({ ok: true, value: null });
  });

  it('refuses "1,234,5" with a message naming the second comma', () => {
    const r = parseNumberText('1,234,5', ',');
    expect(r.ok).toBe(false);
    expect(!r.ok && r.message).toBe(
      '"1,234,5" has more than one comma; a number takes one decimal mark (e.g. 1234.5).',
    );
    expect(parseNumberText('1,234,5', '.').ok).toBe(false);
  });

  it('asks rather than guesses where a mark could group thousands in the locale', () => {
    const r = parseNumberText('1,234', '.');
    expect(!r.ok && r.message).toBe(
      '"1,234" could be 1234 or 1.234; type it without the comma or with the decimal mark you mean.',
    );
    // In a decimal-comma locale the same text has one meaning; a point there is the doubtful one.
    expect(parseNumberText('1,234', ',')).toEqual({ ok: true, value: 1.234 });
    expect(parseNumberText('1.234', ',').ok).toBe(false);
  });

  it('refuses words, mixed marks in the wrong order, and empty digits', () => {
    expect(parseNumberText('abc', '.')).toEqual({
      ok: false,
      message: 'Type a number, e.g. 20.5.',
    });
    expect(parseNumberText('1,2.3', '.').ok).toBe(false);
    expect(parseNumberText('12 mm', '.').ok).toBe(false);
    expect(parseNumberText(',', '.').ok).toBe(false);
  });

  it('finds the decimal mark of a locale', () => {
    expect(decimalMarkOf('de-DE')).toBe(',');
    expect(decimalMarkOf('fr-FR')).toBe(',');
    expect(decimalMarkOf('en-US')).toBe('.');
    expect(decimalMarkOf('not a locale!')).toBe('.');
  });
});
