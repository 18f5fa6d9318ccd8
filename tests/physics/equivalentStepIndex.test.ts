import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  CABLE_BELOW_FIBER_CUTOFF_NM,
  checkLabel,
  equivalentStepIndex,
  THEORETICAL_ABOVE_FIBER_CUTOFF_NM,
} from '../../src/physics/equivalentStepIndex';
import { modeFieldDiameterUm } from '../../src/physics/modeField';
import { InputError, ModelError } from '../../src/physics/errors';

/** LP11 cutoff: the first zero of J0, 2.404825557695773 (A&S Table 9.5), written out rather than read from the code. */
const FIRST_ZERO_J0 = 2.404825557695773;

/** The label of a G.652.D-class fiber (ITU-T G.652 (11/2016): cable cutoff ≤ 1260 nm; MFD 9.2 µm at 1310 nm, a value inside its nominal range). */
const G652D_LABEL = { cutoffWavelengthNm: 1260, cutoffKind: 'cable' as const, mfdUm: 9.2, mfdWavelengthNm: 1310 };

describe('equivalent step-index fiber from a label', () => {
  // The label is built with the code's own cutoff offsets on purpose: this checks the inversion (label → fiber → label),
  // not the offsets, which are common practice and stated in the next test.
  it('recovers a known step-index fiber from the label it would carry (round trip, 1e-10)', () => {
    fc.assert(
      fc.property(fc.double({ min: 2.5, max: 6, noNaN: true }), fc.double({ min: 0.09, max: 0.2, noNaN: true }), fc.constantFrom('fiber', 'cable'), (a, na, kind) => {
        const theoretical = (2 * Math.PI * a * na * 1000) / FIRST_ZERO_J0;
        const label = theoretical - THEORETICAL_ABOVE_FIBER_CUTOFF_NM - (kind === 'cable' ? CABLE_BELOW_FIBER_CUTOFF_NM : 0);
        const mfdWavelengthNm = 1550;
        const mfdUm = modeFieldDiameterUm({ coreRadiusUm: a, na, wavelengthNm: mfdWavelengthNm, definition: 'petermann2' }).mfdUm;
        fc.pre(label > 200 && label < 2500 && mfdUm < 50);
        const fit = equivalentStepIndex({ cutoffWavelengthNm: label, cutoffKind: kind, mfdUm, mfdWavelengthNm });
        expect(Math.abs(fit.coreRadiusUm / a - 1)).toBeLessThan(1e-10);
        expect(Math.abs(fit.na / na - 1)).toBeLessThan(1e-10);
      }),
      { numRuns: 30 },
    );
  });

  it('a G.652.D label (cable cutoff 1260 nm, MFD 9.2 µm at 1310 nm) reproduces both label values', () => {
    const fit = equivalentStepIndex(G652D_LABEL);
    // Regression pin of the stated offsets (common practice, rough): a cable cutoff sits ~50 nm below the fiber cutoff
    // (30–100 nm) and the measured fiber cutoff ~30 nm below the theoretical one: 1260 + 50 + 30 = 1340 nm.
    expect(fit.theoreticalCutoffWavelengthNm).toBe(1340);
    expect(CABLE_BELOW_FIBER_CUTOFF_NM + THEORETICAL_ABOVE_FIBER_CUTOFF_NM).toBe(80);
    // The real checks: V = 2.4048 (first zero of J0, A&S Table 9.5) at that wavelength, and the label MFD reproduced.
    const vAtCutoff = (2 * Math.PI * fit.coreRadiusUm * fit.na * 1000) / fit.theoreticalCutoffWavelengthNm;
    expect(vAtCutoff).toBeCloseTo(FIRST_ZERO_J0, 12);
    const mfd = modeFieldDiameterUm({ coreRadiusUm: fit.coreRadiusUm, na: fit.na, wavelengthNm: 1310, definition: 'petermann2' }).mfdUm;
    expect(mfd).toBeCloseTo(9.2, 10);
    expect(fit.warnings).toEqual([]);
    expect(fit.notes.join(' ')).toMatch(/cable cutoff/);
  });

  it('says which cutoff it was given: a fiber-cutoff label gives a smaller core than the same number read as a cable cutoff', () => {
    const asCable = equivalentStepIndex(G652D_LABEL);
    const asFiber = equivalentStepIndex({ ...G652D_LABEL, cutoffKind: 'fiber' });
    expect(asFiber.theoreticalCutoffWavelengthNm).toBeLessThan(asCable.theoreticalCutoffWavelengthNm);
    expect(asFiber.notes[0]).toMatch(/fiber cutoff/);
  });

  it.each([
    ['an MFD quoted below the cutoff', { ...G652D_LABEL, mfdWavelengthNm: 1200 }, /normally specified where the fiber is single-mode/],
    ['a label core diameter far from the equivalent one', { ...G652D_LABEL, coreDiameterUm: 12 }, /differs by/],
    ['an unusually high NA', { ...G652D_LABEL, mfdUm: 3 }, /unusual for a single-mode fiber/],
  ])('warns about %s, and still gives a fit', (_label, input, message) => {
    const fit = equivalentStepIndex(input);
    expect(fit.warnings.join(' ')).toMatch(message);
    expect(fit.coreRadiusUm).toBeGreaterThan(0);
  });

  it('refuses values no step-index fiber can match with a ModelError and a hint', () => {
    const call = () => equivalentStepIndex({ cutoffWavelengthNm: 2400, cutoffKind: 'cable', mfdUm: 1, mfdWavelengthNm: 1310 });
    expect(call).toThrow(ModelError);
    expect(call).toThrow(/No step-index fiber/);
  });

  it.each([
    ['a missing cutoff kind', { ...G652D_LABEL, cutoffKind: undefined }, /say which cutoff/],
    ['an MFD in nm', { ...G652D_LABEL, mfdUm: 9200 }, /did you give it in nm/],
    ['an MFD of 0.5 µm', { ...G652D_LABEL, mfdUm: 0.5 }, /check the unit/],
    ['a cutoff in µm', { ...G652D_LABEL, cutoffWavelengthNm: 1.26 }, /did you mean 1260 nm/],
    ['a NaN reference wavelength', { ...G652D_LABEL, mfdWavelengthNm: Number.NaN }, /mfdWavelengthNm = NaN/],
  ])('refuses %s with an InputError', (_label, input, message) => {
    const call = () => equivalentStepIndex(input as never);
    expect(call).toThrow(InputError);
    expect(call).toThrow(message);
  });
});

describe("the inspector's label check at a system wavelength", () => {
  it('G.652.D at 1550 nm: single-mode, with the reasons in plain words', () => {
    const result = checkLabel({ ...G652D_LABEL, wavelengthNm: 1550 });
    expect(result.verdict).toBe('single-mode');
    expect(result.reasons[0]).toMatch(/1550 nm is 290 nm above the label's cable cutoff of 1260 nm/);
    expect(result.reasons.join(' ')).toMatch(/Only LP01 is guided/);
    expect(result.mfdAtWavelengthUm).toBeGreaterThan(9.2);
  });
  it('G.652.D at 1310 nm: single-mode in practice, though LP11 is theoretically guided just above its cutoff', () => {
    const result = checkLabel({ ...G652D_LABEL, wavelengthNm: 1310 });
    expect(result.verdict).toBe('single-mode-in-practice');
    expect(result.reasons.join(' ')).toMatch(/lost within metres/);
    expect(result.mfdAtWavelengthUm).toBeCloseTo(9.2, 10);
  });
  it('G.652.D at 1250 nm: not single-mode (below the cable cutoff)', () => {
    expect(checkLabel({ ...G652D_LABEL, wavelengthNm: 1250 }).verdict).toBe('not-single-mode');
  });
  it('within 30 nm above the cutoff the verdict carries a caution', () => {
    expect(checkLabel({ ...G652D_LABEL, wavelengthNm: 1280 }).reasons.join(' ')).toMatch(/within 30 nm of the cutoff/);
  });
  it('G.652.D at 850 nm: not single-mode, and it says how many modes', () => {
    const result = checkLabel({ ...G652D_LABEL, wavelengthNm: 850 });
    expect(result.verdict).toBe('not-single-mode');
    expect(result.reasons[1]).toMatch(/guides \d+ LP modes at 850 nm/);
  });
});
