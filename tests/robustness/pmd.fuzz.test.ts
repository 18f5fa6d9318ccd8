// Fuzzing of src/physics/pmd.ts: link PMD, sections, erfc, Maxwell tail and its inverse, verdict. Cheap: full runs
// (the inverse is 80 bisection steps of a closed form).
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectBetween, expectNonNegative, fuzz, inRange, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'pmd';
const section = (ok: boolean) => fc.record({ coefficientPsPerSqrtKm: ok ? inRange(0, 2) : num(-1, 200), lengthKm: ok ? inRange(0, 500) : num(-1, 50_000) });

describe('pmd: every PMD and probability is finite and in range, or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'linkPmdPs', physics.linkPmdPs, fc.tuple(mixValid(section(true), objectOr(section(false)))), (r) => expectNonNegative(r, 'PMD'));
  const concat = (ok: boolean) =>
    fc.record({
      sections: ok ? fc.array(section(true), { minLength: 1, maxLength: 8 }) : (fc.oneof(fc.array(objectOr(section(false)), { maxLength: 10 }), notANumber) as fc.Arbitrary<physics.PmdSection[]>),
      componentsPs: maybe(ok ? fc.array(inRange(0, 5), { maxLength: 4 }) : (fc.oneof(fc.array(num(-1, 20_000), { maxLength: 4 }), notANumber) as fc.Arbitrary<number[]>)),
    });
  fuzz(M, 'concatenatedPmd', physics.concatenatedPmd, fc.tuple(mixValid(concat(true), objectOr(concat(false)))), (r) => {
    const largest = Math.max(0, ...r.sectionsPs, ...r.componentsPs);
    if (r.totalPs < largest - 1e-9) throw new Error('total PMD below its largest part');
  });
  fuzz(M, 'erfc', physics.erfc, fc.tuple(mixValid(inRange(-6, 30), num(-1e3, 1e3))), (r) => expectBetween(r, 0, 2, 'erfc'));
  const tail = (ok: boolean) => fc.record({ dgdPs: ok ? inRange(0, 100) : num(-1, 2e6), meanDgdPs: ok ? inRange(0.01, 30) : num(-1, 2e6) });
  fuzz(M, 'maxwellExceedProbability', physics.maxwellExceedProbability, fc.tuple(mixValid(tail(true), objectOr(tail(false)))), (r) => expectBetween(r, 0, 1, 'probability'));
  const inv = (ok: boolean) => fc.record({ probability: ok ? inRange(1e-12, 0.999) : num(-1, 2), meanDgdPs: ok ? inRange(0.01, 30) : num(-1, 2e6) });
  fuzz(M, 'maxwellDgdExceeded', physics.maxwellDgdExceeded, fc.tuple(mixValid(inv(true), objectOr(inv(false)))), (r) => expectNonNegative(r, 'DGD'));
  const verdict = (ok: boolean) =>
    fc.record({
      linkPmdPs: ok ? inRange(0, 50) : num(-1, 2e5),
      symbolRateGbaud: ok ? inRange(1, 100) : num(-1, 20_000),
      periodShare: maybe(ok ? inRange(0.05, 0.3) : num(-1, 2)),
      fixedMaxPmdPs: maybe(ok ? inRange(5, 50) : num(-1, 2e5), 3),
    });
  fuzz(M, 'pmdVerdict', physics.pmdVerdict, fc.tuple(mixValid(verdict(true), objectOr(verdict(false)))), (r) => {
    expectBetween(r.outageProbability, 0, 1, 'outage');
    if (r.carries !== r.marginPs >= 0) throw new Error('verdict disagrees with the margin');
  });
});
