// Entry of `npm run bench` (Node part): every bench/*.bench.ts runs its benchSync calls
// at import. scripts/run-bench.mjs bundles this file with Vite (SSR) and runs it.
import { results } from './harness';

const modules = import.meta.glob('./*.bench.ts', { eager: true });
const files = Object.keys(modules).sort();

const over = results.filter((r) => r.ratio !== undefined && r.ratio > 1);
console.log(`\n${results.length} benchmarks from ${files.length} files; ${over.length} over their goal${over.length ? ': ' + over.map((r) => r.name).join(', ') : ''}.`);
