// `npm run demo`: after setup, migrate, seed and build, serve the app on http://localhost:3000.
import { serve } from './serve';

console.log('Tenderline on http://localhost:3000 — demo accounts are listed in the README.');
await serve({
  port: Number(process.env.PORT ?? 3000),
  smtpPort: Number(process.env.SMTP_PORT ?? 2525),
});
