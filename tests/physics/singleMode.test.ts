import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { singleModeCheck } from '../../src/physics/singleMode';
import { InputError } from '../../src/physics/errors';
import { LP11_CUTOFF_V } from '../../src/physics/lpModes';

/** A standard-like single-mode fiber (our choice): a = 4.1 µm, NA = 0.12 → λc = 2π·4.1·0.12/2.405 µm = 1285.5 nm. */
const FIBER = { coreRadiusUm: 4.1, na: 0.12 };
const THEORETICAL_CUTOFF_NM = (2 * Math.PI * 4.1 * 0.12 * 1000) / LP11_CUTOFF_V;

describe('single-mode check of a step-index fiber at a wavelength', () => {
  it('the LP11 cutoff wavelength is where V = 2.405 (common practice): 1285.5 nm for this fiber', () => {
    expect(singleModeCheck({ ...FIBER, wavelengthNm: 1310 }).lp11CutoffWavelengthNm).toBeCloseTo(THEORETICAL_CUTOFF_NM, 9);
    expect(THEORETICAL_CUTOFF_NM).toBeCloseTo(1285.5, 1);
  });

  it('at 1310 nm it is single-mode: V = 2.36, one LP mode (HE11), two modes with polarization', () => {
    const check = singleModeCheck({ ...FIBER, wavelengthNm: 1310 });
    expect(check.v).toBeCloseTo(2.35979, 4);
    expect(check.singleMode).toBe(true);
    expect([check.lpModeCount, check.vectorFamilyCount, check.totalModeCount]).toEqual([1, 1, 2]);
    expect(check.modes[0].vectorModes).toEqual(['HE11']);
    expect(check.wavelengthMarginNm).toBeCloseTo(1310 - THEORETICAL_CUTOFF_NM, 9);
    expect(check.summary).toMatch(/^V = 2\.36, 1\.9 % below the LP11 cutoff V = 2\.405: single-mode\./);
  });

  it('a 1285 nm cutoff fiber carries two LP modes at 850 nm: LP01 and LP11, i.e. HE11 + TE01, TM01, HE21 = 6 modes', () => {
    // V = 3.64: above j_{0,1} = 2.405 (LP11), below j_{1,1} = 3.832 (LP21, LP02), A&S Table 9.5
    const check = singleModeCheck({ ...FIBER, wavelengthNm: 850 });
    expect(check.singleMode).toBe(false);
    expect(check.modes.map((m) => `LP${m.l}${m.m}`)).toEqual(['LP01', 'LP11']);
    expect([check.lpModeCount, check.vectorFamilyCount, check.totalModeCount]).toEqual([2, 4, 6]);
    expect(check.summary).toMatch(/above the LP11 cutoff V = 2\.405: not single-mode\. 2 LP modes are guided \(LP01, LP11\), 6 modes/);
  });

  it.each([
    [850, false],
    [1300, true],
    [1310, true],
    [1490, true],
    [1550, true],
    [1625, true],
  ])('at the common operating wavelength %i nm: single-mode = %s', (wavelengthNm, expected) => {
    expect(singleModeCheck({ ...FIBER, wavelengthNm }).singleMode).toBe(expected);
  });

  it('accepts core and cladding indices or Δ instead of the NA, with the same answer', () => {
    const n1 = 1.45;
    const n2 = Math.sqrt(n1 * n1 - 0.12 * 0.12);
    const delta = ((n1 * n1 - n2 * n2) / (2 * n1 * n1)) * 100;
    const byNa = singleModeCheck({ ...FIBER, wavelengthNm: 1310 });
    const byIndices = singleModeCheck({ coreRadiusUm: 4.1, coreIndex: n1, claddingIndex: n2, wavelengthNm: 1310 });
    const byDelta = singleModeCheck({ coreRadiusUm: 4.1, coreIndex: n1, deltaPercent: delta, wavelengthNm: 1310 });
    expect(byIndices.v).toBeCloseTo(byNa.v, 12);
    expect(byDelta.v).toBeCloseTo(byNa.v, 12);
  });

  it('near the cutoff the summary says so in plain words', () => {
    // a wavelength just below the theoretical cutoff, so LP11 is guided by a hair
    const check = singleModeCheck({ ...FIBER, wavelengthNm: THEORETICAL_CUTOFF_NM * (1 - 1e-8) });
    expect(check.singleMode).toBe(false);
    expect(check.summary).toMatch(/LP11 is right at its cutoff/);
  });

  it('counts agree with the mode list for any fiber and wavelength (property)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 1, max: 30, noNaN: true }),
        fc.double({ min: 0.05, max: 0.3, noNaN: true }),
        fc.double({ min: 600, max: 1700, noNaN: true }),
        (coreRadiusUm, na, wavelengthNm) => {
          const check = singleModeCheck({ coreRadiusUm, na, wavelengthNm });
          expect(check.lpModeCount).toBe(check.modes.length);
          expect(check.totalModeCount).toBe(check.modes.reduce((s, m) => s + m.degeneracy, 0));
          expect(check.singleMode).toBe(check.v <= LP11_CUTOFF_V);
          expect(check.singleMode).toBe(check.wavelengthMarginNm >= 0);
        },
      ),
      { numRuns: 60 },
    );
  });
});

describe('bad input to the single-mode check is refused with a typed, explained error', () => {
  it.each([
    ['a wavelength typed in µm', { ...FIBER, wavelengthNm: 1.55 }, /did you mean 1550 nm/],
    ['a wavelength in metres', { ...FIBER, wavelengthNm: 1.31e-6 }, /did you mean 1310 nm/],
    ['a wavelength outside 200–2500 nm', { ...FIBER, wavelengthNm: 10600 }, /200 to 2500 nm/],
    ['NA ≥ 1', { coreRadiusUm: 4.1, na: 1, wavelengthNm: 1310 }, /NA < 1/],
    ['a negative core radius', { coreRadiusUm: -4.1, na: 0.12, wavelengthNm: 1310 }, /coreRadiusUm = -4.1/],
    ['an infinite core radius', { coreRadiusUm: Infinity, na: 0.12, wavelengthNm: 1310 }, /coreRadiusUm = Infinity/],
    ['no index contrast at all', { coreRadiusUm: 4.1, wavelengthNm: 1310 }, /one way of stating the index contrast/],
    ['both an NA and indices', { coreRadiusUm: 4.1, na: 0.12, coreIndex: 1.45, claddingIndex: 1.445, wavelengthNm: 1310 }, /only one of/],
    ['cladding above core', { coreRadiusUm: 4.1, coreIndex: 1.445, claddingIndex: 1.45, wavelengthNm: 1310 }, /swapped/],
    ['Δ as a fraction typed too big', { coreRadiusUm: 4.1, coreIndex: 1.45, deltaPercent: 80, wavelengthNm: 1310 }, /percent/],
  ])('%s', (_label, input, message) => {
    const call = () => singleModeCheck(input as never);
    expect(call).toThrow(InputError);
    expect(call).toThrow(message);
  });
});

describe('mode names in the summary a technician reads', () => {
  // V just above the cutoff of LP10,1: the first zero of J9, j9,1 = 13.35430 (A&S Table 9.5;
  // 13.354300477435 from scipy.special.jn_zeros(9, 1)), so LP10,1 is the mode right at its cutoff.
  const J9_1 = 13.354300477435;
  const a = 25;
  const wavelengthNm = 1000;
  const na = ((J9_1 + 2e-7) * (wavelengthNm / 1000)) / (2 * Math.PI * a);

  it('a mode with a two-digit index is named with a comma, "LP10,1", never the ambiguous "LP101"', () => {
    const check = singleModeCheck({ coreRadiusUm: a, na, wavelengthNm });
    expect(check.v).toBeCloseTo(J9_1, 6);
    expect(check.summary).toContain('LP10,1 is right at its cutoff');
    expect(check.summary).not.toMatch(/LP\d{3}/);
  });
});
