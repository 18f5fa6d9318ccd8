// Issue 8, browser fuzzing in real Chromium on the production build: every text input on every screen of
// FEATURES (and the fields the fiber picker reveals for typed values and label values) gets each hostile text
// a person types or pastes on site (the picker's fields in full once, then four kinds on the other screens). After each: no uncaught exception (pageerror), no "NaN" or "Infinity" on
// the screen, no markup brought to life, a plain-words explanation beside a number field that cannot read it,
// and the last good result kept — marked "Not current…" wherever the field feeds it. The good value is put
// back between hostile ones and the result must be current again. One page per screen, reused throughout.
// The library's form is fuzzed through its Save button: every refusal is explained and no record is written.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { BUILDS, PHONE, launchBrowser, newContext, startServer, waitForScreen, type StaticServer } from './harness';
import { FEATURES } from '../../src/features/registry';
import { DB_NAME } from '../../src/fibers/db';

/** Hostile texts; `number: false` marks the one that may legitimately read as a number (−0 → 0). */
const HOSTILE: { label: string; text: string; number?: boolean }[] = [
  { label: 'empty', text: '' },
  { label: 'only spaces', text: '   ' },
  { label: '1e309 (beyond a double)', text: '1e309' },
  { label: '-0', text: '-0', number: true },
  { label: 'hexadecimal 0x10', text: '0x10' },
  { label: 'a list 1,2,3', text: '1,2,3' },
  { label: '10,000 characters', text: '7'.repeat(10_000) },
  { label: 'markup', text: '<img src=x onerror="window.__pwned=1">' },
  { label: 'emoji', text: '🔥📏' },
  { label: 'Arabic-Indic digits', text: '١٥٥٠' },
  { label: 'right-to-left marks', text: '\u200f1550\u200f' },
];
/** Texts no fiber-type name may be (the others are fair names: "1,2,3", emoji and Arabic-Indic digits are). */
const NEVER_A_NAME = new Set(['empty', 'only spaces', '10,000 characters', 'markup']);
const SHOWS_NOT_A_NUMBER = /\bNaN\b|Infinity|undefined|\[object /;
/** A developer's argument name (fromADb, bendRadiusMm, elements[0].lengthKm) once the trade's own words are set aside. */
const INTERNAL_NAME = /\b[a-z]+[A-Z][A-Za-z0-9]*\b|\w+\[\d+\]\.\w+/;
const TRADE_WORDS = /\b(dBm?|mW|µW|nW|kHz|MHz|GHz|THz)\b/g;
/** Picker sources that reveal number fields of their own. */
const PICKER_SOURCES = ['typed', 'label'];

let browser: Browser;
let server: StaticServer;
let context: BrowserContext;
beforeAll(async () => {
  server = await startServer(BUILDS.current);
  browser = await launchBrowser();
  context = await newContext(browser, { viewport: PHONE });
  await context.addInitScript(installFuzzProbe);
});
afterAll(async () => {
  await context?.close();
  await browser?.close();
  await server?.close();
});

interface Snapshot {
  text: string;
  results: number;
  resultText: string;
  stale: number;
  fieldError: string;
  invalid: boolean;
  pwned: boolean;
  liveImages: number;
  /** Still computing, or its text still changing, after 20 s. */
  stuck: boolean;
}

interface FuzzProbe {
  settle(): Promise<boolean>;
  snapshot(fieldId: string): Snapshot;
  type(fieldId: string, texts: string[]): Promise<Snapshot[]>;
}

/**
 * Put into every page before the app: the screen is read, and texts are typed, in the page itself, so
 * each hostile text costs a few frames and no round trip to the test. A text is put in as the browser does
 * for a paste (the value set, then an "input" event), with the folded fiber choice opened first, as a
 * person taps it open to type.
 */
function installFuzzProbe(): void {
  const nextFrame = () => new Promise<void>((r) => requestAnimationFrame(() => setTimeout(r, 0)));
  const settle = async (): Promise<boolean> => {
    // Settled: not computing, and the screen's text the same two frames running. The render of a typed text
    // comes in a task after the event (src/main.tsx), hence the timer first; a worker-backed result marks
    // itself busy only in an effect after the next frame; the details band catches up a step per frame; and a
    // plot fits itself to its figure's width when a frame's layout reports it. The same wait, for a test
    // outside the page, is settled() in harness.ts: this copy runs inside the page and cannot import it.
    await new Promise((r) => setTimeout(r, 0));
    const main = () => (document.querySelector('main') as HTMLElement | null)?.innerText ?? '';
    let last: string | undefined;
    const until = performance.now() + 20_000;
    for (;;) {
      await nextFrame();
      if (performance.now() > until) return false;
      if (document.querySelector('[aria-busy="true"]')) {
        last = undefined;
        continue;
      }
      const now = main();
      if (now === last) return true;
      last = now;
    }
  };
  const snapshot = (fieldId: string): Snapshot => {
    const main = document.querySelector('main') as HTMLElement;
    const input = document.getElementById(fieldId);
    const field = input?.closest('.field');
    // The headline <output> counts as a result beside the cards below it.
    const results = [...main.querySelectorAll<HTMLElement>('.result-card .result-body, .answer-line')];
    return {
      text: main.innerText,
      results: results.length,
      resultText: results.map((e) => e.innerText).join('\n'),
      stale: main.querySelectorAll('.result-card .status-stale, .answer-stale').length,
      fieldError: (field?.querySelector('.field-error[role="alert"]') as HTMLElement | null)?.innerText ?? '',
      invalid: input?.getAttribute('aria-invalid') === 'true',
      pwned: (window as unknown as { __pwned?: unknown }).__pwned !== undefined,
      liveImages: document.querySelectorAll('img[src="x"]').length,
      stuck: false,
    };
  };
  const type = async (fieldId: string, texts: string[]): Promise<Snapshot[]> => {
    const out: Snapshot[] = [];
    for (const text of texts) {
      document.querySelectorAll<HTMLDetailsElement>('main details.fiber-picker').forEach((d) => (d.open = true));
      const input = document.getElementById(fieldId) as HTMLInputElement | HTMLTextAreaElement | null;
      if (!input) throw new Error(`#${fieldId} is gone from the page`);
      input.focus();
      const setValue = Object.getOwnPropertyDescriptor(Object.getPrototypeOf(input), 'value')!.set!;
      setValue.call(input, text);
      input.dispatchEvent(new InputEvent('input', { bubbles: true, inputType: 'insertFromPaste', data: text }));
      const settled = await settle();
      out.push({ ...snapshot(fieldId), stuck: !settled });
    }
    return out;
  };
  (window as unknown as { __fuzz: FuzzProbe }).__fuzz = { settle, snapshot, type };
}

const probe = (page: Page) => ({
  settle: () => page.evaluate(() => (window as unknown as { __fuzz: FuzzProbe }).__fuzz.settle()),
  snapshot: (id: string) => page.evaluate((fieldId) => (window as unknown as { __fuzz: FuzzProbe }).__fuzz.snapshot(fieldId), id),
  type: (id: string, texts: string[]) => page.evaluate(([fieldId, t]) => (window as unknown as { __fuzz: FuzzProbe }).__fuzz.type(fieldId, t), [id, texts] as const),
});

async function settle(page: Page): Promise<void> {
  expect(await probe(page).settle(), "the screen settles within 20 s").toBe(true);
}

/** Ids of the visible text inputs in main (number fields and any other typed text). */
async function visibleInputs(page: Page): Promise<{ id: string; number: boolean }[]> {
  const all = await page.$$eval('main input:not([type]), main input[type="text"], main input[type="search"], main textarea', (els) =>
    els.map((e) => ({ id: e.id, number: e.hasAttribute('data-number'), shown: (e as HTMLElement).offsetParent !== null })),
  );
  return all.filter((f) => f.id && f.shown).map(({ id, number }) => ({ id, number }));
}

let inputsTried = 0;

/**
 * The fiber choice is one shared component on many screens: each of its fields gets every hostile text on
 * the first screen that shows it, which tries its reading of text in full. On the other screens the field
 * gets the texts that reach the screen in different ways: a refusal (empty), a number beyond a double, an
 * edge value that reads as a number (−0), and markup that an explanation could echo.
 */
const PICKER_FIELD_TEXTS = HOSTILE.filter((h) => ['empty', '1e309 (beyond a double)', '-0', 'markup'].includes(h.label));
if (PICKER_FIELD_TEXTS.length !== 4) throw new Error('PICKER_FIELD_TEXTS names a hostile text that is not in HOSTILE');
const pickerFieldsTriedInFull = new Set<string>();

/** A fiber choice's fields: their ids start with `prefix`; `source` is how the fiber is given. */
interface PickerFields {
  prefix: string;
  source: string;
}

/** Every hostile text into every visible input; returns the problems found (empty = all promises kept). */
async function fuzzInputs(page: Page, where: string, done: Set<string>, picker?: PickerFields): Promise<string[]> {
  const problems: string[] = [];
  const { snapshot, type } = probe(page);
  for (const { id, number } of await visibleInputs(page)) {
    if (done.has(id)) continue;
    done.add(id);
    let texts = HOSTILE;
    if (picker && id.startsWith(picker.prefix)) {
      const role = `${picker.source}:${id.slice(picker.prefix.length)}`;
      if (pickerFieldsTriedInFull.has(role)) texts = PICKER_FIELD_TEXTS;
      else pickerFieldsTriedInFull.add(role);
    }
    const good = await page.locator(`#${id}`).inputValue();
    const before = await snapshot(id);
    const after = await type(id, texts.map((h) => h.text));
    inputsTried += after.length;
    texts.forEach((h, i) => {
      const s = after[i]!;
      const at = `${where} #${id} given ${h.label}`;
      if (s.stuck) problems.push(`${at}: still computing or changing after 20 s`);
      if (SHOWS_NOT_A_NUMBER.test(s.text)) problems.push(`${at}: the screen shows "${s.text.match(SHOWS_NOT_A_NUMBER)![0]}"`);
      const internal = s.text.replace(TRADE_WORDS, '').match(INTERNAL_NAME);
      if (internal) problems.push(`${at}: the screen shows the internal name "${internal[0]}"`);
      if (s.pwned || s.liveImages > 0) problems.push(`${at}: markup came to life`);
      if (s.results < before.results) problems.push(`${at}: a result disappeared (${before.results} → ${s.results})`);
      const refused = s.fieldError !== '' || s.invalid;
      if (number && !h.number && !refused) problems.push(`${at}: accepted as a number, or refused without a word beside the field`);
      if (refused && s.fieldError.trim().length < 10) problems.push(`${at}: marked invalid but not explained beside the field`);
      // The kept result is marked "Not current…" unless this field feeds no result (then nothing changed).
      if (refused && before.results > 0 && s.stale === 0 && s.resultText !== before.resultText) problems.push(`${at}: result changed but is not marked as not current`);
      if (s.stale > 0 && !/Not current/.test(s.text)) problems.push(`${at}: stale result without the words "Not current"`);
    });
    const [back] = await type(id, [good]);
    if (back!.fieldError || back!.invalid) problems.push(`${where} #${id}: restoring "${good}" still shows "${back!.fieldError}"`);
    if (back!.stale > before.stale) problems.push(`${where} #${id}: restoring "${good}" leaves the result not current`);
    if (back!.resultText !== before.resultText) problems.push(`${where} #${id}: restoring "${good}" does not give the same result again`);
  }
  return problems;
}

async function openPage(id: string): Promise<{ page: Page; errors: string[] }> {
  const page = await context.newPage();
  const errors: string[] = [];
  page.on('pageerror', (e) => errors.push(e.message));
  await page.goto(`${server.url}#/${id}`);
  await waitForScreen(page);
  await settle(page);
  return { page, errors };
}

const CALCULATORS = FEATURES.filter((f) => f.id !== 'library');

describe.each(CALCULATORS.map((f) => ({ id: f.id, title: f.title })))('hostile text on the $title screen', ({ id, title }) => {
  it('every input survives every hostile text: explained, no NaN, last good result kept and marked not current', { timeout: 600_000 }, async () => {
    const { page, errors } = await openPage(id);
    try {
      const done = new Set<string>();
      const problems = await fuzzInputs(page, title, done);
      // The fiber picker's own fields, for a fiber typed in and for label values (the folded picker opened first).
      await page.$$eval('main details.fiber-picker', (ds) => ds.forEach((d) => ((d as HTMLDetailsElement).open = true)));
      await settle(page);
      for (const select of await page.$$eval('main select[id$="-source"]', (els) => els.map((e) => e.id))) {
        const sources = await page.$$eval(`#${select} option`, (os) => os.map((o) => (o as HTMLOptionElement).value));
        for (const source of sources.filter((s) => PICKER_SOURCES.includes(s))) {
          await page.selectOption(`#${select}`, source);
          await settle(page);
          const prefix = `f-${select.replace(/-source$/, '')}-`;
          problems.push(...(await fuzzInputs(page, `${title} (${select} = ${source})`, done, { prefix, source })));
        }
      }
      expect(done.size, 'the screen has inputs to fuzz').toBeGreaterThan(0);
      expect(problems, 'problems found').toEqual([]);
      expect(errors, 'uncaught exceptions in the page').toEqual([]);
    } finally {
      await page.close();
    }
  });
});

async function libraryCount(page: Page): Promise<number> {
  return page.evaluate(
    (name) =>
      new Promise<number>((resolve, reject) => {
        const req = indexedDB.open(name);
        req.onerror = () => reject(req.error);
        req.onsuccess = () => {
          const db = req.result;
          const tx = db.transaction('fiberTypes', 'readonly');
          const c = tx.objectStore('fiberTypes').count();
          c.onsuccess = () => {
            db.close();
            resolve(c.result);
          };
          c.onerror = () => reject(c.error);
        };
      }),
    DB_NAME,
  );
}

describe('hostile text in the fiber library form', () => {
  it('each form field refuses each hostile text with an explanation on Save, and nothing is written', { timeout: 600_000 }, async () => {
    const { page, errors } = await openPage('library');
    try {
      await page.getByRole('button', { name: 'Add a fiber type' }).click();
      await page.locator('#ff-name').waitFor();
      const before = await libraryCount(page);
      const fields = (await visibleInputs(page)).filter((f) => f.id.startsWith('ff-') && f.id !== 'ff-notes');
      expect(fields.length).toBeGreaterThan(3);
      // A valid step-index type first, so that a refusal can only come from the field under test.
      await page.locator('#ff-name').fill('Fuzz reference reel');
      await page.locator('#ff-core').fill('8.2');
      await page.locator('#ff-na').fill('0.14');
      const problems: string[] = [];
      for (const { id } of fields) {
        const field = page.locator(`#${id}`);
        const good = await field.inputValue();
        for (const h of HOSTILE) {
          // An optional field (empty by default) may be left empty or blank: that is its good value.
          if (good === '' && h.text.trim() === '') continue;
          // "-0" can be a fair 0 (an attenuation); a name may be "1,2,3" or emoji: only what no name may be is tried.
          if (h.number) continue;
          if (id === 'ff-name' && !NEVER_A_NAME.has(h.label)) continue;
          await field.fill(h.text);
          inputsTried++;
          await page.getByRole('button', { name: 'Save', exact: true }).click();
          await settle(page);
          const text = await page.locator('main').innerText();
          if (SHOWS_NOT_A_NUMBER.test(text)) problems.push(`#${id} given ${h.label}: the screen shows "${text.match(SHOWS_NOT_A_NUMBER)![0]}"`);
          if (await page.evaluate(() => (window as unknown as { __pwned?: unknown }).__pwned !== undefined || !!document.querySelector('img[src="x"]'))) problems.push(`#${id} given ${h.label}: markup came to life`);
          const stillInForm = await page.locator('#ff-name').isVisible();
          if (!stillInForm) {
            problems.push(`#${id} given ${h.label}: saved a fiber type`);
            break;
          }
          const alerts = await page.locator('form [role="alert"]').allInnerTexts();
          if (alerts.join(' ').trim().length < 10 && !h.number) problems.push(`#${id} given ${h.label}: not saved, but no explanation`);
        }
        if (!(await page.locator('#ff-name').isVisible())) break;
        await field.fill(good);
      }
      if (await page.locator('#ff-name').isVisible()) await page.getByRole('button', { name: 'Cancel' }).click();
      expect(await libraryCount(page), 'records in the library').toBe(before);
      expect(problems, 'problems found').toEqual([]);
      expect(errors, 'uncaught exceptions in the page').toEqual([]);
    } finally {
      await page.close();
    }
  });
});

afterAll(() => {
  console.log(`browser fuzz: ${inputsTried} hostile texts typed into inputs`);
});
