// Keyboard-only use and typed units, in real Chromium on the production build:
// a whole calculation without touching the mouse, a visible focus ring at every stop,
// and "1,55 µm" (decimal comma, micrometres) read as 1550 nm wherever a wavelength is typed.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { BUILDS, PHONE, launchBrowser, newContext, startServer, waitForScreen, type StaticServer } from './harness';
import { FEATURES } from '../../src/features/registry';

let browser: Browser;
let server: StaticServer;
let context: BrowserContext;
beforeAll(async () => {
  server = await startServer(BUILDS.current);
  browser = await launchBrowser();
  context = await newContext(browser, { viewport: PHONE });
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

interface Stop {
  what: string;
  visibleFocus: boolean;
}

/** What has focus, and whether it shows a focus ring a person can see. */
async function focused(page: Page): Promise<Stop & { href: string | null; id: string; name: string }> {
  return page.evaluate(() => {
    const el = document.activeElement as HTMLElement | null;
    if (!el || el === document.body) return { what: 'body', visibleFocus: false, href: null, id: '', name: '' };
    const s = getComputedStyle(el);
    const ring = (s.outlineStyle !== 'none' && parseFloat(s.outlineWidth) >= 2) || s.boxShadow !== 'none';
    const name = (el.getAttribute('aria-label') ?? el.textContent ?? '').trim();
    return {
      what: `${el.tagName.toLowerCase()}${el.id ? '#' + el.id : ''} "${name.slice(0, 40)}"`,
      visibleFocus: ring,
      href: el.getAttribute('href'),
      id: el.id,
      name,
    };
  });
}

/** Presses Tab until `want` holds for the focused element; returns every stop passed. */
async function tabUntil(page: Page, want: (f: Awaited<ReturnType<typeof focused>>) => boolean, maxStops = 80): Promise<Stop[]> {
  const stops: Stop[] = [];
  for (let i = 0; i < maxStops; i++) {
    await page.keyboard.press('Tab');
    const f = await focused(page);
    stops.push({ what: f.what, visibleFocus: f.visibleFocus });
    if (want(f)) return stops;
  }
  throw new Error(`not reached within ${maxStops} Tab presses; stops: ${stops.map((s) => s.what).join(' → ')}`);
}

/** The number in a result line such as "1.9953 mW" (plain or with a unicode minus). */
function numberIn(text: string | null): number {
  const m = /[-−]?\d+(?:[.,]\d+)?(?:e[-+]?\d+)?/i.exec(text ?? '');
  return m ? Number(m[0].replace('−', '-').replace(',', '.')) : NaN;
}

describe('keyboard alone', () => {
  it('from the home screen to an optical power conversion: Tab to the calculator, type a power, pick a common value, read the result', async () => {
    const page = await context.newPage();
    await page.goto(server.url);
    await page.locator('main h1').waitFor();
    const stops = await tabUntil(page, (f) => f.href === '#/power');
    await page.keyboard.press('Enter');
    await waitForScreen(page);
    expect(await page.locator('main h1').textContent()).toBe(FEATURES.find((f) => f.id === 'power')!.title);

    stops.push(...(await tabUntil(page, (f) => f.id === 'f-powerDbm')));
    await page.keyboard.press('Control+A');
    await page.keyboard.type('0');
    const mw = page.locator('section[aria-label="The same power in each unit"] dd').nth(1);
    // 0 dBm is 1 mW by the definition of dBm (P = 1 mW · 10^(dBm/10)); 5 significant figures shown.
    await expect.poll(async () => numberIn(await mw.textContent())).toBeCloseTo(1, 4);

    stops.push(...(await tabUntil(page, (f) => f.name === '3 dBm')));
    await page.keyboard.press('Space');
    // 3 dBm = 10^0.3 mW = 1.99526 mW (definition of dBm).
    await expect.poll(async () => numberIn(await mw.textContent())).toBeCloseTo(1.9953, 3);
    expect(await page.locator('#f-powerDbm').inputValue()).toBe('3');

    const unringed = stops.filter((s) => !s.visibleFocus).map((s) => s.what);
    expect(unringed, 'every keyboard stop shows a focus ring').toEqual([]);
    await page.close();
  });
});

describe('typed units', () => {
  it.for(FEATURES.map((f) => ({ id: f.id, title: f.title })))(
    'on the $title screen, a wavelength typed as "1,55 µm" is read as 1550 nm and gives the same result as 1550',
    async ({ id }, ctx) => {
      const page = await context.newPage();
      try {
        await page.goto(`${server.url}#/${id}`);
        await waitForScreen(page);
        const field = page.locator('#f-wavelengthNm');
        if ((await field.count()) === 0) {
          ctx.skip(); // this screen has no wavelength field
          return;
        }
        const results = page.locator('main .result-card');
        const settled = () => page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'), undefined, { timeout: 15_000 });

        await field.fill('1550');
        await settled();
        const at1550 = await results.allTextContents();

        await field.fill('1,55 µm');
        await settled();
        await expect.poll(() => page.locator('#f-wavelengthNm-conv').textContent()).toMatch(/1550\s*nm/);
        expect(await page.locator('#f-wavelengthNm-err').count(), 'no error under the field').toBe(0);
        expect(await field.getAttribute('aria-invalid')).toBeNull();
        await expect.poll(() => results.allTextContents()).toEqual(at1550);
      } finally {
        await page.close();
      }
    },
  );
});
