// Fuzzing of src/physics/dispersion.ts. One point costs a mode solve and Sellmeier derivatives (tens of µs);
// a sweep is up to a few hundred points and the zero search a bracketing scan, so sweeps use coarse steps
// in the valid share (≥ 20 nm: at most 60 points) to keep 10,000 runs within a few seconds.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { DISPERSION_MAX_NM, DISPERSION_MIN_NM } from '../../src/physics';
import { expectFinitePositive, expectNonNegative, fuzz, inRange, maybe, mixValid, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'dispersion';
const validFiber = fc.record({ coreRadiusUm: inRange(2, 6), germaniaFraction: inRange(0.01, 0.15) });
const fiber = mixValid(validFiber, objectOr(fc.record({ coreRadiusUm: num(0, 40), germaniaFraction: num(0, 0.3) }))) as fc.Arbitrary<physics.DispersionFiber>;
const wavelength = mixValid(inRange(DISPERSION_MIN_NM, DISPERSION_MAX_NM), num(150, 2600));
const checkPoint = (p: physics.DispersionPoint) => {
  if (!(p.b > 0 && p.b < 1)) throw new Error(`b = ${p.b}`);
  if (!(p.groupIndex > 1 && p.effectiveIndex > 1)) throw new Error(`indices ${p.effectiveIndex} / ${p.groupIndex}`);
};

describe('dispersion: every fiber and wavelength gives a finite D or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'dispersionFiberFromNa', physics.dispersionFiberFromNa, fc.tuple(mixValid(fc.record({ coreRadiusUm: inRange(2, 6), na: inRange(0.08, 0.2), referenceWavelengthNm: maybe(inRange(1200, 1600)) }), objectOr(fc.record({ coreRadiusUm: num(0, 40), na: num(0, 0.6), referenceWavelengthNm: maybe(num(150, 2600)) })))), (r) => {
    expectFinitePositive(r.coreRadiusUm, 'core radius');
    expectFinitePositive(r.germaniaFraction, 'GeO2 fraction');
  });
  fuzz(M, 'lp01WaveguideFunctions', physics.lp01WaveguideFunctions, fc.tuple(mixValid(inRange(0.5, 3), num(0, 400))), (r) => {
    if (!(r.b > 0 && r.b < 1)) throw new Error(`b = ${r.b}`);
  });
  fuzz(M, 'chromaticDispersion', physics.chromaticDispersion, fc.tuple(fiber, wavelength), checkPoint);
  const glass = fc.oneof(
    { arbitrary: fc.constantFrom(physics.FUSED_SILICA, physics.GERMANIA_GLASS), weight: 4 },
    { arbitrary: inRange(0, physics.MAX_GERMANIA_FRACTION).map((x) => physics.germaniaDopedSilica(x)), weight: 4 },
    { arbitrary: objectOr(fc.record({ name: fc.string(), source: fc.string(), terms: fc.array(fc.record({ strength: num(-2, 2), resonanceUm: num(-1, 12) }), { maxLength: 4 }), validMinNm: num(0, 3000), validMaxNm: num(0, 5000) })), weight: 2 },
  ) as fc.Arbitrary<physics.SellmeierGlass>;
  const glassInput = objectOr(fc.record({ glass, wavelengthNm: wavelength }));
  // Material dispersion of any glass is finite where the Sellmeier sum is; a sign is not implied (it crosses zero).
  fuzz(M, 'materialDispersionPsPerNmKm', physics.materialDispersionPsPerNmKm, fc.tuple(glassInput), (r) => {
    if (!Number.isFinite(r)) throw new Error(`D_M = ${r}`);
  });
  const sweepOpts = mixValid(
    fc.record({ fromNm: maybe(inRange(1200, 1400)), toNm: maybe(inRange(1500, 1700)), stepNm: inRange(20, 100) }),
    // The default step (1 nm, 451 points) is left to one input in 40: it is the slow case, not the hostile one.
    fc.record({ fromNm: maybe(num(100, 2600)), toNm: maybe(num(100, 2600)), stepNm: fc.oneof({ arbitrary: num(0, 200), weight: 39 }, { arbitrary: fc.constant(undefined), weight: 1 }) }),
  );
  fuzz(M, 'dispersionSweep', physics.dispersionSweep, fc.tuple(fiber, fc.oneof({ arbitrary: sweepOpts, weight: 40 }, { arbitrary: fc.constant(undefined), weight: 1 })), (r) => r.forEach(checkPoint));
  fuzz(M, 'dispersionSlope', physics.dispersionSlope, fc.tuple(fiber, wavelength));
  fuzz(M, 'zeroDispersion', (f: physics.DispersionFiber, o?: { fromNm?: number; toNm?: number }) => physics.zeroDispersion(f, o) ?? null, fc.tuple(fiber, fc.oneof(fc.constant(undefined), fc.record({ fromNm: maybe(num(100, 2600)), toNm: maybe(num(100, 2600)) }))), (r) => {
    if (r && !(r.wavelengthNm >= DISPERSION_MIN_NM && r.wavelengthNm <= DISPERSION_MAX_NM)) throw new Error(`zero at ${r.wavelengthNm} nm`);
  });
  fuzz(M, 'linkDispersionPsPerNm', physics.linkDispersionPsPerNm, fc.tuple(num(-100, 100), num(0, 25_000)));
  fuzz(M, 'dispersionLimitedReach', physics.dispersionLimitedReach, fc.tuple(objectOr(fc.record({ dispersionPsPerNmKm: num(-40, 40), bitRateGbps: num(0, 1000), spectralWidthNm: num(0, 20) }))), (r) => {
    expectNonNegative(r.maxPsPerNm, 'allowed dispersion');
    if (r.reachKm !== undefined) expectNonNegative(r.reachKm, 'reach');
  });
});
