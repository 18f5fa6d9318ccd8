// Browser figures for `npm run bench`, measured in Debian's Chromium against a production
// build (path given as the first argument): JavaScript loaded at start (gzipped), total
// precache size, and time from navigation to the first rendered calculator offline with
// 4× CPU throttling. Figures are reported, never asserted.
import { readFileSync, statSync } from 'node:fs';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import type { CDPSession, Page } from 'playwright-core';
import { freshProfile, launchBrowser, newContext, startServer, waitForServiceWorkerControl } from '../tests/e2e/harness';
import { formatMs, printRow, quantile } from './harness';

const distDir = process.argv[2];
if (!distDir) throw new Error('usage: node browser.mjs <built app folder>');

const START_JS_GOAL_KB = 50;
const PRECACHE_GOAL_KB = 300;
const OFFLINE_START_GOAL_MS = 1000;
const CPU_SLOWDOWN = 4;
const OFFLINE_RUNS = 5;
// The calculator timed: the first screen of the home list, the one people check first.
const TIMED_SCREEN = process.env.BENCH_SCREEN ?? 'single-mode';

const kb = (bytes: number) => `${(bytes / 1024).toFixed(1)} KB`;
const gz = (buf: Buffer) => gzipSync(buf, { level: 9 }).length;

function sizeRow(name: string, bytes: number, goalKb: number, extra = ''): void {
  const ratio = bytes / 1024 / goalKb;
  printRow({
    name: name + extra,
    median: kb(bytes),
    p90: '—',
    runs: '1',
    goal: `≤ ${goalKb} KB`,
    ratio: `${ratio.toFixed(2)}${ratio > 1 ? ' over' : ''}`,
  });
}

/** Every script the page fetched until the network went quiet, with its gzipped size. */
async function startScripts(page: Page, url: string): Promise<{ url: string; gzip: number }[]> {
  const scripts: { url: string; gzip: number }[] = [];
  const pending: Promise<void>[] = [];
  page.on('response', (response) => {
    if (response.request().resourceType() !== 'script') return;
    pending.push(
      response.body().then(
        (body) => void scripts.push({ url: response.url(), gzip: gz(body) }),
        () => undefined,
      ),
    );
  });
  await page.goto(url, { waitUntil: 'networkidle' });
  await Promise.all(pending);
  return scripts;
}

async function measureStartJs(url: string): Promise<void> {
  const browser = await launchBrowser();
  try {
    for (const [label, route] of [
      ['start JS gzip, home', ''],
      [`start JS gzip, #/${TIMED_SCREEN}`, `#/${TIMED_SCREEN}`],
    ] as const) {
      const context = await newContext(browser);
      const page = await context.newPage();
      const scripts = await startScripts(page, url + route);
      const total = scripts.reduce((s, x) => s + x.gzip, 0);
      sizeRow(label, total, START_JS_GOAL_KB, ` [${scripts.length} files]`);
      await context.close();
    }
  } finally {
    await browser.close();
  }
}

function measurePrecache(): void {
  const sw = readFileSync(join(distDir!, 'sw.js'), 'utf8');
  const urls = [...sw.matchAll(/url:"([^"]+)"/g)].map((m) => m[1]!);
  if (urls.length === 0) throw new Error('no precache entries found in sw.js');
  let raw = 0;
  let zipped = 0;
  for (const u of urls) {
    const file = join(distDir!, u);
    raw += statSync(file).size;
    zipped += gz(readFileSync(file));
  }
  sizeRow('precache as stored', raw, PRECACHE_GOAL_KB, ` [${urls.length} files, ${kb(zipped)} gz]`);
}

// Records, in the page's own clock (0 = navigation start), when the routed calculator
// first shows a result (or, for a screen without a result card, its content).
function firstCalculatorProbe(): void {
  const mark = () => {
    const w = window as unknown as { __firstResultMs?: number; __firstScreenMs?: number };
    const main = document.querySelector('main');
    if (!main || main.querySelector('.loading')) return;
    if (w.__firstScreenMs === undefined && main.querySelector('h1') && main.children.length > 1) w.__firstScreenMs = performance.now();
    if (w.__firstResultMs === undefined && main.querySelector('.result-card .result-body')) w.__firstResultMs = performance.now();
  };
  new MutationObserver(mark).observe(document, { childList: true, subtree: true });
}

async function measureOfflineStart(): Promise<void> {
  const server = await startServer(distDir!);
  const url = server.url;
  const profile = await freshProfile();
  try {
    await profile.context.addInitScript(firstCalculatorProbe);
    await profile.page.goto(url);
    await waitForServiceWorkerControl(profile.page);
    // Visit the timed screen once online so its lazy chunk is known to the cache as well.
    await profile.page.goto(`${url}#/${TIMED_SCREEN}`);
    await profile.context.setOffline(true);
    await server.close();

    const times: number[] = [];
    let fallback = false;
    for (let i = 0; i < OFFLINE_RUNS; i++) {
      const page = await profile.context.newPage();
      const cdp: CDPSession = await profile.context.newCDPSession(page);
      await cdp.send('Emulation.setCPUThrottlingRate', { rate: CPU_SLOWDOWN });
      await page.goto(`${url}#/${TIMED_SCREEN}`);
      const t = await page
        .waitForFunction(() => (window as unknown as { __firstResultMs?: number }).__firstResultMs, undefined, { timeout: 5_000 })
        .then((h) => h.jsonValue() as Promise<number>)
        .catch(async () => {
          fallback = true;
          return page.evaluate(() => (window as unknown as { __firstScreenMs?: number }).__firstScreenMs ?? NaN);
        });
      times.push(t);
      await page.close();
    }
    times.sort((a, b) => a - b);
    const median = quantile(times, 0.5);
    const ratio = median / OFFLINE_START_GOAL_MS;
    printRow({
      name: `offline start → ${fallback ? 'screen' : 'result'} #/${TIMED_SCREEN}, CPU ÷${CPU_SLOWDOWN}`,
      median: formatMs(median),
      p90: formatMs(quantile(times, 0.9)),
      runs: String(times.length),
      goal: `≤ ${formatMs(OFFLINE_START_GOAL_MS)}`,
      ratio: `${ratio.toFixed(2)}${ratio > 1 ? ' over' : ''}`,
    });
    console.log(`  (each run: ${times.map((t) => formatMs(t)).join(', ')})`);
    if (fallback) console.log(`  (#/${TIMED_SCREEN} shows no result card yet: timed to its first content instead)`);
  } finally {
    await profile.close();
    await server.close().catch(() => undefined);
  }
}

console.log('\nBrowser figures (Chromium, production build):');
const server = await startServer(distDir);
try {
  await measureStartJs(server.url);
} finally {
  await server.close();
}
measurePrecache();
await measureOfflineStart();
