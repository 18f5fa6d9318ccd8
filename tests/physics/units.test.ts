import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/physics/errors';
import { parseQuantity } from '../../src/physics/units';

// Unit factors are SI definitions (BIPM SI Brochure, 9th ed., prefixes table);
// dBm is 10·log10(P / 1 mW) by definition (common practice).
describe('typed quantities', () => {
  it.each([
    ['1550', 'wavelength', 1550],
    ['1,55 µm', 'wavelength', 1550],
    ['1.31um', 'wavelength', 1310],
    ['  850 nm ', 'wavelength', 850],
    ['2,5 km', 'length', 2.5],
    ['350 m', 'length', 0.35],
    ['15', 'radius', 15],
    ['1.5 cm', 'radius', 15],
    ['9.2', 'size', 9.2],
    ['-3 dBm', 'power', -3],
    ['1 mW', 'power', 0],
    ['100 µW', 'power', -10],
    ['-0', 'plain', 0],
    ['1e3', 'plain', 1000],
  ] as const)('"%s" typed as a %s reads as %s in the base unit', (text, kind, expected) => {
    const got = parseQuantity('x', text, kind).value;
    expect(got, `input ${text}`).toBeCloseTo(expected, 10);
  });

  it('says what the typed unit converted to', () => {
    expect(parseQuantity('wavelengthNm', '1,55 µm', 'wavelength').conversion).toBe('1.55 µm = 1550 nm');
  });

  it.each(['', '   ', '1,2,3', '0x10', '1e309', 'abc', '1.2.3', '<b>1</b>', '🙂', '١٥٥٠', '5 parsecs', 'x'.repeat(10_000), '0 mW'])(
    'refuses %j with a typed error naming the field',
    (text) => {
      const kind = text === '0 mW' ? 'power' : 'wavelength';
      let err: unknown;
      try {
        parseQuantity('wavelengthNm', text, kind);
      } catch (e) {
        err = e;
      }
      expect(err).toBeInstanceOf(InputError);
      expect((err as InputError).argument).toBe('wavelengthNm');
      expect((err as InputError).message).not.toMatch(/NaN/);
    },
  );
});
