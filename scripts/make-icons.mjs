// Renders the committed PNG icons from the SVG sources (public/icons/icon.svg, shipped, and
// scripts/icons/icon-maskable.svg, source only) with Debian's Chromium (playwright-core),
// then writes them as 8-bit palette PNGs: the icons are a few flat colours plus
// anti-aliased edges, so 256 colours look the same at a third of the bytes of RGBA, and
// the icons are precached on every phone.
// Run by hand after changing an SVG: node scripts/make-icons.mjs
// The PNGs are generated files: edit the SVGs, never the PNGs.
import { readFileSync, writeFileSync } from 'node:fs';
import { fileURLToPath } from 'node:url';
import { deflateSync } from 'node:zlib';
import { chromium } from 'playwright-core';

const publicIcons = fileURLToPath(new URL('../public/icons/', import.meta.url));
const sources = fileURLToPath(new URL('./icons/', import.meta.url));
const outputs = [
  { svg: publicIcons + 'icon.svg', png: 'icon-192.png', size: 192 },
  { svg: publicIcons + 'icon.svg', png: 'icon-512.png', size: 512 },
  { svg: sources + 'icon-maskable.svg', png: 'icon-maskable-512.png', size: 512 },
];

/** RGBA pixels of the SVG drawn at size×size by Chromium. */
async function render(browser, svgFile, size) {
  const page = await browser.newPage({ viewport: { width: size, height: size } });
  const dataUrl = `data:image/svg+xml;base64,${readFileSync(svgFile).toString('base64')}`;
  const base64 = await page.evaluate(
    async ({ dataUrl, size }) => {
      const img = new Image(size, size);
      img.src = dataUrl;
      await img.decode();
      const canvas = document.createElement('canvas');
      canvas.width = canvas.height = size;
      const ctx = canvas.getContext('2d');
      ctx.drawImage(img, 0, 0, size, size);
      const bytes = ctx.getImageData(0, 0, size, size).data;
      let s = '';
      for (let i = 0; i < bytes.length; i += 0x8000) s += String.fromCharCode(...bytes.subarray(i, i + 0x8000));
      return btoa(s);
    },
    { dataUrl, size },
  );
  await page.close();
  return Buffer.from(base64, 'base64');
}

/** Palette of the 256 most frequent colours; every pixel mapped to its nearest entry. */
function quantize(rgba) {
  const counts = new Map();
  for (let i = 0; i < rgba.length; i += 4) {
    const key = rgba.readUInt32BE(i);
    counts.set(key, (counts.get(key) ?? 0) + 1);
  }
  const palette = [...counts.entries()].sort((a, b) => b[1] - a[1]).slice(0, 256).map(([k]) => k);
  const channels = (k) => [k >>> 24, (k >>> 16) & 255, (k >>> 8) & 255, k & 255];
  const pal = palette.map(channels);
  const nearest = new Map();
  const indices = Buffer.alloc(rgba.length / 4);
  for (let i = 0, p = 0; i < rgba.length; i += 4, p++) {
    const key = rgba.readUInt32BE(i);
    let idx = nearest.get(key);
    if (idx === undefined) {
      const c = channels(key);
      let best = Infinity;
      for (let j = 0; j < pal.length; j++) {
        const q = pal[j];
        const d = (c[0] - q[0]) ** 2 + (c[1] - q[1]) ** 2 + (c[2] - q[2]) ** 2 + (c[3] - q[3]) ** 2;
        if (d < best) [best, idx] = [d, j];
      }
      nearest.set(key, idx);
    }
    indices[p] = idx;
  }
  return { pal, indices };
}

const CRC_TABLE = Array.from({ length: 256 }, (_, n) => {
  let c = n;
  for (let k = 0; k < 8; k++) c = c & 1 ? 0xedb88320 ^ (c >>> 1) : c >>> 1;
  return c >>> 0;
});
function crc32(buf) {
  let c = 0xffffffff;
  for (const b of buf) c = CRC_TABLE[(c ^ b) & 255] ^ (c >>> 8);
  return (c ^ 0xffffffff) >>> 0;
}
function chunk(type, data) {
  const head = Buffer.alloc(8);
  head.writeUInt32BE(data.length, 0);
  head.write(type, 4, 'ascii');
  const crc = Buffer.alloc(4);
  crc.writeUInt32BE(crc32(Buffer.concat([head.subarray(4), data])));
  return Buffer.concat([head, data, crc]);
}

/** An indexed-colour PNG (colour type 3, 8 bits, tRNS for alpha), PNG spec (W3C, 2003). */
function encodePalettePng(size, { pal, indices }) {
  const ihdr = Buffer.alloc(13);
  ihdr.writeUInt32BE(size, 0);
  ihdr.writeUInt32BE(size, 4);
  ihdr.set([8, 3, 0, 0, 0], 8);
  const plte = Buffer.from(pal.flatMap(([r, g, b]) => [r, g, b]));
  const alpha = pal.map((c) => c[3]);
  while (alpha.length && alpha[alpha.length - 1] === 255) alpha.pop();
  const rows = Buffer.alloc(size * (size + 1));
  for (let y = 0; y < size; y++) indices.copy(rows, y * (size + 1) + 1, y * size, (y + 1) * size); // filter 0
  return Buffer.concat([
    Buffer.from([0x89, 0x50, 0x4e, 0x47, 0x0d, 0x0a, 0x1a, 0x0a]),
    chunk('IHDR', ihdr),
    chunk('PLTE', plte),
    ...(alpha.length ? [chunk('tRNS', Buffer.from(alpha))] : []),
    chunk('IDAT', deflateSync(rows, { level: 9 })),
    chunk('IEND', Buffer.alloc(0)),
  ]);
}

const browser = await chromium.launch({
  executablePath: process.env.MODEWRIGHT_CHROMIUM ?? '/usr/bin/chromium',
  args: ['--headless', '--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
});
try {
  for (const { svg, png, size } of outputs) {
    const rgba = await render(browser, svg, size);
    const file = encodePalettePng(size, quantize(rgba));
    writeFileSync(publicIcons + png, file);
    console.log(`wrote public/icons/${png} (${size}×${size}, ${file.length} bytes)`);
  }
} finally {
  await browser.close();
}
