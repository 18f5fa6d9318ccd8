// Fuzzing of src/physics/reflectance.ts: faces, gaps, typical tables and link ORL. Cheap: full runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectBetween, expectNonNegative, fuzz, inRange, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'reflectance';
const checkReflection = (r: physics.Reflection) => {
  expectBetween(r.fraction, 0, 1, 'fraction');
  if (r.reflectanceDb > 0) throw new Error(`reflectance ${r.reflectanceDb} dB above 0`);
  expectNonNegative(r.returnLossDb, 'return loss');
};
const index = (ok: boolean) => maybe(ok ? inRange(1.0, 1.6) : num(0, 5));

describe('reflectance: every reflection lies in [0, 1] with a negative reflectance and a positive return loss', () => {
  reportAfterAll(M);
  fuzz(M, 'reflectionFromFraction', physics.reflectionFromFraction, fc.tuple(mixValid(inRange(0, 1), num(-1, 2))), checkReflection);
  fuzz(M, 'reflectionFromDb', physics.reflectionFromDb, fc.tuple(mixValid(inRange(-80, 80), num(-400, 400))), checkReflection);
  const face = (ok: boolean) => fc.record({ fiberIndex: index(ok), mediumIndex: index(ok) });
  fuzz(M, 'faceReflection', physics.faceReflection, fc.tuple(mixValid(face(true), objectOr(face(false)))), checkReflection);
  const gap = (ok: boolean) => fc.record({ fiberIndex: index(ok), mediumIndex: index(ok), gapUm: maybe(ok ? inRange(0, 100) : num(-1, 6000)), wavelengthNm: maybe(ok ? inRange(1260, 1650) : num(150, 2600)) });
  fuzz(M, 'gapReflection', physics.gapReflection, fc.tuple(mixValid(gap(true), objectOr(gap(false)))), (r) => {
    checkReflection(r.maximum);
    checkReflection(r.minimum);
    if (r.atGap) {
      checkReflection(r.atGap);
      if (r.atGap.fraction > r.maximum.fraction * (1 + 1e-12)) throw new Error('reflection at a gap above the etalon maximum');
    }
  });
  fuzz(M, 'typicalReflections', physics.typicalReflections, fc.tuple(mixValid(fc.record({ fiberIndex: index(true) }), objectOr(fc.record({ fiberIndex: index(false) })))), (rows) => {
    for (const row of rows) checkReflection(row.reflection);
  });
  const event = (ok: boolean) => fc.record({ reflectanceDb: ok ? inRange(-70, -10) : num(-400, 400), lossBeforeDb: ok ? inRange(0, 30) : num(-1, 200) });
  const events = (ok: boolean) => (ok ? fc.array(event(true), { minLength: 1, maxLength: 10 }) : (fc.oneof(fc.array(objectOr(event(false)), { maxLength: 12 }), notANumber) as fc.Arbitrary<physics.OrlEvent[]>));
  const orl = (ok: boolean) => fc.record({ events: events(ok), backscatterReturnLossDb: maybe(ok ? inRange(28, 60) : num(-1, 400)) });
  fuzz(M, 'linkReturnLoss', physics.linkReturnLoss, fc.tuple(mixValid(orl(true), objectOr(orl(false)))), (r) => {
    expectNonNegative(r.orlDb, 'ORL');
    const sum = r.shares.reduce((s, x) => s + x, 0) + r.backscatterShare;
    if (Math.abs(sum - 1) > 1e-9) throw new Error(`shares add to ${sum}`);
  });
});
