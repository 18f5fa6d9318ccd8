// Fuzzing of src/physics/otdr.ts: directional OTDR splice readings and the two-way average. Cheap: full runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_OTDR_READING_DB } from '../../src/physics';
import { expectClose, expectFinitePositive, expectNonNegative, fuzz, inRange, maybe, mixValid, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'otdr';
const reading = num(-MAX_OTDR_READING_DB - 5, MAX_OTDR_READING_DB + 5);

describe('otdr: every reading gives a finite, consistent answer or a typed error', () => {
  reportAfterAll(M);
  const valid = fc.record({ mfdAUm: inRange(0.1, 100), mfdBUm: inRange(0.1, 100), extraLossDb: maybe(inRange(0, 30)), rayleighRatioBA: maybe(inRange(0.1, 10)) });
  const hostile = objectOr(fc.record({ mfdAUm: num(0, 110), mfdBUm: num(0, 110), extraLossDb: maybe(num(-1, 35)), rayleighRatioBA: maybe(num(0, 12)) }));
  const input = mixValid(valid, hostile) as fc.Arbitrary<physics.OtdrSpliceInput>;
  fuzz(M, 'otdrSpliceReading', physics.otdrSpliceReading, fc.tuple(input), (r) => {
    expectNonNegative(r.trueLossDb, 'true splice loss');
    expectNonNegative(r.mismatchLossDb, 'mismatch loss');
    // The backscatter step cancels in the two-way average (ITU-T G.650.3): the readings straddle the true loss.
    expectClose((r.apparentFromADb + r.apparentFromBDb) / 2, r.trueLossDb, 1e-9, 'two-way average');
  }, { minSuccessShare: 0.99 }); // every in-range reading has an answer (measured: 100 %)
  fuzz(M, 'otdrTwoWayAverage', physics.otdrTwoWayAverage, fc.tuple(reading, reading), (r, [a, b]) => {
    expectClose(r.trueLossDb, (a + b) / 2, 1e-12, 'average');
    expectFinitePositive(r.impliedMfdRatioBA, 'implied MFD ratio');
    if (r.consistent !== a + b >= 0) throw new Error('consistency flag disagrees with the sign of the sum of the readings');
  });
});
