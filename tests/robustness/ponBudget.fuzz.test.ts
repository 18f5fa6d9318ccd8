// Fuzzing of src/physics/ponBudget.ts: plans of every generation and class with 0–5 splitter stages (typical or
// typed values), hostile lengths, counts, extras and fiber lists. Each plan evaluates every class of its generation
// and the split table (a few hundred small link budgets): still milliseconds per plan, full 10,000 runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { PON_LOSS_CLASSES } from '../../src/physics';
import { expectNonNegative, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'ponBudget';
const generation = fc.oneof({ arbitrary: fc.constantFrom('G-PON', 'XG-PON', 'XGS-PON'), weight: 8 }, { arbitrary: fc.oneof(fc.constantFrom('EPON', '', '__proto__'), notANumber), weight: 1 }) as fc.Arbitrary<physics.PonGeneration>;
const className = fc.oneof({ arbitrary: fc.constantFrom('A', 'B', 'C', 'B+', 'C+', 'N1', 'N2', 'E1', 'E2'), weight: 8 }, { arbitrary: fc.oneof(fc.string({ maxLength: 4 }), notANumber), weight: 1 }) as fc.Arbitrary<string>;
const ways = fc.oneof({ arbitrary: fc.constantFrom(2, 4, 8, 16, 32, 64, 128), weight: 6 }, { arbitrary: int(0, 300), weight: 2 });
const stage = objectOr(fc.record({ ways, maxInsertionLossDb: maybe(num(0, 80), 4), uniformityDb: maybe(num(0, 80), 3) }));
const g652d = [
  { wavelengthNm: 1310, dbPerKm: 0.4 },
  { wavelengthNm: 1550, dbPerKm: 0.3 },
  { wavelengthNm: 1625, dbPerKm: 0.4 },
];
const list = fc.oneof(
  { arbitrary: fc.constant(g652d), weight: 6 },
  { arbitrary: fc.array(fc.record({ wavelengthNm: num(100, 2600), dbPerKm: num(0, 120) }), { maxLength: 4 }), weight: 2 },
  { arbitrary: notANumber, weight: 1 },
) as fc.Arbitrary<physics.AttenuationAt[]>;
const extra = objectOr(fc.record({ label: fc.oneof(fc.string({ maxLength: 12 }), notANumber) as fc.Arbitrary<string>, lossDb: num(0, 80) }));
const hostile = objectOr(
  fc.record({
    generation,
    className,
    feederKm: num(0, 150),
    farthestDropKm: num(0, 150),
    nearestDropKm: num(0, 150),
    splitters: fc.oneof({ arbitrary: fc.array(stage, { maxLength: 5 }), weight: 8 }, { arbitrary: notANumber as fc.Arbitrary<physics.SplitterStage[]>, weight: 1 }),
    connectorPairs: int(0, 120),
    splices: int(0, 1200),
    extras: maybe(fc.oneof(fc.array(extra, { maxLength: 3 }), notANumber as fc.Arbitrary<physics.PonExtra[]>)),
    reserveDb: num(0, 80),
    attenuationDbPerKm: list,
    broadcastOverlay: maybe(fc.boolean()),
    overlayWavelengthNm: maybe(num(1400, 1700)),
  }),
) as fc.Arbitrary<physics.PonPlanInput>;
const valid = fc
  .constantFrom(...PON_LOSS_CLASSES)
  .chain((k) =>
    fc.record({
      generation: fc.constant(k.generation),
      className: fc.constant(k.name),
      feederKm: inRange(0, 60),
      farthestDropKm: inRange(2, 5),
      nearestDropKm: inRange(0, 2),
      splitters: fc.array(fc.record({ ways: fc.constantFrom(2, 4, 8, 16, 32) }), { minLength: 1, maxLength: 2 }),
      connectorPairs: fc.integer({ min: 0, max: 8 }),
      splices: fc.integer({ min: 0, max: 20 }),
      extras: maybe(fc.array(fc.record({ label: fc.string({ maxLength: 8 }), lossDb: inRange(0, 2) }), { maxLength: 2 })),
      reserveDb: inRange(0, 3),
      attenuationDbPerKm: fc.constant(g652d),
      broadcastOverlay: maybe(fc.boolean()),
      overlayWavelengthNm: maybe(inRange(1530, 1625)),
    }),
  ) as fc.Arbitrary<physics.PonPlanInput>;

// In range: a ratio of the typical table, or any 1×2…1×128 with a data-sheet loss at or above the ideal share and a
// uniformity below it. Every such splitter has an answer.
const splitterInRange = fc.oneof(
  fc.constantFrom(2, 4, 8, 16, 32, 64, 128).map((ways) => ({ ways })),
  fc.integer({ min: 2, max: 128 }).chain((ways) =>
    fc.record({ ways: fc.constant(ways), maxInsertionLossDb: inRange(10 * Math.log10(ways), 10 * Math.log10(ways) + 5), uniformityDb: maybe(inRange(0, 2)) }),
  ),
).map((st) => [st] as [physics.SplitterStage]);

describe('ponBudget: every plan gives ordered, finite losses and a verdict, or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'splitterLoss', physics.splitterLoss, fc.tuple(stage), (r) => {
    expectNonNegative(r.minDb, 'lowest splitter loss');
    if (!(r.minDb <= r.typicalDb && r.typicalDb <= r.maxDb && r.idealDb <= r.maxDb)) throw new Error('splitter losses out of order');
  }, { inRange: splitterInRange, minSuccessShare: 1 });
  fuzz(M, 'findPonLossClass', physics.findPonLossClass, fc.tuple(objectOr(fc.record({ generation, className }))), (r) => {
    if (!(r.minDb < r.maxDb)) throw new Error('class limits out of order');
  });
  fuzz(M, 'ponBudget', physics.ponBudget, fc.tuple(mixValid(valid, hostile)), (r) => {
    for (const d of r.directions) {
      expectNonNegative(d.minLossDb, `lowest loss at ${d.wavelengthNm} nm`);
      if (d.minLossDb > d.maxLossDb + 1e-9) throw new Error(`nearest home loses more than the farthest at ${d.wavelengthNm} nm`);
    }
    if (r.longestFeederKm !== undefined) expectNonNegative(r.longestFeederKm, 'longest feeder');
    if ((r.verdict === 'fits') !== r.directions.every((d) => d.fits)) throw new Error(`verdict ${r.verdict} disagrees with the directions`);
  });
});
