// Issue 8, browser fuzzing: every number field on every screen, in real Chromium on the
// production build, gets the hostile texts people type or paste on site. After each one:
// no uncaught exception, no "NaN" or "Infinity" on the screen, no markup brought to life,
// a plain-words explanation beside the field, and the last good result still shown and
// marked as not current. The good value is restored between hostile ones, and the screen
// must come back to a current result.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { BUILDS, PHONE, launchBrowser, newContext, startServer, waitForScreen, type StaticServer } from './harness';
import { FEATURES } from '../../src/features/registry';

/** Texts that are never a number: each must give an explanation beside the field. */
const NEVER_A_NUMBER: [label: string, text: string][] = [
  ['empty', ''],
  ['spaces', '    '],
  ['an overflowing exponent', '1e309'],
  ['hexadecimal', '0x10'],
  ['a list', '1,2,3'],
  ['10,000 characters', '9'.repeat(10_000)],
  ['markup', '<img src=x onerror="window.__pwned=1">'],
  ['emoji', '🔦📏'],
  ['right-to-left digits', '١٥٥٠'],
  ['right-to-left marks around digits', '\u202e1550\u202c'],
];

/** A text that may be a valid value in some fields (0 offset) and not in others (0 nm). */
const NEGATIVE_ZERO = '-0';

// Screens whose number fields are all in a form that opens on demand: the fiber types
// list shows only its search box until "add" is pressed (its form is fuzzed by the
// library's own validation tests). Every other screen has number fields at once.
const SCREENS = FEATURES.filter((f) => f.id !== 'library');

let browser: Browser;
let server: StaticServer;
let context: BrowserContext;
beforeAll(async () => {
  server = await startServer(BUILDS.current);
  browser = await launchBrowser();
  context = await newContext(browser, { viewport: PHONE });
});
afterAll(async () => {
  await context?.close();
  await browser?.close();
  await server?.close();
});

async function settle(page: Page): Promise<void> {
  // Two frames first: a worker-backed result only marks itself busy in an effect after the render.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(() => r(null)))));
  await page.waitForFunction(() => !document.querySelector('[aria-busy="true"]'), undefined, { timeout: 20_000 });
}

interface ScreenState {
  text: string;
  resultBodies: number;
  /** The text of every shown result, to tell a field that feeds no result from one that does. */
  resultText: string;
  staleMarks: number;
  fieldError: string | null;
  pwned: boolean;
  liveMarkup: number;
}

async function screenState(page: Page, fieldId: string): Promise<ScreenState> {
  return page.evaluate((id) => {
    const main = document.querySelector('main') as HTMLElement;
    return {
      text: main.innerText,
      resultBodies: main.querySelectorAll('.result-card .result-body').length,
      resultText: [...main.querySelectorAll('.result-card .result-body')].map((e) => (e as HTMLElement).innerText).join('\n'),
      staleMarks: main.querySelectorAll('.result-card .status-stale').length,
      fieldError: document.getElementById(`${id}-err`)?.textContent ?? null,
      pwned: (window as unknown as { __pwned?: unknown }).__pwned !== undefined,
      liveMarkup: main.querySelectorAll('img[src="x"]').length,
    };
  }, fieldId);
}

const NOT_A_NUMBER_ON_SCREEN = /\bNaN\b|Infinity/;

/** Every visible number field on the page gets every hostile text; returns the problems found. */
async function fuzzNumberFields(page: Page): Promise<string[]> {
  const fieldIds = await page.$$eval('main .field input[inputmode="decimal"]', (els) => els.map((e) => e.id).filter(Boolean));
  expect(fieldIds.length, 'the screen has number fields').toBeGreaterThan(0);
  const problems: string[] = [];
  // Fields known to feed a result: any whose hostile text marked a result as not current at least once.
  const feedsResults = new Set<string>();

  for (const fieldId of fieldIds) {
    const field = page.locator(`#${fieldId}`);
    if (!(await field.isVisible())) continue;
    const good = await field.inputValue();
    const before = await screenState(page, fieldId);
    expect(before.resultBodies, `${fieldId}: a result is shown for the default "${good}"`).toBeGreaterThan(0);
    expect(before.staleMarks, `${fieldId}: the default result is current`).toBe(0);

    for (const [label, text] of NEVER_A_NUMBER) {
      await field.fill(text);
      await settle(page);
      const s = await screenState(page, fieldId);
      const where = `${fieldId} given ${label}`;
      if (s.staleMarks > 0) feedsResults.add(fieldId);
      if (!s.fieldError || s.fieldError.trim().length < 10) problems.push(`${where}: no explanation beside the field`);
      if (s.resultBodies < before.resultBodies) problems.push(`${where}: a result disappeared (${before.resultBodies} → ${s.resultBodies})`);
      // A field that feeds no result card (e.g. the wavelength that only sets the laser-hazard
      // context) leaves every result as it was; any other must mark its kept result.
      if (s.staleMarks === 0 && s.resultText !== before.resultText) problems.push(`${where}: a result changed but is not marked as not current`);
      if (s.staleMarks === 0 && s.resultText === before.resultText && feedsResults.has(fieldId)) problems.push(`${where}: the kept result is not marked as not current`);
      if (NOT_A_NUMBER_ON_SCREEN.test(s.text)) problems.push(`${where}: the screen shows ${s.text.match(NOT_A_NUMBER_ON_SCREEN)?.[0]}`);
      if (s.pwned || s.liveMarkup > 0) problems.push(`${where}: markup came to life`);
    }

    // "-0" is either a valid 0 (then the result is current) or explained beside the field.
    await field.fill(NEGATIVE_ZERO);
    await settle(page);
    const z = await screenState(page, fieldId);
    if (NOT_A_NUMBER_ON_SCREEN.test(z.text)) problems.push(`${fieldId} given -0: the screen shows NaN or Infinity`);
    if (z.staleMarks > 0 && !z.fieldError && !/⚠/.test(z.text)) problems.push(`${fieldId} given -0: result not current and no explanation`);

    await field.fill(good);
    await settle(page);
    const back = await screenState(page, fieldId);
    if (back.fieldError) problems.push(`${fieldId}: restoring "${good}" still shows an error: ${back.fieldError}`);
    if (back.staleMarks > 0) problems.push(`${fieldId}: restoring "${good}" leaves the result marked not current`);
  }
  return problems;
}

describe.each(SCREENS.map((f) => ({ id: f.id, title: f.title })))('hostile input on the $title screen', ({ id }) => {
  it('every number field explains bad text beside it and keeps the last good result, marked not current', async () => {
    const page = await context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (e) => pageErrors.push(e.message));
    try {
      await page.goto(`${server.url}#/${id}`);
      await waitForScreen(page);
      await settle(page);
      const problems = await fuzzNumberFields(page);
      expect(problems, 'problems found').toEqual([]);
      expect(pageErrors, 'uncaught exceptions in the page').toEqual([]);
    } finally {
      await page.close();
    }
  });
});

describe('hostile input in the fiber picker', () => {
  // The picker's own fields appear when a person types a fiber instead of choosing a category.
  it.each([
    ['typed values (core diameter and NA)', 'typed'],
    ['a label (cutoff and mode field diameter)', 'label'],
  ])('on the single-mode check, the fields for %s explain bad text and keep the last good result', async (_words, source) => {
    const page = await context.newPage();
    const pageErrors: string[] = [];
    page.on('pageerror', (e) => pageErrors.push(e.message));
    try {
      await page.goto(`${server.url}#/single-mode`);
      await waitForScreen(page);
      await page.selectOption('#single-mode-source', source);
      await settle(page);
      const problems = await fuzzNumberFields(page);
      expect(problems, 'problems found').toEqual([]);
      expect(pageErrors, 'uncaught exceptions in the page').toEqual([]);
    } finally {
      await page.close();
    }
  });
});
