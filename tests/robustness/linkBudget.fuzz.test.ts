// Fuzzing of src/physics/linkBudget.ts: links of up to 12 elements of every kind at up to 3 wavelengths, with
// the standard rule sets, the user's own, and broken ones. Cheap (microseconds per link): full 10,000 runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_SPLITTER_WAYS, TIA_568_3_D, TIA_568_C_3, TYPICAL_VALUES } from '../../src/physics';
import { expectNonNegative, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'linkBudget';

function spreadOf(n: (lo: number, hi: number) => fc.Arbitrary<number>): fc.Arbitrary<physics.LossSpread> {
  return fc.tuple(n(0, 110), n(0, 110), n(0, 110)).map(([a, b, c]) => ({ minDb: a, typicalDb: b, maxDb: c }));
}
/** Mostly ordered (lowest ≤ typical ≤ highest), sometimes shuffled or broken. */
const spread = fc.oneof(
  { arbitrary: fc.tuple(inRange(0, 2), inRange(0, 2), inRange(0, 2)).map((v) => { const [a, b, c] = [...v].sort((x, y) => x - y); return { minDb: a, typicalDb: b, maxDb: c }; }), weight: 6 },
  { arbitrary: spreadOf(num), weight: 2 },
  { arbitrary: notANumber, weight: 1 },
) as fc.Arbitrary<physics.LossSpread>;
const windows = [850, 1300, 1310, 1550, 1625];
const wavelength = fc.oneof({ arbitrary: fc.constantFrom(...windows), weight: 6 }, { arbitrary: num(150, 2600), weight: 2 });
const attenuation = fc.oneof(
  { arbitrary: fc.array(fc.record({ wavelengthNm: wavelength, dbPerKm: fc.oneof(inRange(0.15, 4), num(0, 120)) }), { minLength: 1, maxLength: 4 }), weight: 8 },
  { arbitrary: fc.oneof(fc.constant([]), notANumber, fc.array(notANumber, { maxLength: 2 })), weight: 1 },
) as fc.Arbitrary<physics.AttenuationAt[]>;
const fiberClass = fc.oneof({ arbitrary: fc.constantFrom('single-mode', 'multimode'), weight: 8 }, { arbitrary: fc.constantFrom('om3', '', undefined), weight: 1 }) as fc.Arbitrary<physics.FiberClass>;
const label = fc.oneof(fc.string({ maxLength: 20 }), fc.constant('<img src=x onerror=alert(1)>'), notANumber) as fc.Arbitrary<string>;
const count = int(0, 12);
const element: fc.Arbitrary<physics.LinkElement> = fc.oneof(
  fc.record({ kind: fc.constant('fiber' as const), label, lengthKm: fc.oneof(inRange(0, 80), num(0, 25_000)), fiberClass, plant: maybe(fc.constantFrom('inside' as const, 'outside' as const)), attenuationDbPerKm: attenuation }),
  fc.record({ kind: fc.constant('connectorPair' as const), label, count }),
  fc.record({ kind: fc.constant('splice' as const), label, count }),
  fc.record({ kind: fc.constant('splitter' as const), label, ways: fc.oneof(fc.constantFrom(2, 4, 8, 16, 32, 64), int(0, MAX_SPLITTER_WAYS + 10)), excessDb: maybe(spread, 3) }),
  fc.record({ kind: fc.constant('patchCord' as const), label, count, lengthM: num(0, 12_000), fiberClass, attenuationDbPerKm: attenuation }),
  fc.record({ kind: fc.constant('other' as const), label, lossDb: spread }),
  fc.oneof(notANumber, fc.record({ kind: fc.constantFrom('amplifier', '', undefined), label })) as fc.Arbitrary<physics.LinkElement>,
);
const ownRules = fc.record({ connectorPairDb: spread, spliceDb: spread, splitterExcessPerStageDb: maybe(spread) });
const ruleSet = fc.oneof(
  { arbitrary: fc.constantFrom(TIA_568_3_D, TIA_568_C_3, TYPICAL_VALUES), weight: 6 },
  { arbitrary: ownRules.map((v) => { try { return physics.ownRuleSet(v); } catch { return TYPICAL_VALUES; } }), weight: 2 },
  { arbitrary: fc.oneof(notANumber, fc.record({ name: fc.string(), connectorPairDb: spread, spliceDb: spread, splitterExcessPerStageDb: spread, fiberMaxima: fc.constant([]) })), weight: 1 },
) as fc.Arbitrary<physics.LinkRuleSet>;
const dbm = (lo: number, hi: number) => fc.oneof({ arbitrary: inRange(lo, hi), weight: 6 }, { arbitrary: num(-120, 70), weight: 1 });
const equipment = fc.record({ wavelengthNm: wavelength, txMinDbm: dbm(-8, 0), txMaxDbm: dbm(0, 5), rxSensitivityDbm: dbm(-40, -20), rxOverloadDbm: dbm(-10, 0) });
const input = objectOr(
  fc.record({
    elements: fc.oneof({ arbitrary: fc.array(element, { maxLength: 12 }), weight: 9 }, { arbitrary: notANumber, weight: 1 }),
    wavelengthsNm: fc.oneof({ arbitrary: fc.array(wavelength, { minLength: 1, maxLength: 3 }), weight: 9 }, { arbitrary: fc.oneof(fc.constant([]), notANumber), weight: 1 }),
    ruleSet,
    designMarginDb: fc.oneof(inRange(0, 6), num(-1, 120)),
    equipment: maybe(fc.oneof({ arbitrary: fc.array(equipment, { maxLength: 3 }), weight: 9 }, { arbitrary: notANumber, weight: 1 })),
  }),
) as fc.Arbitrary<physics.LinkBudgetInput>;

// The all-valid share: every element well formed, every window listed in the fiber's attenuation.
const fullAttenuation = fc.constant(windows.map((w) => ({ wavelengthNm: w, dbPerKm: w < 1000 ? 3 : 0.4 })));
const validElement: fc.Arbitrary<physics.LinkElement> = fc.oneof(
  fc.record({ kind: fc.constant('fiber' as const), label: fc.string({ maxLength: 12 }), lengthKm: inRange(0, 80), fiberClass: fc.constantFrom('single-mode' as const, 'multimode' as const), plant: maybe(fc.constantFrom('inside' as const, 'outside' as const)), attenuationDbPerKm: fullAttenuation }),
  fc.record({ kind: fc.constant('connectorPair' as const), label: fc.string({ maxLength: 12 }), count: fc.integer({ min: 0, max: 12 }) }),
  fc.record({ kind: fc.constant('splice' as const), label: fc.string({ maxLength: 12 }), count: fc.integer({ min: 0, max: 40 }) }),
  fc.record({ kind: fc.constant('splitter' as const), label: fc.string({ maxLength: 12 }), ways: fc.integer({ min: 2, max: MAX_SPLITTER_WAYS }) }),
  fc.record({ kind: fc.constant('patchCord' as const), label: fc.string({ maxLength: 12 }), count: fc.integer({ min: 0, max: 4 }), lengthM: inRange(0, 30), fiberClass: fc.constantFrom('single-mode' as const, 'multimode' as const), attenuationDbPerKm: fullAttenuation }),
);
const validInput = fc.record({
  elements: fc.array(validElement, { maxLength: 12 }),
  wavelengthsNm: fc.array(fc.constantFrom(...windows), { minLength: 1, maxLength: 3 }),
  ruleSet: fc.constantFrom(TIA_568_3_D, TIA_568_C_3, TYPICAL_VALUES),
  designMarginDb: inRange(0, 6),
  equipment: maybe(fc.array(equipment, { maxLength: 3 })),
}) as fc.Arbitrary<physics.LinkBudgetInput>;
const anyInput = mixValid(validInput, input);

function checkBudget(r: physics.LinkBudgetResult): void {
  for (const w of r.wavelengths) {
    for (const e of [w, ...w.elements]) {
      expectNonNegative(e.minDb, `lowest loss at ${w.wavelengthNm} nm`);
      if (!(e.minDb <= e.typicalDb + 1e-9 && e.typicalDb <= e.maxDb + 1e-9)) throw new Error(`at ${w.wavelengthNm} nm lowest ${e.minDb} / typical ${e.typicalDb} / highest ${e.maxDb} out of order`);
    }
    if (w.withMarginDb < w.acceptanceDb) throw new Error('margin lowered the total');
  }
}

describe('linkBudget: every link gives ordered losses ≥ 0 dB or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'ownRuleSet', physics.ownRuleSet, fc.tuple(objectOr(ownRules)), (r) => {
    for (const s of [r.connectorPairDb, r.spliceDb, r.splitterExcessPerStageDb]) if (!(s.minDb >= 0 && s.minDb <= s.typicalDb && s.typicalDb <= s.maxDb)) throw new Error('spread out of order');
  });
  fuzz(M, 'attenuationAt', physics.attenuationAt, mixValid(fc.tuple(fullAttenuation, fc.constantFrom(...windows), maybe(label)), fc.tuple(attenuation, num(150, 2600), maybe(label))), (r, [, w]) => {
    expectNonNegative(r.dbPerKm, 'attenuation');
    if (Math.abs(r.wavelengthNm - w) > physics.WINDOW_TOLERANCE_NM) throw new Error(`picked ${r.wavelengthNm} nm for ${w} nm`);
  });
  fuzz(M, 'idealSplitLossDb', physics.idealSplitLossDb, fc.tuple(int(0, MAX_SPLITTER_WAYS + 10)), (r) => expectNonNegative(r, 'split loss'));
  fuzz(M, 'linkBudget', physics.linkBudget, fc.tuple(anyInput), checkBudget);
  const result = fc.oneof(
    { arbitrary: anyInput.map((i) => { try { return physics.linkBudget(i); } catch { return undefined; } }), weight: 8 },
    { arbitrary: fc.oneof(notANumber, fc.record({ wavelengths: notANumber })), weight: 2 },
  ) as fc.Arbitrary<physics.LinkBudgetResult>;
  fuzz(M, 'linkBudgetReport', physics.linkBudgetReport, fc.tuple(result));
});
