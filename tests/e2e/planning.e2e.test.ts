// The planning calculators of issue 14 in real Chromium on the production build: a 1:32 PON at 20 km is judged
// against a named loss class and the verdict is read from the headline <output>; the WDM plan names the channel of
// a 1550.12 nm laser; both hand their result over as text and offer print.
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { PHONE, settled, sharedBrowser } from './harness';

const shared = sharedBrowser();
const open = (id: string) => shared.open(id, { clipboard: true });

async function headline(page: Page): Promise<string> {
  await settled(page);
  return (await page.locator('output.headline').innerText()).replace(/\s+/g, ' ');
}

async function copiedText(page: Page): Promise<string> {
  await page.getByRole('button', { name: 'Copy as text' }).click();
  await page.getByText('Copied.').waitFor();
  return page.evaluate(() => navigator.clipboard.readText());
}

async function printCalls(page: Page): Promise<number> {
  await page.evaluate(() => {
    const w = window as unknown as { printed: number; print: () => void };
    w.printed = 0;
    w.print = () => {
      w.printed++;
    };
  });
  await page.getByRole('button', { name: 'Print' }).click();
  return page.evaluate(() => (window as unknown as { printed: number }).printed);
}

describe('PON budget', () => {
  // Worked by hand: G.652.D at 1310 nm, 0.4 dB/km × 20 km = 8.0 dB; 1×32 typical 17.1 dB; 4 connector pairs ×
  // 0.5 dB and 6 splices × 0.1 dB (typical installed values) = 2.6 dB: 27.7 dB against the 28 dB maximum of class B+.
  it('a 1:32 network at 20 km fits class B+ with 0.30 dB to spare, and misses class B — read from the headline <output>', async () => {
    const page = await open('pon-budget');
    await page.selectOption('#pon-generation', 'G-PON');
    await page.selectOption('#pon-class', 'B+');
    await page.selectOption('#pon-stage-1-ratio', '32');
    await page.fill('#f-feederKm', '20');
    await page.fill('#f-farthestDropKm', '0');
    await page.fill('#f-nearestDropKm', '0');
    await expect.poll(() => headline(page)).toMatch(/Fits class B\+: 0\.30\s*dB to spare \(upstream at 1310 nm\)/);
    await expect(page.locator('output.headline').getAttribute('aria-live')).resolves.toBe('polite');

    await page.selectOption('#pon-class', 'B');
    await expect.poll(() => headline(page)).toMatch(/Does not fit class B: 2\.70\s*dB too much loss/);
    await page.close();
  });

  it('the headline stays in view at 360 × 740 while a field far down is edited', async () => {
    const page = await open('pon-budget');
    await page.locator('#f-reserveDb').scrollIntoViewIfNeeded();
    await page.fill('#f-reserveDb', '1');
    const box = await page.locator('output.headline').boundingBox();
    expect(box).not.toBeNull();
    expect(box!.y).toBeGreaterThanOrEqual(0);
    expect(box!.y + box!.height).toBeLessThanOrEqual(PHONE.height);
    await page.close();
  });

  it('a swapped nearest and farthest home is said beside the field, in its own words', async () => {
    const page = await open('pon-budget');
    await page.fill('#f-nearestDropKm', '5');
    await expect.poll(async () => (await page.locator('#f-nearestDropKm-err').innerText()).replace(/\s+/g, ' ')).toMatch(/^⚠ ?Distribution and drop, nearest home: type at most/);
    expect(await page.locator('main').innerText()).not.toMatch(/nearestDropKm|NaN/);
    await page.close();
  });

  it('copies the plan as text (verdict, both directions, sources) and offers print', async () => {
    const page = await open('pon-budget');
    const text = await copiedText(page);
    expect(text).toMatch(/^PON budget: G-PON class B\+, 1:32/);
    expect(text).toMatch(/Verdict: (Fits|Does not fit|Nearest home)/);
    expect(text).toMatch(/downstream 1490 nm: farthest/);
    expect(text).toMatch(/upstream 1310 nm: farthest/);
    expect(text).toMatch(/from memory/);
    expect(await printCalls(page)).toBe(1);
    await page.close();
  });
});

describe('WDM channel plan', () => {
  it('a 1550.12 nm laser is on the 100 GHz channel 193.4000 THz, n = 3', async () => {
    const page = await open('wdm-plan');
    await page.fill('#f-wavelengthNm', '1550.12');
    await expect.poll(() => headline(page)).toMatch(/193\.4000\s*THz.*n = 3, 1550\.12\s*nm/);
    await page.selectOption('#wdm-grid', 'cwdm');
    await expect.poll(() => headline(page)).toMatch(/1551\s*nm.*Channel 15/);
    await page.close();
  });

  it('copies the plan as text, with the free coarse channels, and offers print', async () => {
    const page = await open('wdm-plan');
    await page.getByRole('group', { name: 'CWDM channels in use' }).getByRole('button', { name: '15: 1551\u00a0nm' }).click();
    const text = await copiedText(page);
    expect(text).toMatch(/^WDM channel plan/);
    expect(text).toMatch(/CWDM 15 \(1551 nm\), in use/);
    expect(text).toMatch(/Free CWDM channels: 1 \(1271 nm\)/);
    expect(text).not.toMatch(/Free CWDM channels:.*15 \(1551 nm\)/);
    expect(await printCalls(page)).toBe(1);
    await page.close();
  });
});
