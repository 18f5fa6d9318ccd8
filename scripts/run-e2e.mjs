// Browser tests: make sure Chromium is there, build the app twice (version N and N+1 for
// the update test, from the same sources with different build ids), then run Vitest with
// vitest.e2e.config.ts. Extra arguments go to Vitest (e.g. a test-file filter).
// The JSON results go to test-results/e2e.json for scripts/test-all.mjs's summary.
import { spawnSync } from 'node:child_process';
import { mkdirSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { ensureChromium } from './chromium.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const bin = (name) => fileURLToPath(new URL(`../node_modules/.bin/${name}`, import.meta.url));

function run(cmd, args, env = {}) {
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
  if (r.status !== 0) process.exit(r.status ?? 1);
}

ensureChromium();

const builds = [
  { dir: 'dist-e2e/n', id: 'e2e-n' },
  { dir: 'dist-e2e/n1', id: 'e2e-n1' },
];
if (!process.env.E2E_SKIP_BUILD) {
  for (const { dir, id } of builds) {
    console.log(`\nbuilding ${dir} (build id ${id})`);
    run(bin('vite'), ['build', '--outDir', dir, '--emptyOutDir', '--logLevel', 'warn'], { MODEWRIGHT_BUILD_ID: id });
  }
}

mkdirSync(`${root}test-results`, { recursive: true });
run(
  bin('vitest'),
  ['run', '--config', 'vitest.e2e.config.ts', '--reporter=default', '--reporter=json', '--outputFile.json=test-results/e2e.json', ...process.argv.slice(2)],
  {
    E2E_DIST: builds[0].dir,
    E2E_BUILD_ID: builds[0].id,
    E2E_DIST_NEXT: builds[1].dir,
    E2E_NEXT_BUILD_ID: builds[1].id,
  },
);
