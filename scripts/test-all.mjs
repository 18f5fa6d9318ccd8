// `npm test`: type checking, lint, unit tests, browser tests, in that order; stops at the
// first failure. The last line is always `summary: N passed, M failed`, summed over the
// unit and browser Vitest runs (read from their JSON reports in test-results/).
import { spawnSync } from 'node:child_process';
import { existsSync, mkdirSync, readFileSync, rmSync } from 'node:fs';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const results = `${root}test-results`;
const npm = process.platform === 'win32' ? 'npm.cmd' : 'npm';

const steps = [
  { name: 'typecheck', cmd: npm, args: ['run', '--silent', 'typecheck'] },
  { name: 'lint', cmd: npm, args: ['run', '--silent', 'lint'] },
  {
    name: 'unit tests',
    cmd: npm,
    args: ['run', '--silent', 'test:unit', '--', '--reporter=default', '--reporter=json', '--outputFile.json=test-results/unit.json'],
    report: 'unit.json',
  },
  { name: 'browser tests', cmd: process.execPath, args: ['scripts/run-e2e.mjs'], report: 'e2e.json' },
];

mkdirSync(results, { recursive: true });
for (const s of steps) if (s.report) rmSync(`${results}/${s.report}`, { force: true });

let passed = 0;
let failed = 0;
let stoppedAt;
for (const step of steps) {
  console.log(`\n=== ${step.name} ===`);
  const started = Date.now();
  const r = spawnSync(step.cmd, step.args, { cwd: root, stdio: 'inherit' });
  if (step.report) {
    const file = `${results}/${step.report}`;
    if (existsSync(file)) {
      const json = JSON.parse(readFileSync(file, 'utf8'));
      passed += json.numPassedTests ?? 0;
      failed += json.numFailedTests ?? 0;
    }
  }
  console.log(`=== ${step.name}: ${r.status === 0 ? 'ok' : 'FAILED'} in ${((Date.now() - started) / 1000).toFixed(1)} s ===`);
  if (r.status !== 0) {
    stoppedAt = step.name;
    break;
  }
}

if (stoppedAt) {
  const rest = steps.slice(steps.findIndex((s) => s.name === stoppedAt) + 1).map((s) => s.name);
  console.log(`\nstopped: ${stoppedAt} failed${rest.length ? `; not run: ${rest.join(', ')}` : ''}`);
}
console.log(`summary: ${passed} passed, ${failed} failed`);
process.exit(stoppedAt ? 1 : 0);
