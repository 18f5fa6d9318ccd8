// Fuzzing of src/physics/equivalentStepIndex.ts: label values (cutoff, MFD at a wavelength) to an equivalent
// step-index fiber, and the label verdict at a system wavelength. A closed-form fit plus one mode list at a
// single-mode V: cheap, full 10,000 runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectFinitePositive, fuzz, inRange, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'equivalentStepIndex';
const kind = fc.oneof({ arbitrary: fc.constantFrom('fiber' as const, 'cable' as const), weight: 9 }, { arbitrary: notANumber as fc.Arbitrary<'fiber'>, weight: 1 });
const valid = fc.record({ cutoffWavelengthNm: inRange(1100, 1330), cutoffKind: kind, mfdUm: inRange(8, 10.5), mfdWavelengthNm: fc.constantFrom(1310, 1550), coreDiameterUm: maybe(inRange(6, 10), 3) });
const hostile = fc.record({ cutoffWavelengthNm: num(150, 2600), cutoffKind: kind, mfdUm: num(0, 60), mfdWavelengthNm: num(150, 2600), coreDiameterUm: maybe(num(0, 200)) });
const label = mixValid(valid, objectOr(hostile)) as fc.Arbitrary<physics.EquivalentStepIndexInput>;

describe('equivalentStepIndex: every label gives a finite step-index fiber and a verdict, or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'equivalentStepIndex', physics.equivalentStepIndex, fc.tuple(label), (r) => {
    expectFinitePositive(r.coreRadiusUm, 'core radius');
    if (!(r.na > 0 && r.na < 1)) throw new Error(`NA = ${r.na}`);
  });
  const withWavelength = fc.tuple(label, mixValid(fc.constantFrom(1310, 1490, 1550, 1625, 1260), num(150, 2600))).map(([l, w]) => (l && typeof l === 'object' ? { ...l, wavelengthNm: w } : l));
  fuzz(M, 'checkLabel', physics.checkLabel, fc.tuple(withWavelength as fc.Arbitrary<physics.EquivalentStepIndexInput & { wavelengthNm: number }>), (r) => {
    if (!['single-mode', 'single-mode-in-practice', 'not-single-mode'].includes(r.verdict)) throw new Error(`verdict ${r.verdict}`);
    if (r.reasons.length === 0) throw new Error('no reasons');
  });
});
