import { describe, expect, it } from 'vitest';
import { equipmentFit, InputError, linkBudget, TYPICAL_VALUES } from '../../src/physics';

// Sums and differences of dB values: exact to a few ulps.
const TOL_DB = 1e-12;

describe('equipment power budget against the link loss', () => {
  // Textbook exercise (transmitter 0.1 mW = −10 dBm, fiber 6 dB/km × 0.5 km, two connectors of 2 dB,
  // receiver sensitivity −35 dBm, 4 dB margin; as posted on ques10.com, worked by hand here):
  // budget −10 − (−35) = 25 dB; loss 3 + 4 = 7 dB; with the 4 dB margin 11 dB; 14 dB to spare.
  it('the textbook link (−10 dBm into −35 dBm, 7 dB of loss, 4 dB margin) fits with 14 dB to spare, from levels or from the 25 dB budget', () => {
    const levels = equipmentFit({
      limits: { kind: 'levels', txMinDbm: -10, txMaxDbm: -10, rxSensitivityDbm: -35, rxOverloadDbm: -3 },
      lowestLossDb: 7,
      highestLossDb: 7,
      designMarginDb: 4,
    });
    const budget = equipmentFit({ limits: { kind: 'budget', powerBudgetDb: 25 }, lowestLossDb: 7, highestLossDb: 7, designMarginDb: 4 });
    for (const r of [levels, budget]) {
      expect(r.powerBudgetDb).toBeCloseTo(25, 12);
      expect(Math.abs(r.spareDb - 14)).toBeLessThanOrEqual(TOL_DB);
      expect(r.verdict).toBe('fits');
      expect(r.shortDb).toBe(0);
    }
    expect(levels.weakestRxDbm).toBeCloseTo(-17, 12);
    expect(budget.overloadDb).toBeUndefined();
  });

  // Worst-case power budget P_B = P_T,min − P_R,sensitivity and margin P_M = P_B − link loss (common practice):
  // −15 dBm into −28 dBm is 13 dB; a 7 dB link leaves 6 dB.
  it('−15 dBm into a −28 dBm receiver is a 13 dB budget; a 7 dB link leaves 6 dB with no design margin', () => {
    const r = equipmentFit({ limits: { kind: 'levels', txMinDbm: -15, txMaxDbm: -8, rxSensitivityDbm: -28, rxOverloadDbm: -7 }, lowestLossDb: 5, highestLossDb: 7, designMarginDb: 0 });
    expect(r.powerBudgetDb).toBeCloseTo(13, 12);
    expect(r.spareDb).toBeCloseTo(6, 12);
    expect(r.overloadDb).toBe(0);
    expect(r.strongestRxDbm).toBeCloseTo(-13, 12);
  });

  it.each([
    // budget, highest loss, design margin → verdict, spare, short (definition of the decibel: differences of dB values)
    [20, 15.5, 3, 'fits', 1.5, 0],
    [20, 18.2, 3, 'no-margin', -1.2, 0],
    [20, 20.8, 3, 'short', -3.8, 0.8],
    [20, 17, 3, 'fits', 0, 0],
  ] as const)('a %s dB budget over a %s dB link with a %s dB margin: %s (spare %s dB, short %s dB)', (b, loss, margin, verdict, spare, short) => {
    const r = equipmentFit({ limits: { kind: 'budget', powerBudgetDb: b }, lowestLossDb: 0, highestLossDb: loss, designMarginDb: margin });
    expect(r.verdict).toBe(verdict);
    expect(r.spareDb).toBeCloseTo(spare, 12);
    expect(r.shortDb).toBeCloseTo(short, 12);
  });

  it('a strong transmitter over a short link overloads the receiver, by strongest arrival − overload', () => {
    // 0 dBm through 0.5 dB into a −3 dBm overload: −0.5 dBm arrives, 2.5 dB too strong (common practice: attenuate by that much).
    const r = equipmentFit({ limits: { kind: 'levels', txMinDbm: -5, txMaxDbm: 0, rxSensitivityDbm: -23, rxOverloadDbm: -3 }, lowestLossDb: 0.5, highestLossDb: 1, designMarginDb: 3 });
    expect(r.verdict).toBe('overload');
    expect(r.overloadDb).toBeCloseTo(2.5, 12);
  });

  it('agrees with the link budget’s own equipment check on the margin left (same levels, same link)', () => {
    const atten = [{ wavelengthNm: 1310, dbPerKm: 0.35 }];
    const spec = { wavelengthNm: 1310, txMinDbm: -5, txMaxDbm: 0, rxSensitivityDbm: -23, rxOverloadDbm: -3 };
    const b = linkBudget({
      elements: [
        { kind: 'fiber', label: 'span', lengthKm: 30, fiberClass: 'single-mode', attenuationDbPerKm: atten },
        { kind: 'connectorPair', label: 'pairs', count: 4 },
      ],
      wavelengthsNm: [1310],
      ruleSet: TYPICAL_VALUES,
      designMarginDb: 3,
      equipment: [spec],
    });
    const w = b.wavelengths[0]!;
    const r = equipmentFit({ limits: { kind: 'levels', ...spec }, lowestLossDb: w.minDb, highestLossDb: w.maxDb, designMarginDb: 3 });
    expect(Math.abs(r.spareDb - w.equipment!.remainingMarginDb)).toBeLessThanOrEqual(TOL_DB);
  });

  it.each([
    ['a negative budget', { limits: { kind: 'budget', powerBudgetDb: -1 }, lowestLossDb: 0, highestLossDb: 1, designMarginDb: 0 }, 'powerBudgetDb'],
    ['swapped transmitter levels', { limits: { kind: 'levels', txMinDbm: 0, txMaxDbm: -5, rxSensitivityDbm: -23, rxOverloadDbm: -3 }, lowestLossDb: 0, highestLossDb: 1, designMarginDb: 0 }, 'txMinDbm'],
    ['swapped receiver levels', { limits: { kind: 'levels', txMinDbm: -5, txMaxDbm: 0, rxSensitivityDbm: -3, rxOverloadDbm: -23 }, lowestLossDb: 0, highestLossDb: 1, designMarginDb: 0 }, 'rxSensitivityDbm'],
    ['lowest loss above highest', { limits: { kind: 'budget', powerBudgetDb: 20 }, lowestLossDb: 5, highestLossDb: 1, designMarginDb: 0 }, 'highestLossDb'],
    ['no equipment', { limits: undefined, lowestLossDb: 0, highestLossDb: 1, designMarginDb: 0 }, 'limits'],
  ])('%s is refused in words, naming the value', (_what, input, argument) => {
    let thrown: unknown;
    try {
      equipmentFit(input as Parameters<typeof equipmentFit>[0]);
    } catch (e) {
      thrown = e;
    }
    expect(thrown).toBeInstanceOf(InputError);
    expect((thrown as InputError).argument).toBe(argument);
  });
});
