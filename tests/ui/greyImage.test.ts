// The mode picture's grey image, read back field by field as the BMP format defines it: BITMAPFILEHEADER
// (14 bytes) then BITMAPINFOHEADER (40 bytes), little-endian; for 8 bits per pixel a palette of 4-byte
// blue-green-red-reserved entries follows, then the rows, bottom row first when the height is positive,
// each padded to a multiple of 4 bytes (Microsoft Win32 documentation, wingdi.h, BITMAPFILEHEADER and
// BITMAPINFOHEADER structures; from memory). That Chromium decodes it is checked in tests/e2e/plots.
import { describe, expect, it } from 'vitest';
import { greyBmpDataUrl } from '../../src/ui/greyImage';

function decode(url: string): DataView {
  expect(url.startsWith('data:image/bmp;base64,')).toBe(true);
  const binary = atob(url.slice('data:image/bmp;base64,'.length));
  return new DataView(Uint8Array.from(binary, (c) => c.charCodeAt(0)).buffer);
}

describe('a grey picture as a BMP data URL', () => {
  // 3 × 2, so each 3-byte row is padded to 4.
  const levels = [0, 0.5, 1, 0.25, 2, Number.NaN];
  const bmp = decode(greyBmpDataUrl({ levels, width: 3, height: 2 }));

  it('has the file header: "BM", the file size and where the pixels start', () => {
    expect(String.fromCharCode(bmp.getUint8(0), bmp.getUint8(1))).toBe('BM');
    expect(bmp.getUint32(2, true)).toBe(bmp.byteLength);
    expect(bmp.getUint32(10, true)).toBe(14 + 40 + 256 * 4);
  });

  it('has the info header: size, width, bottom-up height, one plane, 8 bits, no compression, 256 colours', () => {
    expect(bmp.getUint32(14, true)).toBe(40);
    expect(bmp.getInt32(18, true)).toBe(3);
    expect(bmp.getInt32(22, true)).toBe(2);
    expect(bmp.getUint16(26, true)).toBe(1);
    expect(bmp.getUint16(28, true)).toBe(8);
    expect(bmp.getUint32(30, true)).toBe(0);
    expect(bmp.getUint32(34, true)).toBe(2 * 4);
    expect(bmp.getUint32(46, true)).toBe(256);
  });

  it('has a grey palette: entry k is blue = green = red = k', () => {
    for (const k of [0, 1, 127, 255]) {
      const at = 54 + 4 * k;
      expect([bmp.getUint8(at), bmp.getUint8(at + 1), bmp.getUint8(at + 2)]).toEqual([k, k, k]);
    }
  });

  it('stores the top row last, each row padded to 4 bytes, levels clamped and a non-number black', () => {
    const pixels = 54 + 1024;
    const row = (r: number) => [0, 1, 2].map((c) => bmp.getUint8(pixels + r * 4 + c));
    expect(row(1)).toEqual([0, 128, 255]); // top row of the picture, stored second
    expect(row(0)).toEqual([64, 255, 0]); // bottom row: 0.25, 2 clamped to white, NaN black
    expect(bmp.byteLength).toBe(pixels + 2 * 4);
  });
});
