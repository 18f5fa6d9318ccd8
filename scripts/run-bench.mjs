// `npm run bench`: the Node benchmarks (bench/*.bench.ts through bench/all.ts), then the
// browser figures (bench/browser.ts) against a fresh production build. Both entries are
// bundled with Vite's build API in SSR mode into dist-bench/ and run with Node.
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { build } from 'vite';
import { ensureChromium } from './chromium.mjs';

const root = fileURLToPath(new URL('..', import.meta.url));
const appDir = 'dist-bench/app';

function runNode(file, args = []) {
  const r = spawnSync(process.execPath, [file, ...args], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) {
    console.error(`${file} failed (exit ${r.status ?? r.signal})`);
    process.exit(r.status ?? 1);
  }
}

// The bench code is plain TypeScript run in Node: no app plugins, only the bundler.
await build({
  root,
  configFile: false,
  logLevel: 'warn',
  build: {
    ssr: true,
    target: 'node20',
    outDir: 'dist-bench/node',
    emptyOutDir: true,
    minify: false,
    rollupOptions: {
      input: { all: 'bench/all.ts', browser: 'bench/browser.ts' },
      output: { entryFileNames: '[name].mjs', format: 'es' },
    },
  },
});
// BENCH_ONLY (start, typing or library) runs one group of browser figures and skips the Node benchmarks.
if (!process.env.BENCH_ONLY) runNode('dist-bench/node/all.mjs');

ensureChromium();
await build({ root, logLevel: 'warn', build: { outDir: appDir, emptyOutDir: true } });
runNode('dist-bench/node/browser.mjs', [appDir]);
