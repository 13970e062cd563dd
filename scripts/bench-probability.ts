/**
 * Benchmark of the probability of bruising and the slip map on the balanced mesh (run with
 * `npx tsx scripts/bench-probability.ts`). Monte Carlo of 1 000 samples, cold (body cache
 * cleared: the bodies of the Poisson bands are built) and warm (median of 3), for E alone and
 * for all six inputs spread; then the slip map at the grip point. Target: 1 000 samples ≤ 2 s.
 */
import {
  clearCondensedBodyCache,
  runMonteCarlo,
  slipMapAtGrip,
  type MonteCarloInput,
  type SqueezeInput,
} from '../fem';

// Reference case of scripts/bench.ts: 80 mm sphere, E = 3 MPa, ν = 0.35, 30 mm pads, 2 mm travel.
const base: SqueezeInput = {
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.002,
  steps: 20,
  mesh: 'balanced',
  padDiameter: 0.03,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  bruiseThreshold: 150e3,
};
const cases: [string, MonteCarloInput][] = [
  ['E alone (sd 20 %)', { base, spreads: { modulus: { sd: 0.6e6 } }, samples: 1000, seed: 1 }],
  [
    'all six spread',
    {
      base,
      spreads: {
        modulus: { sd: 0.6e6 },
        poisson: { low: 0.3, high: 0.4 },
        size: { low: 0.036, high: 0.044 },
        density: { sd: 30 },
        friction: { low: 0.3, high: 0.5 },
        bruiseThreshold: { sd: 20e3 },
      },
      samples: 1000,
      seed: 1,
    },
  ],
];

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];
/** Wall time and CPU time (user + system) of `fn`, ms: on a busy machine the two part. */
function time<T>(fn: () => T): [number, T, number] {
  const t = performance.now();
  const cpu = process.cpuUsage();
  const out = fn();
  const used = process.cpuUsage(cpu);
  return [performance.now() - t, out, (used.user + used.system) / 1000];
}

// JIT warm-up on the sparse mesh, so the first row is not charged for it.
runMonteCarlo({ ...cases[1][1], base: { ...base, mesh: 'sparse' }, samples: 200 });

const rows: string[][] = [];
for (const [name, input] of cases) {
  clearCondensedBodyCache();
  const [cold, result, coldCpu] = time(() => runMonteCarlo(input));
  const warms = [0, 1, 2].map(() => time(() => runMonteCarlo(input)));
  const warm = median(warms.map((w) => w[0]));
  const warmCpu = median(warms.map((w) => w[2]));
  const band = result.confidence!;
  rows.push([
    name,
    String(result.poissonBands.length),
    `${cold.toFixed(0)} (${coldCpu.toFixed(0)})`,
    `${warm.toFixed(0)} (${warmCpu.toFixed(0)})`,
    ((warm / input.samples) * 1000).toFixed(0),
    (result.probability as number).toFixed(3),
    `${band.low.toFixed(3)}–${band.high.toFixed(3)}`,
    result.drivers[0]?.input ?? '-',
  ]);
}
const head = [
  '1 000 samples',
  'ν bands',
  'cold ms',
  'warm ms',
  'µs/sample',
  'P(m<1)',
  '95 %',
  'driver',
];
const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
const line = (cells: string[]) => cells.map((c, i) => c.padStart(widths[i])).join('  ');
console.log(line(head));
for (const r of rows) console.log(line(r));

const [slipMs, slip] = time(() => slipMapAtGrip(base));
const map = slip.map!;
console.log(
  `slip map at the grip (balanced mesh, T = m(g + a)/2): ${slipMs.toFixed(1)} ms; T/μP ` +
    `${(map.utilisation as number).toFixed(3)}, stick radius ${(map.stickRadius * 1e3).toFixed(2)} ` +
    `mm of a = ${(map.contactRadius * 1e3).toFixed(2)} mm`,
);
console.log(
  'ms: wall (CPU); cold: body cache cleared first; warm: median of 3; µs/sample from the warm ' +
    'wall time. Target: 1 000 samples ≤ 2 s.',
);
