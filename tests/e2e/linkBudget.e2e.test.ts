// The link budget in real Chromium on the production build, as a technician uses it on a 360 px phone:
// an equipment power budget in dB instead of levels, one verdict per wavelength chosen, signed fields
// that take every minus a phone can type, a bad row marked at its own field, one clean copied report,
// and the budget on one printed page.
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { newContext, openScreen, PHONE, settled, sharedBrowser } from './harness';

const shared = sharedBrowser();

async function open(): Promise<Page> {
  const context = await newContext(shared.browser, { viewport: PHONE });
  await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: shared.server.origin });
  const page = await context.newPage();
  page.once('close', () => void context.close().catch(() => undefined));
  await openScreen(page, shared.server.url, 'link-budget');
  return page;
}

/** The headline <output>, with no-break spaces read as spaces. */
async function headline(page: Page): Promise<string> {
  await settled(page);
  return ((await page.locator('output.headline').innerText()) ?? '').replace(/\u00a0/g, ' ').replace(/\s+/g, ' ').trim();
}

async function verdictLines(page: Page): Promise<string[]> {
  await settled(page);
  return (await page.locator('output.headline .answer-line').allInnerTexts()).map((t) => t.replace(/\u00a0/g, ' ').replace(/\s+/g, ' ').trim());
}

// The default link, worked by hand with the TIA-568.3-D maxima the rule set states (0.75 dB per mated pair,
// 0.3 dB per splice, 0.5 dB/km outside-plant single-mode cable at 1310 and 1550 nm; values from memory, see
// src/physics/linkBudget.ts): 18.5 km × 0.5 = 9.25 dB, 4 pairs 3.00 dB, 6 splices 1.80 dB; no patch cords:
// highest loss 14.05 dB at each wavelength.
const HIGHEST_LOSS_DB = 14.05;

describe('link budget against the equipment', () => {
  it('takes a power budget in dB instead of levels and gives one verdict per wavelength with the margin in dB', async () => {
    const page = await open();
    await page.fill('#f-patchCords', '0');
    expect(await page.locator('#lb-equipment').inputValue()).toBe('budget');
    await page.fill('#f-powerBudgetDb', '20');
    // 20 − 14.05 − 3 (design margin) = 2.95 dB to spare.
    await expect.poll(() => verdictLines(page)).toEqual(['✓ Fits at 1310 nm, 2.95 dB to spare', '✓ Fits at 1550 nm, 2.95 dB to spare']);
    // The design margin is not neutral: said next to the answer.
    expect(await headline(page)).toMatch(/3\.0 dB design margin kept in hand/);
    // 12 dB cannot carry 14.05 dB: short by 2.05 dB (margin aside).
    await page.fill('#f-powerBudgetDb', '12');
    await expect.poll(() => verdictLines(page)).toEqual(['✗ Short at 1310 nm by 2.05 dB', '✗ Short at 1550 nm by 2.05 dB']);
    // 16 dB carries the loss but not all of the margin: 16 − 14.05 − 3 = −1.05 dB.
    await page.fill('#f-powerBudgetDb', '16');
    await expect.poll(() => headline(page)).toMatch(/Works at 1310 nm, but 1\.05 dB short of the 3\.0 dB design margin/);
    // No word twice in a row ("Fails: Fails", "dB dB").
    expect(await headline(page)).not.toMatch(/\b(\w+)\s+\1\b/i);
    expect(HIGHEST_LOSS_DB).toBeCloseTo(9.25 + 3 + 1.8, 10);
    await page.close();
  });

  it('checks only the wavelengths ticked: 1310 nm alone gives one verdict', async () => {
    const page = await open();
    await expect.poll(() => verdictLines(page).then((l) => l.length)).toBe(2);
    await page.getByRole('checkbox', { name: '1550 nm' }).uncheck();
    await expect.poll(() => verdictLines(page)).toHaveLength(1);
    const lines = await verdictLines(page);
    expect(lines[0]).toMatch(/1310 nm/);
    expect(await headline(page)).not.toMatch(/1550/);
    // 1625 nm on request: the rule set has no cable allowance there, and the screen says what it used and why.
    await page.getByRole('checkbox', { name: '1625 nm' }).check();
    await expect.poll(() => verdictLines(page)).toHaveLength(2);
    const details = (await page.locator('.lb-details').innerText()).replace(/\u00a0/g, ' ');
    expect(details).toMatch(/gives a cable allowance only at 1310 nm and 1550 nm, so at 1625 nm the fiber type’s own 0\.4 dB\/km is used/);
    await page.close();
  });

  it('a signed dBm field reads −3 (minus sign), –3 (en dash) and -3 (hyphen) as the same value', async () => {
    const page = await open();
    await page.selectOption('#lb-equipment', 'levels');
    await page.fill('#f-patchCords', '0');
    await page.fill('#f-txMaxDbm', '0');
    await page.fill('#f-rxSensitivityDbm', '-23');
    const seen: string[] = [];
    for (const typed of ['\u22123', '\u20133', '-3']) {
      await page.fill('#f-txMinDbm', typed);
      // −3 − (−23) = 20 dB budget; 20 − 14.05 − 3 = 2.95 dB to spare.
      await expect.poll(() => verdictLines(page), { message: `typed ${JSON.stringify(typed)}` }).toContain('✓ Fits at 1310 nm, 2.95 dB to spare');
      expect(await page.locator('#f-txMinDbm').getAttribute('aria-invalid')).toBeNull();
      seen.push(await headline(page));
    }
    expect(new Set(seen).size).toBe(1);
    await page.close();
  });

  it('a negative section length is marked at its own row, in words naming the row', async () => {
    const page = await open();
    await page.fill('#section-2', '-2');
    await expect.poll(() => page.locator('#section-2').getAttribute('aria-invalid')).toBe('true');
    expect(await page.locator('#section-1').getAttribute('aria-invalid')).toBeNull();
    const said = (await page.locator('#section-2-err').innerText()).replace(/\u00a0/g, ' ');
    expect(said).toMatch(/^⚠ ?Section 2 length: type a length of 0 km or more/);
    // The headline points to the field instead of saying it twice, and no internal name reaches the screen.
    expect(await headline(page)).toMatch(/Check the field marked ⚠/);
    expect(await page.locator('main').innerText()).not.toMatch(/section-\d|lengthKm|elements\[|Row \d/);
    await page.close();
  });

  it('the copied report has one title and the Inputs, Results and Assumptions headings once each', async () => {
    const page = await open();
    await expect.poll(() => verdictLines(page).then((l) => l.length)).toBe(2);
    await page.getByRole('button', { name: 'Copy as text' }).click();
    await expect.poll(() => page.locator('[role="status"]:has-text("Copied."), textarea[aria-label="Result as text"]').count()).toBeGreaterThan(0);
    const text =
      (await page.locator('textarea[aria-label="Result as text"]').count()) > 0
        ? await page.locator('textarea[aria-label="Result as text"]').inputValue()
        : await page.evaluate(() => navigator.clipboard.readText());
    const lines = text.split('\n');
    expect(lines[0]).toBe('Link loss budget');
    expect(lines[1]).toMatch(/^=+$/);
    expect(lines.filter((l) => l === 'Link loss budget')).toHaveLength(1);
    for (const heading of ['Inputs', 'Results', 'Assumptions']) expect(lines.filter((l) => l === heading), heading).toHaveLength(1);
    // No empty bullet and no second report nested inside.
    expect(lines.filter((l) => /^\s*-\s*$/.test(l))).toEqual([]);
    expect(text).not.toMatch(/Sources and assumptions:|^At \d+ nm$/m);
    expect(text).toMatch(/Equipment at 1310 nm: Fits at 1310 nm, \d+\.\d\d dB to spare/);
    await page.close();
  });

  it('prints on one page', async () => {
    const page = await open();
    await expect.poll(() => verdictLines(page).then((l) => l.length)).toBe(2);
    await page.emulateMedia({ media: 'print' });
    const pdf = (await page.pdf({ format: 'A4', printBackground: false })).toString('latin1');
    const pages = pdf.match(/\/Type\s*\/Page\b/g) ?? [];
    expect(pages.length).toBe(1);
    await page.close();
  });
});
