// Fuzzing of the multimode launch-condition physics: src/physics/encircledFlux.ts, mandrel.ts, offsetLaunch.ts and
// ethernetReach.ts. Mode sets cost milliseconds to a second to solve, so they are made once from a small pool
// (V ≈ 4 to 12, plus the 50 µm OM-class core at V = 24 drawn rarely) and the functions fuzz powers, radii,
// mandrels, offsets and hostile objects against them. Every EF must lie in [0, 1] and never fall with radius,
// every share in [0, 1], every loss ≥ 0 dB, every verdict one of the words the screens know.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_LAUNCH_OFFSET_UM } from '../../src/physics';
import { expectBetween, expectNonNegative, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';


const M = 'mmlaunch';
const FIBERS: physics.MultimodeFiberSpec[] = [
  { profile: 'graded', coreRadiusUm: 3, na: 0.2 },
  { profile: 'step', coreRadiusUm: 4, na: 0.2 },
  { profile: 'graded', coreRadiusUm: 8, na: 0.2, alpha: 2.1 },
];
const WAVELENGTHS = [850, 1300, 850];
const SETS = FIBERS.map((f, i) => physics.multimodeModes(f, WAVELENGTHS[i]));
const OM50_FIBER: physics.MultimodeFiberSpec = { profile: 'graded', coreRadiusUm: 25, na: 0.2 };
const OM50 = physics.multimodeModes(OM50_FIBER, 1300);
const CASES = [...FIBERS.map((fiber, i) => ({ fiber, wavelengthNm: WAVELENGTHS[i], modes: SETS[i] }))];
const OM50_CASE = { fiber: OM50_FIBER, wavelengthNm: 1300, modes: OM50 };

const junkSet = fc.oneof(notANumber, fc.record({ rUm: fc.constant(new Float64Array(3)), stepUm: num(0, 1), modes: fc.constant([]) }), fc.record({ rUm: fc.constant([1, 2]), modes: fc.constant([{ l: 0 }]) }));
const set = fc.oneof({ arbitrary: fc.constantFrom(...SETS), weight: 30 }, { arbitrary: fc.constant(OM50), weight: 1 }, { arbitrary: junkSet, weight: 4 }) as fc.Arbitrary<physics.MultimodeModeSet>;

/** Powers for a set: mostly one valid value per mode, sometimes wrong length, negatives or junk. */
function powersFor(s: physics.MultimodeModeSet): fc.Arbitrary<number[]> {
  const n = Array.isArray(s?.modes) ? s.modes.length : 3;
  return fc.oneof(
    { arbitrary: fc.array(inRange(0, 1), { minLength: n, maxLength: n }), weight: 8 },
    { arbitrary: fc.array(num(-1, 1), { minLength: n, maxLength: n }), weight: 2 },
    { arbitrary: fc.array(inRange(0, 1), { maxLength: 5 }), weight: 1 },
    { arbitrary: notANumber, weight: 1 },
  ) as fc.Arbitrary<number[]>;
}

const setAndPowers = set.chain((s) => fc.tuple(fc.constant(s), powersFor(s)));
/** In-range inputs only: a pooled set. */
const validSet = fc.constantFrom(...SETS);

function checkCurve(c: physics.EncircledFluxCurve): void {
  for (let i = 0; i < c.ef.length; i++) {
    expectBetween(c.ef[i], 0, 1, `EF at ${c.rUm[i]} µm`);
    if (i > 0 && c.ef[i] < c.ef[i - 1] - 1e-12) throw new Error(`EF falls from ${c.ef[i - 1]} to ${c.ef[i]} at ${c.rUm[i]} µm`);
  }
  for (const g of c.perGroup) expectBetween(g.fraction, 0, 1, `share of group ${g.principal}`);
}

function checkShares(p: number[]): void {
  let sum = 0;
  for (const x of p) {
    expectBetween(x, 0, 1, 'mode power share');
    sum += x;
  }
  if (Math.abs(sum - 1) > 1e-9) throw new Error(`shares sum to ${sum}`);
}

describe('multimode launch conditions: every result finite and physically valid, or a typed error', () => {
  reportAfterAll(M);

  fuzz(M, 'overfilledModePowers', physics.overfilledModePowers, fc.tuple(objectOr(fc.record({ modes: set }))), checkShares, { inRange: fc.tuple(fc.record({ modes: validSet })) });

  const groupPowers = fc.oneof(
    { arbitrary: fc.array(fc.record({ principal: int(1, 12), power: num(0, 10) }), { minLength: 1, maxLength: 6 }), weight: 8 },
    { arbitrary: fc.oneof(notANumber, fc.constant([])), weight: 1 },
  ) as fc.Arbitrary<{ principal: number; power: number }[]>;
  const validGroups = fc.array(fc.record({ principal: fc.integer({ min: 1, max: 3 }), power: fc.double({ min: 0.01, max: 10, noNaN: true }) }), { minLength: 1, maxLength: 6 });
  fuzz(M, 'groupModePowers', physics.groupModePowers, fc.tuple(objectOr(fc.record({ modes: set, groupPowers }))), checkShares, { inRange: fc.tuple(fc.record({ modes: validSet, groupPowers: validGroups })) });

  fuzz(M, 'powerPerGroup', physics.powerPerGroup, setAndPowers.map(([modes, powers]) => [{ modes, powers }] as [{ modes: physics.MultimodeModeSet; powers: number[] }]), (groups) => {
    for (const g of groups) expectBetween(g.fraction, 0, 1, 'group share');
  });

  const points = fc.oneof({ arbitrary: fc.constant(undefined), weight: 6 }, { arbitrary: int(2, 300), weight: 3 });
  fuzz(
    M,
    'encircledFlux',
    physics.encircledFlux,
    fc.tuple(setAndPowers, mixValid(inRange(1, 8), num(0, 600)), points).map(([[modes, powers], coreRadiusUm, p]) => [{ modes, powers, coreRadiusUm, points: p }] as [Parameters<typeof physics.encircledFlux>[0]]),
    checkCurve,
  );

  const goodCurve = physics.encircledFlux({ modes: OM50, powers: physics.overfilledModePowers({ modes: OM50 }), coreRadiusUm: 25 });
  const curve = fc.oneof(
    { arbitrary: fc.constant(goodCurve), weight: 8 },
    { arbitrary: fc.oneof(notANumber, fc.record({ rUm: fc.constant([0]), ef: fc.constant([0]) }), fc.record({ rUm: fc.array(num(0, 30), { maxLength: 4 }), ef: fc.array(num(0, 1), { maxLength: 4 }) })), weight: 2 },
  ) as fc.Arbitrary<physics.EncircledFluxCurve>;
  fuzz(M, 'encircledFluxAt', physics.encircledFluxAt, fc.tuple(objectOr(fc.record({ curve, radiusUm: num(0, 40) }))), (ef) => expectBetween(ef, 0, 1, 'EF'));

  fuzz(M, 'efTemplateFor', physics.efTemplateFor, fc.tuple(objectOr(fc.record({ coreDiameterUm: num(40, 70), wavelengthNm: num(800, 1400) }))));

  const template = fc.oneof(
    { arbitrary: fc.constantFrom(...physics.EF_TEMPLATES), weight: 8 },
    { arbitrary: fc.oneof(notANumber, fc.record({ points: fc.array(fc.record({ radiusUm: num(0, 30), lower: num(0, 1), upper: num(0, 1) }), { maxLength: 4 }) })), weight: 2 },
  ) as fc.Arbitrary<physics.EfTemplate>;
  const validCurves = [goodCurve, physics.encircledFlux({ modes: OM50, powers: physics.groupModePowers({ modes: OM50, groupPowers: [{ principal: 1, power: 1 }] }), coreRadiusUm: 25 })];
  fuzz(
    M,
    'checkEncircledFlux',
    physics.checkEncircledFlux,
    fc.tuple(objectOr(fc.record({ curve, template }))),
    (r) => {
      if (!['compliant', 'underfilled', 'overfilled', 'outside both ways'].includes(r.verdict)) throw new Error(`verdict ${r.verdict}`);
      expectNonNegative(r.marginEf, 'margin');
    },
    { inRange: fc.tuple(fc.record({ curve: fc.constantFrom(...validCurves), template: fc.constantFrom(...physics.EF_TEMPLATES) })) },
  );

  fuzz(M, 'rayPeriodIntegral', physics.rayPeriodIntegral, fc.tuple(objectOr(fc.record({ alpha: fc.oneof(num(0.5, 1000), fc.constant(Number.POSITIVE_INFINITY)) }))), (x) => {
    if (!(x >= 1 && x <= 3)) throw new Error(`I_α = ${x}, expected between 1 (step) and 3`);
  });

  const mandrelCase = fc.oneof({ arbitrary: fc.constantFrom(...CASES), weight: 30 }, { arbitrary: fc.constant(OM50_CASE), weight: 1 });
  const mandrelInput = mixValid(
    fc.tuple(mandrelCase, inRange(3, 500), inRange(0.1, 10), inRange(0, 20), maybe(fc.constantFrom('stress-corrected' as const, 'geometric' as const))).map(([c, d, cord, turns, radiusModel]) => ({ ...c, mandrelDiameterMm: d, cordDiameterMm: cord, turns, radiusModel })),
    fc
      .tuple(mandrelCase, num(0, 600), num(0, 12), num(0, 120), maybe(fc.oneof(fc.constantFrom('stress-corrected', 'geometric', 'bent'), notANumber)), maybe(num(150, 2600)), fc.boolean())
      .map(([c, d, cord, turns, radiusModel, w, swapModes]) => ({ ...c, wavelengthNm: w ?? c.wavelengthNm, modes: swapModes ? OM50 : c.modes, mandrelDiameterMm: d, cordDiameterMm: cord, turns, radiusModel })),
  ) as fc.Arbitrary<physics.MandrelInput>;
  fuzz(M, 'mandrelFilter', physics.mandrelFilter, fc.tuple(objectOr(mandrelInput)), (r) => {
    expectNonNegative(r.lossDb, 'mandrel loss');
    for (const m of r.perMode) {
      expectBetween(m.transmission, 0, 1, `transmission of LP${m.l}${m.m}`);
      expectNonNegative(m.barrier, 'barrier');
    }
    expectBetween(r.glogeGuidedModeShare, 0, 1, 'Gloge share');
  });

  fuzz(M, 'recommendedMandrel', physics.recommendedMandrel, fc.tuple(objectOr(fc.record({ coreDiameterUm: num(40, 70), cordDiameterMm: num(0, 4) }))));
  fuzz(M, 'modeConditioningOffset', physics.modeConditioningOffset, fc.tuple(objectOr(fc.record({ coreDiameterUm: num(5, 70) }))));

  // Fields at the wavelengths of the pooled sets (a field of another wavelength is refused, also fuzzed here).
  const FIELDS = [physics.gaussianRadialField(5.5, 850), physics.gaussianRadialField(9.2, 850), physics.gaussianRadialField(9.2, 1300)];
  const field = fc.oneof({ arbitrary: fc.constantFrom(...FIELDS), weight: 8 }, { arbitrary: notANumber, weight: 1 }) as fc.Arbitrary<physics.RadialField>;
  const offsets = fc.oneof(
    { arbitrary: fc.array(inRange(0, 10), { minLength: 1, maxLength: 3 }), weight: 8 },
    { arbitrary: fc.array(num(0, MAX_LAUNCH_OFFSET_UM + 20), { maxLength: 3 }), weight: 2 },
    { arbitrary: notANumber, weight: 1 },
  ) as fc.Arbitrary<number[]>;
  // The 50 µm set is drawn about 1 time in 50 here: each offset is a full set of overlaps (~10 ms there).
  const sweepSet = fc.oneof({ arbitrary: fc.constantFrom(...SETS), weight: 40 }, { arbitrary: fc.constant(OM50), weight: 1 }, { arbitrary: junkSet, weight: 6 }) as fc.Arbitrary<physics.MultimodeModeSet>;
  // In range: a set at 850 nm with a field of 850 nm, offsets inside the small cores (3 µm radius and up).
  const validSweep = fc.record({ source: fc.constantFrom(FIELDS[0], FIELDS[1]), modes: fc.constantFrom(SETS[0], SETS[2]), coreRadiusUm: fc.constant(3), offsetsUm: fc.array(fc.double({ min: 0, max: 2, noNaN: true }), { minLength: 1, maxLength: 3 }) });
  fuzz(
    M,
    'offsetLaunchSweep',
    physics.offsetLaunchSweep,
    fc.tuple(objectOr(fc.record({ source: field, modes: sweepSet, coreRadiusUm: mixValid(inRange(3, 4), num(0, 100)), offsetsUm: offsets }))),
    (points) => {
      for (const p of points) {
        expectBetween(p.coupledFraction, 0, 1, 'coupled fraction');
        expectNonNegative(p.lossDb, 'launch loss');
        expectBetween(p.centreShare, 0, 1, 'share near the axis');
      }
    },
    { inRange: fc.tuple(validSweep) },
  );

  const losses = fc.oneof(
    { arbitrary: fc.constant(undefined), weight: 2 },
    { arbitrary: fc.record({ 850: maybe(num(-5, 20)), 1300: maybe(num(-5, 20)) }, { requiredKeys: [] }), weight: 4 },
    { arbitrary: fc.record({ 1310: maybe(num(-5, 30)), 1550: maybe(num(-5, 30)) }, { requiredKeys: [] }), weight: 4 },
    { arbitrary: notANumber, weight: 1 },
  );
  fuzz(
    M,
    'applicationsForLink',
    physics.applicationsForLink,
    fc.tuple(objectOr(fc.record({ category: fc.oneof(fc.constantFrom(...physics.FIBER_CATEGORIES), notANumber), lengthM: num(0, 250_000), lossDbByWindow: losses }))) as fc.Arbitrary<[Parameters<typeof physics.applicationsForLink>[0]]>,
    (rows) => {
      for (const r of rows) if (r.maxReachM !== undefined) expectNonNegative(r.maxReachM, 'reach');
    },
    {
      inRange: fc.tuple(
        fc.oneof(
          fc.record({ category: fc.constantFrom('OM1' as const, 'OM3' as const, 'OM5' as const), lengthM: fc.double({ min: 0, max: 2000, noNaN: true }), lossDbByWindow: fc.record({ 850: fc.double({ min: 0, max: 5, noNaN: true }) }) }),
          fc.record({ category: fc.constantFrom('OS1' as const, 'OS2' as const), lengthM: fc.double({ min: 0, max: 40_000, noNaN: true }), lossDbByWindow: fc.record({ 1310: fc.double({ min: 0, max: 20, noNaN: true }) }) }),
        ),
      ) as fc.Arbitrary<[Parameters<typeof physics.applicationsForLink>[0]]>,
    },
  );
});
