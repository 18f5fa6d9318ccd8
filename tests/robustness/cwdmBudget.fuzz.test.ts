// Fuzzing of src/physics/cwdmBudget.ts: coarse WDM plans with broken and valid fiber lists, counts and budgets.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectNonNegative, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'cwdmBudget';
const point = fc.record({ wavelengthNm: fc.oneof(fc.constantFrom(1310, 1383, 1550, 1625), num(100, 2600)), dbPerKm: fc.oneof(inRange(0.15, 1), num(0, 120)) });
const list = fc.oneof(
  { arbitrary: fc.array(point, { minLength: 1, maxLength: 5 }), weight: 8 },
  { arbitrary: fc.oneof(fc.constant([]), notANumber), weight: 1 },
) as fc.Arbitrary<physics.AttenuationAt[]>;
const g652d = fc.constant<physics.AttenuationAt[]>([
  { wavelengthNm: 1310, dbPerKm: 0.4 },
  { wavelengthNm: 1550, dbPerKm: 0.3 },
  { wavelengthNm: 1625, dbPerKm: 0.4 },
]);
const valid = fc.record({
  attenuationDbPerKm: g652d,
  lengthKm: inRange(0, 120),
  connectorPairs: fc.integer({ min: 0, max: 10 }),
  splices: fc.integer({ min: 0, max: 40 }),
  muxDemuxLossDb: inRange(0, 6),
  channelNumbers: maybe(fc.array(fc.integer({ min: 1, max: 18 }), { minLength: 1, maxLength: 18 })),
  powerBudgetDb: maybe(inRange(0, 40)),
  reserveDb: inRange(0, 6),
});
const hostile = objectOr(
  fc.record({
    attenuationDbPerKm: list,
    lengthKm: num(0, 500),
    connectorPairs: int(0, 120),
    splices: int(0, 1200),
    muxDemuxLossDb: num(0, 40),
    channelNumbers: maybe(fc.oneof(fc.array(int(0, 20), { maxLength: 20 }), notANumber as fc.Arbitrary<number[]>)),
    powerBudgetDb: maybe(num(-10, 120)),
    reserveDb: num(0, 80),
  }),
);

describe('cwdmBudget: every plan gives losses ≥ 0 dB per channel or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'cwdmPlan', physics.cwdmPlan, fc.tuple(mixValid(valid, hostile) as fc.Arbitrary<physics.CwdmPlanInput>), (r) => {
    for (const c of r.channels) {
      if (c.unavailable === undefined) expectNonNegative(c.maxLossDb!, `loss of channel ${c.channel.number}`);
      else if (c.maxLossDb !== undefined) throw new Error('unavailable channel with a loss');
    }
  });
});
