// Every property test (fast-check) runs on a seed fixed per test, so a test run gives the same result every time.
// The seed is a hash of the test file and the test's full name: adding a test elsewhere does not change it.
// fast-check prints the seed (and the shrunk counterexample's path) in every failure message.
//
//   FUZZ_SEED unset      the fixed seed per test (npm test, npx vitest run)
//   FUZZ_SEED=<integer>  that seed for every test: to replay a failure seen with fresh seeds
//   FUZZ_SEED=fresh      a new random seed per test (npm run fuzz: exploration, never in CI)
import fc from 'fast-check';
import { beforeEach } from 'vitest';

const setting = typeof process === 'undefined' ? undefined : process.env.FUZZ_SEED;

/** True in the exploration run (`npm run fuzz`): fresh seeds, more runs, and the hang detector on. */
export const FRESH_SEEDS = setting === 'fresh';

/** 32-bit FNV-1a hash of a text (Fowler, Noll & Vo; the public-domain reference constants). */
export function stableSeed(text: string): number {
  let h = 0x811c9dc5;
  for (let i = 0; i < text.length; i++) {
    h ^= text.charCodeAt(i);
    h = Math.imul(h, 0x01000193);
  }
  return h | 0;
}

interface TaskLike {
  name: string;
  suite?: TaskLike;
  file?: { name: string };
}

function fullName(task: TaskLike): string {
  const parts: string[] = [];
  for (let t: TaskLike | undefined = task; t; t = t.suite) if (t.name) parts.unshift(t.name);
  return `${task.file?.name ?? ''}::${parts.join(' > ')}`;
}

/** The seed a test runs on under the current setting. */
export function seedFor(task: TaskLike): number {
  if (FRESH_SEEDS) return (Math.random() * 0x7fffffff) | 0;
  if (setting !== undefined && setting !== '' && Number.isInteger(Number(setting))) return Number(setting) | 0;
  return stableSeed(fullName(task));
}

const base = fc.readConfigureGlobal();
/** Default runs of a property without its own numRuns: fast-check's 100, ×10 in the exploration run. */
const numRuns = FRESH_SEEDS ? 1000 : (base.numRuns ?? 100);

beforeEach((ctx) => {
  fc.configureGlobal({ ...base, numRuns, seed: seedFor(ctx.task as unknown as TaskLike) });
});
