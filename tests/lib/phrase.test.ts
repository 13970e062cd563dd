import { describe, expect, it } from 'vitest';
import { m, ph, siText, textIn } from '@/lib/phrase';

describe('sentences with measures', () => {
  it('keep words and measures apart, and splice phrases', () => {
    const inner = ph`${m(4.183, 'N')} at first`;
    const p = ph`close to ${m(25.4, 'mm')} per pad (${inner}), margin ${0.57}.`;
    expect(p).toEqual([
      'close to ',
      { value: 25.4, unit: 'mm' },
      ' per pad (',
      { value: 4.183, unit: 'N' },
      ' at first), margin 0.57.',
    ]);
  });

  it('read in each system: 25.4 mm is 1 in exactly, 4.4482216 N is 1 lbf', () => {
    // The inch is 25.4 mm and the pound-force 0.45359237 kg × 9.80665 m/s² (NIST SP 811, 2008,
    // App. B); four significant figures are shown, so both read as exactly 1.
    const p = ph`close to ${m(25.4, 'mm')}, ${m(4.4482216, 'N')} at first`;
    expect(textIn(p, 'us')).toBe('close to 1 in, 1 lbf at first');
    expect(siText(p)).toBe('close to 25.4 mm, 4.448 N at first');
    // A plain string (a result saved before phrases) passes through unchanged.
    expect(textIn('as saved', 'us')).toBe('as saved');
  });
});
