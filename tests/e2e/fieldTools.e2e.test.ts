// Field tools in real Chromium on the production build: every screen where optical power is entered
// shows the full laser cautions with the hazard context, no screen text suggests a level is all right to
// look at, and the dispersion screen draws its D(λ) curve.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { BUILDS, PHONE, launchBrowser, newPage, openScreen, startServer, type StaticServer } from './harness';

// Same list as tests/physics/laserSafety.test.ts: phrasing that would suggest a power is all right to look at.
const FORBIDDEN = /safe to (look|view|stare|see)|eye[- ]?safe|harmless|no (eye )?hazard|safe for (the )?eyes?|\bis safe\b|\bare safe\b|safe level|safely (look|view)/i;

let browser: Browser;
let server: StaticServer;
beforeAll(async () => {
  server = await startServer(BUILDS.current);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

async function open(id: string): Promise<Page> {
  const page = await newPage(browser, { viewport: PHONE });
  await openScreen(page, server.url, id);
  return page;
}

async function mainText(page: Page): Promise<string> {
  return (await page.locator('main').innerText()).replace(/\s+/g, ' ');
}

describe('screens where optical power is entered show the cautions', () => {
  it.each(['power', 'link-budget', 'laser-safety'])('%s shows the full cautions, the hazard context and who governs', async (id) => {
    const page = await open(id);
    const cautions = page.locator('section.safety-cautions');
    await expect(cautions.count()).resolves.toBeGreaterThan(0);
    const text = (await cautions.first().innerText()).replace(/\s+/g, ' ');
    expect(text).toMatch(/Never look into a fiber end/);
    expect(text).toMatch(/inspection scope/);
    expect(text).toMatch(/hazard context at \d+ nm/);
    expect(text).toMatch(/IEC 60825-2/);
    expect(text).toMatch(/adopted locally/);
    // The frame's own disclaimer ("it never tells you that a level is safe to look at") is a negation: left out of the scan.
    const all = (await mainText(page)).replace(/[^.]*\bnever tells you\b[^.]*\./g, '');
    const bad = FORBIDDEN.exec(all);
    expect(bad?.[0], `forbidden phrase on ${id}`).toBeUndefined();
    await page.close();
  });

  it('the laser-safety screen gives indicative level 4 for 1 W at 1550 nm, with the edition', async () => {
    const page = await open('laser-safety');
    await page.fill('#f-powerDbm', '30 dBm');
    await expect.poll(() => mainText(page)).toMatch(/Indicative: 1000 mW is at or above the 500 mW upper limit of class 3B, so the hazard level is 4/);
    expect(await mainText(page)).toMatch(/IEC 60825-2:2021/);
    await page.close();
  });

  it('the power screen converts −3 dBm to 0.50119 mW at once and shows the chain', async () => {
    const page = await open('power');
    const text = await mainText(page);
    expect(text).toMatch(/0\.50119 mW/);
    expect(text).toMatch(/End power/);
    await page.close();
  });
});

describe('dispersion screen', () => {
  it('draws D(λ) over 1200–1650 nm and finds λ0 for a typed standard-like fiber', async () => {
    const page = await open('dispersion');
    await page.selectOption('#dispersion-source', 'typed');
    await page.fill('#f-dispersion-coreDiameterUm', '8.2');
    await page.fill('#f-dispersion-na', '0.123');
    await expect.poll(() => mainText(page)).toMatch(/Zero-dispersion wavelength \d{4}\.\d nm/);
    expect(await page.locator('main svg').count()).toBeGreaterThan(0);
    expect(await mainText(page)).toMatch(/Chromatic dispersion D\(λ\)/);
    await page.close();
  });
});
