// Fuzzing of src/physics/fiber.ts: V-number, NA, Δ and their guards. Closed forms: full 10,000 runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_CORE_RADIUS_UM } from '../../src/physics';
import { expectBetween, expectFinitePositive, fuzz, inRange, mixValid, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'fiber';
const radius = num(0, 600);
const na = num(0, 1.2);
const index = num(0.5, 4.5);
const wavelength = num(150, 2600);
const indices = mixValid(
  fc.tuple(inRange(1.44, 1.5), inRange(0, 0.05)).map(([n2, dn]) => ({ coreIndex: n2 + dn, claddingIndex: n2 })),
  objectOr(fc.record({ coreIndex: index, claddingIndex: index })),
);
const passThrough = (r: number, args: unknown[]) => {
  if (!Object.is(r, args[1])) throw new Error(`returned ${r}, not its argument`);
};

describe('fiber: every fiber gives a finite V, NA in (0, 1) and Δ in (0, ½), or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'requireCoreRadiusUm', physics.requireCoreRadiusUm, fc.tuple(fc.constant('coreRadiusUm'), radius), (r, a) => {
    passThrough(r, a);
    expectBetween(r, Number.MIN_VALUE, MAX_CORE_RADIUS_UM, 'core radius');
  });
  fuzz(M, 'requireNa', physics.requireNa, fc.tuple(fc.constant('na'), na), (r, a) => {
    passThrough(r, a);
    if (!(r > 0 && r < 1)) throw new Error(`NA ${r} accepted`);
  });
  fuzz(M, 'requireRefractiveIndex', physics.requireRefractiveIndex, fc.tuple(fc.constant('coreIndex'), index), (r, a) => {
    passThrough(r, a);
    expectBetween(r, 1, 4, 'index');
  });
  fuzz(M, 'vNumber', physics.vNumber, fc.tuple(mixValid(fc.record({ coreRadiusUm: inRange(0.5, 500), na: inRange(0.01, 0.99), wavelengthNm: inRange(200, 2500) }), objectOr(fc.record({ coreRadiusUm: radius, na, wavelengthNm: wavelength })))), (r) =>
    expectFinitePositive(r, 'V'),
  );
  fuzz(M, 'numericalAperture', physics.numericalAperture, fc.tuple(indices), (r) => {
    if (!(r > 0 && r < 1)) throw new Error(`NA = ${r}`);
  });
  fuzz(M, 'relativeIndexDifference', physics.relativeIndexDifference, fc.tuple(indices), (r) => {
    if (!(r > 0 && r < 0.5)) throw new Error(`Δ = ${r}`);
  });
  fuzz(M, 'naFromDelta', physics.naFromDelta, fc.tuple(mixValid(fc.record({ coreIndex: inRange(1.4, 1.5), deltaPercent: inRange(0.01, 2) }), objectOr(fc.record({ coreIndex: index, deltaPercent: num(0, 60) })))), (r) => {
    if (!(r > 0 && r < 1)) throw new Error(`NA = ${r}`);
  });
});
