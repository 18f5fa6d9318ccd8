// Renders the committed PNG icons from the SVG sources (public/icons/icon.svg, shipped, and
// scripts/icons/icon-maskable.svg, source only) with Debian's
// Chromium (playwright-core). Run by hand after changing an SVG: node scripts/make-icons.mjs
// The PNGs are generated files: edit the SVGs, never the PNGs.
import { readFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { chromium } from 'playwright-core';

const iconsDir = fileURLToPath(new URL('../public/icons/', import.meta.url));
const outputs = [
  { svg: 'icon.svg', png: 'icon-192.png', size: 192 },
  { svg: 'icon.svg', png: 'icon-512.png', size: 512 },
  { svg: '../../scripts/icons/icon-maskable.svg', png: 'icon-maskable-512.png', size: 512 },
];

const browser = await chromium.launch({
  executablePath: process.env.MODEWRIGHT_CHROMIUM ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
});
try {
  for (const { svg, png, size } of outputs) {
    const page = await browser.newPage({ viewport: { width: size, height: size }, deviceScaleFactor: 1 });
    const dataUrl = `data:image/svg+xml;base64,${readFileSync(iconsDir + svg).toString('base64')}`;
    await page.setContent(
      `<html><body style="margin:0;background:transparent"><img src="${dataUrl}" width="${size}" height="${size}" style="display:block"></body></html>`,
    );
    await page.locator('img').evaluate((img) => img.decode());
    await page.screenshot({ path: iconsDir + png, omitBackground: true, clip: { x: 0, y: 0, width: size, height: size } });
    await page.close();
    console.log(`wrote public/icons/${png} (${size}×${size}) from ${svg}`);
  }
} finally {
  await browser.close();
}
