// A greyscale picture as a data URL: an uncompressed 8-bit BMP (BITMAPFILEHEADER, BITMAPINFOHEADER and a
// 256-level grey palette, rows stored bottom-up and padded to 4 bytes), which every browser decodes.
// Written byte by byte rather than through a canvas: a canvas's PNG export compressed the 72 × 72 mode
// picture on the main thread each time the mode changed, the largest single cost of a typed wavelength on
// a slow phone; this takes a fraction of a millisecond and needs no canvas at all.

const FILE_HEADER_BYTES = 14;
const INFO_HEADER_BYTES = 40;
const PALETTE_BYTES = 256 * 4;
const PIXELS_AT = FILE_HEADER_BYTES + INFO_HEADER_BYTES + PALETTE_BYTES;

/**
 * `levels` row by row, top row first, 0 = black to 1 = white (clamped; anything not a number is black),
 * as a `data:image/bmp;base64,…` URL of `width` × `height` pixels.
 */
export function greyBmpDataUrl({ levels, width, height }: { levels: ArrayLike<number>; width: number; height: number }): string {
  const rowBytes = Math.ceil(width / 4) * 4;
  const bytes = new Uint8Array(PIXELS_AT + rowBytes * height);
  const view = new DataView(bytes.buffer);
  // BITMAPFILEHEADER
  bytes[0] = 0x42; // 'B'
  bytes[1] = 0x4d; // 'M'
  view.setUint32(2, bytes.length, true);
  view.setUint32(10, PIXELS_AT, true);
  // BITMAPINFOHEADER: a positive height means the rows run bottom-up.
  view.setUint32(14, INFO_HEADER_BYTES, true);
  view.setInt32(18, width, true);
  view.setInt32(22, height, true);
  view.setUint16(26, 1, true); // planes
  view.setUint16(28, 8, true); // bits per pixel: an index into the palette
  view.setUint32(30, 0, true); // BI_RGB, no compression
  view.setUint32(34, rowBytes * height, true);
  view.setInt32(38, 2835, true); // 72 dpi, in pixels per metre
  view.setInt32(42, 2835, true);
  view.setUint32(46, 256, true); // palette entries
  // The palette: entry k is grey level k (blue, green, red, reserved).
  for (let k = 0; k < 256; k++) bytes.fill(k, FILE_HEADER_BYTES + INFO_HEADER_BYTES + 4 * k, FILE_HEADER_BYTES + INFO_HEADER_BYTES + 4 * k + 3);
  for (let row = 0; row < height; row++) {
    const at = PIXELS_AT + (height - 1 - row) * rowBytes;
    for (let col = 0; col < width; col++) {
      const v = levels[row * width + col]!;
      bytes[at + col] = v > 0 ? Math.round(Math.min(1, v) * 255) : 0;
    }
  }
  let binary = '';
  for (let i = 0; i < bytes.length; i += 0x2000) binary += String.fromCharCode(...bytes.subarray(i, i + 0x2000));
  return `data:image/bmp;base64,${btoa(binary)}`;
}
