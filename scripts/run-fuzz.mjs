// `npm run fuzz`: exploration, not CI. Every property test draws a fresh seed (printed by fast-check on failure;
// replay with `FUZZ_SEED=<seed> npx vitest run <file>`), each fuzz entry runs 50,000 inputs instead of 10,000,
// properties without their own count run 1,000 instead of 100, and calls slower than the hang limit are flagged.
// Extra arguments go to vitest, e.g. `npm run fuzz -- tests/robustness/otdr.fuzz.test.ts`.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('..', import.meta.url));
const extra = process.argv.slice(2);
const targets = extra.some((a) => !a.startsWith('-')) ? [] : ['tests/robustness', 'tests/physics'];
const env = { ...process.env, FUZZ_SEED: 'fresh', FUZZ_RUNS: process.env.FUZZ_RUNS ?? '50000' };
console.log(`fuzz: fresh seeds, ${env.FUZZ_RUNS} inputs per fuzz entry`);
const r = spawnSync(process.execPath, ['node_modules/vitest/vitest.mjs', 'run', ...targets, ...extra], { cwd: root, stdio: 'inherit', env });
process.exit(r.status ?? 1);
