// Reading the line (issue 15) in real Chromium on the production build: the bend-or-splice verdict read from the
// headline <output>, and the other three calculators answering first with their worked defaults.
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { PHONE, settled, sharedBrowser } from './harness';

const shared = sharedBrowser();
const open = (id: string) => shared.open(id);

/** The headline answer as one line of text, once the worker has settled. */
async function headline(page: Page): Promise<string> {
  await settled(page);
  await page.waitForFunction(() => {
    const out = document.querySelector('output.headline');
    return !!out && out.getAttribute('aria-busy') !== 'true' && !/No answer yet|Working/.test(out.textContent ?? '');
  }, undefined, { timeout: 15_000 });
  return ((await page.locator('output.headline').innerText()) ?? '').replace(/\s+/g, ' ');
}

async function headlineInFirstViewport(page: Page): Promise<boolean> {
  const box = await page.locator('output.headline').boundingBox();
  return !!box && box.y >= 0 && box.y + box.height <= PHONE.height;
}

describe('bend or splice, read from the headline <output>', () => {
  it('0.05 dB at 1310 nm and 0.40 dB at 1550 nm on standard fiber is called a bend (issue 15)', async () => {
    const page = await open('bend-or-splice');
    await page.fill('#f-loss1310Db', '0.05');
    await page.fill('#f-loss1550Db', '0.40');
    await expect.poll(() => headline(page), { timeout: 15_000 }).toMatch(/\bBend\b/);
    const text = await headline(page);
    expect(text).not.toMatch(/splice/i);
    expect(text).toMatch(/rises steeply with wavelength/);
    expect(await headlineInFirstViewport(page)).toBe(true);
    await page.close();
  });

  it('0.20 dB at 1310 nm and 0.19 dB at 1550 nm is called a splice (issue 15)', async () => {
    const page = await open('bend-or-splice');
    await page.fill('#f-loss1310Db', '0.20');
    await page.fill('#f-loss1550Db', '0.19');
    await expect.poll(() => headline(page), { timeout: 15_000 }).toMatch(/Splice or connector/);
    const text = await headline(page);
    expect(text).not.toMatch(/\bbend\b/i);
    expect(text).toMatch(/nearly flat with wavelength/);
    await page.close();
  });

  it('two readings below zero (a one-way gainer) fit neither, said plainly', async () => {
    const page = await open('bend-or-splice');
    await page.fill('#f-loss1310Db', '-0.20');
    await page.fill('#f-loss1550Db', '-0.25');
    await expect.poll(() => headline(page), { timeout: 15_000 }).toMatch(/Fits neither model/);
    await page.close();
  });

  it('Copy as text gives one report with the readings and the verdict', async () => {
    const page = await open('bend-or-splice');
    await page.fill('#f-loss1310Db', '0.05');
    await page.fill('#f-loss1550Db', '0.40');
    await expect.poll(() => headline(page), { timeout: 15_000 }).toMatch(/\bBend\b/);
    // Catch what the page hands to the clipboard (the headless clipboard may be closed to the page).
    await page.evaluate(() => {
      Object.defineProperty(navigator, 'clipboard', { configurable: true, value: { writeText: async (t: string) => void ((window as unknown as { copied: string }).copied = t) } });
    });
    await page.getByRole('button', { name: 'Copy as text' }).click();
    const copied = await page.waitForFunction(() => (window as unknown as { copied?: string }).copied).then((h) => h.jsonValue() as Promise<string>);
    expect(copied.match(/^Bend or splice\? One event at several wavelengths$/gm)).toHaveLength(1);
    expect(copied).toMatch(/^ {2}Loss at 1310 nm: 0\.05 dB$/m);
    expect(copied).toMatch(/^ {2}Loss at 1550 nm: 0\.4 dB$/m);
    expect(copied).toMatch(/^ {2}Verdict: Bend: loss rises steeply with wavelength$/m);
    expect(copied).toMatch(/^ {2}Splice model: does not fit/m);
    await page.close();
  });
});

describe('the other calculators of the trace answer first', () => {
  it.each([
    // 10 ns at n_g = 1.4682: c·τ/(2·n_g) = 1.02 m (definition).
    ['otdr-setup', /Resolution 1\.02\s*m with a 10 ns pulse/],
    // Issue 15 check value: a glass–air face, −14.4 dB, is in the table; the default reading −55 dB is within the typical UPC figure.
    ['reflection', /Reflectance [-−]55\.0\s*dB \W*= return loss 55\.0\s*dB; within the typical UPC figure/],
    // 0.2 ps/√km over 80 km = 1.789 ps; 10 Gbit/s tolerates 9.7 ps.
    ['pmd', /Link PMD 1\.79\s*ps \W*Carries 10 Gbit\/s/],
  ])('%s shows its headline in the first phone viewport', async (id, expected) => {
    const page = await open(id);
    expect(await headline(page)).toMatch(expected);
    expect(await headlineInFirstViewport(page)).toBe(true);
    await page.close();
  });

  it('the reflection screen lists a flat glass–air end at −14.4 dB beside its 14.4 dB return loss', async () => {
    const page = await open('reflection');
    const text = (await page.locator('main').innerText()).replace(/\s+/g, ' ');
    expect(text).toMatch(/Open glass–air end, cleaved flat [-−]14\.4\s*dB 14\.4\s*dB/);
    await page.close();
  });
});
