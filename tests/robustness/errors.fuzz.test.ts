// Fuzzing of src/physics/errors.ts: the guards every other function relies on, and the error classes.
// A guard either returns its argument unchanged (a finite number inside the range) or throws InputError;
// building an error from any value must itself never throw (the UI builds messages from stored data).
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { WAVELENGTH_MAX_NM, WAVELENGTH_MIN_NM } from '../../src/physics';
import { anyDouble, edgeNumber, fuzz, maybe, notANumber, num, reportAfterAll } from './fuzzKit';

const M = 'errors';
const value = num(-1e6, 1e6);
const bound = fc.oneof(num(-1e3, 1e3, { junk: 0 }), fc.constant(undefined));
const spec = fc.oneof(
  { arbitrary: fc.record({ min: maybe(bound), max: maybe(bound), minInclusive: maybe(fc.boolean()), maxInclusive: maybe(fc.boolean()), unit: maybe(fc.constantFrom('nm', 'dB', 'µm')), hint: maybe(fc.oneof(fc.string(), fc.constant((v: number) => `did you mean ${-v}?`))) }), weight: 8 },
  { arbitrary: fc.constant(undefined), weight: 1 },
) as fc.Arbitrary<physics.RangeSpec>;
const anything = fc.oneof(anyDouble, edgeNumber, notANumber, fc.string(), fc.anything());

function returnsItsArgument(r: number, args: unknown[]): void {
  if (!Object.is(r, args[1])) throw new Error(`returned ${r}, not its argument ${String(args[1])}`);
}

describe('errors: guards pass a finite in-range number through or throw InputError', () => {
  reportAfterAll(M);
  fuzz(M, 'requireNumber', physics.requireNumber, fc.tuple(fc.constant('x'), value, spec), (r, args) => {
    returnsItsArgument(r, args);
    const s = args[2] ?? {};
    if (s.min !== undefined && Number.isFinite(s.min) && r < s.min) throw new Error(`accepted ${r} below min ${s.min}`);
    if (s.max !== undefined && Number.isFinite(s.max) && r > s.max) throw new Error(`accepted ${r} above max ${s.max}`);
  });
  fuzz(M, 'requirePositive', physics.requirePositive, fc.tuple(fc.constant('x'), value, fc.oneof(fc.constant(undefined), fc.record({ max: maybe(bound) }))), (r, args) => {
    returnsItsArgument(r, args);
    if (!(r > 0)) throw new Error(`accepted ${r}, not > 0`);
  }, { inRange: fc.tuple(fc.constant('x'), fc.double({ min: Number.MIN_VALUE, max: 1e300, noNaN: true }), fc.constant(undefined)) });
  fuzz(M, 'requireInteger', physics.requireInteger, fc.tuple(fc.constant('count'), fc.oneof(fc.integer({ min: -150, max: 150 }), fc.integer(), value), fc.integer({ min: -100, max: 0 }), fc.integer({ min: 0, max: 100 })), (r, args) => {
    returnsItsArgument(r, args);
    if (!Number.isInteger(r) || r < args[2] || r > args[3]) throw new Error(`accepted ${r} outside whole numbers ${args[2]}..${args[3]}`);
  }, { inRange: fc.tuple(fc.constant('count'), fc.integer({ min: -100, max: 100 }), fc.constant(-100), fc.constant(100)) });
  fuzz(M, 'requireWavelengthNm', physics.requireWavelengthNm, fc.tuple(fc.constant('wavelengthNm'), num(0, 3000)), (r, args) => {
    returnsItsArgument(r, args);
    if (r < WAVELENGTH_MIN_NM || r > WAVELENGTH_MAX_NM) throw new Error(`accepted ${r} nm`);
  }, { inRange: fc.tuple(fc.constant('wavelengthNm'), fc.double({ min: WAVELENGTH_MIN_NM, max: WAVELENGTH_MAX_NM, noNaN: true })) });
  // A predicate and constructors: every input is in range and must give an answer (never throw).
  const errorLike = fc.tuple(fc.oneof(anything, fc.constant(new physics.InputError('x', 1, 'y')), fc.constant(new TypeError('t'))) as fc.Arbitrary<unknown>);
  fuzz(M, 'isCalcError', physics.isCalcError, errorLike, (r, [e]) => {
    if (r !== e instanceof physics.CalcError) throw new Error(`said ${r}`);
  }, { inRange: errorLike, minSuccessShare: 1 });
  // Constructors: any offending value (NaN, a bigint, a cyclic object…) still gives a message in words.
  // The error keeps the offending value as given (it may be NaN), so the check looks at the message only.
  const built = (e: Error) => ({ isCalcError: e instanceof physics.CalcError, messageLength: e.message.length, name: e.name });
  const wellFormed = (r: ReturnType<typeof built>) => {
    if (!r.isCalcError || !(r.messageLength > 0)) throw new Error(`${r.name} without a message`);
  };
  const inputErrorArgs = fc.tuple(fc.string(), anything, fc.string(), maybe(fc.string()));
  fuzz(M, 'InputError', (a: string, v: unknown, allowed: string, hint?: string) => built(new physics.InputError(a, v, allowed, hint)), inputErrorArgs, wellFormed, { inRange: inputErrorArgs, minSuccessShare: 1 });
  const modelErrorArgs = fc.tuple(fc.string({ minLength: 1 }), fc.string(), maybe(fc.string()));
  fuzz(M, 'ModelError', (m: string, model: string, hint?: string) => built(new physics.ModelError(m, model, hint)), modelErrorArgs, wellFormed, { inRange: modelErrorArgs, minSuccessShare: 1 });
  const calcErrorArgs = fc.tuple(fc.string({ minLength: 1 }));
  fuzz(M, 'CalcError', (m: string) => built(new physics.CalcError(m)), calcErrorArgs, wellFormed, { inRange: calcErrorArgs, minSuccessShare: 1 });
});
