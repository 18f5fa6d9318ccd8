// Every screen on a 360 px phone and a 1280 px laptop, in real Chromium: no sideways
// scrolling, no serious or critical accessibility violation (axe-core) in either theme,
// and a screenshot of each for a person to look at (test-results/screenshots/).
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { mkdirSync, rmSync } from 'node:fs';
import { createRequire } from 'node:module';
import { join } from 'node:path';
import type { Browser, Page } from 'playwright-core';
import { BUILDS, LAPTOP, PHONE, REPO_ROOT, launchBrowser, newContext, settled, startServer, waitForScreen, type StaticServer, type Viewport } from './harness';
import { FEATURES } from '../../src/features/registry';

const AXE_PATH = createRequire(import.meta.url).resolve('axe-core/axe.min.js');
const SHOTS = join(REPO_ROOT, 'test-results/screenshots');

const SCREENS = [{ id: '', title: 'Field calculator', name: 'home' }, ...FEATURES.map((f) => ({ id: f.id, title: f.title, name: f.id }))];
const SIZES: { label: string; viewport: Viewport }[] = [
  { label: '360×740 phone', viewport: PHONE },
  { label: '1280×800 laptop', viewport: LAPTOP },
];
const THEMES = ['light', 'dark'] as const;

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

/** Opens a screen and waits for its content and for any worker computation to settle. */
async function show(page: Page, id: string, title: string): Promise<void> {
  await page.goto(`${server.url}#/${id}`);
  await waitForScreen(page);
  expect(await page.locator('main h1').first().textContent()).toBe(title);
  await settled(page);
}

async function setTheme(page: Page, theme: (typeof THEMES)[number]): Promise<void> {
  await page.evaluate((t) => {
    document.documentElement.dataset.theme = t;
  }, theme);
  // Let style recalculation and any theme transition finish before measuring colours.
  await page.evaluate(() => new Promise((r) => requestAnimationFrame(() => requestAnimationFrame(r))));
}

interface Overflow {
  scrollWidth: number;
  clientWidth: number;
  widest: string[];
}

async function horizontalOverflow(page: Page): Promise<Overflow> {
  return page.evaluate(() => {
    const root = document.documentElement;
    const clientWidth = root.clientWidth;
    const describe = (el: Element) =>
      `${el.tagName.toLowerCase()}${el.id ? '#' + el.id : ''}${el.className && typeof el.className === 'string' ? '.' + el.className.trim().split(/\s+/).join('.') : ''}`;
    const widest: string[] = [];
    for (const el of document.querySelectorAll('body *')) {
      const right = el.getBoundingClientRect().right;
      if (right > clientWidth + 0.5) widest.push(`${describe(el)} ends at ${right.toFixed(0)} px`);
    }
    // Text that does not wrap (a long word or number) sticks out of its box without the box growing.
    const walker = document.createTreeWalker(document.body, NodeFilter.SHOW_TEXT);
    const range = document.createRange();
    for (let n = walker.nextNode(); n; n = walker.nextNode()) {
      range.selectNodeContents(n);
      const right = range.getBoundingClientRect().right;
      if (right > clientWidth + 0.5) widest.push(`text "${(n.textContent ?? '').trim().slice(0, 40)}" in ${describe(n.parentElement!)} ends at ${right.toFixed(0)} px`);
    }
    return { scrollWidth: root.scrollWidth, clientWidth, widest: widest.slice(0, 6) };
  });
}

// Issue 7: touch targets at least 44 × 44 CSS px (WCAG 2.2 SC 2.5.5). A control counts with
// its label when the label is tied to it (tapping the label works the control); links inside
// running text are exempt, as in the WCAG exception for inline targets.
const TOUCH_TARGET_PX = 44;

async function smallTouchTargets(page: Page): Promise<string[]> {
  return page.evaluate((min) => {
    const small: string[] = [];
    const controls = document.querySelectorAll<HTMLElement>('button, input:not([type="hidden"]), select, textarea, summary, a[href]');
    for (const el of controls) {
      const style = getComputedStyle(el);
      if (style.visibility === 'hidden' || style.display === 'none' || el.getClientRects().length === 0) continue;
      if (el.tagName === 'A' && style.display === 'inline' && (el.parentElement?.textContent ?? '').trim() !== (el.textContent ?? '').trim()) continue;
      let { width, height } = el.getBoundingClientRect();
      const labels = (el as HTMLInputElement).labels;
      if (labels) for (const l of labels) {
        const r = l.getBoundingClientRect();
        width = Math.max(width, r.width);
        height = Math.max(height, r.height);
      }
      if (width < min - 0.5 || height < min - 0.5) {
        const input = el as HTMLInputElement;
        const name = (el.getAttribute('aria-label') ?? (input.labels?.[0]?.textContent || el.textContent || `type=${input.type}`)).trim().slice(0, 30);
        small.push(`${el.tagName.toLowerCase()}${el.id ? '#' + el.id : ''} "${name}" is ${width.toFixed(0)}×${height.toFixed(0)} px`);
      }
    }
    return small;
  }, TOUCH_TARGET_PX);
}

interface AxeFinding {
  id: string;
  impact: string;
  help: string;
  nodes: string[];
}

async function seriousAxeViolations(page: Page): Promise<AxeFinding[]> {
  if (!(await page.evaluate(() => 'axe' in window))) await page.addScriptTag({ path: AXE_PATH });
  return page.evaluate(async () => {
    const axe = (window as unknown as { axe: { run(ctx: Document, opts: object): Promise<{ violations: { id: string; impact?: string; help: string; nodes: { target: string[]; failureSummary?: string }[] }[] }> } }).axe;
    const r = await axe.run(document, { resultTypes: ['violations'] });
    return r.violations
      .filter((v) => v.impact === 'serious' || v.impact === 'critical')
      .map((v) => ({
        id: v.id,
        impact: v.impact ?? '',
        help: v.help,
        nodes: v.nodes.slice(0, 5).map((n) => `${n.target.join(' ')} — ${(n.failureSummary ?? '').replace(/\s+/g, ' ')}`),
      }));
  });
}

describe.each(SIZES)('at $label', ({ viewport }) => {
  let page: Page;
  beforeAll(async () => {
    // bypassCSP only so the test can inject axe-core; the policy itself is checked in shell.e2e.test.ts.
    const context = await newContext(browser, { viewport, bypassCSP: true });
    page = await context.newPage();
  });
  afterAll(async () => {
    await page?.context().close();
  });

  it.each(SCREENS)('the $title screen fits the width with no sideways scrolling', async ({ id, title, name }) => {
    await show(page, id, title);
    await setTheme(page, 'light');
    const o = await horizontalOverflow(page);
    // The whole page, in the light theme (the dark theme is checked by axe below, not pictured).
    await page.screenshot({ path: join(SHOTS, `${viewport.width}x${viewport.height}-${name}.png`), fullPage: true });
    expect(o.scrollWidth, `page is ${o.scrollWidth} px wide in a ${o.clientWidth} px window; ${o.widest.join('; ')}`).toBeLessThanOrEqual(o.clientWidth);
  });

  it.each(SCREENS)('on the $title screen every control is a touch target of at least 44 × 44 px', async ({ id, title }) => {
    await show(page, id, title);
    const small = await smallTouchTargets(page);
    expect(small, small.join('\n')).toEqual([]);
  });

  describe.each(THEMES)('in the %s theme', (theme) => {
    it.each(SCREENS)('the $title screen has no serious or critical accessibility violation', async ({ id, title }) => {
      await show(page, id, title);
      await setTheme(page, theme);
      const found = await seriousAxeViolations(page);
      expect(found, JSON.stringify(found, null, 2)).toEqual([]);
    });
  });
});

describe('the checks themselves can fail', () => {
  it('a field without a label and a too-wide block are caught', async () => {
    const context = await newContext(browser, { viewport: PHONE, bypassCSP: true });
    const page = await context.newPage();
    try {
      await show(page, '', 'Field calculator');
      await page.evaluate(() => {
        const main = document.querySelector('main')!;
        main.append(document.createElement('input'));
        const tick = document.createElement('input');
        tick.type = 'checkbox';
        tick.setAttribute('aria-label', 'tiny tick box');
        main.append(tick);
        const wide = document.createElement('div');
        wide.style.width = '2000px';
        wide.textContent = 'too wide';
        main.append(wide);
      });
      expect((await seriousAxeViolations(page)).map((v) => v.id)).toContain('label');
      expect((await smallTouchTargets(page)).join()).toMatch(/tiny tick box/);
      const o = await horizontalOverflow(page);
      expect(o.scrollWidth).toBeGreaterThan(o.clientWidth);
    } finally {
      await context.close();
    }
  });
});
