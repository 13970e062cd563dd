/**
 * Simple shapes for the invented demo photos, drawn as SVG on a 1200 × 900 canvas with the fruit
 * centred near (600, 450). Each takes a palette and returns SVG markup; `url(#body)` is the
 * shaded fill the caller defines from the palette.
 */
export interface Palette {
  /** Lit side, main colour and shaded side of the skin. */
  light: string;
  body: string;
  shade: string;
  /** Flesh, stems, seeds and the like. */
  accent: string;
}

const stem = (x: number, y: number, h: number) =>
  `<path d="M${x} ${y} q 8 ${-h / 2} 26 ${-h}" stroke="#6b4a2b" stroke-width="14" fill="none" stroke-linecap="round"/>`;
const leaf = (x: number, y: number) =>
  `<path d="M${x} ${y} q 70 -70 150 -30 q -70 60 -150 30 z" fill="#4f8a3c"/>`;
const dots = (points: [number, number][], r: number, fill: string) =>
  points.map(([x, y]) => `<circle cx="${x}" cy="${y}" r="${r}" fill="${fill}"/>`).join('');

/** A ring of n points around (cx, cy). */
const ring = (cx: number, cy: number, radius: number, n: number): [number, number][] =>
  Array.from({ length: n }, (_, i) => {
    const a = (2 * Math.PI * i) / n;
    return [Math.round(cx + radius * Math.cos(a)), Math.round(cy + radius * Math.sin(a))];
  });

export const SHAPES: Record<string, (p: Palette) => string> = {
  pome: () =>
    `<path d="M600 250 c 90 -60 270 -40 270 170 c 0 170 -120 300 -200 300 c -40 0 -50 -20 -70 -20 c -20 0 -30 20 -70 20 c -80 0 -200 -130 -200 -300 c 0 -210 180 -230 270 -170 z" fill="url(#body)"/>${stem(600, 262, 110)}${leaf(628, 200)}`,
  pear: () =>
    `<path d="M600 170 c 60 0 80 90 90 160 c 10 70 150 120 150 260 c 0 110 -110 170 -240 170 c -130 0 -240 -60 -240 -170 c 0 -140 140 -190 150 -260 c 10 -70 30 -160 90 -160 z" fill="url(#body)"/>${stem(600, 178, 90)}`,
  kiwi: (p) =>
    `<ellipse cx="460" cy="460" rx="230" ry="180" fill="url(#body)"/>` +
    `<circle cx="800" cy="470" r="180" fill="${p.shade}"/><circle cx="800" cy="470" r="165" fill="${p.accent}"/>` +
    `<circle cx="800" cy="470" r="60" fill="#f2efd0"/>${dots(ring(800, 470, 85, 22), 7, '#1d1a14')}`,
  stone: (p) =>
    `<circle cx="600" cy="470" r="250" fill="url(#body)"/><path d="M600 225 c -70 90 -70 330 0 490" stroke="${p.shade}" stroke-width="10" fill="none" opacity="0.6"/>${leaf(612, 230)}`,
  cherry: (p) =>
    `<path d="M470 560 q 40 -260 180 -330 M740 580 q -20 -250 -90 -350" stroke="#6b4a2b" stroke-width="12" fill="none"/>` +
    `<circle cx="470" cy="600" r="140" fill="url(#body)"/><circle cx="750" cy="610" r="140" fill="url(#body)"/>${leaf(650, 232)}` +
    `<circle cx="430" cy="560" r="22" fill="${p.light}" opacity="0.7"/>`,
  berry: (p) =>
    `<path d="M600 760 c -130 -60 -280 -250 -250 -380 c 30 -120 170 -130 250 -90 c 80 -40 220 -30 250 90 c 30 130 -120 320 -250 380 z" fill="url(#body)"/>` +
    dots(
      [
        [520, 400],
        [600, 380],
        [680, 400],
        [480, 480],
        [560, 470],
        [640, 470],
        [720, 480],
        [540, 560],
        [620, 560],
        [700, 550],
        [580, 650],
        [650, 640],
      ],
      9,
      p.accent,
    ) +
    `<path d="M470 300 l 60 20 l 20 -60 l 50 50 l 50 -50 l 20 60 l 60 -20 l -40 60 z" fill="#4f8a3c"/>`,
  tomato: () =>
    `<ellipse cx="600" cy="490" rx="290" ry="230" fill="url(#body)"/>` +
    `<path d="M600 280 l 40 -50 l 10 60 l 70 -10 l -50 40 l 50 40 l -70 -10 l -10 60 l -40 -50 l -40 50 l -10 -60 l -70 10 l 50 -40 l -50 -40 l 70 10 l 10 -60 z" fill="#3f7a33"/>`,
  avocado: (p) =>
    `<path d="M430 200 c 70 0 90 100 120 180 c 30 80 100 130 100 240 c 0 100 -90 150 -220 150 c -130 0 -220 -50 -220 -150 c 0 -110 70 -160 100 -240 c 30 -80 50 -180 120 -180 z" fill="url(#body)"/>` +
    `<ellipse cx="820" cy="520" rx="170" ry="220" fill="${p.shade}"/><ellipse cx="820" cy="520" rx="155" ry="205" fill="${p.accent}"/>` +
    `<circle cx="820" cy="580" r="80" fill="#7a4b27"/>`,
  mango: () =>
    `<path d="M380 520 c -40 -200 160 -330 340 -290 c 160 40 240 200 160 340 c -80 140 -300 190 -400 110 c -50 -40 -90 -90 -100 -160 z" fill="url(#body)"/>${stem(720, 236, 60)}`,
  banana: (p) =>
    `<path d="M300 330 c 60 280 420 380 640 160 c 30 -30 60 -20 40 20 c -200 330 -640 300 -740 -150 c -10 -40 50 -60 60 -30 z" fill="url(#body)"/>` +
    `<path d="M290 330 l -20 -60 l 40 -10 z" fill="${p.accent}"/>`,
  cluster: (p) =>
    dots(
      [
        [480, 330],
        [600, 330],
        [720, 330],
        [540, 440],
        [660, 440],
        [780, 430],
        [420, 440],
        [600, 550],
        [720, 540],
        [480, 550],
        [540, 660],
        [660, 650],
        [600, 760],
      ],
      70,
      'url(#body)',
    ) +
    dots(
      [
        [455, 305],
        [575, 305],
        [695, 305],
      ],
      14,
      p.light,
    ) +
    `<path d="M600 260 q 10 -60 60 -90" stroke="#6b4a2b" stroke-width="14" fill="none"/>${leaf(620, 210)}`,
  // A potato: a lumpy, elongated tuber with shallow eyes and no stem or leaf.
  tuber: (p) =>
    `<path d="M330 470 c -20 -120 90 -200 230 -190 c 90 6 130 -30 220 -20 c 120 14 170 110 150 210 c -20 110 -110 190 -250 200 c -90 6 -140 -20 -210 -10 c -90 12 -130 -90 -140 -190 z" fill="url(#body)"/>` +
    [
      [430, 420],
      [560, 360],
      [720, 340],
      [820, 470],
      [660, 560],
      [480, 580],
    ]
      .map(
        ([x, y]) =>
          `<path d="M${x - 16} ${y} q 16 -12 32 0" stroke="${p.shade}" stroke-width="7" fill="none" stroke-linecap="round"/>`,
      )
      .join('') +
    dots(
      [
        [500, 480],
        [610, 450],
        [760, 410],
        [560, 640],
        [700, 600],
      ],
      4,
      p.shade,
    ),
  // A mandarin: smaller and flattened, a sunken stem end and a leafy twig, a finely pitted peel.
  mandarin: (p) =>
    `<ellipse cx="600" cy="510" rx="240" ry="175" fill="url(#body)"/>` +
    dots(
      ring(600, 510, 1, 18).map(([x, y], i) => {
        const a = (2 * Math.PI * i) / 18;
        return [Math.round(x + 150 * Math.cos(a)), Math.round(y + 105 * Math.sin(a))];
      }),
      4,
      p.shade,
    ) +
    `<ellipse cx="600" cy="345" rx="38" ry="13" fill="${p.shade}"/>` +
    `<path d="M600 340 q 6 -40 30 -64" stroke="#6b4a2b" stroke-width="10" fill="none" stroke-linecap="round"/>` +
    `<path d="M628 278 c 40 -70 130 -90 200 -60 c -60 60 -140 80 -200 60 z" fill="#3f7a33"/>` +
    `<path d="M626 282 c -30 -60 -110 -80 -170 -50 c 50 50 120 66 170 50 z" fill="#4f8a3c"/>`,
  // Cherry tomatoes on the vine: a truss of small round fruit with green calyces.
  truss: () =>
    `<path d="M300 260 q 300 -80 620 40 M420 238 l 10 140 M560 220 l 0 210 M700 236 l -10 150 M820 270 l 0 230" stroke="#3f7a33" stroke-width="14" fill="none" stroke-linecap="round"/>` +
    [
      [430, 450, 100],
      [560, 540, 110],
      [690, 450, 100],
      [820, 570, 95],
    ]
      .map(
        ([x, y, r]) =>
          `<circle cx="${x}" cy="${y}" r="${r}" fill="url(#body)"/>` +
          `<path d="M${x} ${y - r + 6} l 24 -26 l -4 34 l 36 4 l -34 12 l -22 -24 l -22 24 l -34 -12 l 36 -4 l -4 -34 z" fill="#3f7a33"/>`,
      )
      .join(''),
  // Blueberries: a few loose round berries, each with its star-shaped crown.
  blueberries: (p) =>
    [
      [470, 520, 130],
      [720, 500, 140],
      [600, 690, 110],
    ]
      .map(
        ([x, y, r]) =>
          `<circle cx="${x}" cy="${y}" r="${r}" fill="url(#body)"/>` +
          `<circle cx="${x + r * 0.1}" cy="${y - r * 0.35}" r="${r * 0.22}" fill="${p.shade}"/>` +
          `<path d="M${x + r * 0.1} ${y - r * 0.55} l 8 16 l 18 2 l -13 12 l 4 18 l -17 -9 l -17 9 l 4 -18 l -13 -12 l 18 -2 z" fill="${p.accent}"/>`,
      )
      .join(''),
  citrus: (p) =>
    `<circle cx="600" cy="470" r="260" fill="url(#body)"/>` +
    dots([...ring(600, 470, 120, 14), ...ring(600, 470, 200, 24)], 5, p.shade) +
    `<circle cx="600" cy="470" r="16" fill="${p.shade}"/>${leaf(610, 215)}`,
};
