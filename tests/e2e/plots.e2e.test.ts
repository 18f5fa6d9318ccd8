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

describe('the mode picture on a phone', () => {
  it('is a grey image the browser decodes, scaled smoothly, with the mode\'s shape: LP11 dark on the axis, bright in two lobes', async () => {
    const context = await newContext(shared.browser, { viewport: PHONE });
    try {
      const page = await context.newPage();
      await page.goto(`${shared.server.url}#/single-mode`);
      await waitForScreen(page);
      await settled(page);
      const picture = await page.evaluate(async () => {
        const image = document.querySelector<SVGImageElement>('main figure.mode-picture mask image');
        if (!image) return undefined;
        // Decoded by Chromium itself, then read back pixel by pixel.
        const decoded = new Image();
        decoded.src = image.href.baseVal;
        await decoded.decode();
        const canvas = document.createElement('canvas');
        canvas.width = decoded.naturalWidth;
        canvas.height = decoded.naturalHeight;
        const ctx = canvas.getContext('2d')!;
        ctx.drawImage(decoded, 0, 0);
        const all = ctx.getImageData(0, 0, canvas.width, canvas.height).data;
        const grey = (x: number, y: number) => all[4 * (y * canvas.width + x)];
        const c = canvas.width / 2;
        let brightest = 0;
        for (let i = 0; i < all.length; i += 4) brightest = Math.max(brightest, all[i]);
        return {
          width: canvas.width,
          height: canvas.height,
          label: image.closest('svg')?.getAttribute('aria-label') ?? '',
          onAxis: grey(c, c),
          // 0.6 core radii left and right of the axis, and the same distance above it (the picture spans ±1.6 radii).
          left: grey(Math.round(c - (0.6 / 1.6) * c), c),
          right: grey(Math.round(c + (0.6 / 1.6) * c), c),
          above: grey(c, Math.round(c - (0.6 / 1.6) * c)),
          corner: grey(0, 0),
          brightest,
          rendering: getComputedStyle(image).imageRendering,
        };
      });
      expect(picture, 'a mode picture on #/single-mode').toBeDefined();
      const p = picture!;
      expect([p.width, p.height]).toEqual([72, 72]);
      // The default (G.652.D at 1310 nm, the model's V just above 2.405) shows LP11, the mode that decides.
      expect(p.label).toContain('Intensity of LP11');
      // LP11 ∝ J1(ur/a)² cos²φ (Gloge 1971): zero on the axis and along the y axis, two lobes on the x axis,
      // and far down in the cladding at 1.6 core radii on the diagonal.
      expect(p.brightest).toBe(255);
      expect(p.left).toBeGreaterThan(150);
      expect(p.right).toBeGreaterThan(150);
      expect(p.onAxis).toBeLessThan(10);
      expect(p.above).toBeLessThan(10);
      expect(p.corner).toBeLessThan(40);
      expect(p.rendering).toBe('auto'); // smooth scaling, not blocky cells
    } finally {
      await context.close();
    }
  }, 60_000);
});
