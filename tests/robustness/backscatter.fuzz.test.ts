// Fuzzing of src/physics/backscatter.ts: capture fraction, backscatter level, return loss of a length, gainer error. Cheap: full runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectBetween, expectClose, expectFinitePositive, fuzz, inRange, maybe, mixValid, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'backscatter';
const mfd = (ok: boolean) => (ok ? inRange(6, 12) : num(0, 120));
const wl = (ok: boolean) => (ok ? inRange(1260, 1650) : num(150, 2600));
const index = (ok: boolean) => maybe(ok ? inRange(1.44, 1.48) : num(0, 3));

describe('backscatter: every level is finite and physical, or a typed error', () => {
  reportAfterAll(M);
  const cap = (ok: boolean) => fc.record({ mfdUm: mfd(ok), wavelengthNm: wl(ok), fiberIndex: index(ok) });
  fuzz(M, 'backscatterCaptureFraction', physics.backscatterCaptureFraction, fc.tuple(mixValid(cap(true), objectOr(cap(false)))), (r) => {
    expectBetween(r.fraction, 0, 1, 'capture fraction');
    expectFinitePositive(r.fraction, 'capture fraction');
  });
  const ray = (ok: boolean) => fc.record({ wavelengthNm: wl(ok), coefficientDbUm4PerKm: maybe(ok ? inRange(0.5, 1.2) : num(0, 30)) });
  fuzz(M, 'rayleighScatteringDbPerKm', physics.rayleighScatteringDbPerKm, fc.tuple(mixValid(ray(true), objectOr(ray(false)))), (r) => expectFinitePositive(r, 'scattering'));
  const lvl = (ok: boolean) =>
    fc.record({ mfdUm: mfd(ok), wavelengthNm: wl(ok), scatteringDbPerKm: ok ? inRange(0.1, 0.5) : num(-1, 200), pulseWidthNs: ok ? inRange(1, 20_000) : num(-1, 2e6), groupIndex: ok ? inRange(1.44, 1.5) : num(0, 3), fiberIndex: index(ok) });
  fuzz(M, 'backscatterLevel', physics.backscatterLevel, fc.tuple(mixValid(lvl(true), objectOr(lvl(false)))), (r) => {
    if (!(r.levelDb < 0)) throw new Error(`backscatter level ${r.levelDb} dB is not below the launched power`);
  });
  const rl = (ok: boolean) =>
    fc.record({ mfdUm: mfd(ok), wavelengthNm: wl(ok), scatteringDbPerKm: ok ? inRange(0.1, 0.3) : num(-1, 200), attenuationDbPerKm: ok ? inRange(0.3, 1) : num(-1, 200), lengthKm: ok ? inRange(0.001, 200) : num(-1, 2000), fiberIndex: index(ok) });
  fuzz(M, 'backscatterReturnLoss', physics.backscatterReturnLoss, fc.tuple(mixValid(rl(true), objectOr(rl(false)))), (r) => {
    if (!(r.returnLossDb >= r.limitDb - 1e-9)) throw new Error('a length returns more than an endless fiber');
    expectFinitePositive(r.nearLimitKm, 'length to the limit');
  });
  const g = (ok: boolean) => fc.record({ mfdAUm: mfd(ok), mfdBUm: mfd(ok), wavelengthNm: wl(ok), scatteringRatioBA: maybe(ok ? inRange(0.8, 1.2) : num(0, 20)) });
  fuzz(M, 'gainerError', physics.gainerError, fc.tuple(mixValid(g(true), objectOr(g(false)))), (r) => expectClose(r.errorFromADb, -r.errorFromBDb, 1e-12, 'opposite errors'));
});
