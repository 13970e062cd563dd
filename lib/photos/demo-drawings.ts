import { SHAPES, type Palette } from './demo-shapes';

/**
 * Invented drawings for the demo's photos: one stylised fruit shape and colour per commodity,
 * picked by a word in the commodity's slug. Nothing here is a picture of real produce.
 */
const STYLES: { words: string[]; shape: keyof typeof SHAPES; palette: Palette }[] = [
  { words: ['pineapple'], shape: 'pear', palette: pal('#f2c14e', '#d99a22', '#8a5a12', '#4f8a3c') },
  { words: ['apple'], shape: 'pome', palette: pal('#f08a7a', '#c8382e', '#7c1d1a', '#f7e6b5') },
  {
    words: ['pear', 'quince'],
    shape: 'pear',
    palette: pal('#e6ef9a', '#b8c94a', '#6f7f22', '#f4f0c8'),
  },
  { words: ['kiwi'], shape: 'kiwi', palette: pal('#b58a5c', '#8a6238', '#5a3e22', '#7fb236') },
  { words: ['peach'], shape: 'stone', palette: pal('#ffd0a0', '#f59a6a', '#c65a3c', '#ffd68f') },
  // Smooth-skinned and redder than a peach.
  {
    words: ['nectarine'],
    shape: 'stone',
    palette: pal('#ffb070', '#d8342a', '#7c1420', '#ffd060'),
  },
  { words: ['apricot'], shape: 'stone', palette: pal('#ffd28a', '#f2a23c', '#b8691c', '#ffe0a0') },
  {
    words: ['plum', 'prune'],
    shape: 'stone',
    palette: pal('#9c6fb0', '#5e2f78', '#2e1540', '#e0c56a'),
  },
  // Before 'cherry' and 'tomato': a cherry tomato is neither a cherry nor a beefsteak tomato.
  {
    words: ['cherry-tomato'],
    shape: 'truss',
    palette: pal('#ff9a7a', '#e8402a', '#a01c12', '#f2c6a0'),
  },
  { words: ['cherry'], shape: 'cherry', palette: pal('#e8606a', '#a3172a', '#560812', '#f2c6cc') },
  {
    words: ['strawberry', 'raspberry'],
    shape: 'berry',
    palette: pal('#ff7a7a', '#d92b34', '#8c1420', '#f5d76e'),
  },
  { words: ['tomato'], shape: 'tomato', palette: pal('#ff8a6a', '#e0402a', '#962015', '#f2c6a0') },
  {
    words: ['avocado'],
    shape: 'avocado',
    palette: pal('#6b8f3c', '#3e5e22', '#22340f', '#d9e07a'),
  },
  {
    words: ['mango', 'papaya'],
    shape: 'mango',
    palette: pal('#ffd24a', '#f08a2c', '#b0402a', '#ffe08a'),
  },
  { words: ['banana'], shape: 'banana', palette: pal('#fff08a', '#f2d23c', '#b09420', '#5a4020') },
  {
    words: ['blueberr'],
    shape: 'blueberries',
    palette: pal('#8a9ad8', '#3c4a8c', '#1c2250', '#6a5a80'),
  },
  { words: ['grape'], shape: 'cluster', palette: pal('#8a7fd0', '#4a3f90', '#231c50', '#cfc8f0') },
  // Mandarins (and tangerines, clementines) are flatter, smaller and deeper in colour.
  {
    words: ['mandarin', 'tangerine', 'clementine'],
    shape: 'mandarin',
    palette: pal('#ffa84a', '#f0701a', '#a8400c', '#ffe0a0'),
  },
  {
    words: ['orange', 'citrus', 'lemon', 'lime'],
    shape: 'citrus',
    palette: pal('#ffc04a', '#f28a1c', '#b45a10', '#ffe0a0'),
  },
  {
    words: ['potato'],
    shape: 'tuber',
    palette: pal('#e8cf9a', '#c09a5c', '#7a5a30', '#f2e2b8'),
  },
];

function pal(light: string, body: string, shade: string, accent: string): Palette {
  return { light, body, shade, accent };
}

/** A steady hue from a slug, for a commodity none of the styles above names. */
function fallbackPalette(slug: string): Palette {
  const hue = [...slug].reduce((h, c) => (h * 31 + c.charCodeAt(0)) % 360, 7);
  const hsl = (l: number) => `hsl(${hue}, 55%, ${l}%)`;
  return { light: hsl(72), body: hsl(50), shade: hsl(28), accent: hsl(85) };
}

export function styleFor(commoditySlug: string) {
  const style = STYLES.find((s) => s.words.some((w) => commoditySlug.includes(w)));
  return style ?? { shape: 'stone' as const, palette: fallbackPalette(commoditySlug) };
}

/** The SVG of a commodity's demo drawing, 1200 × 900 px. */
export function demoDrawing(commoditySlug: string): string {
  const { shape, palette: p } = styleFor(commoditySlug);
  return `<svg xmlns="http://www.w3.org/2000/svg" width="1200" height="900" viewBox="0 0 1200 900">
<defs><radialGradient id="body" cx="0.36" cy="0.32" r="0.75">
<stop offset="0" stop-color="${p.light}"/><stop offset="0.55" stop-color="${p.body}"/><stop offset="1" stop-color="${p.shade}"/>
</radialGradient></defs>
<rect width="1200" height="900" fill="#f3eee4"/><rect y="690" width="1200" height="210" fill="#e4dccb"/>
<ellipse cx="610" cy="790" rx="330" ry="46" fill="#000" opacity="0.12"/>
${SHAPES[shape](p)}
</svg>`;
}
