// Keyboard-only use and typed units, in real Chromium on the production build:
// a whole calculation without touching the mouse, a visible focus ring at every stop,
// and "1,55 µm" (decimal comma, micrometres) read as 1550 nm wherever a wavelength is typed.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { BUILDS, PHONE, launchBrowser, newContext, settled, startServer, waitForScreen, type StaticServer } from './harness';
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
    // Names compare with ordinary spaces: a value and its unit are joined by a no-break space on screen.
    const name = (el.getAttribute('aria-label') ?? el.textContent ?? '').replace(/\s+/g, ' ').trim();
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

describe('keyboard alone, a fiber check', () => {
  it('on the single-mode check: pick typed fiber values, enter core and NA, then a wavelength, and read V and the verdict', async () => {
    const page = await context.newPage();
    await page.goto(server.url);
    await page.locator('main h1').waitFor();
    const stops = await tabUntil(page, (f) => f.href === '#/single-mode');
    await page.keyboard.press('Enter');
    await waitForScreen(page);

    // The chosen fiber is folded to one line: Enter on it opens the choice.
    stops.push(...(await tabUntil(page, (f) => f.what.startsWith('summary') && f.name.startsWith('Fiber type:'))));
    await page.keyboard.press('Enter');
    stops.push(...(await tabUntil(page, (f) => f.id === 'single-mode-source')));
    // A closed <select> takes type-ahead: "Typed values (core diameter and NA)".
    await page.keyboard.type('Typed');
    await expect.poll(() => page.locator('#single-mode-source').inputValue()).toBe('typed');

    const coreDiameterUm = 8.2;
    const na = 0.14;
    for (const [id, value] of [
      ['f-single-mode-coreDiameterUm', String(coreDiameterUm)],
      ['f-single-mode-na', String(na)],
      ['f-wavelengthNm', '1550'],
    ] as const) {
      stops.push(...(await tabUntil(page, (f) => f.id === id)));
      await page.keyboard.press('Control+A');
      await page.keyboard.type(value);
    }
    const headline = page.locator('main output');
    // V = 2π a NA / λ (Gloge 1971, eq. for the normalized frequency); shown to 4 significant figures.
    const vAt = (wavelengthNm: number) => (2 * Math.PI * (coreDiameterUm / 2) * na) / (wavelengthNm / 1000);
    await expect.poll(async () => numberIn(await headline.locator('.answer-value').textContent())).toBeCloseTo(vAt(1550), 3);
    // Below V = 2.405 (first zero of J0, A&S Table 9.5) only LP01 is guided.
    expect(vAt(1550)).toBeLessThan(2.405);
    await expect.poll(() => headline.locator('.tone-ok .answer-verdict').textContent()).toMatch(/only LP01/);

    stops.push(...(await tabUntil(page, (f) => f.name === '1310 nm')));
    await page.keyboard.press('Space');
    // 2.405 < V < 3.832 (first zero of J1, A&S Table 9.5): LP01 and LP11, two LP modes.
    expect(vAt(1310)).toBeGreaterThan(2.405);
    expect(vAt(1310)).toBeLessThan(3.832);
    await expect.poll(async () => numberIn(await headline.locator('.answer-value').textContent())).toBeCloseTo(vAt(1310), 3);
    await expect.poll(() => headline.locator('.tone-warn .answer-verdict').textContent()).toMatch(/2 LP modes/);

    const unringed = stops.filter((s) => !s.visibleFocus).map((s) => s.what);
    expect(unringed, 'every keyboard stop shows a focus ring').toEqual([]);
    await page.close();
  });
});

describe('typed units', () => {
  // The fiber types list has no wavelength field until a form is opened; the power screen takes
  // no wavelength; the link budget ticks the fiber type's listed wavelengths instead of typing one;
  // "Bend or splice?" reads the event at the fixed OTDR wavelengths 1310, 1550 and 1625 nm; PMD is
  // a delay with no wavelength in its formula; and the Ethernet screen takes each application's own.
  // Every other screen has at least one, and the first (by id ending in "avelengthNm") is tried.
  const NO_TYPED_WAVELENGTH = ['library', 'power', 'link-budget', 'bend-or-splice', 'pmd', 'link-applications'];
  const withWavelength = FEATURES.filter((f) => !NO_TYPED_WAVELENGTH.includes(f.id));
  it('the screens said to take no typed wavelength are real screens and have no wavelength field', async () => {
    const page = await context.newPage();
    try {
      for (const id of NO_TYPED_WAVELENGTH) {
        expect(FEATURES.map((f) => f.id), `${id} is a screen`).toContain(id);
        await page.goto(`${server.url}#/${id}`);
        await waitForScreen(page);
        expect(await page.locator('input[id$="avelengthNm"]').count(), `${id} has no wavelength field`).toBe(0);
      }
    } finally {
      await page.close();
    }
  });
  it.for(withWavelength.map((f) => ({ id: f.id, title: f.title })))(
    'on the $title screen, a wavelength typed as "1,55 µm" is read as 1550 nm and gives the same result as 1550',
    async ({ id }) => {
      const page = await context.newPage();
      try {
        await page.goto(`${server.url}#/${id}`);
        await waitForScreen(page);
        // A field in view first (a folded fiber choice hides its own); otherwise the first in the page.
        const inView = page.locator('input[id$="avelengthNm"]:visible');
        const fieldId = await ((await inView.count()) > 0 ? inView : page.locator('input[id$="avelengthNm"]')).first().getAttribute('id');
        expect(fieldId, 'the screen has a wavelength field').toBeTruthy();
        const field = page.locator(`#${fieldId}`);
        const results = page.locator('main output, main .result-card');
        await field.fill('1550');
        await settled(page);
        const at1550 = await results.allTextContents();

        await field.fill('1,55 µm');
        await settled(page);
        await expect.poll(() => page.locator(`#${fieldId}-conv`).textContent()).toMatch(/1550\s*nm/);
        expect(await page.locator(`#${fieldId}-err`).count(), 'no error under the field').toBe(0);
        expect(await field.getAttribute('aria-invalid')).toBeNull();
        await expect.poll(() => results.allTextContents()).toEqual(at1550);
      } finally {
        await page.close();
      }
    },
  );
});
