// Starts the mail catcher and the app server side by side; stops both on Ctrl-C. The catcher
// takes mail only with a credential made for this run and handed to the app alone.
import { spawn } from 'node:child_process';
import { randomBytes } from 'node:crypto';
import knex from 'knex';
import { config, knexEnvironment } from '../knexfile';
import { startMailCatcher } from '../lib/mail/catcher';
import { startLocalBucket } from './local-bucket';
import { seedDemoPhotos } from './seed-demo-photos';

export async function serve(options: {
  appUrl: string;
  smtpPort: number;
  /** The local bucket's port (0: any free one) and folder, unless S3_ENDPOINT names a real one. */
  bucket: { port: number; directory: string };
  env?: Record<string, string>;
}) {
  const url = new URL(options.appUrl);
  const db = knex(config[knexEnvironment()]);
  const credentials = { user: 'tenderline-app', pass: randomBytes(24).toString('base64url') };
  const catcher = await startMailCatcher(db, options.smtpPort, '127.0.0.1', credentials);
  console.log(`mail catcher listening on 127.0.0.1:${catcher.port}`);
  const bucketName = process.env.S3_BUCKET ?? 'tenderline-uploads';
  const bucket = process.env.S3_ENDPOINT
    ? null
    : await startLocalBucket({ ...options.bucket, bucket: bucketName });
  if (bucket) console.log(`local bucket ${bucketName} on 127.0.0.1:${bucket.port}`);
  try {
    const endpoint = bucket ? `http://127.0.0.1:${bucket.port}` : process.env.S3_ENDPOINT!;
    const added = await seedDemoPhotos(db, { endpoint, bucket: bucketName });
    if (added) console.log(`demo photos: ${added} drawings stored`);
  } catch (error) {
    console.warn(`demo photos not stored: ${(error as Error).message}`);
  }
  const app = spawn(process.execPath, ['scripts/server.mjs'], {
    stdio: 'inherit',
    env: {
      ...process.env,
      ...options.env,
      NODE_ENV: 'production',
      APP_URL: options.appUrl,
      NEXTAUTH_URL: options.appUrl,
      PORT: url.port || '80',
      HOST: url.hostname,
      SMTP_HOST: '127.0.0.1',
      SMTP_PORT: String(catcher.port),
      SMTP_USER: credentials.user,
      SMTP_PASS: credentials.pass,
      ...(bucket && { S3_ENDPOINT: `http://127.0.0.1:${bucket.port}`, S3_BUCKET: bucketName }),
    },
  });
  const stop = async () => {
    app.kill('SIGTERM');
    await catcher.close();
    await bucket?.close();
    await db.destroy();
  };
  process.on('SIGINT', () => void stop().then(() => process.exit(0)));
  process.on('SIGTERM', () => void stop().then(() => process.exit(0)));
  app.on('exit', (code) => void stop().then(() => process.exit(code ?? 0)));
}
