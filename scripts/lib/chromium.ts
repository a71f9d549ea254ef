import { spawnSync } from 'node:child_process';
import fs from 'node:fs';

export const CHROMIUM_PATH = process.env.CHROMIUM_PATH || '/usr/bin/chromium';

/**
 * Browser tests need Debian's Chromium. As root we install it with apt; otherwise we stop
 * with the command to run. Never skipped silently.
 */
export function ensureChromium(): string {
  if (fs.existsSync(CHROMIUM_PATH)) return CHROMIUM_PATH;
  const isRoot = process.getuid?.() === 0;
  if (!isRoot) {
    throw new Error(
      `Chromium was not found at ${CHROMIUM_PATH}; the browser tests need it.\n` +
        'Install it with:\n  sudo apt-get update && sudo apt-get install -y chromium\n' +
        '(or set CHROMIUM_PATH to a Chromium binary).',
    );
  }
  console.log('Chromium not found: installing Debian\'s "chromium" package…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', 'chromium']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed; install Chromium by hand: apt-get install -y chromium`);
  }
  if (!fs.existsSync(CHROMIUM_PATH)) throw new Error(`chromium was installed but ${CHROMIUM_PATH} is missing.`);
  return CHROMIUM_PATH;
}
