import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  FUSED_SILICA,
  germaniaDopedSilica,
  germaniaFractionForNa,
  groupIndex,
  InputError,
  ModelError,
  refractiveIndex,
  refractiveIndexDerivatives,
  type SellmeierGlass,
} from '../../src/physics';

function expectWithin(got: number, expected: number, tol: number, input: unknown) {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`input ${JSON.stringify(input)}: got ${got}, expected ${expected}, tolerance ${tol}`);
}

describe('fused silica (Malitson 1965)', () => {
  // Published indices of fused silica at 20 °C (Malitson 1965, JOSA 55(10) 1205): 1.4584 at the sodium D line,
  // about 1.4468 at 1310 nm and 1.4440 at 1550 nm. The values are quoted to 4 decimals, so the tolerance is
  // half a unit of the last digit, 5e-5 (the three-term fit itself is good to about 1e-5).
  it.each([
    [589.3, 1.4584],
    [1310, 1.4468],
    [1550, 1.444],
  ])('n at %s nm is %s', (w, expected) => {
    expectWithin(refractiveIndex(FUSED_SILICA, w), expected, 5e-5, w);
  });

  // Group index of fused silica near 1550 nm ≈ 1.4626 (common practice, from memory); 5e-4 covers the spread of
  // quoted values (1.462–1.463).
  it('the group index at 1550 nm is about 1.4626', () => {
    expectWithin(groupIndex(FUSED_SILICA, 1550), 1.4626, 5e-4, 1550);
  });

  // Material zero-dispersion wavelength of fused silica ≈ 1.27 µm (common practice; Malitson-based value 1273 nm):
  // d²n/dλ² changes sign there. ±5 nm covers the quoted values 1270–1276 nm.
  it('d²n/dλ² of silica changes sign near 1273 nm (material zero-dispersion wavelength)', () => {
    expect(refractiveIndexDerivatives(FUSED_SILICA, 1268).d2nPerUm2).toBeGreaterThan(0);
    expect(refractiveIndexDerivatives(FUSED_SILICA, 1278).d2nPerUm2).toBeLessThan(0);
  });
});

describe('germania-doped silica (Fleming 1984 coefficients, linear interpolation)', () => {
  // Fleming 1978 measured a 13.5 mol % GeO₂ glass (coefficients 0.711040, 0.451885, 0.704048; 0.0642700,
  // 0.129408, 9.425478 µm, as tabulated in Kasap, Optoelectronics and Photonics, Table 1.2). The interpolation
  // comes from other samples, so agreement is expected to about 1.5e-3 in n, not to the fit accuracy.
  const FLEMING_1978_13_5: SellmeierGlass = {
    name: '13.5 mol % GeO₂ (Fleming 1978)',
    source: 'Fleming1978',
    terms: [
      { strength: 0.71104, resonanceUm: 0.06427 },
      { strength: 0.451885, resonanceUm: 0.129408 },
      { strength: 0.704048, resonanceUm: 9.425478 },
    ],
    validMinNm: 600,
    validMaxNm: 1800,
  };
  it.each([633, 850, 1310, 1550])('at %s nm the 13.5 mol %% glass matches Fleming 1978 within 1.5e-3', (w) => {
    expectWithin(refractiveIndex(germaniaDopedSilica(0.135), w), refractiveIndex(FLEMING_1978_13_5, w), 1.5e-3, w);
  });

  it('no germania gives exactly fused silica', () => {
    for (const w of [600, 1000, 1550, 1800]) expect(refractiveIndex(germaniaDopedSilica(0), w)).toBe(refractiveIndex(FUSED_SILICA, w));
  });

  it('more germania raises the index at every wavelength from 600 to 1800 nm', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 0.19, noNaN: true }), fc.double({ min: 600, max: 1800, noNaN: true }), (x, w) => {
        expect(refractiveIndex(germaniaDopedSilica(x + 0.01), w)).toBeGreaterThan(refractiveIndex(germaniaDopedSilica(x), w));
      }),
    );
  });

  // A standard single-mode core: Δn ≈ 0.005 for about 3.5 mol % GeO₂ (common practice: ~0.0015 per mol % near 1.3 µm).
  it('3.5 mol % GeO₂ raises the index by about 0.005 at 1310 nm', () => {
    const dn = refractiveIndex(germaniaDopedSilica(0.035), 1310) - refractiveIndex(FUSED_SILICA, 1310);
    expectWithin(dn, 0.0052, 0.0005, 0.035);
  });

  it('the germania fraction found for an NA gives that NA back', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.05, max: 0.25, noNaN: true }), fc.constantFrom(1310, 1550), (na, w) => {
        const x = germaniaFractionForNa(na, w);
        const n1 = refractiveIndex(germaniaDopedSilica(x), w);
        const n2 = refractiveIndex(FUSED_SILICA, w);
        expectWithin(Math.sqrt(n1 * n1 - n2 * n2), na, 1e-12, { na, w });
      }),
    );
  });
});

describe('analytic derivatives agree with finite differences', () => {
  // Central differences with h = 0.5 nm: truncation h²/6·n''' ≈ 2e-8 /µm for n' at 700 nm; for n'' truncation
  // h²/12·n'''' plus round-off ~4·eps·n/h² ≈ 5e-9 /µm²;
  // bounds 1e-7 /µm for n' and 1e-7 /µm² for n'' (n'' itself is ~4e-3 /µm² at 1550 nm).
  it('dn/dλ and d²n/dλ² match central differences from 700 to 1750 nm', () => {
    fc.assert(
      fc.property(fc.double({ min: 700, max: 1750, noNaN: true }), fc.double({ min: 0, max: 0.15, noNaN: true }), (w, x) => {
        const g = germaniaDopedSilica(x);
        const hUm = 0.0005;
        const n = (nm: number) => refractiveIndex(g, nm);
        const d = refractiveIndexDerivatives(g, w);
        const fd1 = (n(w + 0.5) - n(w - 0.5)) / (2 * hUm);
        const fd2 = (n(w + 0.5) - 2 * n(w) + n(w - 0.5)) / (hUm * hUm);
        expectWithin(d.dnPerUm, fd1, 1e-7, { w, x, what: "n'" });
        expectWithin(d.d2nPerUm2, fd2, 1e-7, { w, x, what: "n''" });
      }),
    );
  });
});

describe('bad input', () => {
  it.each([
    ['a wavelength typed in µm', () => refractiveIndex(FUSED_SILICA, 1.55), InputError],
    ['a doped core outside 600–1800 nm', () => refractiveIndex(germaniaDopedSilica(0.05), 400), ModelError],
    ['a mole fraction typed in percent beyond 20 %', () => germaniaDopedSilica(35), InputError],
    ['an NA no germania core reaches', () => germaniaFractionForNa(0.45, 1310), ModelError],
  ])('%s is refused', (_name, f, kind) => {
    expect(f).toThrow(kind);
  });
});
