import { describe, expect, it } from 'vitest';
import { InputError } from '../../src/physics/errors';
import { parseQuantity, UNITS_IN_WORDS, type QuantityKind } from '../../src/physics/units';

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

// What people paste from documents and phone keyboards. The typographic minus U+2212 and the en dash U+2013 used as
// a minus (Unicode Standard, ch. 6, "Dashes"); digits grouped in threes by a thin space U+2009, a narrow no-break
// space U+202F or a no-break space U+00A0 (BIPM SI Brochure, 9th ed., §5.4.4); the decimal comma (ibid.).
describe('numbers as typography writes them', () => {
  it.each([
    ['\u22123 dBm', 'power', -3],
    ['\u20133 dBm', 'power', -3],
    ['\u22120,5', 'plain', -0.5],
    ['1\u2009550 nm', 'wavelength', 1550],
    ['1\u202f550', 'wavelength', 1550],
    ['1\u00a0550', 'wavelength', 1550],
    ['12\u2009345\u2009678', 'plain', 12345678],
    ['0.000\u20091', 'plain', 0.0001],
    ['1\u2009234,5 m', 'length', 1.2345],
    ['1,55\u00a0µm', 'wavelength', 1550],
    ['\u00a01550\u00a0', 'wavelength', 1550],
    ['1e\u22123', 'plain', 0.001],
    ['+0,25 km', 'length', 0.25],
    ['0,0083 mm', 'size', 8.3],
    ['0.0012345', 'plain', 0.0012345],
    ['1234.5678 m', 'length', 1.2345678],
  ] as const)('%j typed as a %s reads as %s', (text, kind, expected) => {
    expect(parseQuantity('x', text, kind).value, `input ${JSON.stringify(text)}`).toBeCloseTo(expected, 12);
  });

  // A group separator must separate groups of three: anything else is more likely a slip than a number.
  it.each(['1\u200955', '1 550', '15\u20095\u20090', '1\u2009\u2009550', '\u22121\u2212 nm', '3\u20135', '1\u20095500', '0.12\u2009345'])('refuses %j', (text) => {
    expect(() => parseQuantity('x', text, 'wavelength')).toThrow(InputError);
  });
});

// Issue 12: "0.5 milliwatt" in a power field must be an error, never 0.5 dBm; the same for any word that is not a
// listed unit of the field's kind. The message lists the units in words, the InputError keeps its fields.
describe('words after the number that are not units of the field', () => {
  it.each([
    ['0.5 milliwatt', 'power'],
    ['0.5 milliwatts', 'power'],
    ['3 dB', 'power'],
    ['-3 dBm please', 'power'],
    ['0.5 mW W', 'power'],
    ['1550 nanometers', 'wavelength'],
    ['1550 nm!', 'wavelength'],
    ['2 miles', 'length'],
    ['15 inch', 'radius'],
    ['9.2 microns wide', 'size'],
    ['50 percent', 'ratio'],
    ['3 dB', 'plain'],
  ] as const)('%j in a %s field is refused, not read as the base unit', (text, kind: QuantityKind) => {
    let err: unknown;
    try {
      parseQuantity('fieldArg', text, kind);
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    const e = err as InputError;
    expect(e.argument).toBe('fieldArg');
    expect(e.allowed).toBe(UNITS_IN_WORDS[kind]);
    expect(typeof e.hint).toBe('string');
    expect(e.message).toContain(UNITS_IN_WORDS[kind]);
  });

  it('the power field names its units in words', () => {
    expect(UNITS_IN_WORDS.power).toMatch(/milliwatts \(mW\)/);
    expect(UNITS_IN_WORDS.power).toMatch(/microwatts/);
    expect(UNITS_IN_WORDS.power).toMatch(/dBm/);
  });

  it('"0.5 mW" is −3.01 dBm (10·log10 0.5, definition of dBm), so the refusal above is not a refusal of mW itself', () => {
    expect(parseQuantity('p', '0.5 mW', 'power').value).toBeCloseTo(-3.0103, 4);
  });
});
