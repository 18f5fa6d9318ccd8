// Plots readable on a phone and on paper (issue 11): on every screen that shows a plot, each SVG text
// is drawn at least 12 CSS px on a 360 px phone, and lies wholly inside its drawing (no clipped axis
// label or tick) on a 320 px phone, a 360 px phone and a 1280 px laptop. SVG text scales with the
// viewBox, so the size read is the CSS font size × the drawing's scale on screen.
// 12 CSS px: the smallest text size the issue allows for plots (issue 11, "Plots readable").
import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { LAPTOP, newContext, PHONE, settled, sharedBrowser, waitForScreen, type Viewport } from './harness';
import { FEATURES } from '../../src/features/registry';

const MIN_TEXT_PX = 12;
/** Sub-pixel rounding of glyph boxes. */
const EDGE_TOLERANCE_PX = 0.5;
const WIDTHS: { label: string; viewport: Viewport; checkSize: boolean }[] = [
  { label: '320 px phone', viewport: { width: 320, height: 740 }, checkSize: false },
  { label: '360 px phone', viewport: PHONE, checkSize: true },
  { label: '1280 px laptop', viewport: LAPTOP, checkSize: false },
];

const shared = sharedBrowser();

interface PlotText {
  plot: string;
  text: string;
  renderedPx: number;
  inside: boolean;
  box: string;
}

/** Every visible text of every plot drawing on the page (legend swatches have no text). */
async function plotTexts(page: Page): Promise<{ plots: number; texts: PlotText[] }> {
  return page.evaluate((tol) => {
    const out: PlotText[] = [];
    let plots = 0;
    for (const svg of document.querySelectorAll<SVGSVGElement>('main figure.plot > svg')) {
      const frame = svg.getBoundingClientRect();
      if (frame.width === 0 || frame.height === 0) continue; // folded away: not on screen
      plots++;
      const viewBoxWidth = svg.viewBox.baseVal?.width || frame.width;
      const scale = frame.width / viewBoxWidth;
      const plot = svg.getAttribute('aria-label')?.slice(0, 60) ?? '(plot)';
      for (const t of svg.querySelectorAll<SVGTextElement>('text')) {
        if (!(t.textContent ?? '').trim()) continue;
        const box = t.getBoundingClientRect();
        const renderedPx = parseFloat(getComputedStyle(t).fontSize) * scale;
        const inside =
          box.left >= frame.left - tol && box.right <= frame.right + tol && box.top >= frame.top - tol && box.bottom <= frame.bottom + tol;
        out.push({
          plot,
          text: (t.textContent ?? '').trim().slice(0, 40),
          renderedPx,
          inside,
          box: `${box.left.toFixed(1)}–${box.right.toFixed(1)} × ${box.top.toFixed(1)}–${box.bottom.toFixed(1)} in ${frame.left.toFixed(1)}–${frame.right.toFixed(1)} × ${frame.top.toFixed(1)}–${frame.bottom.toFixed(1)}`,
        });
      }
    }
    return { plots, texts: out };
  }, EDGE_TOLERANCE_PX);
}

describe('plot text on every screen with a plot', () => {
  for (const { label, viewport, checkSize } of WIDTHS) {
    it(`${label}: ${checkSize ? `text ≥ ${MIN_TEXT_PX} px and ` : ''}every text inside its drawing`, async () => {
      const context = await newContext(shared.browser, { viewport });
      const page = await context.newPage();
      let screensWithPlots = 0;
      const small: string[] = [];
      const clipped: string[] = [];
      try {
        for (const f of FEATURES) {
          await page.goto(`${shared.server.url}#/${f.id}`);
          await waitForScreen(page);
          await settled(page);
          const { plots, texts } = await plotTexts(page);
          if (plots > 0) screensWithPlots++;
          for (const t of texts) {
            if (checkSize && t.renderedPx < MIN_TEXT_PX) small.push(`#/${f.id} "${t.text}" in ${t.plot}: ${t.renderedPx.toFixed(1)} px`);
            if (!t.inside) clipped.push(`#/${f.id} "${t.text}" in ${t.plot}: ${t.box}`);
          }
        }
      } finally {
        await context.close();
      }
      // The check must see plots to mean anything: bend loss, joint loss, launch, dispersion,
      // mode field and single-mode all draw one with their defaults.
      expect(screensWithPlots).toBeGreaterThanOrEqual(6);
      expect(small, 'plot text drawn smaller than 12 CSS px').toEqual([]);
      expect(clipped, 'plot text outside its drawing').toEqual([]);
    }, 240_000);
  }
});
