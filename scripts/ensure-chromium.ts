// Installs Debian's chromium for the browser tests when it is missing (no browser downloads).
import { execSync } from 'node:child_process';
import fs from 'node:fs';

const path = process.env.CHROMIUM_PATH ?? '/usr/bin/chromium';
if (fs.existsSync(path)) {
  console.log(`chromium: ${path}`);
} else {
  const sudo = process.getuid?.() === 0 ? '' : 'sudo ';
  console.log('chromium: not found, installing Debian package chromium…');
  execSync(
    `${sudo}apt-get update -qq && ${sudo}env DEBIAN_FRONTEND=noninteractive apt-get install -y -qq chromium`,
    { stdio: 'inherit' },
  );
}
