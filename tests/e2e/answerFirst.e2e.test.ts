// Issue 11, the answer first on a phone, in real Chromium on the production build, for every
// calculator of FEATURES: the headline <output> is in the first viewport on load and stays in view
// while the last input is edited; no number is laid out across two lines at 320, 360 or 1280 px;
// no sentence is said twice on a screen; signed fields take every minus a phone or a paste gives;
// the copied text is one report. Screenshots of every screen at 360 × 740 go to
// test-results/screenshots/answer-first/, beside the pictures taken before this work
// (tests/e2e/before-answer-first/) for the five screens the issue named.
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { copyFileSync, existsSync, mkdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser, BrowserContext, Page } from 'playwright-core';
import { BUILDS, LAPTOP, PHONE, REPO_ROOT, launchBrowser, newContext, settled, startServer, waitForScreen, type StaticServer, type Viewport } from './harness';
import { FEATURES } from '../../src/features/registry';

const CALCULATORS = FEATURES.filter((f) => f.id !== 'library').map((f) => ({ id: f.id, title: f.title }));
const SHOTS = join(REPO_ROOT, 'test-results/screenshots/answer-first');
const BEFORE = join(REPO_ROOT, 'tests/e2e/before-answer-first');
const THEMES = ['light', 'dark'] as const;
let signedFieldsTried = 0;

let browser: Browser;
let server: StaticServer;
beforeAll(async () => {
  rmSync(SHOTS, { recursive: true, force: true });
  mkdirSync(SHOTS, { recursive: true });
  server = await startServer(BUILDS.current);
  browser = await launchBrowser();
});
afterAll(async () => {
  await browser?.close();
  await server?.close();
});

const settle = (page: Page) => settled(page);

async function open(viewport: Viewport, id: string, theme: (typeof THEMES)[number] = 'light'): Promise<{ context: BrowserContext; page: Page }> {
  const context = await newContext(browser, { viewport, colorScheme: theme });
  const page = await context.newPage();
  await page.goto(`${server.url}#/${id}`);
  await waitForScreen(page);
  await settle(page);
  return { context, page };
}

/** Where the headline <output> sits against the viewport. */
async function headlinePlace(page: Page): Promise<{ count: number; top: number; bottom: number; height: number; live: string | null; text: string }> {
  return page.evaluate(() => {
    const outs = document.querySelectorAll('main output');
    const o = outs[0] as HTMLElement | undefined;
    const r = o?.getBoundingClientRect();
    return { count: outs.length, top: r?.top ?? NaN, bottom: r?.bottom ?? NaN, height: innerHeight, live: o?.getAttribute('aria-live') ?? null, text: o?.innerText ?? '' };
  });
}

/**
 * Every number token on the page (sign, digits, separators, exponent and a unit after it) whose
 * characters are laid out on more than one line. Runs over the text of each block, across inline
 * elements, so "<strong>0.06</strong> dB" counts as one token.
 */
async function brokenNumbers(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const UNIT = '(?:dBm|dB/km|dB|nm|µm|um|mm|cm|km|m|mW|µW|nW|W|THz|GHz|MHz|ps/nm/km|ps/\\(nm·km\\)|ps/nm|ps/√km|ps|ns|µs|%|°|Gb/s|Mb/s|mm²)';
    // A token starts where no letter, digit or separator stands before it ("G.652-2016" holds no "-2016").
    const TOKEN = new RegExp(`(?<![\\p{L}\\d.,])[−–+-]?\\d[\\d.,\\u00a0\\u202f\\u2009]*(?:[eE][−+-]?\\d+|\\u00a0?×\\u00a0?10\\^?[−-]?\\d+)?(?:[\\u00a0 ]?${UNIT}(?![\\p{L}\\d/]))?`, 'gu');
    const blocks = new Set<Element>();
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    const isBlock = (el: Element) => !/^(inline|contents)$/.test(getComputedStyle(el).display);
    for (let n = walker.nextNode(); n; n = walker.nextNode()) {
      let el = n.parentElement;
      if (!el || el.closest('svg, script, style, option, select, textarea')) continue;
      while (el && !isBlock(el)) el = el.parentElement;
      if (el) blocks.add(el);
    }
    const broken: string[] = [];
    const range = document.createRange();
    for (const block of blocks) {
      // The block's own text nodes in order (not those of nested blocks).
      const nodes: Text[] = [];
      const w = document.createTreeWalker(block, NodeFilter.SHOW_TEXT);
      for (let n = w.nextNode(); n; n = w.nextNode()) {
        let el = n.parentElement;
        while (el && el !== block && !isBlock(el)) el = el.parentElement;
        if (el === block && (n.textContent ?? '').length > 0) nodes.push(n as Text);
      }
      const text = nodes.map((n) => n.textContent).join('');
      const at = (i: number): [Text, number] => {
        let k = i;
        for (const n of nodes) {
          const len = n.textContent!.length;
          if (k <= len) return [n, k];
          k -= len;
        }
        const lastNode = nodes[nodes.length - 1]!;
        return [lastNode, lastNode.textContent!.length];
      };
      for (const m of text.matchAll(TOKEN)) {
        const token = m[0].replace(/[\s\u00a0,.]+$/, '');
        if (!/\d/.test(token) || token.length < 2) continue;
        const [sn, so] = at(m.index!);
        const [en, eo] = at(m.index! + token.length);
        range.setStart(sn, so);
        range.setEnd(en, eo);
        const rects = [...range.getClientRects()].filter((r) => r.width > 0 && r.height > 0);
        if (rects.length === 0) continue;
        const tops = rects.map((r) => r.top);
        const lineHeight = Math.min(...rects.map((r) => r.height));
        if (Math.max(...tops) - Math.min(...tops) > lineHeight / 2) broken.push(`"${token}" in ${block.tagName.toLowerCase()}${block.className ? '.' + String(block.className).split(' ')[0] : ''}`);
      }
    }
    return broken;
  });
}

/**
 * Sentences (four words or more, ending in a full stop, question or exclamation mark) that are laid
 * out more than once on the page (folded text excluded). Table cells and labels, which may rightly
 * repeat a value row after row, are not sentences.
 */
async function repeatedSentences(page: Page): Promise<string[]> {
  return page.evaluate(() => {
    const text = document.body.innerText;
    const seen = new Map<string, number>();
    // A sentence ends at a full stop, question or exclamation mark followed by a space or the line's end
    // (so the point of "7.5 mm" ends nothing).
    for (const raw of text.split(/\n+/).flatMap((line) => line.split(/(?<=[.!?])\s+/))) {
      const s = raw.replace(/\s+/g, ' ').trim();
      if (s.split(' ').length < 4 || !/[.!?]$/.test(s)) continue;
      seen.set(s, (seen.get(s) ?? 0) + 1);
    }
    return [...seen.entries()].filter(([, n]) => n > 1).map(([s, n]) => `${n}× "${s}"`);
  });
}

/** The report as copied: title, underline, Inputs, Results, optional Assumptions, the closing lines. */
function reportProblems(text: string): string[] {
  const lines = text.split('\n');
  const problems: string[] = [];
  if (!/^\S/.test(lines[0] ?? '')) problems.push('no title on the first line');
  if (!/^=+$/.test(lines[1] ?? '')) problems.push('no underline under the title');
  if (lines.filter((l) => /^=+$/.test(l)).length !== 1) problems.push('more than one title underline (a report inside the report)');
  for (const heading of ['Inputs', 'Results']) {
    const n = lines.filter((l) => l === heading).length;
    if (n !== 1) problems.push(`"${heading}" heading ${n} times`);
  }
  if (lines.filter((l) => l === 'Assumptions').length > 1) problems.push('"Assumptions" heading more than once');
  if (lines.some((l) => /^\s*-\s*$/.test(l))) problems.push('an empty bullet');
  if (lines.some((l) => /^\s+[^:]+:\s*$/.test(l))) problems.push('a label with no value');
  if (/NaN|undefined|\[object/.test(text)) problems.push('NaN, undefined or an object in the text');
  if (lines.filter((l) => l.startsWith('Computed ')).length !== 1) problems.push('the date-and-version line is not there exactly once');
  return problems;
}

async function setTheme(page: Page, theme: (typeof THEMES)[number]): Promise<void> {
  await page.evaluate((t) => {
    document.documentElement.dataset.theme = t;
  }, theme);
  await settle(page);
}

async function headlineInView(page: Page, where: string): Promise<string> {
  const place = await headlinePlace(page);
  expect(place.count, `${where}: one headline <output>`).toBe(1);
  expect(place.top, `${where}: top of the headline`).toBeGreaterThanOrEqual(0);
  expect(place.bottom, `${where}: bottom of the headline against the viewport height`).toBeLessThanOrEqual(place.height);
  return place.text;
}

// One page per screen, used by every check in order (a fresh page per check would triple the run).
describe.each(CALCULATORS)('on the $title screen', ({ id, title }) => {
  let context: BrowserContext;
  let page: Page;
  beforeAll(async () => {
    ({ context, page } = await open(PHONE, id));
    await context.grantPermissions(['clipboard-read', 'clipboard-write'], { origin: server.url });
  });
  afterAll(async () => {
    await context?.close();
  });

  it('the headline answer is an <output>, a polite live region, in the first view of a 360 × 740 phone in both themes', async () => {
    const place = await headlinePlace(page);
    expect(place.live, 'aria-live of the headline').toBe('polite');
    expect(place.text.trim().length, 'the headline says something').toBeGreaterThan(3);
    for (const theme of THEMES) {
      await setTheme(page, theme);
      await headlineInView(page, `360 px, ${theme}`);
    }
    await setTheme(page, 'light');
    await page.screenshot({ path: join(SHOTS, `${id}.png`) });
  });

  it('the headline stays in view while the last field is focused and changed, on a phone and a laptop', async () => {
    for (const viewport of [PHONE, LAPTOP]) {
      await page.setViewportSize(viewport);
      await page.evaluate(() => window.scrollTo(0, 0));
      await settle(page);
      for (const theme of THEMES) {
        await setTheme(page, theme);
        const onLoad = await headlineInView(page, `${viewport.width} px, ${theme}, on load`);
        // The last visible number field: focus it (the browser scrolls it into view), change it and put it back.
        const last = page.locator('main input[data-number]:visible').last();
        if ((await last.count()) === 0) continue;
        const text = await last.inputValue();
        await last.focus();
        await last.fill(`${text}0`);
        await settle(page);
        await headlineInView(page, `${viewport.width} px, ${theme}, last field changed`);
        await last.fill(text);
        await settle(page);
        expect(await headlineInView(page, `${viewport.width} px, ${theme}, value put back`), 'the same answer once the value is back').toBe(onLoad);
        await page.evaluate(() => window.scrollTo(0, 0));
      }
    }
    await setTheme(page, 'light');
    await page.setViewportSize(PHONE);
  });

  it('no sentence appears twice, and no paragraph starts in lower case mid-thought', async () => {
    expect(await repeatedSentences(page), title).toEqual([]);
    const fragments = await page.evaluate(() =>
      [...document.querySelectorAll('main p, main li')].map((e) => (e as HTMLElement).innerText.trim()).filter((t) => /^[a-z]/.test(t)),
    );
    expect(fragments, `${title}: paragraphs or list items starting in lower case`).toEqual([]);
  });

  it('the copied text is one report: a title, the inputs, the results and the assumptions, each once', async () => {
    await page.getByRole('button', { name: 'Copy as text' }).first().click();
    await page.getByRole('status').filter({ hasText: 'Copied.' }).waitFor({ timeout: 5_000 });
    const text = await page.evaluate(() => navigator.clipboard.readText());
    expect(reportProblems(text), `${title}:\n${text}`).toEqual([]);
  });

  it('every field with a ± key reads "−3", "–3" and "-3" alike, and the ± key flips the sign', async () => {
    const ids = await page.$$eval('main .field:has(.sign-toggle) input[data-number]', (els) => els.map((e) => e.id));
    for (const fieldId of ids) {
      const field = page.locator(`#${fieldId}`);
      const good = await field.inputValue();
      const answers: string[] = [];
      for (const minus of ['\u2212', '\u2013', '-']) {
        await field.fill(`${minus}3`);
        await settle(page);
        expect(await field.getAttribute('aria-invalid'), `#${fieldId} given ${JSON.stringify(minus + '3')}`).toBeNull();
        answers.push(await page.locator('main output').first().innerText());
      }
      expect(new Set(answers).size, `#${fieldId}: one answer for the three minus signs`).toBe(1);
      await page.locator(`.field:has(#${fieldId}) .sign-toggle`).click();
      expect(await field.inputValue()).toBe('3');
      await field.fill(good);
      await settle(page);
      signedFieldsTried++;
    }
  });

  it('at 320, 360 and 1280 px wide, with every fold opened, no number token spans two lines', async () => {
    await page.$$eval('main details', (ds) => ds.forEach((d) => ((d as HTMLDetailsElement).open = true)));
    for (const width of [320, 360, 1280]) {
      await page.setViewportSize({ width, height: 800 });
      await settle(page);
      expect(await brokenNumbers(page), `${title} at ${width} px`).toEqual([]);
    }
    await page.setViewportSize(PHONE);
  });
});

describe.each([
  { id: '', title: 'home' },
  { id: 'library', title: 'Fiber types' },
])('on the $title screen', ({ id, title }) => {
  it('no number token spans two lines at 320, 360 and 1280 px, and no sentence appears twice', async () => {
    const { context, page } = await open(PHONE, id);
    try {
      expect(await repeatedSentences(page), title).toEqual([]);
      for (const width of [320, 360, 1280]) {
        await page.setViewportSize({ width, height: 800 });
        await settle(page);
        expect(await brokenNumbers(page), `${title} at ${width} px`).toEqual([]);
      }
    } finally {
      await context.close();
    }
  });
});

describe('home for twenty tools', () => {
  it('groups the tools by the situation the user is in, finds a tool by any word of its title or summary, and puts the last three used on top', async () => {
    const { context, page } = await open(PHONE, '');
    try {
      const groups = await page.locator('main section h2').allTextContents();
      expect(groups).toEqual(expect.arrayContaining(['At the splice tray', 'Planning a link', 'My fiber types']));
      await page.locator('#tool-filter').fill('splice');
      await expect.poll(() => page.locator('main a.feature-link .feature-title').allTextContents()).toEqual(expect.arrayContaining(['Joint loss', 'OTDR splice reading']));
      expect(await page.locator('main a.feature-link .feature-title').allTextContents()).not.toContain('Optical power');
      await page.locator('#tool-filter').fill('xyzzy');
      await expect.poll(() => page.getByRole('status').textContent()).toMatch(/No tool matches/);
      for (const id of ['power', 'joint-loss', 'bend-loss', 'label-check']) {
        await page.goto(`${server.url}#/${id}`);
        await waitForScreen(page);
      }
      await page.goto(`${server.url}#/`);
      await page.locator('#grp-recent').waitFor();
      const recent = await page.locator('section[aria-labelledby="grp-recent"] .feature-title').allTextContents();
      const title = (id: string) => FEATURES.find((f) => f.id === id)!.title;
      expect(recent).toEqual([title('label-check'), title('bend-loss'), title('joint-loss')]);
    } finally {
      await context.close();
    }
  });
});

describe('signed fields across the screens', () => {
  it('more than one screen has a field that takes a negative value, and each was tried', () => {
    expect(signedFieldsTried).toBeGreaterThan(1);
  });
});

describe('screenshots before and after the answer-first work', () => {
  it('keeps a before-and-after pair for the five screens the issue named', () => {
    const pairs = join(SHOTS, 'before-after');
    mkdirSync(pairs, { recursive: true });
    for (const id of ['label-check', 'joint-loss', 'link-budget', 'otdr-splice', 'bend-loss']) {
      const after = join(SHOTS, `${id}.png`);
      expect(existsSync(after), `${id}: screenshot taken by the headline test above`).toBe(true);
      copyFileSync(join(BEFORE, `${id}.png`), join(pairs, `${id}-before.png`));
      copyFileSync(after, join(pairs, `${id}-after.png`));
    }
  });
});
