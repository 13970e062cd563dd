import { describe, expect, it } from 'vitest';
import { demoDrawing, styleFor } from '@/lib/photos/demo-drawings';
import { COMMODITIES } from '@/seeds/property-data/commodities';

// The drawing each seeded commodity should get, chosen by hand for what the produce looks like.
const EXPECTED_SHAPE: Record<string, string> = {
  apple: 'pome',
  pear: 'pear',
  peach: 'stone',
  nectarine: 'stone',
  apricot: 'stone',
  plum: 'stone',
  strawberry: 'berry',
  blueberry: 'blueberries',
  orange: 'citrus',
  mandarin: 'mandarin',
  avocado: 'avocado',
  mango: 'mango',
  banana: 'banana',
  kiwifruit: 'kiwi',
  tomato: 'tomato',
  'cherry-tomato': 'truss',
  potato: 'tuber',
};

describe('demo drawings', () => {
  const slugs = COMMODITIES.map((c) => c.slug);

  it('draws each seeded commodity as what it is', () => {
    expect(Object.fromEntries(slugs.map((s) => [s, styleFor(s).shape]))).toEqual(EXPECTED_SHAPE);
  });

  it('gives no two commodities the same drawing', () => {
    const byDrawing = new Map<string, string[]>();
    for (const slug of slugs) {
      const svg = demoDrawing(slug);
      byDrawing.set(svg, [...(byDrawing.get(svg) ?? []), slug]);
    }
    expect([...byDrawing.values()].filter((same) => same.length > 1)).toEqual([]);
  });

  it('does not draw the potato as a round stone fruit, nor orange and mandarin alike', () => {
    expect(styleFor('potato').shape).not.toBe(styleFor('plum').shape);
    expect(styleFor('mandarin').shape).not.toBe(styleFor('orange').shape);
    // A cherry tomato is not a pair of cherries.
    expect(styleFor('cherry-tomato').shape).not.toBe(styleFor('cherry').shape);
  });

  it('is a 1200 × 900 SVG', () => {
    for (const slug of slugs) {
      expect(demoDrawing(slug)).toMatch(/^<svg [^>]*width="1200" height="900"/);
    }
  });
});
