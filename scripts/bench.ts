/**
 * Benchmark of the squeeze core: `npm run bench` (builds dist/ first, then runs dist/bench.mjs).
 * First the whole-process time of the built CLI, dist/tenderline.mjs, spawned 5 times cold (one
 * 20-increment squeeze on the balanced mesh). Then per mesh level, for the reference case: size
 * of its graded body, the body build alone, the cold squeeze (empty cache: build + compliance +
 * stress influence + run), the warm 20-increment squeeze, the 20-diameter pad sweep cold (one
 * body per pad-edge band) and warm (medians of repeats), and peak memory.
 * Targets: CLI ≤ 600 ms; balanced mesh cold ≤ 300 ms, warm squeeze ≤ 10 ms, warm sweep ≤ 200 ms.
 */
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import path from 'node:path';
import {
  clearCondensedBodyCache,
  prepareBody,
  runSqueeze,
  sweepPadDiameters,
  type MeshLevel,
  type SqueezeInput,
} from '../fem';

const median = (xs: number[]) => [...xs].sort((a, b) => a - b)[Math.floor(xs.length / 2)];

// Both scripts/bench.ts and its build dist/bench.mjs sit one folder below the repository root.
const cli = path.resolve(import.meta.dirname, '../dist/tenderline.mjs');
const CLI_ARGS = ['squeeze', '--diameter-mm', '80', '--modulus-mpa', '3', '--poisson', '0.35'];

/** Wall time (ms) of `node dist/tenderline.mjs squeeze …` as a whole process, 5 cold runs. */
function cliTimes(): number[] {
  return Array.from({ length: 5 }, () => {
    const t = performance.now();
    const run = spawnSync(process.execPath, [cli, ...CLI_ARGS, '--travel-mm', '1'], {
      stdio: ['ignore', 'ignore', 'pipe'],
    });
    const ms = performance.now() - t;
    if (run.status !== 0) throw new Error(`the CLI failed: ${run.stderr.toString().trim()}`);
    return ms;
  });
}

if (existsSync(cli)) {
  const ms = cliTimes().sort((a, b) => a - b);
  console.log(
    `CLI, whole process (node dist/tenderline.mjs squeeze, balanced mesh, 20 steps, 5 runs): ` +
      `min ${ms[0].toFixed(0)} ms, median ${median(ms).toFixed(0)} ms, max ${ms[4].toFixed(0)} ms ` +
      `(target ≤ 600 ms)`,
  );
} else {
  console.log('CLI not built (npm run build:cli); skipping the whole-process timing');
}

function time(fn: () => void): number {
  const t = performance.now();
  fn();
  return performance.now() - t;
}

function repeat(n: number, fn: () => void): number {
  return median(Array.from({ length: n }, () => time(fn)));
}

// Reference case: 80 mm sphere, E = 3 MPa, ν = 0.35, 1 mm travel, 30 mm pad, with liftability.
const base = (mesh: MeshLevel): SqueezeInput => ({
  equatorialRadius: 0.04,
  modulus: 3e6,
  poisson: 0.35,
  travel: 0.001,
  steps: 20,
  mesh,
  padDiameter: 0.03,
  density: 840,
  friction: 0.4,
  safetyFactor: 2,
  bruiseThreshold: 150e3,
});
const diameters = Array.from({ length: 20 }, (_, i) => 0.006 + 0.002 * i);

let peakRss = 0;
let peakHeap = 0;
const sample = () => {
  const m = process.memoryUsage();
  peakRss = Math.max(peakRss, m.rss);
  peakHeap = Math.max(peakHeap, m.heapUsed);
};

// One throwaway pass so that JIT warm-up is not charged to the first mesh level.
runSqueeze({ ...base('sparse'), poisson: 0.3 });
sweepPadDiameters({ ...base('sparse'), poisson: 0.3 }, diameters);

const rows: string[][] = [];
for (const level of ['sparse', 'balanced', 'dense'] as const) {
  const input = base(level);
  // Cold: the first squeeze on an empty cache (build the graded body, its compliance and stress
  // influence, then run), 3 times; the body build alone is timed on the last.
  const colds = Array.from({ length: 3 }, () => {
    clearCondensedBodyCache();
    const t = time(() => runSqueeze(input));
    sample();
    return t;
  });
  clearCondensedBodyCache();
  const build = time(() => prepareBody(input));
  runSqueeze(input);
  const squeeze = repeat(9, () => runSqueeze(input));
  clearCondensedBodyCache();
  const coldSweep = time(() => sweepPadDiameters(input, diameters));
  sample();
  const sweep = repeat(3, () => sweepPadDiameters(input, diameters));
  sample();
  const body = prepareBody(input).body;
  rows.push([
    level,
    String(body.nodes),
    String(body.dofs),
    String(body.contactR.length),
    build.toFixed(0),
    colds[0].toFixed(0),
    median(colds).toFixed(0),
    squeeze.toFixed(2),
    coldSweep.toFixed(0),
    sweep.toFixed(1),
    (peakRss / 2 ** 20).toFixed(0),
    (peakHeap / 2 ** 20).toFixed(0),
  ]);
}

const head = [
  'mesh',
  'nodes',
  'DOFs',
  'contact',
  'build ms',
  'cold ms',
  'cold med',
  'squeeze ms',
  'cold sweep',
  'sweep ms',
  'rss MB',
  'heap MB',
];
const widths = head.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
const line = (cells: string[]) => cells.map((c, i) => c.padStart(widths[i])).join('  ');
console.log(line(head));
for (const r of rows) console.log(line(r));
console.log(
  'build: the graded body alone (mesh + assemble + factor + condense); cold: the first squeeze ' +
    'on an empty cache (build + compliance + stress influence + run), first and median of 3; ' +
    'squeeze: warm, 20 increments + grip, median of 9; cold sweep: 20 pad diameters on an empty ' +
    'cache (one graded body per pad-edge band); sweep: the same warm, median of 3; memory: ' +
    'peaks so far (cumulative).',
);
console.log(
  'targets (normal): cold ≤ 300 ms, squeeze ≤ 10 ms, warm sweep ≤ 200 ms; cold sweep reported',
);

// The pad about the size of the contact (13 mm pad, 2 mm edge, 1 mm travel): the refined band
// at the pad's edge makes this the largest body of the reference fruit.
const padRows = (['sparse', 'balanced', 'dense'] as const).map((level) => {
  const input = { ...base(level), padDiameter: 0.013, edgeRadius: 0.002 };
  clearCondensedBodyCache();
  const cold = time(() => runSqueeze(input));
  const warm = repeat(5, () => runSqueeze(input));
  const peak = runSqueeze(input).final.peakPressure / 1e3;
  return `${level}: ${prepareBody(input).body.nodes} nodes, cold ${cold.toFixed(0)} ms, warm ${warm.toFixed(2)} ms, peak ${peak.toFixed(0)} kPa`;
});
console.log(`13 mm pad, 2 mm edge: ${padRows.join('; ')}`);
