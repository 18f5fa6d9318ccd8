// The multimode launch-condition screens in real Chromium on the production build, at phone size: the verdict
// is read from the headline <output>, which is in view without scrolling; the physics behind it is computed in
// the worker (tests/physics/encircledFlux.test.ts checks the numbers themselves).
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { PHONE, newPage, openScreen, settled, sharedBrowser, watchForeignRequests } from './harness';

const shared = sharedBrowser();
const open = (id: string) => shared.open(id);

async function headline(page: Page): Promise<string> {
  await settled(page);
  return (await page.locator('output.headline').innerText()).replace(/\s+/g, ' ');
}

/** The headline's box lies inside the first screenful (360 × 740). */
async function headlineInView(page: Page): Promise<boolean> {
  const box = await page.locator('output.headline').boundingBox();
  return box !== null && box.y >= 0 && box.y + box.height <= PHONE.height;
}

describe('launch conditions, answer first', () => {
  it('the EF screen opens on an overfilled launch into OM3 at 850 nm and says "Overfilled" in the headline', async () => {
    const page = await open('encircled-flux');
    await expect.poll(() => headline(page), { timeout: 20_000 }).toMatch(/Overfilled/);
    expect(await headlineInView(page)).toBe(true);
    await page.close();
  });

  it('a centred single-mode launch reads "Underfilled" at 10 µm', async () => {
    const page = await open('encircled-flux');
    await page.selectOption('#ef-launch', 'single-mode');
    await expect.poll(() => headline(page), { timeout: 20_000 }).toMatch(/EF at 10\s*µm.*Underfilled/);
    await page.close();
  });

  it('typed group powers that are not numbers are explained beside the field, with no NaN anywhere', async () => {
    const page = await open('encircled-flux');
    await page.selectOption('#ef-launch', 'groups');
    await page.fill('#ef-groups', '1, x, 2');
    await expect.poll(() => page.locator('#ef-groups-err').innerText()).toMatch(/Power in each group: “x” \(group 2\)/);
    expect(await page.locator('main').innerText()).not.toMatch(/NaN|Infinity|undefined/);
    await page.close();
  });

  it('the mandrel screen names the groups it strips and the loss, in view', async () => {
    const page = await open('mode-filter-mandrel');
    await expect.poll(() => headline(page), { timeout: 20_000 }).toMatch(/Loss in the wrap \d+\.\d\d\s*dB.*Strips group/);
    expect(await headlineInView(page)).toBe(true);
    await page.close();
  });

  it('the offset screen moves from "Centre-heavy" to "Inside the cord range" with the example offset', async () => {
    const page = await open('offset-launch');
    await expect.poll(() => headline(page), { timeout: 20_000 }).toMatch(/Centre-heavy/);
    await page.getByRole('button', { name: /Example: a mode-conditioning cord/ }).click();
    await expect.poll(() => headline(page), { timeout: 20_000 }).toMatch(/Inside the cord range for this core \(10–16\sµm\)/);
    await page.close();
  });

  it('300 m of OM3 with 2.0 dB at 850 nm carries 10GBASE-SR, and no request leaves the app', async () => {
    const page = await newPage(shared.browser, { viewport: PHONE });
    const log = watchForeignRequests(page, new URL(shared.server.url).origin);
    await openScreen(page, shared.server.url, 'link-applications');
    await page.selectOption('#apps-loss', 'yes');
    await page.fill('#f-loss850', '2.0');
    await expect.poll(() => page.locator('main').innerText()).toMatch(/10GBASE-SR\s*✓ carried/);
    expect(await headline(page)).toMatch(/OM3/);
    expect(log.foreign).toEqual([]);
    await page.close();
  });
});
