// The installable offline shell, in real Chromium against production builds:
// offline start after one visit, the update offer, no request to another origin,
// and Chromium's own installability verdict.
import { describe, expect, it } from 'vitest';
import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { BUILDS, closedAfterEach, launchBrowser, newContext, UPDATE_OFFER, waitForScreen, waitForServiceWorkerControl, watchCspViolations, watchForeignRequests, type FreshProfile, type StaticServer } from './harness';
import { FEATURES } from '../../src/features/registry';


const { serve, profile, later } = closedAfterEach();



async function buildIdShown(page: Page): Promise<string> {
  return (await page.locator('[data-build-id]').textContent())?.trim() ?? '';
}

async function expectHomeScreen(page: Page): Promise<void> {
  await expect.poll(() => page.locator('main h1').textContent()).toBe('Field calculator');
  // Every calculator is offered on the home screen.
  expect(await page.locator('main section:not([aria-labelledby="grp-recent"]) a.feature-link').count()).toBe(FEATURES.length);
}

// A calculator counts as working when its title and its own content have rendered from the
// lazily loaded chunk (not the loading placeholder, not an error page).
async function openCalculatorFromHome(page: Page, id: string): Promise<void> {
  const feature = FEATURES.find((f) => f.id === id)!;
  await page.locator(`main a[href="#/${id}"]`).click();
  await waitForScreen(page);
  expect(await page.locator('main h1').textContent()).toBe(feature.title);
  expect(await page.locator('main h2, main form, main input, main p').count()).toBeGreaterThan(0);
}

/** The number in a result line such as "1.9953 mW". */
function numberIn(text: string | null): number {
  const m = /[-−]?\d+(?:[.,]\d+)?(?:e[-+]?\d+)?/i.exec(text ?? '');
  return m ? Number(m[0].replace('−', '-').replace(',', '.')) : NaN;
}

// The power calculator computes: 3 dBm typed in gives 10^0.3 mW = 1.9953 mW (definition of dBm).
async function expectPowerCalculatorComputes(page: Page): Promise<void> {
  await page.locator('#f-powerDbm').fill('3');
  const mw = page.locator('section[aria-label="The same power in each unit"] dd').nth(1);
  await expect.poll(async () => numberIn(await mw.textContent())).toBeCloseTo(1.9953, 3);
}

async function goOffline(p: FreshProfile, server: StaticServer): Promise<void> {
  await p.context.setOffline(true);
  // Also stop the server, so nothing but the service worker's cache can answer.
  await server.close();
}

describe('the app works offline after one visit', () => {
  it('a fresh phone profile, once the service worker controls the page, reloads offline into the home screen and opens a calculator', async () => {
    const server = await serve(BUILDS.current);
    const p = await profile();
    await p.page.goto(server.url);
    await waitForServiceWorkerControl(p.page);
    await expectHomeScreen(p.page);

    await goOffline(p, server);
    const seenBefore = server.requests.length;
    await p.page.reload();
    await expectHomeScreen(p.page);
    await openCalculatorFromHome(p.page, 'power');
    await expectPowerCalculatorComputes(p.page);
    await p.page.goBack();
    await expectHomeScreen(p.page);
    await openCalculatorFromHome(p.page, 'single-mode');
    expect(server.requests.length, 'the server saw no request once offline').toBe(seenBefore);
  });
});

describe('a new version is offered, never forced', () => {
  async function visitNThenServeNext(): Promise<{ server: StaticServer; p: FreshProfile }> {
    const server = await serve(BUILDS.current);
    const p = await profile();
    await p.page.goto(server.url);
    await waitForServiceWorkerControl(p.page);
    expect(await buildIdShown(p.page)).toBe(BUILDS.currentId);
    server.setRoot(BUILDS.next);
    await p.page.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));
    // The next visit: the worker still serves N, and the browser finds N+1's worker.
    await p.page.reload();
    await p.page.getByText(UPDATE_OFFER).waitFor({ timeout: 30_000 });
    expect(await buildIdShown(p.page)).toBe(BUILDS.currentId);
    return { server, p };
  }

  it('offers N+1 while N runs, and does not reload by itself', async () => {
    const { p } = await visitNThenServeNext();
    await p.page.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));
    await p.page.waitForTimeout(3000);
    expect(await p.page.evaluate(() => (window as unknown as { __sameDocument?: boolean }).__sameDocument)).toBe(true);
    expect(await buildIdShown(p.page)).toBe(BUILDS.currentId);
  });

  it('an update found while someone is typing is offered, and what they typed stays put', async () => {
    const server = await serve(BUILDS.current);
    const p = await profile();
    await p.page.goto(`${server.url}#/power`);
    await waitForServiceWorkerControl(p.page);
    await waitForScreen(p.page);
    await p.page.locator('#f-powerDbm').click();
    await p.page.keyboard.press('Control+A');
    await p.page.keyboard.type('-7.5');
    await p.page.evaluate(() => ((window as unknown as { __sameDocument: boolean }).__sameDocument = true));

    server.setRoot(BUILDS.next);
    // The check the app makes when it comes back into view, made at once.
    await p.page.evaluate(async () => (await navigator.serviceWorker.getRegistration())?.update());
    await p.page.getByText(UPDATE_OFFER).waitFor({ timeout: 30_000 });
    await p.page.keyboard.type('5');
    await p.page.waitForTimeout(2000);

    expect(await p.page.evaluate(() => (window as unknown as { __sameDocument?: boolean }).__sameDocument)).toBe(true);
    expect(await p.page.locator('#f-powerDbm').inputValue()).toBe('-7.55');
    expect(await p.page.evaluate(() => document.activeElement?.id)).toBe('f-powerDbm');
    expect(await buildIdShown(p.page)).toBe(BUILDS.currentId);
  });

  it('accepting the update reloads into N+1, which then works offline', async () => {
    const { server, p } = await visitNThenServeNext();
    await Promise.all([p.page.waitForEvent('load'), p.page.getByRole('button', { name: 'Reload to update' }).click()]);
    await expect.poll(() => buildIdShown(p.page)).toBe(BUILDS.nextId);
    await expect.poll(() => p.page.getByText(UPDATE_OFFER).count()).toBe(0);

    await goOffline(p, server);
    await p.page.reload();
    expect(await buildIdShown(p.page)).toBe(BUILDS.nextId);
    await expectHomeScreen(p.page);
    await openCalculatorFromHome(p.page, 'power');
    await expectPowerCalculatorComputes(p.page);
  });

  it('declining keeps N, which still works offline', async () => {
    const { server, p } = await visitNThenServeNext();
    await p.page.getByRole('button', { name: 'Not now' }).click();
    expect(await p.page.getByText(UPDATE_OFFER).count()).toBe(0);
    expect(await buildIdShown(p.page)).toBe(BUILDS.currentId);

    await goOffline(p, server);
    await p.page.reload();
    await expectHomeScreen(p.page);
    expect(await buildIdShown(p.page)).toBe(BUILDS.currentId);
    await openCalculatorFromHome(p.page, 'power');
    await expectPowerCalculatorComputes(p.page);
  });
});

describe('nothing leaves the app’s origin', () => {
  it('a walk through every screen, by links and the back button, requests nothing from another origin and trips no security policy', async () => {
    const server = await serve(BUILDS.current);
    const browser = await launchBrowser();
    later(() => browser.close());
    const context = await newContext(browser, { serviceWorkers: 'allow' });
    const requests = watchForeignRequests(context, server.origin);
    const csp = await watchCspViolations(context);
    const page = await context.newPage();
    await page.goto(server.url);
    await waitForServiceWorkerControl(page);
    await expectHomeScreen(page);
    for (const f of FEATURES) {
      await page.locator(`main a[href="#/${f.id}"]`).click();
      await waitForScreen(page);
      expect(await page.locator('main h1').textContent()).toBe(f.title);
      await page.goBack();
      await expectHomeScreen(page);
    }
    // Give late requests (plots, workers, the update check) a moment to show up.
    await page.waitForTimeout(500);
    expect(requests.all.length, 'the watcher saw the app’s own requests').toBeGreaterThan(FEATURES.length);
    expect(requests.foreign).toEqual([]);
    expect(csp.violations).toEqual([]);
  });

  it('the request watcher does see a request to another origin (check of the check)', async () => {
    const server = await serve(BUILDS.current);
    const browser = await launchBrowser();
    later(() => browser.close());
    const context = await newContext(browser, { bypassCSP: true, serviceWorkers: 'allow' });
    const requests = watchForeignRequests(context, server.origin);
    const page = await context.newPage();
    await page.goto(server.url);
    await page.evaluate(() => fetch('http://127.0.0.2:9/elsewhere').catch(() => undefined));
    expect(requests.foreign).toEqual(['http://127.0.0.2:9/elsewhere']);
  });

  it('the built page carries the strict content-security policy, and it blocks another origin', async () => {
    const html = readFileSync(join(BUILDS.current, 'index.html'), 'utf8');
    const policy = /http-equiv="Content-Security-Policy" content="([^"]+)"/.exec(html)?.[1];
    expect(policy).toBeDefined();
    for (const directive of ["default-src 'self'", "script-src 'self'", "connect-src 'self'", "object-src 'none'"]) {
      expect(policy).toContain(directive);
    }
    expect(html, 'no inline script in the built page').not.toMatch(/<script(?![^>]*\bsrc=)[^>]*>/);

    const server = await serve(BUILDS.current);
    const browser = await launchBrowser();
    later(() => browser.close());
    const context = await newContext(browser, { serviceWorkers: 'allow' });
    const csp = await watchCspViolations(context);
    const page = await context.newPage();
    await page.goto(server.url);
    await expectHomeScreen(page);
    const blocked = await page.evaluate(() =>
      fetch('http://127.0.0.2:9/elsewhere').then(
        () => false,
        () => true,
      ),
    );
    expect(blocked).toBe(true);
    await expect.poll(() => csp.violations.length).toBeGreaterThan(0);
  });
});

describe('the app is installable', () => {
  it('Chromium finds no installability error, and the manifest carries name, standalone display, colours, icons and an in-scope start URL', async () => {
    const server = await serve(BUILDS.current);
    const p = await profile();
    await p.page.goto(server.url);
    await waitForServiceWorkerControl(p.page);
    const cdp = await p.context.newCDPSession(p.page);

    const manifest = (await cdp.send('Page.getAppManifest')) as {
      url: string;
      errors: { message: string; critical: number }[];
      data?: string;
    };
    expect(manifest.url).toBe(`${server.url}manifest.webmanifest`);
    expect(manifest.errors).toEqual([]);
    const m = JSON.parse(manifest.data ?? '{}') as {
      name: string;
      short_name: string;
      start_url: string;
      scope: string;
      display: string;
      theme_color: string;
      background_color: string;
      icons: { src: string; sizes: string; type: string; purpose?: string }[];
    };
    expect(m.name).toMatch(/Modewright/);
    expect(m.short_name.length).toBeLessThanOrEqual(12); // fits under a home-screen icon (common practice)
    expect(m.display).toBe('standalone');
    expect(m.theme_color).toMatch(/^#[0-9a-f]{6}$/i);
    expect(m.background_color).toMatch(/^#[0-9a-f]{6}$/i);
    const startUrl = new URL(m.start_url, manifest.url).href;
    const scope = new URL(m.scope, manifest.url).href;
    expect(startUrl.startsWith(scope), `start URL ${startUrl} lies inside scope ${scope}`).toBe(true);

    // The PNG sizes browsers ask for, served, and really that size (PNG IHDR width/height).
    const wanted = [
      { sizes: '192x192', purpose: 'any' },
      { sizes: '512x512', purpose: 'any' },
      { sizes: '512x512', purpose: 'maskable' },
    ];
    for (const w of wanted) {
      const icon = m.icons.find((i) => i.type === 'image/png' && i.sizes === w.sizes && (i.purpose ?? 'any') === w.purpose);
      expect(icon, `a ${w.sizes} ${w.purpose} PNG icon`).toBeDefined();
      const response = await p.page.request.get(new URL(icon!.src, manifest.url).href);
      expect(response.status()).toBe(200);
      expect(response.headers()['content-type']).toBe('image/png');
      const png = await response.body();
      const [width, height] = [png.readUInt32BE(16), png.readUInt32BE(20)];
      expect(`${width}x${height}`).toBe(w.sizes);
    }

    // A service worker whose scope covers the start URL, and whose fetch handler answers
    // the start page (newer Chromium no longer lists this among its installability errors).
    const registration = await p.page.evaluate(async (url) => {
      const r = await navigator.serviceWorker.getRegistration(url);
      return r?.active ? { scope: r.scope, script: r.active.scriptURL } : undefined;
    }, startUrl);
    expect(registration).toEqual({ scope, script: `${server.url}sw.js` });
    const startResponse = await p.page.goto(startUrl);
    expect(startResponse?.fromServiceWorker(), 'the start page came from the service worker').toBe(true);

    const installability = (await cdp.send('Page.getInstallabilityErrors')) as {
      installabilityErrors: { errorId: string; errorArguments: unknown[] }[];
    };
    expect(installability.installabilityErrors).toEqual([]);
  });
});
