// The PostgreSQL leg of the test run: Debian's PostgreSQL (installed when missing), a throw-away
// cluster on a loopback port, then the migrations and the database tests against it.
import { execFileSync, execSync, spawnSync } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';

const PORT = Number(process.env.PG_TEST_PORT ?? 55432);
const root = process.getuid?.() === 0;
const sudo = root ? '' : 'sudo ';

function binDir(): string | null {
  const base = '/usr/lib/postgresql';
  if (!fs.existsSync(base)) return null;
  const versions = fs.readdirSync(base).sort((a, b) => Number(b) - Number(a));
  return versions.length ? path.join(base, versions[0], 'bin') : null;
}

if (!binDir()) {
  console.log('postgresql: not found, installing Debian package postgresql…');
  execSync(
    `${sudo}apt-get update -qq && ${sudo}env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq postgresql`,
    { stdio: 'inherit' },
  );
}
const bin = binDir()!;
const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'tenderline-pg-'));
fs.chmodSync(dir, 0o777);
const data = path.join(dir, 'data');
// PostgreSQL refuses to run as root: the cluster belongs to the `postgres` system user.
const asPostgres = (cmd: string) =>
  execFileSync(
    root ? 'su' : 'sudo',
    root ? ['postgres', '-c', cmd] : ['-u', 'postgres', 'sh', '-c', cmd],
    {
      stdio: 'inherit',
    },
  );

asPostgres(`${bin}/initdb -D ${data} -A trust -U postgres --no-sync >/dev/null`);
asPostgres(
  `${bin}/pg_ctl -D ${data} -o "-p ${PORT} -k ${dir} -c listen_addresses=127.0.0.1 -c fsync=off" -l ${dir}/log -w start >/dev/null`,
);
let status = 1;
try {
  asPostgres(`${bin}/createdb -h 127.0.0.1 -p ${PORT} -U postgres tenderline_test`);
  const url = `postgres://postgres@127.0.0.1:${PORT}/tenderline_test`;
  console.log(`postgresql: throw-away cluster on 127.0.0.1:${PORT}; migrations and database tests`);
  const run = spawnSync(
    'npx',
    [
      'vitest',
      'run',
      '--no-file-parallelism',
      'tests/db',
      'tests/integration/revisions.test.ts',
      'tests/integration/sign-in.test.ts',
      // Parallel re-runs race for real on PostgreSQL (SQLite serialises the transactions).
      'tests/integration/assessments.test.ts',
    ],
    { stdio: 'inherit', env: { ...process.env, TEST_DATABASE_URL: url } },
  );
  status = run.status ?? 1;
} finally {
  asPostgres(`${bin}/pg_ctl -D ${data} -m fast -w stop >/dev/null`);
  fs.rmSync(dir, { recursive: true, force: true });
}
process.exit(status);
