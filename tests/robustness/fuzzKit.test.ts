// Checks of the fuzz kit itself: what it calls a non-finite result, and what it lets through as the user's own words.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as physics from '../../src/physics';
import { checkCall, findNonFinite, inRange, mixValid, num, userTextsIn } from './fuzzKit';
import { seedFor, stableSeed } from '../setup/propertySeed';

describe('the fuzz kit tells computed NaN from text the user typed', () => {
  it('a field the user named "NaN" is echoed, not flagged (the clean-run failure of issue 12)', () => {
    expect(() => checkCall('kit', 'tabulatedRadialField', physics.tabulatedRadialField, ['NaN', 0.5, [1, 0.6, 0.2, 0], 1550])).not.toThrow();
    expect(findNonFinite({ name: 'NaN' }, 'result', new WeakSet(), userTextsIn(['NaN']))).toBeUndefined();
    expect(findNonFinite({ name: 'Infinity loop splice' }, 'result', new WeakSet(), userTextsIn([{ label: 'Infinity loop splice' }]))).toBeUndefined();
  });

  it.each([
    [{ lossDb: Number.NaN }, []],
    [{ text: 'loss NaN dB' }, []],
    [{ text: 'loss NaN dB', name: 'A' }, ['A']],
    [{ values: new Float64Array([1, Number.POSITIVE_INFINITY]) }, []],
    [{ text: 'undefined dB' }, ['a name']],
  ])('a computed non-finite value is still flagged: %o', (result, args) => {
    expect(findNonFinite(result, 'result', new WeakSet(), userTextsIn(args))).toBeDefined();
  });
});

describe('property tests are deterministic', () => {
  it('the seed of a test is a fixed hash of its file and name (FNV-1a)', () => {
    // FNV-1a of the empty text is the offset basis 0x811c9dc5 (Fowler–Noll–Vo reference), as a signed 32-bit integer.
    expect(stableSeed('')).toBe(0x811c9dc5 | 0);
    const task = { name: 'x', suite: { name: 'suite' }, file: { name: 'tests/a.test.ts' } };
    expect(seedFor(task)).toBe(seedFor(task));
    expect(seedFor(task)).not.toBe(seedFor({ ...task, name: 'y' }));
  });

  it('the same seed draws the same inputs', () => {
    const arb = fc.tuple(mixValid(inRange(0, 1), num(-5, 5)), fc.string());
    expect(fc.sample(arb, { seed: 42, numRuns: 20 })).toEqual(fc.sample(arb, { seed: 42, numRuns: 20 }));
  });
});
