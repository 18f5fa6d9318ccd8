// Fuzzing of src/physics/bendOrSplice.ts. classifyEvent sweeps ~2900 radii per wavelength (about a millisecond for
// valid input); the rest are closed forms. Full 10,000 runs each.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectFinitePositive, expectNonNegative, fuzz, inRange, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'bendOrSplice';
const validFiber = fc.record({ coreRadiusUm: inRange(3.5, 5), na: inRange(0.1, 0.14), claddingIndex: maybe(inRange(1.44, 1.47)) });
const hostileFiber = objectOr(fc.record({ coreRadiusUm: num(0, 600), na: num(0, 1.2), claddingIndex: maybe(num(0.5, 4.5)) }));
const model = maybe(fc.oneof({ arbitrary: fc.constantFrom('stress-corrected' as const, 'geometric' as const), weight: 8 }, { arbitrary: notANumber as fc.Arbitrary<'geometric'>, weight: 1 }));
const validReadings = fc
  .shuffledSubarray([1310, 1383, 1490, 1550, 1625], { minLength: 2, maxLength: 5 })
  .chain((ws) => fc.tuple(...ws.map((w) => fc.record({ wavelengthNm: fc.constant(w), lossDb: inRange(-0.3, 3) }))));
const hostileReadings = fc.oneof(
  fc.array(objectOr(fc.record({ wavelengthNm: num(150, 2600), lossDb: num(-30, 30) })), { maxLength: 8 }),
  notANumber,
) as fc.Arbitrary<physics.EventReading[]>;

describe('bendOrSplice: every event gets a verdict with finite numbers, or a typed error', () => {
  reportAfterAll(M);
  const input = (ok: boolean) =>
    fc.record({ fiber: ok ? validFiber : hostileFiber, readings: ok ? validReadings : hostileReadings, toleranceDb: maybe(ok ? inRange(0.005, 0.1) : num(-1, 10)), radiusModel: model });
  fuzz(M, 'classifyEvent', physics.classifyEvent, fc.tuple(mixValid(input(true), objectOr(input(false))) as fc.Arbitrary<physics.BendOrSpliceInput>), (r) => {
    expectNonNegative(r.splice.offsetUm, 'offset');
    if (!(r.splice.mfdRatio >= 1)) throw new Error(`MFD ratio ${r.splice.mfdRatio} below 1`);
    if (r.verdict === 'bend' && !r.bend.fits) throw new Error('called a bend that does not fit');
    if (r.verdict === 'splice' && !r.splice.fits) throw new Error('called a splice that does not fit');
    if (r.bend.fits) {
      const [lo, hi] = r.bend.radiusRangeMm!;
      if (!(lo <= hi && lo >= physics.BEND_SEARCH_MIN_MM && hi <= physics.BEND_SEARCH_MAX_MM)) throw new Error('radius range outside the search range');
      expectFinitePositive(r.bend.turns!, 'turns');
    }
  });
  const off = (ok: boolean) => fc.record({ mfdUm: ok ? inRange(6, 12) : num(0, 200), lossDb: ok ? inRange(0, 3) : num(-1, 200) });
  fuzz(M, 'offsetForLossUm', physics.offsetForLossUm, fc.tuple(mixValid(off(true), objectOr(off(false)))), (r) => expectNonNegative(r, 'offset'));
  const mm = (ok: boolean) => fc.record({ lossDb: ok ? inRange(0, 3) : num(-1, 100) });
  fuzz(M, 'mfdRatioForLoss', physics.mfdRatioForLoss, fc.tuple(mixValid(mm(true), objectOr(mm(false)))), (r) => {
    if (!(r >= 1)) throw new Error(`ratio ${r} below 1`);
  });
  const bendIn = (ok: boolean) =>
    fc.record({ fiber: ok ? validFiber : hostileFiber, wavelengthNm: ok ? inRange(1260, 1650) : num(150, 2600), bendRadiusMm: ok ? inRange(2, 60) : num(0, 100), turns: ok ? inRange(0, 100) : num(-1, 1000), radiusModel: model });
  fuzz(M, 'bendEventLossDb', physics.bendEventLossDb, fc.tuple(mixValid(bendIn(true), objectOr(bendIn(false)))), (r) => expectNonNegative(r, 'bend loss'));
  const spliceIn = (ok: boolean) => fc.record({ mfdUm: ok ? inRange(6, 12) : num(0, 200), lateralOffsetUm: ok ? inRange(0, 5) : num(-1, 600), mfdRatio: maybe(ok ? inRange(1, 1.5) : num(0, 20)) });
  fuzz(M, 'spliceEventLossDb', physics.spliceEventLossDb, fc.tuple(mixValid(spliceIn(true), objectOr(spliceIn(false)))), (r) => expectNonNegative(r, 'splice loss'));
});
