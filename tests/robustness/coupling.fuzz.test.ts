// Fuzzing of src/physics/coupling.ts (overlap integrals). Mode solving and overlaps cost milliseconds to a
// second, so: mode sets are made once from a small pool (V ≈ 4 to 12, plus one OM-class 50 µm core at V = 37
// drawn rarely) and the launch calls fuzz offsets, distributions and hostile objects against them;
// multimodeModes itself is fuzzed with small cores in its valid share (V ≲ 15; the caps above V = 65/120 are
// checked once by the radialSolver suite and here). Every coupled fraction must lie in (0, 1], every loss ≥ 0 dB.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_EXACT_STEP_V, MAX_LAUNCH_OFFSET_UM, ModelError } from '../../src/physics';
import { expectBetween, expectCount, expectNonNegative, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'coupling';
const SETS = [
  physics.multimodeModes({ profile: 'graded', coreRadiusUm: 3, na: 0.2 }, 850),
  physics.multimodeModes({ profile: 'step', coreRadiusUm: 4, na: 0.2 }, 1300),
  physics.multimodeModes({ profile: 'graded', coreRadiusUm: 8, na: 0.2, alpha: 2.1 }, 850),
];
const OM50 = physics.multimodeModes({ profile: 'graded', coreRadiusUm: 25, na: 0.2 }, 850);
// Fields at the sets' wavelengths (850 and 1300 nm) so that launches run, and one at 1310 nm that no set matches:
// a field and modes of different wavelengths must be refused with a ModelError (drawn in the hostile share).
const FIELDS_AT: Record<number, physics.RadialField[]> = {
  850: [physics.gaussianRadialField(5.5, 850), physics.lp01RadialField({ coreRadiusUm: 2, na: 0.12 }, 850)],
  1300: [physics.gaussianRadialField(9.2, 1300), physics.lp01RadialField({ coreRadiusUm: 4.1, na: 0.12 }, 1300)],
};
const OTHER_WAVELENGTH = physics.lp01RadialField({ coreRadiusUm: 4.1, na: 0.12 }, 1310);
const handMadeField = fc.oneof(notANumber, fc.record({ name: fc.string(), at: fc.constant(() => 1), extentUm: num(0, 10), powerUm2: num(0, 10), wavelengthNm: maybe(num(150, 2600)) }));
const fieldAt = (wavelengthNm: number) => mixValid(fc.constantFrom(...FIELDS_AT[wavelengthNm]!), fc.oneof(fc.constant(OTHER_WAVELENGTH), handMadeField), 8, 2) as fc.Arbitrary<physics.RadialField>;
const field = mixValid(fc.constantFrom(...FIELDS_AT[850]!, ...FIELDS_AT[1300]!), fc.oneof(fc.constant(OTHER_WAVELENGTH), handMadeField), 8, 2) as fc.Arbitrary<physics.RadialField>;
const hostileSet = fc.oneof(notANumber, fc.record({ rUm: fc.constant([1, 2]), modes: fc.constant([]) })) as fc.Arbitrary<physics.MultimodeModeSet>;
/** A mode set with a field: mostly of the same wavelength (the launch runs), else another wavelength or junk. */
const setAndField = mixValid(
  fc.oneof({ arbitrary: fc.constantFrom(...SETS), weight: 40 }, { arbitrary: fc.constant(OM50), weight: 1 }).chain((s) => fc.tuple(fc.constant(s), fieldAt(s.wavelengthNm))),
  fc.tuple(hostileSet, field),
  10,
  1,
);
/** Two single-mode fields: mostly of one wavelength. */
const fieldPair = mixValid(
  fc.constantFrom(850, 1300).chain((w) => fc.tuple(fc.constantFrom(...FIELDS_AT[w]!), fc.constantFrom(...FIELDS_AT[w]!))),
  fc.tuple(field, field),
  4,
  1,
);
const offset = mixValid(inRange(0, 15), num(0, MAX_LAUNCH_OFFSET_UM + 20));

function checkLaunch(r: physics.LaunchResult): void {
  if (!(r.coupledFraction > 0 && r.coupledFraction <= 1)) throw new Error(`coupled fraction ${r.coupledFraction}`);
  expectNonNegative(r.lossDb, 'launch loss');
  let sum = 0;
  for (const m of r.perMode) {
    expectBetween(m.fraction, 0, 1, `fraction in LP${m.l}${m.m}`);
    sum += m.fraction;
  }
  if (sum > 1 + 1e-4) throw new Error(`mode fractions sum to ${sum}`);
  expectCount(r.modesFor90Percent, 'modes carrying 90 %');
  expectCount(r.multimodeModeCount, 'mode count');
}

describe('coupling: every launch gives fractions in [0, 1] and losses ≥ 0 dB, or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'gaussianRadialField', physics.gaussianRadialField, fc.tuple(mixValid(inRange(0.1, 100), num(0, 120)), num(150, 2600)), (r) => {
    if (!(r.extentUm > 0 && r.powerUm2 > 0 && r.at(0) === 1)) throw new Error('not a unit-peak field of positive size');
  });
  const values = fc.oneof(
    { arbitrary: fc.array(inRange(0, 1), { minLength: 3, maxLength: 60 }), weight: 180 },
    { arbitrary: fc.array(num(-1, 1), { maxLength: 10 }), weight: 90 },
    { arbitrary: fc.oneof(notANumber, fc.constant(new Float64Array(5))), weight: 10 },
    // 200,000 samples (once a call-stack overflow): ~70 ms each, so about one input in 300.
    { arbitrary: fc.constant(new Float64Array(200_000).fill(1)), weight: 1 },
  ) as fc.Arbitrary<number[]>;
  // Names are the user's text: "NaN" as a name is echoed back, not a computed NaN (the kit tells them apart).
  const fieldName = fc.oneof(fc.string({ maxLength: 10 }), fc.constantFrom('NaN', 'Infinity', 'undefined', 'field NaN'));
  fuzz(M, 'tabulatedRadialField', physics.tabulatedRadialField, fc.tuple(fieldName, mixValid(inRange(0.01, 1), num(0, 200)), values, num(150, 2600)), (r) => {
    if (!(r.extentUm > 0 && r.powerUm2 > 0)) throw new Error('field of no size or power');
  });
  const fiber = mixValid<unknown>(
    fc.record({ profile: fc.constantFrom('step' as const, 'graded' as const), coreRadiusUm: inRange(1, 5), na: inRange(0.1, 0.25), alpha: maybe(inRange(1.8, 2.2)) }),
    objectOr(fc.record({ profile: fc.oneof(fc.constantFrom('step', 'graded'), notANumber), coreRadiusUm: num(0, 600), na: num(0, 1), alpha: maybe(num(0, 2000)), claddingIndex: maybe(num(0.5, 5)) })),
  ) as fc.Arbitrary<physics.MultimodeFiberSpec>;
  const opts = fc.oneof({ arbitrary: fc.constant(undefined), weight: 6 }, { arbitrary: fc.record({ method: maybe(fc.constantFrom('auto' as const, 'finite-difference' as const)), maxL: maybe(int(0, 8)) }, { requiredKeys: [] }), weight: 2 });
  fuzz(M, 'multimodeModes', (f: physics.MultimodeFiberSpec, w: number, o?: physics.MultimodeOptions) => physics.multimodeModes(f, w, o), fc.tuple(fiber, mixValid(inRange(800, 1600), num(150, 2600)), opts), (r) => {
    for (const m of r.modes) if (!(m.b >= 0 && m.b <= 1)) throw new Error(`b = ${m.b}`);
    expectCount(r.totalModeCount, 'mode count');
  });
  const radii = fc.oneof({ arbitrary: fc.array(inRange(0, 30), { maxLength: 40 }).map((a) => Float64Array.from(a)), weight: 8 }, { arbitrary: fc.oneof(notANumber, fc.array(num(-1, 10), { maxLength: 4 })), weight: 2 }) as fc.Arbitrary<Float64Array>;
  fuzz(M, 'azimuthalCoefficients', physics.azimuthalCoefficients, fc.tuple(field, radii, offset, mixValid(int(0, 12, { edge: 0, any: 0, junk: 0 }), int(0, 300))));
  fuzz(M, 'singleModeToMultimode', physics.singleModeToMultimode, fc.tuple(objectOr(setAndField.chain(([modes, source]) => fc.record({ source: fc.constant(source), modes: fc.constant(modes), offsetUm: maybe(offset) })))), checkLaunch);
  const distribution = fc.oneof(
    { arbitrary: fc.constant({ kind: 'uniform' as const }), weight: 4 },
    { arbitrary: fc.record({ kind: fc.constant('restricted' as const), groupFraction: num(0, 1.2) }), weight: 4 },
    { arbitrary: fc.oneof(notANumber, fc.record({ kind: fc.constantFrom('overfilled', '') })), weight: 1 },
  ) as fc.Arbitrary<physics.ModePowerDistribution>;
  fuzz(M, 'multimodeToSingleMode', physics.multimodeToSingleMode, fc.tuple(objectOr(setAndField.chain(([modes, target]) => fc.record({ target: fc.constant(target), modes: fc.constant(modes), distribution, offsetUm: maybe(offset) })))), checkLaunch);
  // Valid offsets up to 5 µm here: a large offset widens the azimuthal grid (~2 ms a call) without new cases.
  fuzz(M, 'fieldOverlapLoss', physics.fieldOverlapLoss, fieldPair.chain(([f1, f2]) => fc.tuple(fc.constant(f1), fc.constant(f2), mixValid(inRange(0, 5), num(0, MAX_LAUNCH_OFFSET_UM + 20), 1, 4))), (r) => {
    if (!(r.fraction > 0 && r.fraction <= 1)) throw new Error(`fraction ${r.fraction}`);
    expectNonNegative(r.lossDb, 'loss');
  });
  const stepFiber = (ok: boolean) => (ok ? fc.record({ coreRadiusUm: inRange(3.5, 5), na: inRange(0.1, 0.14) }) : objectOr(fc.record({ coreRadiusUm: num(0, 600), na: num(0, 1.2) })));
  fuzz(M, 'lp01RadialField', physics.lp01RadialField, mixValid(fc.tuple(stepFiber(true), inRange(1260, 1650)), fc.tuple(stepFiber(false), num(150, 2600))), (r) => {
    if (!(r.extentUm > 0 && r.powerUm2 > 0)) throw new Error('field of no size or power');
  });
  const joint = (ok: boolean) => fc.record({ fiber1: stepFiber(ok), fiber2: stepFiber(ok), wavelengthNm: ok ? inRange(1260, 1650) : num(150, 2600), lateralOffsetUm: ok ? inRange(0, 5) : num(0, 250) });
  // One valid comparison is 31 exact overlaps (~30 ms): valid inputs are 1 in 40 here (~250 of them).
  fuzz(M, 'singleModeJointComparison', physics.singleModeJointComparison, fc.tuple(mixValid(joint(true), objectOr(joint(false)), 1, 40)), (r) => {
    expectNonNegative(r.exactLossDb, 'exact loss');
    expectNonNegative(r.gaussianLossDb, 'Gaussian loss');
    for (const p of r.curve) expectNonNegative(p.exactDb, 'loss on the curve');
  });
  it(`a step-index core above V = ${MAX_EXACT_STEP_V} is refused with a ModelError, not solved for seconds`, () => {
    // a = 50 µm, NA 0.22 at 850 nm: V = 2π·50·0.22/0.85 = 81 (definition of V); it took 3 s before the cap.
    expect(() => physics.multimodeModes({ profile: 'step', coreRadiusUm: 50, na: 0.22 }, 850)).toThrow(ModelError);
  });
});
