// Writes .env.local with a fresh auth secret when it has none. The file is git-ignored.
import { randomBytes } from 'node:crypto';
import fs from 'node:fs';

const file = '.env.local';
const current = fs.existsSync(file) ? fs.readFileSync(file, 'utf8') : '';
const lines: string[] = [];
if (!/^NEXTAUTH_SECRET=/m.test(current))
  lines.push(`NEXTAUTH_SECRET=${randomBytes(32).toString('base64url')}`);
// One address for the server, its links and its cookies: it listens on this host and port.
if (!/^APP_URL=/m.test(current)) lines.push('APP_URL=http://127.0.0.1:3000');
if (!/^NEXTAUTH_URL=/m.test(current)) lines.push('NEXTAUTH_URL=http://127.0.0.1:3000');
if (lines.length) {
  fs.writeFileSync(
    file,
    current + (current && !current.endsWith('\n') ? '\n' : '') + lines.join('\n') + '\n',
    { mode: 0o600 },
  );
  console.log(`setup: wrote ${lines.map((l) => l.split('=')[0]).join(', ')} to ${file}`);
} else {
  console.log(`setup: ${file} already has an auth secret`);
}
