// Fuzzing of src/physics/materials.ts: Sellmeier indices of silica, GeO2 glass and doped silica, and the GeO2
// fraction for an NA (a 60-step bisection: still microseconds). Glasses are the published ones, doped ones from
// fuzzed mole fractions, and broken glass objects. Full 10,000 runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { FUSED_SILICA, GERMANIA_GLASS, MAX_GERMANIA_FRACTION } from '../../src/physics';
import { expectBetween, expectFinitePositive, fuzz, inRange, mixValid, notANumber, num, reportAfterAll } from './fuzzKit';

const M = 'materials';
const fraction = num(0, 0.25);
const glass = fc.oneof(
  { arbitrary: fc.constantFrom(FUSED_SILICA, GERMANIA_GLASS), weight: 4 },
  { arbitrary: inRange(0, MAX_GERMANIA_FRACTION).map((x) => physics.germaniaDopedSilica(x)), weight: 4 },
  {
    arbitrary: fc.oneof(
      notANumber,
      fc.record({ name: fc.string(), source: fc.string(), terms: fc.oneof(fc.array(fc.record({ strength: num(-2, 2), resonanceUm: num(-1, 12) }), { maxLength: 4 }), notANumber), validMinNm: num(0, 3000), validMaxNm: num(0, 5000) }),
    ),
    weight: 2,
  },
) as fc.Arbitrary<physics.SellmeierGlass>;
const wavelength = mixValid(inRange(600, 1800), num(150, 4500));

describe('materials: every glass and wavelength gives a real index ≥ 1 or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'germaniaDopedSilica', physics.germaniaDopedSilica, fc.tuple(fraction), (r) => {
    for (const t of r.terms) expectFinitePositive(t.strength, 'oscillator strength');
  });
  fuzz(M, 'refractiveIndexDerivatives', physics.refractiveIndexDerivatives, fc.tuple(glass, wavelength), (r) => {
    if (!(r.n >= 1)) throw new Error(`n = ${r.n}, expected ≥ 1`);
  });
  fuzz(M, 'refractiveIndex', physics.refractiveIndex, fc.tuple(glass, wavelength), (r) => {
    if (!(r >= 1)) throw new Error(`n = ${r}, expected ≥ 1`);
  });
  fuzz(M, 'groupIndex', physics.groupIndex, fc.tuple(glass, wavelength), (r) => {
    // Positive Sellmeier terms give normal dispersion (dn/dλ < 0), so N = n − λ dn/dλ ≥ n ≥ 1.
    if (!(r >= 1)) throw new Error(`group index ${r}, expected ≥ 1`);
  });
  fuzz(M, 'germaniaFractionForNa', physics.germaniaFractionForNa, mixValid(fc.tuple(inRange(0.01, 0.3), inRange(600, 1800)), fc.tuple(num(0, 0.6), num(150, 2600))), (r) =>
    expectBetween(r, 0, MAX_GERMANIA_FRACTION, 'GeO2 mole fraction'),
  );
});
