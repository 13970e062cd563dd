/**
 * Route latency against the built app on loopback (autocannon): a fresh seeded database, the
 * app server, an engineer signed in; then for each check route 200 sequential requests and 20
 * concurrent connections (400 requests), and a page load timed while the concurrent run is on.
 * Needs `next build` first. Run: `npx tsx scripts/bench-routes.ts`.
 * Targets (squeeze): warm p50 ≤ 50 ms, p95 ≤ 200 ms at 20 concurrent.
 */
import { spawn } from 'node:child_process';
import fs from 'node:fs';
import path from 'node:path';
import autocannon from 'autocannon';

const PORT = Number(process.env.BENCH_PORT ?? 3390);
const ORIGIN = `http://127.0.0.1:${PORT}`;
const SQUEEZE = {
  modulusMpa: 3,
  poisson: 0.35,
  diameterMm: 80,
  massG: 200,
  staticThresholdKpa: 100,
  padDiameterMm: 20,
  padEdgeMm: 2,
  friction: 0.5,
  safetyFactor: 2,
  accelerationMs2: 2,
  maxTravelMm: 2,
};
/**
 * [label, route, body, a new pad each request]: the squeeze alone (grip point, slip map) on one
 * case — warm: its bodies are cached, but every request is solved afresh (there is no result
 * cache) — then with a new pad each request (bodies built as pads cross mesh bands), and with
 * the page's 12-pad sweep.
 */
const CASES: [string, string, unknown, boolean][] = [
  [
    'drop',
    '/api/checks/drop',
    { modulusMpa: 3, poisson: 0.35, diameterMm: 80, massG: 200, heightMm: 150, surface: 'steel' },
    false,
  ],
  [
    'stack',
    '/api/checks/stack',
    {
      modulusMpa: 3,
      poisson: 0.35,
      diameterMm: 80,
      massG: 200,
      staticThresholdKpa: 100,
      binLengthMm: 1200,
      binWidthMm: 1000,
      fillDepthMm: 600,
    },
    false,
  ],
  ['squeeze, one case', '/api/checks/squeeze', { ...SQUEEZE, sweep: false }, false],
  ['squeeze, new pad each', '/api/checks/squeeze', { ...SQUEEZE, sweep: false }, true],
  ['squeeze + pad sweep', '/api/checks/squeeze', SQUEEZE, false],
];

async function waitFor(url: string, ms = 90_000) {
  const until = Date.now() + ms;
  while (Date.now() < until) {
    if (
      await fetch(url).then(
        (r) => r.ok,
        () => false,
      )
    )
      return;
    await new Promise((r) => setTimeout(r, 300));
  }
  throw new Error(`${url} did not answer in ${ms / 1000} s`);
}

async function signIn(): Promise<string> {
  const csrf = await fetch(`${ORIGIN}/api/auth/csrf`);
  const cookie = csrf.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  const { csrfToken } = (await csrf.json()) as { csrfToken: string };
  const res = await fetch(`${ORIGIN}/api/auth/callback/credentials`, {
    method: 'POST',
    headers: { 'content-type': 'application/x-www-form-urlencoded', cookie, origin: ORIGIN },
    body: new URLSearchParams({
      email: 'engineer@kestrelvale.example',
      password: 'kestrel-demo-2026',
      csrfToken,
      json: 'true',
    }),
    redirect: 'manual',
  });
  const session = res.headers
    .getSetCookie()
    .map((c) => c.split(';')[0])
    .join('; ');
  if (!session.includes('session-token')) throw new Error('sign-in failed');
  return `${cookie}; ${session}`;
}

/**
 * With `vary`, each request grips with a pad 0.01 mm wider than the one before (from 15 mm), so
 * no two requests of a run ask for the same case.
 */
function bodies(body: unknown, vary: boolean): () => string {
  let n = 0;
  return () =>
    JSON.stringify(vary ? { ...(body as object), padDiameterMm: 15 + (n++ % 1000) * 0.01 } : body);
}

interface Run {
  p50: number;
  p95: number;
  /** non-2xx answers and socket errors */
  failed: number;
  /** completed requests per second */
  rate: number;
}

/** Nearest-rank percentile of sorted values. */
const percentile = (sorted: number[], p: number) =>
  sorted[Math.max(0, Math.ceil((p / 100) * sorted.length) - 1)];

/** Runs `amount` requests over `connections`; percentiles from every response time recorded. */
function load(
  [route, body, vary]: [string, unknown, boolean],
  cookie: string,
  connections: number,
  amount: number,
): Promise<Run> {
  const next = bodies(body, vary);
  const times: number[] = [];
  const started = performance.now();
  let last = started;
  return new Promise((resolve, reject) => {
    const instance = autocannon(
      {
        url: ORIGIN + route,
        connections,
        amount,
        requests: [
          {
            method: 'POST',
            headers: { 'content-type': 'application/json', cookie, origin: ORIGIN },
            setupRequest: (req) => ({ ...req, body: next() }),
          },
        ],
      },
      (error, result) => {
        if (error) return reject(error);
        const sorted = times.sort((a, b) => a - b);
        resolve({
          p50: percentile(sorted, 50),
          p95: percentile(sorted, 95),
          failed: result.non2xx + result.errors,
          // autocannon ends a run on its next one-second tick: the rate runs to the last answer
          rate: (times.length * 1000) / (last - started),
        });
      },
    );
    instance.on('response', (_client, _status, _bytes, ms) => {
      times.push(ms);
      last = performance.now();
    });
  });
}

async function pageWhileLoaded(
  request: [string, unknown, boolean],
  cookie: string,
): Promise<number> {
  const running = load(request, cookie, 20, 200);
  await new Promise((r) => setTimeout(r, 300));
  const t = performance.now();
  await fetch(`${ORIGIN}/checks`, { headers: { cookie } });
  const ms = performance.now() - t;
  await running;
  return ms;
}

const server = spawn(process.execPath, ['node_modules/.bin/tsx', 'scripts/e2e-server.ts'], {
  env: { ...process.env, E2E_PORT: String(PORT) },
  stdio: ['ignore', 'ignore', 'inherit'],
});
try {
  await waitFor(`${ORIGIN}/sign-in`);
  const cookie = await signIn();
  console.log('route latency (ms), built app on loopback, engineer signed in');
  console.log(
    'check                   | 200 sequential p50 / p95 | 20 concurrent p50 / p95 | req/s   | errors | page load under load',
  );
  for (const [label, route, body, vary] of CASES) {
    const probe = await fetch(ORIGIN + route, {
      method: 'POST',
      headers: { 'content-type': 'application/json', cookie, origin: ORIGIN },
      body: JSON.stringify(body),
    });
    if (probe.status === 404) continue; // a check not built yet
    const request: [string, unknown, boolean] = [route, body, vary];
    const seq = await load(request, cookie, 1, 200);
    const par = await load(request, cookie, 20, 400);
    const page = await pageWhileLoaded(request, cookie);
    const row = [
      label.padEnd(23),
      `${seq.p50.toFixed(0)} / ${seq.p95.toFixed(0)}`.padStart(24),
      `${par.p50.toFixed(0)} / ${par.p95.toFixed(0)}`.padStart(23),
      `${par.rate.toFixed(0)}`.padStart(7),
      String(seq.failed + par.failed).padStart(6),
      `${page.toFixed(0)} ms`.padStart(20),
    ];
    console.log(row.join(' | '));
  }
  console.log('(percentiles by nearest rank over every response time; req/s at 20 concurrent)');
} finally {
  server.kill('SIGTERM');
  for (const f of fs.readdirSync('data').filter((f) => f.startsWith(`e2e-${PORT}`))) {
    fs.rmSync(path.join('data', f), { recursive: true, force: true });
  }
}
