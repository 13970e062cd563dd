// `npm run demo`: after setup, migrate, seed and build, serve the app on its APP_URL.
import fs from 'node:fs';
import { serve } from './serve';

if (fs.existsSync('.env.local')) process.loadEnvFile('.env.local');
const appUrl = process.env.APP_URL ?? process.env.NEXTAUTH_URL ?? 'http://127.0.0.1:3000';
console.log(`Tenderline on ${appUrl} — demo accounts are listed in the README.`);
await serve({
  appUrl,
  smtpPort: Number(process.env.SMTP_PORT ?? 2525),
  bucket: { port: 4568, directory: 'data/s3' },
});
