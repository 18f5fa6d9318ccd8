import { describe, expect, it } from 'vitest';
import { naFromDelta, numericalAperture, relativeIndexDifference, vNumber } from '../../src/physics/fiber';
import { InputError } from '../../src/physics/errors';

describe('V-number, NA and Δ (Snyder & Love 1983 definitions)', () => {
  it('V = 2π a NA / λ: a 4.1 µm radius, NA 0.12 core at 1310 nm has V = 2.3597 (hand calculation)', () => {
    // 2π × 4.1 × 0.12 / 1.310 = 3.0913/1.310 = 2.35976…
    expect(vNumber({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 1310 })).toBeCloseTo((2 * Math.PI * 4.1 * 0.12) / 1.31, 12);
  });
  it('V scales as 1/λ: the same fiber at 1550 nm has V smaller by 1310/1550', () => {
    const v1310 = vNumber({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 1310 });
    const v1550 = vNumber({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 1550 });
    expect(v1550 / v1310).toBeCloseTo(1310 / 1550, 14);
  });
  it('NA = √(n1² − n2²): 1.4500 / 1.4450 gives NA = 0.12031 (hand calculation)', () => {
    expect(numericalAperture({ coreIndex: 1.45, claddingIndex: 1.445 })).toBeCloseTo(Math.sqrt(1.45 ** 2 - 1.445 ** 2), 14);
  });
  it('Δ = (n1² − n2²)/(2n1²) ≈ (n1 − n2)/n1 for a weakly guiding fiber (within 0.2 % of itself here)', () => {
    const delta = relativeIndexDifference({ coreIndex: 1.45, claddingIndex: 1.445 });
    expect(delta).toBeCloseTo((1.45 ** 2 - 1.445 ** 2) / (2 * 1.45 ** 2), 15);
    expect(Math.abs(delta / ((1.45 - 1.445) / 1.45) - 1)).toBeLessThan(2e-3);
  });
  it('NA from Δ inverts Δ from the indices', () => {
    const delta = relativeIndexDifference({ coreIndex: 1.45, claddingIndex: 1.445 });
    expect(naFromDelta({ coreIndex: 1.45, deltaPercent: delta * 100 })).toBeCloseTo(numericalAperture({ coreIndex: 1.45, claddingIndex: 1.445 }), 14);
  });
});

describe('bad fiber parameters are refused with a typed error that names the likely mistake', () => {
  it.each([
    ['a wavelength typed in µm', () => vNumber({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 1.55 }), /wavelengthNm.*did you mean 1550 nm/],
    ['a wavelength of 3000 nm', () => vNumber({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 3000 }), /wavelengthNm = 3000/],
    ['NA = 1', () => vNumber({ coreRadiusUm: 4.1, na: 1, wavelengthNm: 1310 }), /na = 1 .*NA < 1/],
    ['a zero core radius', () => vNumber({ coreRadiusUm: 0, na: 0.12, wavelengthNm: 1310 }), /coreRadiusUm = 0/],
    ['a core radius given in nm', () => vNumber({ coreRadiusUm: 4100, na: 0.12, wavelengthNm: 1310 }), /did you give it in nm/],
    ['NaN NA', () => vNumber({ coreRadiusUm: 4.1, na: Number.NaN, wavelengthNm: 1310 }), /na = NaN/],
    ['cladding index above the core', () => numericalAperture({ coreIndex: 1.445, claddingIndex: 1.45 }), /swapped/],
    ['an index below 1', () => numericalAperture({ coreIndex: 0.5, claddingIndex: 0.4 }), /at least 1/],
    ['indices giving NA ≥ 1', () => numericalAperture({ coreIndex: 2, claddingIndex: 1.5 }), /NA < 1/],
    ['Δ typed as a fraction above 50 %', () => naFromDelta({ coreIndex: 1.45, deltaPercent: 60 }), /percent/],
    ['a missing argument', () => vNumber({ coreRadiusUm: 4.1, na: 0.12 } as never), /wavelengthNm = missing/],
  ])('%s', (_label, call, message) => {
    expect(call).toThrow(InputError);
    expect(call).toThrow(message);
  });
});
