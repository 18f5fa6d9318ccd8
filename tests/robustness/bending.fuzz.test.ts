// Fuzzing of src/physics/bending.ts (Marcuse 1976 bend loss). One loss is a mode solve and a closed form
// (microseconds); sweeps are capped by their count, which the valid share keeps ≤ 50.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_BEND_RADIUS_MM, MIN_BEND_RADIUS_MM } from '../../src/physics';
import { expectFinitePositive, expectNonNegative, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'bending';
const model = maybe(fc.oneof({ arbitrary: fc.constantFrom('stress-corrected' as const, 'geometric' as const), weight: 8 }, { arbitrary: notANumber as fc.Arbitrary<'geometric'>, weight: 1 }));
// radiusFactor: an explicitly chosen R_eff/R (1–2), left out half the time so the radius models run too.
const validFiber = { coreRadiusUm: inRange(3, 5), na: inRange(0.1, 0.14), claddingIndex: maybe(inRange(1.44, 1.47)), radiusFactor: maybe(inRange(1, 2), 4) };
const hostileFiber = { coreRadiusUm: num(0, 600), na: num(0, 1.2), claddingIndex: maybe(num(0.5, 4.5)), radiusFactor: maybe(num(0, 3), 4) };
const radius = (ok: boolean) => (ok ? inRange(MIN_BEND_RADIUS_MM, 60) : num(0, MAX_BEND_RADIUS_MM + 100));
const wavelength = (ok: boolean) => (ok ? inRange(1260, 1650) : num(150, 2600));
const checkLoss = (r: physics.BendLossResult) => {
  expectNonNegative(r.lossDbPerTurn, 'loss per turn');
  expectNonNegative(r.lossDbPerM, 'loss per metre');
  expectNonNegative(r.totalLossDb, 'total loss');
  expectFinitePositive(r.effectiveRadiusMm, 'effective radius');
};

describe('bending: every bend gives a loss ≥ 0 dB or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'stressRadiusFactor', physics.stressRadiusFactor, fc.tuple(mixValid(inRange(1.4, 1.5), num(0, 5))), (r) => expectFinitePositive(r, 'radius factor'));
  const input = (ok: boolean) => fc.record({ ...(ok ? validFiber : hostileFiber), wavelengthNm: wavelength(ok), bendRadiusMm: radius(ok), turns: maybe(ok ? int(1, 100, { edge: 0, any: 0, junk: 0 }) : num(0, 1e7)), radiusModel: model });
  fuzz(M, 'bendLoss', physics.bendLoss, fc.tuple(mixValid(input(true), objectOr(input(false)))), checkLoss);
  const sweep = (ok: boolean) =>
    fc.record({ ...(ok ? validFiber : hostileFiber), wavelengthNm: wavelength(ok), minRadiusMm: radius(ok), maxRadiusMm: radius(ok), count: ok ? int(2, 50, { edge: 0, any: 0, junk: 0 }) : int(0, 60), radiusModel: model });
  // In range: the smaller radius first (drawn independently, half the pairs would be reversed and rightly refused).
  const orderedSweep = sweep(true).map((r) => ({ ...r, minRadiusMm: Math.min(r.minRadiusMm, r.maxRadiusMm), maxRadiusMm: Math.max(r.minRadiusMm, r.maxRadiusMm) }));
  fuzz(M, 'bendLossSweep', physics.bendLossSweep, fc.tuple(mixValid(orderedSweep, objectOr(sweep(false)))), (r) => {
    for (const p of r) expectNonNegative(p.lossDbPerTurn, 'loss per turn');
  });
  const critical = (ok: boolean) => fc.record({ ...(ok ? validFiber : hostileFiber), wavelengthNm: wavelength(ok), thresholdDbPerTurn: maybe(ok ? inRange(0.001, 1) : num(0, 200)), radiusModel: model });
  fuzz(M, 'criticalBendRadius', physics.criticalBendRadius, fc.tuple(mixValid(critical(true), objectOr(critical(false)))));
  fuzz(M, 'macNumber', physics.macNumber, fc.tuple(mixValid(inRange(8, 11), num(0, 120)), mixValid(inRange(1150, 1330), num(150, 2600))), (r) => expectFinitePositive(r, 'MAC number'));
});
