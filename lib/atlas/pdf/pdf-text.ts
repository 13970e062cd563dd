/**
 * The PDF's prose font is the built-in Helvetica, which covers the Windows-1252 characters only;
 * the few signs outside it that our texts use are spelt out instead of printing as blanks.
 */
const SPELT: Record<string, string> = {
  '≥': '>=',
  '≤': '<=',
  '−': '-',
  '≈': '~',
  '→': '->',
  '×': 'x',
  '\u00a0': ' ',
  '\u202f': ' ',
};

const WIN_ANSI_EXTRA = new Set('€‚ƒ„…†‡ˆ‰Š‹ŒŽ‘’“”•–—˜™š›œžŸ');

export function pdfText(text: string): string {
  return [...text]
    .map((ch) => {
      if (SPELT[ch] !== undefined) return SPELT[ch];
      const code = ch.codePointAt(0)!;
      return code < 0x100 || WIN_ANSI_EXTRA.has(ch) ? ch : '?';
    })
    .join('');
}
