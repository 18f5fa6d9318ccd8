import { execFileSync } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { defineConfig, type Plugin } from 'vite';
import preact from '@preact/preset-vite';
import { VitePWA } from 'vite-plugin-pwa';

const rootDir = fileURLToPath(new URL('.', import.meta.url));
const pkg = JSON.parse(readFileSync(new URL('./package.json', import.meta.url), 'utf8')) as { version: string };

// The build id tells two builds apart (shown beside the version; the update test builds
// two with different MODEWRIGHT_BUILD_ID). Default: the commit, so a build is traceable.
function buildId(): string {
  const fromEnv = process.env.MODEWRIGHT_BUILD_ID;
  if (fromEnv) return fromEnv;
  try {
    return execFileSync('git', ['rev-parse', '--short', 'HEAD'], { cwd: rootDir, encoding: 'utf8', stdio: ['ignore', 'pipe', 'ignore'] }).trim() || 'local';
  } catch {
    return 'local';
  }
}

// Strict policy: everything from our own origin, no inline script, no other origin.
// Set as a meta tag in the built page only: the dev server injects its own helpers.
const CONTENT_SECURITY_POLICY = [
  "default-src 'self'",
  "script-src 'self'",
  "style-src 'self'",
  "img-src 'self' data:",
  "font-src 'self'",
  "connect-src 'self'",
  "worker-src 'self'",
  "manifest-src 'self'",
  "object-src 'none'",
  "base-uri 'self'",
  "form-action 'self'",
].join('; ');

function contentSecurityPolicy(): Plugin {
  return {
    name: 'modewright-csp',
    apply: 'build',
    // Right after <meta charset>: a policy only covers what the parser meets after it.
    transformIndexHtml: {
      order: 'post',
      handler(html) {
        const tag = `<meta http-equiv="Content-Security-Policy" content="${CONTENT_SECURITY_POLICY}" />`;
        const out = html.replace(/(<meta charset="utf-8"\s*\/?>)/i, `$1\n    ${tag}`);
        if (out === html) throw new Error('index.html needs <meta charset="utf-8"> for the CSP tag to follow');
        return out;
      },
    },
  };
}

// manifest.webmanifest lives at the top level (hand-written, reviewed like code) and is
// copied to the build root unchanged, so its relative icon paths and start_url stay valid.
function topLevelManifest(): Plugin {
  const file = fileURLToPath(new URL('./manifest.webmanifest', import.meta.url));
  return {
    name: 'modewright-manifest',
    apply: 'build',
    buildStart() {
      this.addWatchFile(file);
    },
    generateBundle() {
      const text = readFileSync(file, 'utf8');
      JSON.parse(text); // a broken manifest fails the build, not the install prompt
      this.emitFile({ type: 'asset', fileName: 'manifest.webmanifest', source: text });
    },
  };
}

// The physics modules do nothing when imported (pure functions and constants, no DOM; see DEVELOPERS.md).
// Saying so lets the bundler follow the src/physics/index.ts barrel to the modules a screen really uses:
// without it, every screen that imports the barrel shared one chunk holding all of the physics.
function purePhysics(): Plugin {
  const dir = fileURLToPath(new URL('./src/physics/', import.meta.url));
  return {
    name: 'modewright-pure-physics',
    transform(code, id) {
      if (!id.startsWith(dir)) return null;
      return { code, map: null, moduleSideEffects: false };
    },
  };
}

export default defineConfig({
  define: {
    __APP_VERSION__: JSON.stringify(pkg.version),
    __APP_BUILD__: JSON.stringify(buildId()),
  },
  plugins: [
    preact(),
    purePhysics(),
    contentSecurityPolicy(),
    topLevelManifest(),
    VitePWA({
      strategies: 'generateSW',
      registerType: 'prompt',
      injectRegister: false, // src/pwa/register.ts registers through workbox-window
      manifest: false, // the top-level manifest.webmanifest is used as written
      includeAssets: [],
      workbox: {
        // Every built file, lazy calculator chunks and workers included, so that after one
        // visit each screen opens with the network off.
        globPatterns: ['**/*.{js,mjs,css,html,svg,png,ico,webmanifest,json,woff2,wasm}'],
        navigateFallback: 'index.html',
        cleanupOutdatedCaches: true,
        // The first install takes the open page at once (so one visit is enough to work offline);
        // an update only claims pages after the person accepts it (skipWaiting on request).
        clientsClaim: true,
        skipWaiting: false, // a new version waits until the person accepts the update
        sourcemap: false,
      },
    }),
  ],
  build: { target: 'es2022', sourcemap: false },
});
