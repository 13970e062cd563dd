import { describe, expect, it } from 'vitest';
import { startingText, typedText } from '@/components/checks/measure-fields';

describe('check forms: starting figures and typed numbers', () => {
  it('starts US readers at round figures (2 significant figures, or 1 within 2.5 %)', () => {
    // 20 mm = 0.7874 in → 0.8; 1200 mm = 47.24 in → 47; 600 mm = 23.62 in → 24 (1.6 % off).
    const text = startingText(
      { padDiameterMm: '20', binLengthMm: '1200', fillDepthMm: '600', friction: '0.5' },
      {},
      'us',
    );
    expect(text).toEqual({
      padDiameterMm: '0.8',
      binLengthMm: '47',
      fillDepthMm: '24',
      friction: '0.5',
    });
  });

  it('keeps SI defaults as given and converts an address figure without rounding it further', () => {
    expect(startingText({ padDiameterMm: '20' }, {}, 'si')).toEqual({ padDiameterMm: '20' });
    // An address holds SI as typed before: 0.79 in = 20.066 mm reads back 0.79, not 0.8.
    expect(startingText({ padDiameterMm: '20' }, { padDiameterMm: '20.066' }, 'us')).toEqual({
      padDiameterMm: '0.79',
    });
    expect(startingText({ padDiameterMm: '20' }, { padDiameterMm: '' }, 'us')).toEqual({
      padDiameterMm: '',
    });
  });

  it('sends "20,5" as 20.5 and leaves a text with no one meaning for the route to name', () => {
    expect(typedText({ padDiameterMm: '20,5', massG: '1,234,5', friction: '' })).toEqual({
      padDiameterMm: '20.5',
      massG: '1,234,5',
      friction: '',
    });
  });
});
