// Starts the mail catcher and `next start` side by side; stops both on Ctrl-C.
import { spawn } from 'node:child_process';
import knex from 'knex';
import { config, knexEnvironment } from '../knexfile';
import { startMailCatcher } from '../lib/mail/catcher';

export async function serve(options: {
  port: number;
  smtpPort: number;
  env?: Record<string, string>;
}) {
  const db = knex(config[knexEnvironment()]);
  const catcher = await startMailCatcher(db, options.smtpPort);
  console.log(`mail catcher listening on 127.0.0.1:${catcher.port}`);
  const next = spawn(
    process.execPath,
    ['node_modules/next/dist/bin/next', 'start', '-p', String(options.port), '-H', '127.0.0.1'],
    {
      stdio: 'inherit',
      env: {
        ...process.env,
        ...options.env,
        SMTP_HOST: '127.0.0.1',
        SMTP_PORT: String(catcher.port),
      },
    },
  );
  const stop = async () => {
    next.kill('SIGTERM');
    await catcher.close();
    await db.destroy();
  };
  process.on('SIGINT', () => void stop().then(() => process.exit(0)));
  process.on('SIGTERM', () => void stop().then(() => process.exit(0)));
  next.on('exit', (code) => void stop().then(() => process.exit(code ?? 0)));
}
