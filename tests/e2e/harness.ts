// Shared harness for the real-browser tests (tests/e2e/*.e2e.test.ts): Debian's Chromium
// through playwright-core, a tiny static server for a production build, and watchers for
// requests to other origins and Content-Security-Policy violations.
import { createServer, type IncomingMessage, type ServerResponse } from 'node:http';
import { existsSync, mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { extname, join, resolve, sep } from 'node:path';
import type { AddressInfo } from 'node:net';
import { fileURLToPath } from 'node:url';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { afterAll, afterEach, beforeAll } from 'vitest';
import { DB_NAME } from '../../src/fibers/db';

export const REPO_ROOT = fileURLToPath(new URL('../../', import.meta.url));

/** Debian's Chromium; never a downloaded build. MODEWRIGHT_CHROMIUM overrides the path. */
export const CHROMIUM_PATH = process.env.MODEWRIGHT_CHROMIUM ?? '/usr/bin/chromium';

// Without the background-networking flags Chromium keeps calling home, which a closed
// network refuses many times a second; the tests must see only the app's own requests.
export const CHROMIUM_ARGS = [
  '--headless',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

/** The production builds the runner (scripts/run-e2e.mjs) made: N and, for the update test, N+1. */
export const BUILDS = {
  current: resolve(REPO_ROOT, process.env.E2E_DIST ?? 'dist-e2e/n'),
  next: resolve(REPO_ROOT, process.env.E2E_DIST_NEXT ?? 'dist-e2e/n1'),
  currentId: process.env.E2E_BUILD_ID ?? 'e2e-n',
  nextId: process.env.E2E_NEXT_BUILD_ID ?? 'e2e-n1',
};

export function requireBuild(dir: string): string {
  if (!existsSync(join(dir, 'index.html'))) {
    throw new Error(`No production build in ${dir}. Run the browser tests with \`npm run test:e2e\`, which builds first.`);
  }
  return dir;
}

export function launchBrowser(): Promise<Browser> {
  return chromium.launch({ executablePath: CHROMIUM_PATH, args: CHROMIUM_ARGS });
}

export interface Viewport {
  width: number;
  height: number;
}

export interface ContextOptions {
  viewport?: Viewport;
  offline?: boolean;
  /** Only for injecting test tools such as axe-core; the app's own CSP checks run without it. */
  bypassCSP?: boolean;
  colorScheme?: 'light' | 'dark';
  /**
   * newContext blocks the service worker unless asked: a context made for one check would otherwise
   * install it and fetch the whole precache in the background, taking the CPU from the check on a
   * two-core machine. The offline and update tests ask for it; freshProfile allows it unless told otherwise.
   */
  serviceWorkers?: 'allow' | 'block';
}

export const PHONE: Viewport = { width: 360, height: 740 };
export const LAPTOP: Viewport = { width: 1280, height: 800 };

export async function newContext(browser: Browser, opts: ContextOptions = {}): Promise<BrowserContext> {
  const context = await browser.newContext({
    viewport: opts.viewport ?? PHONE,
    offline: opts.offline ?? false,
    bypassCSP: opts.bypassCSP ?? false,
    colorScheme: opts.colorScheme ?? 'light',
    serviceWorkers: opts.serviceWorkers ?? 'block',
  });
  return context;
}

export async function newPage(browser: Browser, opts: ContextOptions = {}): Promise<Page> {
  const context = await newContext(browser, opts);
  const page = await context.newPage();
  page.once('close', () => void context.close().catch(() => undefined));
  return page;
}

export interface FreshProfile {
  context: BrowserContext;
  page: Page;
  /** Closes the browser and deletes the profile folder. */
  close(): Promise<void>;
}

/**
 * A whole browser on a new, empty user-data-dir: what a person's phone has on first visit.
 * The service worker is allowed unless `serviceWorkers: 'block'` is asked (a storage-only check).
 * Used where the browser profile matters (service worker install, installability:
 * Chromium does not offer installation in off-the-record contexts).
 */
export async function freshProfile(opts: ContextOptions = {}): Promise<FreshProfile> {
  const dir = mkdtempSync(join(tmpdir(), 'modewright-profile-'));
  const context = await chromium.launchPersistentContext(dir, {
    executablePath: CHROMIUM_PATH,
    args: CHROMIUM_ARGS,
    viewport: opts.viewport ?? PHONE,
    offline: opts.offline ?? false,
    bypassCSP: opts.bypassCSP ?? false,
    colorScheme: opts.colorScheme ?? 'light',
    serviceWorkers: opts.serviceWorkers ?? 'allow',
  });
  const page = context.pages()[0] ?? (await context.newPage());
  return {
    context,
    page,
    async close() {
      await context.close().catch(() => undefined);
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

const MIME: Record<string, string> = {
  '.html': 'text/html; charset=utf-8',
  '.js': 'text/javascript; charset=utf-8',
  '.mjs': 'text/javascript; charset=utf-8',
  '.css': 'text/css; charset=utf-8',
  '.json': 'application/json; charset=utf-8',
  '.webmanifest': 'application/manifest+json; charset=utf-8',
  '.svg': 'image/svg+xml',
  '.png': 'image/png',
  '.ico': 'image/x-icon',
  '.woff2': 'font/woff2',
  '.wasm': 'application/wasm',
  '.txt': 'text/plain; charset=utf-8',
};

export interface StaticServer {
  /** Base URL with trailing slash, e.g. http://127.0.0.1:41234/ */
  url: string;
  origin: string;
  port: number;
  /** Every path requested so far, in order (for "nothing reached the network" checks). */
  requests: string[];
  /** Serve another build from the same origin (the update test: N, then N+1). */
  setRoot(dir: string): void;
  close(): Promise<void>;
}

/**
 * A static server for a production build on 127.0.0.1. Every response says
 * `Cache-Control: no-cache`, so the browser revalidates sw.js and the app and a new
 * version is seen at once, as on a well-configured host.
 */
export async function startServer(distDir: string, port = 0): Promise<StaticServer> {
  let root = resolve(requireBuild(distDir));
  const requests: string[] = [];
  const handler = (req: IncomingMessage, res: ServerResponse) => {
    const path = decodeURIComponent(new URL(req.url ?? '/', 'http://x').pathname);
    requests.push(path);
    let file = resolve(root, '.' + path);
    if (file !== root && !file.startsWith(root + sep)) {
      res.writeHead(403).end();
      return;
    }
    if (existsSync(file) && statSync(file).isDirectory()) file = join(file, 'index.html');
    if (!existsSync(file) || req.method !== 'GET' && req.method !== 'HEAD') {
      res.writeHead(404, { 'Content-Type': 'text/plain; charset=utf-8', 'Cache-Control': 'no-cache' }).end('not found');
      return;
    }
    const body = readFileSync(file);
    res.writeHead(200, {
      'Content-Type': MIME[extname(file)] ?? 'application/octet-stream',
      'Content-Length': body.length,
      'Cache-Control': 'no-cache',
      'X-Content-Type-Options': 'nosniff',
    });
    res.end(req.method === 'HEAD' ? undefined : body);
  };
  const server = createServer(handler);
  await new Promise<void>((ok, fail) => {
    server.once('error', fail);
    server.listen(port, '127.0.0.1', () => ok());
  });
  const actualPort = (server.address() as AddressInfo).port;
  const origin = `http://127.0.0.1:${actualPort}`;
  return {
    url: `${origin}/`,
    origin,
    port: actualPort,
    requests,
    setRoot(dir: string) {
      root = resolve(requireBuild(dir));
    },
    close() {
      server.closeAllConnections();
      return new Promise<void>((ok) => server.close(() => ok()));
    },
  };
}

export interface RequestLog {
  /** Every network request (http, https, ws), in order. */
  all: string[];
  /** Those whose origin is not the app's. Must stay empty. */
  foreign: string[];
}

/**
 * Records every request the page or context makes (workers included) and those whose
 * origin differs from `origin` (default: the origin of the first request seen, the
 * navigation). data: and blob: URLs never reach a network and are not counted.
 */
export function watchForeignRequests(target: Page | BrowserContext, origin?: string): RequestLog {
  const log: RequestLog = { all: [], foreign: [] };
  let own = origin;
  (target as Page).on('request', (request) => {
    const url = request.url();
    if (/^(data|blob|about):/.test(url)) return;
    log.all.push(url);
    let o: string;
    try {
      o = new URL(url).origin;
    } catch {
      log.foreign.push(url);
      return;
    }
    own ??= o;
    if (o !== own) log.foreign.push(url);
  });
  return log;
}

export interface CspLog {
  violations: string[];
}

/**
 * Collects Content-Security-Policy violations (the browser's securitypolicyviolation
 * events) on every document the page loads, plus CSP messages on the console.
 */
export async function watchCspViolations(target: Page | BrowserContext): Promise<CspLog> {
  const log: CspLog = { violations: [] };
  await target.exposeBinding('__modewrightCspViolation', (_source, text: string) => {
    log.violations.push(text);
  });
  await target.addInitScript(() => {
    document.addEventListener('securitypolicyviolation', (e) => {
      const report = (window as unknown as { __modewrightCspViolation?: (t: string) => void }).__modewrightCspViolation;
      report?.(`${e.violatedDirective} blocked ${e.blockedURI || '(inline)'} at ${e.sourceFile}:${e.lineNumber}`);
    });
  });
  (target as Page).on('console', (msg) => {
    if (msg.type() === 'error' && /Content Security Policy/i.test(msg.text())) log.violations.push(msg.text());
  });
  return log;
}

/** Resolves once a service worker controls the page (the first visit installs it). */
export async function waitForServiceWorkerControl(page: Page, timeoutMs = 30_000): Promise<void> {
  await page.waitForFunction(() => navigator.serviceWorker?.controller?.state === 'activated', undefined, {
    timeout: timeoutMs,
  });
}

/** Opens a screen by its route and waits until its title and first content have rendered. */
export async function openScreen(page: Page, baseUrl: string, id: string): Promise<void> {
  await page.goto(`${baseUrl}#/${id}`);
  await waitForScreen(page);
}

/** Waits until the routed screen has replaced its loading placeholder with content. */
export async function waitForScreen(page: Page): Promise<void> {
  await page.waitForFunction(() => {
    const main = document.querySelector('main');
    if (!main || main.querySelector('.loading')) return false;
    // The title and something after it: the screen's own content, not just the frame.
    return !!main.querySelector('h1 ~ *');
  });
}

/**
 * Waits until the screen has settled: the render a typed key queued has run (it runs in a task of its
 * own, src/main.tsx), nothing says it is busy (the headline while the worker computes, the details band
 * while it catches up card by card), and the screen's text is the same two frames running (a worker job
 * marks itself busy only in an effect after a frame; a plot fits its width when a frame reports it).
 * Read anything below the headline after this, not after the headline alone has changed.
 */
export async function settled(page: Page, timeoutMs = 20_000): Promise<void> {
  const ok = await page.evaluate(async (limitMs) => {
    const nextFrame = () => new Promise<void>((r) => requestAnimationFrame(() => setTimeout(r, 0)));
    await new Promise((r) => setTimeout(r, 0)); // after any render already queued
    const text = () => (document.querySelector('main') as HTMLElement | null)?.innerText ?? '';
    let last: string | undefined;
    const until = performance.now() + limitMs;
    while (performance.now() < until) {
      await nextFrame();
      if (document.querySelector('[aria-busy="true"]')) {
        last = undefined;
        continue;
      }
      const now = text();
      if (now === last) return true;
      last = now;
    }
    return false;
  }, timeoutMs);
  if (!ok) throw new Error(`the screen did not settle within ${timeoutMs / 1000} s (still busy, or its text still changing)`);
}

/** The update prompt's words (src/pwa/UpdatePrompt.tsx), as the update tests look for them. */
export const UPDATE_OFFER = 'A new version is ready — reload to update.';

export interface TestResources {
  /** A static server for a build, closed after the test (closing it early, mid-test, is fine). */
  serve(dir?: string): Promise<StaticServer>;
  /** A fresh browser profile, closed and deleted after the test. */
  profile(opts?: ContextOptions): Promise<FreshProfile>;
  /** Anything else to close or delete after the test. */
  later(close: () => Promise<void>): void;
}

/**
 * Call once at the top of a test file: what each test opens through the returned helpers is
 * closed after that test, newest first, whether the test passed or failed.
 */
export function closedAfterEach(): TestResources {
  let cleanups: (() => Promise<void>)[] = [];
  afterEach(async () => {
    const todo = cleanups.reverse();
    cleanups = [];
    for (const c of todo) await c();
  });
  const later = (close: () => Promise<void>) => {
    cleanups.push(close);
  };
  return {
    later,
    async serve(dir = BUILDS.current) {
      const s = await startServer(dir);
      let closed = false;
      const close = s.close.bind(s);
      s.close = async () => {
        if (closed) return;
        closed = true;
        await close();
      };
      later(() => s.close());
      return s;
    },
    async profile(opts = {}) {
      const p = await freshProfile(opts);
      later(() => p.close());
      return p;
    },
  };
}

export interface SharedBrowser {
  readonly browser: Browser;
  readonly server: StaticServer;
  /** A new page, in a context of its own (a phone unless said), showing screen `id`; `clipboard` grants copy and paste. */
  open(id: string, opts?: ContextOptions & { clipboard?: boolean }): Promise<Page>;
}

/**
 * One browser and one server of the current build for a whole test file: call once at its top. They
 * start before the file's first test and close after its last.
 */
export function sharedBrowser(): SharedBrowser {
  let browser: Browser | undefined;
  let server: StaticServer | undefined;
  beforeAll(async () => {
    server = await startServer(BUILDS.current);
    browser = await launchBrowser();
  });
  afterAll(async () => {
    await browser?.close();
    await server?.close();
  });
  const started = () => {
    if (!browser || !server) throw new Error('sharedBrowser() is used before its file started');
    return { browser, server };
  };
  return {
    get browser() {
      return started().browser;
    },
    get server() {
      return started().server;
    },
    async open(id, { clipboard, ...opts } = {}) {
      const { browser: b, server: s } = started();
      const page = await newPage(b, { viewport: PHONE, ...opts });
      if (clipboard) await page.context().grantPermissions(['clipboard-read', 'clipboard-write'], { origin: s.url });
      await openScreen(page, s.url, id);
      await settled(page);
      return page;
    },
  };
}

/** A saved fiber type as IndexedDB holds it. */
export type StoredRecord = Record<string, unknown> & { id: string; name: string; updatedAt: number };

/** Every saved fiber type, read straight from IndexedDB in the page (no app code), sorted by id. */
export async function storedRecords(page: Page): Promise<StoredRecord[]> {
  const records = await page.evaluate(
    (dbName) =>
      new Promise<Record<string, unknown>[]>((resolve, reject) => {
        const req = indexedDB.open(dbName);
        req.onerror = () => reject(req.error);
        req.onsuccess = () => {
          const db = req.result;
          if (!db.objectStoreNames.contains('fiberTypes')) {
            db.close();
            resolve([]);
            return;
          }
          const all = db.transaction('fiberTypes').objectStore('fiberTypes').getAll();
          all.onsuccess = () => {
            db.close();
            resolve(all.result as Record<string, unknown>[]);
          };
          all.onerror = () => reject(all.error);
        };
      }),
    DB_NAME,
  );
  return (records as StoredRecord[]).sort((a, b) => (a.id < b.id ? -1 : a.id > b.id ? 1 : 0));
}
