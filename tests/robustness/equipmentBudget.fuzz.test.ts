// Fuzzing of src/physics/equipmentBudget.ts: budgets and levels in and beyond their ranges, losses in any order.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { EQUIPMENT_DBM_MAX, EQUIPMENT_DBM_MIN, MAX_POWER_BUDGET_DB } from '../../src/physics';
import { expectClose, fuzz, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'equipmentBudget';
const dbm = num(EQUIPMENT_DBM_MIN - 10, EQUIPMENT_DBM_MAX + 10);
// Plausible equipment (tx −10…+5 dBm, rx −35…−3 dBm) more often than not, so most draws reach a verdict.
const plausible = fc.record({ kind: fc.constant('levels' as const), txMinDbm: fc.double({ min: -10, max: 0, noNaN: true }), txMaxDbm: fc.double({ min: 0, max: 5, noNaN: true }), rxSensitivityDbm: fc.double({ min: -35, max: -20, noNaN: true }), rxOverloadDbm: fc.double({ min: -10, max: -3, noNaN: true }) });
const limits = objectOr(
  fc.oneof(
    fc.record({ kind: fc.constant('budget' as const), powerBudgetDb: num(-5, MAX_POWER_BUDGET_DB + 5) }),
    plausible,
    fc.record({ kind: fc.constant('levels' as const), txMinDbm: dbm, txMaxDbm: dbm, rxSensitivityDbm: dbm, rxOverloadDbm: dbm }),
  ),
) as fc.Arbitrary<physics.EquipmentLimits>;
// Mostly ordered losses (lowest ≤ highest), as a link budget gives them; sometimes any pair.
const losses = fc.oneof(
  { arbitrary: fc.tuple(fc.double({ min: 0, max: 200, noNaN: true }), fc.double({ min: 0, max: 50, noNaN: true })).map(([lo, d]) => [lo, lo + d] as const), weight: 4 },
  { arbitrary: fc.tuple(num(-1, 200), num(-1, 200)), weight: 1 },
);
const input = objectOr(
  fc.record({ limits, losses, designMarginDb: num(-1, 110) }).map(({ limits: l, losses: [lowestLossDb, highestLossDb], designMarginDb }) => ({ limits: l, lowestLossDb, highestLossDb, designMarginDb })),
);

// What a person can type on the screen: a budget of 0–40 dB, or levels in their order, ordered losses, a margin of 0–10 dB.
// Every such input must give a verdict.
const inRangeInput = fc
  .record({
    limits: fc.oneof(fc.record({ kind: fc.constant('budget' as const), powerBudgetDb: fc.double({ min: 0, max: 40, noNaN: true }) }), plausible),
    lowestLossDb: fc.double({ min: 0, max: 60, noNaN: true }),
    extraDb: fc.double({ min: 0, max: 10, noNaN: true }),
    designMarginDb: fc.double({ min: 0, max: 10, noNaN: true }),
  })
  .map(({ limits: l, lowestLossDb, extraDb, designMarginDb }) => [{ limits: l as physics.EquipmentLimits, lowestLossDb, highestLossDb: lowestLossDb + extraDb, designMarginDb }] as [Parameters<typeof physics.equipmentFit>[0]]);

describe('equipmentBudget: every input gives a verdict with consistent numbers or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'equipmentFit', physics.equipmentFit, fc.tuple(input), (r, [i]) => {
    expectClose(r.spareDb, r.powerBudgetDb - i.highestLossDb - i.designMarginDb, 1e-9, 'spare');
    if (r.verdict === 'short' && !(r.shortDb > 0)) throw new Error('short without a shortfall');
    if (r.verdict === 'fits' && !(r.spareDb >= 0)) throw new Error('fits with a negative spare');
  }, { inRange: inRangeInput, minSuccessShare: 1 });
});
