// Field tools in real Chromium on the production build: the screens where optical power is entered show a
// compact caution line, the laser-safety screen the full cautions first and the hazard context once; no screen
// text suggests a level is all right to look at or says a sentence twice; the dispersion screen draws D(λ).
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { settled, sharedBrowser } from './harness';

// Same list as tests/physics/laserSafety.test.ts: phrasing that would suggest a power is all right to look at.
const FORBIDDEN = /safe to (look|view|stare|see)|eye[- ]?safe|harmless|no (eye )?hazard|safe for (the )?eyes?|\bis safe\b|\bare safe\b|safe level|safely (look|view)/i;

const shared = sharedBrowser();
const open = (id: string) => shared.open(id);

async function mainText(page: Page): Promise<string> {
  await settled(page);
  return (await page.locator('main').innerText()).replace(/\s+/g, ' ');
}

describe('screens where optical power is entered show the cautions', () => {
  it.each(['power', 'link-budget'])('%s shows the compact caution line with a link to the full cautions, not a second copy of them', async (id) => {
    const page = await open(id);
    const line = page.locator('p.caution-line');
    await expect(line.count()).resolves.toBe(1);
    expect(await line.locator('a').getAttribute('href')).toBe('#/laser-safety');
    expect(await page.locator('section.safety-cautions').count()).toBe(0);
    const bad = FORBIDDEN.exec(await mainText(page));
    expect(bad?.[0], `forbidden phrase on ${id}`).toBeUndefined();
    await page.close();
  });

  it('the laser-safety screen puts the full cautions first, then the hazard context and who governs', async () => {
    const page = await open('laser-safety');
    const cautions = page.locator('section.safety-cautions');
    await expect(cautions.count()).resolves.toBe(1);
    const text = (await cautions.innerText()).replace(/\s+/g, ' ');
    expect(text).toMatch(/Never look into a fiber end/);
    expect(text).toMatch(/inspection scope/);
    // Cautions before the fields and before the context.
    const order = await page.evaluate(() => {
      const c = document.querySelector('section.safety-cautions')!;
      const f = document.querySelector('#f-powerDbm')!;
      const h = [...document.querySelectorAll('section.result-card')].find((s) => s.getAttribute('aria-label') === 'Hazard context')!;
      return [c.compareDocumentPosition(f) & Node.DOCUMENT_POSITION_FOLLOWING, c.compareDocumentPosition(h) & Node.DOCUMENT_POSITION_FOLLOWING];
    });
    expect(order.every((x) => x !== 0)).toBe(true);
    const all = await mainText(page);
    expect(all).toMatch(/infrared: invisible/);
    expect(all).toMatch(/IEC 60825-2/);
    expect(all).toMatch(/adopted locally/);
    // The headline gives the context in words, never a clearance.
    const head = (await page.locator('output.headline').innerText()).replace(/\s+/g, ' ');
    expect(head).toMatch(/Hazard level not stated here: look it up in IEC 60825-2 as adopted locally/);
    expect(head).not.toMatch(/safe/i);
    // The frame's own disclaimer ("it never tells you that a level is safe to look at") is a negation: left out of the scan.
    const bad = FORBIDDEN.exec(all.replace(/[^.]*\bnever tells you\b[^.]*\./g, ''));
    expect(bad?.[0], 'forbidden phrase on laser-safety').toBeUndefined();
    await page.close();
  });

  it.each(['laser-safety', 'power', 'link-budget'])('%s says no sentence twice and starts none in lower case mid-thought', async (id) => {
    const page = await open(id);
    if (id === 'laser-safety') await page.fill('#f-powerDbm', '30 dBm');
    await page.waitForTimeout(50);
    // Each line and table cell of the screen as laid out, cut into sentences; short labels ("Remove") are not sentences.
    const text = (await page.locator('main').innerText()).replace(/\u00a0/g, ' ');
    const sentences = text
      .split(/\n|\t/)
      .flatMap((b) => b.split(/(?<=[.!?])\s+(?=[A-Z0-9⚠✓✗!−])/))
      .map((x) => x.replace(/\s+/g, ' ').trim())
      .filter((x) => x.split(' ').length >= 4);
    const seen = new Map<string, number>();
    for (const x of sentences) seen.set(x, (seen.get(x) ?? 0) + 1);
    const twice = [...seen].filter(([, n]) => n > 1).map(([x]) => x);
    expect(twice, `sentences said twice on ${id}`).toEqual([]);
    const lower = sentences.filter((x) => /^[a-z]/.test(x) && !/^(e\.g|i\.e)/.test(x));
    expect(lower, `fragments starting in lower case on ${id}`).toEqual([]);
    await page.close();
  });

  it('the laser-safety screen gives indicative level 4 for 1 W at 1550 nm, with the edition', async () => {
    const page = await open('laser-safety');
    await page.fill('#f-powerDbm', '30 dBm');
    await expect.poll(() => mainText(page)).toMatch(/Indicative: 1000 mW is at or above the 500 mW upper limit of class 3B, so the hazard level is 4/);
    expect((await page.locator('output.headline').innerText()).replace(/\s+/g, ' ')).toMatch(/Indicative hazard level 4/);
    expect(await mainText(page)).toMatch(/IEC 60825-2:2021/);
    await page.close();
  });

  it('the power screen converts −3 dBm to 0.50119 mW in the headline and shows the chain', async () => {
    const page = await open('power');
    const head = (await page.locator('output.headline').innerText()).replace(/\u00a0/g, ' ');
    expect(head).toMatch(/0\.50119 mW/);
    // −3 − (0.6 + 10.5 + 3.5) = −17.60 dBm (definition of the decibel: losses in series add).
    expect(head).toMatch(/−17\.60 dBm/);
    expect(await mainText(page)).toMatch(/End power/);
    await page.close();
  });

  it('the power screen says beside the field that "0.5 milliwatt" is not a power it reads, and shows no answer for it', async () => {
    const page = await open('power');
    await page.fill('#f-powerDbm', '0.5 milliwatt');
    await expect.poll(() => page.locator('#f-powerDbm').getAttribute('aria-invalid')).toBe('true');
    const said = await page.locator('#f-powerDbm-err').innerText();
    expect(said).toMatch(/^⚠ ?Optical power: type a number in dBm/);
    expect(said).not.toMatch(/powerDbm/);
    const head = (await page.locator('output.headline').innerText()).replace(/\u00a0/g, ' ');
    expect(head).toMatch(/Not current|Check the field marked/);
    expect(head).not.toMatch(/\b0\.5 dBm/);
    await page.close();
  });

  it('a power-chain step takes a gain as a negative loss typed with any minus, marked at its own row when it is not a number', async () => {
    const page = await open('power');
    await page.fill('#step-3-loss', '-3');
    // −3 − (0.6 + 10.5 − 3) = −11.10 dBm.
    await expect.poll(async () => (await page.locator('output.headline').innerText()).replace(/\u00a0/g, ' ')).toMatch(/−11\.10 dBm/);
    await page.fill('#step-2-loss', 'lots');
    await expect.poll(() => page.locator('#step-2-loss').getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#step-2-loss-err').innerText()).toMatch(/Step 2 loss: type a loss in dB/);
    expect(await mainText(page)).not.toMatch(/step-\d|lossDb|steps\[/);
    await page.close();
  });
});

describe('dispersion screen', () => {
  it('draws D(λ) over 1200–1650 nm and finds λ0 for a typed standard-like fiber', async () => {
    const page = await open('dispersion');
    // A chosen fiber folds to one line: open it to change the fiber.
    if (!(await page.locator('#dispersion-source').isVisible())) await page.locator('.fiber-picker .picker-summary').first().click();
    await page.selectOption('#dispersion-source', 'typed');
    await page.fill('#f-dispersion-coreDiameterUm', '8.2');
    await page.fill('#f-dispersion-na', '0.123');
    await expect.poll(() => mainText(page)).toMatch(/Zero-dispersion wavelength \d{4}\.\d nm/);
    expect(await page.locator('main svg').count()).toBeGreaterThan(0);
    expect(await mainText(page)).toMatch(/Chromatic dispersion D\(λ\)/);
    await page.close();
  });
});
