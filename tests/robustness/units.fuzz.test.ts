// Fuzzing of src/physics/units.ts: what a person types into a field. Texts are built from a number part
// (ordinary, with a decimal comma, exponent, huge, signed zero, hexadecimal…) and a unit part (every accepted
// unit, upper-case spellings, unknown words), plus raw hostile strings: empty, spaces, long, markup, emoji,
// right-to-left digits and marks. All cheap: full 10,000 runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_FIELD_CHARS } from '../../src/physics';
import { anyDouble, edgeNumber, fuzz, notANumber, reportAfterAll } from './fuzzKit';

const M = 'units';
const KINDS: physics.QuantityKind[] = ['wavelength', 'length', 'radius', 'size', 'power', 'ratio', 'plain'];
const UNITS = ['', 'constructor', 'toString', '__proto__', 'hasOwnProperty', 'nm', 'µm', 'um', 'μm', 'micron', 'km', 'm', 'mm', 'cm', 'dBm', 'dbm', 'mW', 'µW', 'uW', 'nW', 'W', '%', 'KM', 'Nm', 'furlong', 'dB'];
const UNITS_BY_KIND: Record<physics.QuantityKind, string[]> = {
  wavelength: ['', 'nm', 'µm', 'um', 'μm', 'micron', 'NM'],
  length: ['', 'km', 'm', 'mm', 'KM'],
  radius: ['', 'mm', 'cm', 'm', 'µm', 'um'],
  size: ['', 'µm', 'um', 'nm', 'mm'],
  power: ['', 'dBm', 'dbm', 'mW', 'µW', 'μW', 'uW', 'nW', 'W'],
  ratio: ['', '%'],
  plain: [''],
};
const HOSTILE_TEXTS = [
  '',
  ' ',
  '   ',
  '1e309',
  '-1e309',
  '-0',
  '0x10',
  '1,2,3',
  '1.2.3',
  '1,5.5',
  'x'.repeat(10_000),
  '<img src=x onerror=alert(1)>',
  '<script>alert(1)</script>',
  '🔥',
  '1550 🔥',
  '١٥٥٠',
  '\u200f1550\u200f',
  '1550\u202e',
  'NaN',
  'Infinity',
  '-Infinity',
  'e5',
  '.',
  '-',
  '+',
  '1e',
  '1e+',
  '\u00a01550\u00a0',
  '1\u00a0550',
  '0b101',
  '1_000',
  '9'.repeat(400),
  '0.' + '0'.repeat(60) + '1',
  '0.5 milliwatt',
  '\u22123 dBm',
  '1\u2009550\u2009nm',
  '1\u2009\u2009550',
];
const numberPart = fc.oneof(
  fc.double({ min: -1e4, max: 1e4, noNaN: true }).map((x) => String(x)),
  fc.double({ min: -1e4, max: 1e4, noNaN: true }).map((x) => String(x).replace('.', ',')),
  fc.oneof(edgeNumber, anyDouble).map((x) => String(x)),
  fc.constantFrom('1e308', '1e-308', '5e-324', '-0', '0x10', '1,2,3', '١٥٥٠', '1e309'),
  // Typography: minus U+2212, en dash U+2013, digits grouped by thin, narrow no-break and no-break spaces.
  fc.tuple(fc.constantFrom('\u2212', '\u2013', '', '-'), fc.integer({ min: 1, max: 999 }), fc.array(fc.constantFrom('\u2009', '\u202f', '\u00a0', ' ', ''), { maxLength: 3 }), fc.integer({ min: 0, max: 999 }))
    .map(([sign, a, seps, b]) => sign + String(a) + seps.map((sp) => sp + String(b).padStart(3, '0')).join('')),
);
const text = fc.oneof(
  { arbitrary: fc.tuple(numberPart, fc.constantFrom('', ' ', '  '), fc.constantFrom(...UNITS)).map(([n, sp, u]) => n + sp + u), weight: 6 },
  { arbitrary: fc.constantFrom(...HOSTILE_TEXTS), weight: 2 },
  { arbitrary: fc.string({ maxLength: 80 }), weight: 1 },
  { arbitrary: fc.string({ unit: 'grapheme', maxLength: 20 }), weight: 1 },
  { arbitrary: notANumber, weight: 1 },
) as fc.Arbitrary<string>;
const kind = fc.oneof({ arbitrary: fc.constantFrom(...KINDS), weight: 9 }, { arbitrary: fc.constantFrom('speed', '', 'constructor', '__proto__', 'toString'), weight: 1 }) as fc.Arbitrary<physics.QuantityKind>;

describe('units: every typed text gives one finite value or a typed error', () => {
  reportAfterAll(M);
  // Half the texts carry a unit of the field's own kind, so a good share parse and the conversions run.
  const matched = fc.constantFrom(...KINDS).chain((k) =>
    fc.tuple(fc.constant('field'), fc.tuple(numberPart, fc.constantFrom('', ' '), fc.constantFrom(...UNITS_BY_KIND[k])).map(([n, sp, u]) => n + sp + u), fc.constant(k)),
  );
  const args = fc.oneof(matched, fc.tuple(fc.constantFrom('wavelengthNm', 'lengthKm'), text, kind));
  // In range: an ordinary number (decimal point or comma) with a unit of the field's own kind, or none.
  const ordinary = fc.double({ min: 1e-3, max: 1e4, noNaN: true }).map((x) => String(Number(x.toPrecision(6))));
  const inRangeText = fc.constantFrom(...KINDS.filter((k) => k !== 'power')).chain((k) =>
    fc.tuple(fc.constant('field'), fc.tuple(ordinary, fc.constantFrom('', ' '), fc.constantFrom(...UNITS_BY_KIND[k])).map(([n, sp, u]) => n + sp + u), fc.constant(k)),
  );
  fuzz(M, 'parseQuantity', physics.parseQuantity, args, (r, [, t]) => {
    if (typeof t !== 'string' || t.length > MAX_FIELD_CHARS) throw new Error('accepted a text it should refuse');
    if (Object.is(r.value, -0)) throw new Error('gave −0, which a field would show as "-0"');
  }, { inRange: inRangeText, minSuccessShare: 0.99 });
  fuzz(M, 'formatPlain', physics.formatPlain, fc.tuple(fc.oneof(anyDouble, edgeNumber, notANumber as fc.Arbitrary<number>)), (r) => {
    if (typeof r !== 'string' || r === '') throw new Error(`gave ${JSON.stringify(r)}, expected a number in words`);
  }, { inRange: fc.tuple(fc.double({ noNaN: true, noDefaultInfinity: true })), minSuccessShare: 1 });
});
