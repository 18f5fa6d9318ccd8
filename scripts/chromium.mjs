// Makes sure Debian's Chromium is there for the browser tests and the bench. When it is
// missing and we run as root on Debian, install it with apt-get; otherwise stop and say how.
// Never downloads a browser build of its own.
import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';

export const CHROMIUM_PATH = process.env.MODEWRIGHT_CHROMIUM ?? '/usr/bin/chromium';

export function ensureChromium() {
  if (existsSync(CHROMIUM_PATH)) return CHROMIUM_PATH;
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  const isDebian = existsSync('/etc/debian_version');
  if (!isRoot || !isDebian || process.env.MODEWRIGHT_CHROMIUM) {
    console.error(
      `Chromium was not found at ${CHROMIUM_PATH}. The browser tests use Debian's Chromium.\n` +
        'Install it with:  sudo apt-get update && sudo apt-get install -y chromium\n' +
        '(or set MODEWRIGHT_CHROMIUM to the path of a Chromium you already have).',
    );
    process.exit(1);
  }
  console.log('Chromium is missing: installing Debian\'s package (apt-get install -y chromium)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update'], ['install', '-y', '--no-install-recommends', 'chromium']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) {
      console.error(`apt-get ${args.join(' ')} failed (exit ${r.status ?? r.signal}). Install chromium by hand and run again.`);
      process.exit(1);
    }
  }
  if (!existsSync(CHROMIUM_PATH)) {
    console.error(`apt-get installed chromium, but ${CHROMIUM_PATH} is still missing.`);
    process.exit(1);
  }
  return CHROMIUM_PATH;
}
