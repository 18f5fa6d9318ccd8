// Fuzzing of src/physics/otdrSetup.ts: pulse extent, trace ⇄ cable distance, group-index error, ghost check. Cheap: full runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectClose, expectFinitePositive, expectNonNegative, fuzz, inRange, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'otdrSetup';
const ng = (ok: boolean) => (ok ? inRange(1.44, 1.5) : num(0, 2000));

describe('otdrSetup: every distance is finite and sensible, or a typed error', () => {
  reportAfterAll(M);
  const pulse = (ok: boolean) => fc.record({ pulseWidthNs: ok ? inRange(0.5, 20_000) : num(-1, 2e6), groupIndex: ng(ok) });
  fuzz(M, 'pulseSpatialExtent', physics.pulseSpatialExtent, fc.tuple(mixValid(pulse(true), objectOr(pulse(false)))), (r) => {
    expectFinitePositive(r.twoPointResolutionM, 'resolution');
    expectClose(r.pulseLengthM, 2 * r.twoPointResolutionM, 1e-12, 'pulse length');
  });
  const res = (ok: boolean) => fc.record({ resolutionM: ok ? inRange(0.1, 2000) : num(-1, 2e5), groupIndex: ng(ok) });
  fuzz(M, 'pulseWidthForResolution', physics.pulseWidthForResolution, fc.tuple(mixValid(res(true), objectOr(res(false)))), (r) => expectFinitePositive(r, 'pulse width'));
  const trace = (ok: boolean) => fc.record({ traceKm: ok ? inRange(0, 200) : num(-1, 2000), excessPercent: ok ? inRange(0, 3) : num(-1, 30) });
  fuzz(M, 'cableDistanceFromTrace', physics.cableDistanceFromTrace, fc.tuple(mixValid(trace(true), objectOr(trace(false)))), (r) => {
    expectNonNegative(r.cableKm, 'cable');
    expectNonNegative(r.differenceM, 'difference');
  });
  const cable = (ok: boolean) => fc.record({ cableKm: ok ? inRange(0, 200) : num(-1, 2000), excessPercent: ok ? inRange(0, 3) : num(-1, 30) });
  fuzz(M, 'traceDistanceFromCable', physics.traceDistanceFromCable, fc.tuple(mixValid(cable(true), objectOr(cable(false)))), (r) => {
    if (r.fiberKm < r.cableKm) throw new Error('fiber shorter than its cable');
  });
  const helix = (ok: boolean) => fc.record({ helixRadiusMm: ok ? inRange(0, 10) : num(-1, 200), pitchMm: ok ? inRange(20, 500) : num(0, 20_000) });
  fuzz(M, 'helixExcessPercent', physics.helixExcessPercent, fc.tuple(mixValid(helix(true), objectOr(helix(false)))), (r) => expectNonNegative(r, 'excess'));
  const gi = (ok: boolean) => fc.record({ shownKm: ok ? inRange(0, 200) : num(-1, 2000), groupIndexSet: ng(ok), groupIndexTrue: ng(ok) });
  fuzz(M, 'groupIndexEffect', physics.groupIndexEffect, fc.tuple(mixValid(gi(true), objectOr(gi(false)))), (r) => expectNonNegative(r.trueKm, 'true distance'));
  const list = (ok: boolean) =>
    ok ? fc.array(inRange(0, 50), { maxLength: 8 }) : (fc.oneof(fc.array(num(-1, 2000), { maxLength: 60 }), notANumber) as fc.Arbitrary<number[]>);
  const ghost = (ok: boolean) =>
    fc.record({ eventKm: ok ? inRange(0, 100) : num(-1, 2000), reflectiveEventsKm: list(ok), toleranceM: ok ? inRange(0, 50) : num(-1, 20_000), launchCordKm: maybe(ok ? inRange(0, 2) : num(-1, 2000)) });
  fuzz(M, 'ghostCheck', physics.ghostCheck, fc.tuple(mixValid(ghost(true), objectOr(ghost(false)))), (r) => {
    if (r.possibleGhost !== r.candidates.length > 0) throw new Error('possibleGhost disagrees with the candidates');
    for (const c of r.candidates) {
      if (Math.abs(c.offsetM) > r.toleranceM) throw new Error('candidate outside the tolerance');
      if (!Number.isInteger(c.multiple) || c.multiple < 2) throw new Error('multiple not a whole number ≥ 2');
    }
  });
});
