// Bend or splice? An event's loss at several wavelengths against the project's bend model (Marcuse 1976, bending.ts)
// and joint model (Marcuse 1977, jointLoss.ts). Forward-then-inverse round trips, and readings classified.
import { describe, expect, it } from 'vitest';
import {
  bendEventLossDb,
  classifyEvent,
  equivalentStepIndex,
  lateralOffsetLossDb,
  mfdMismatchLossDb,
  mfdRatioForLoss,
  modeFieldDiameterUm,
  offsetForLossUm,
  spliceEventLossDb,
  type EventReading,
} from '../../src/physics';

// Standard single-mode fiber as the app's G.652.D preset describes it: cable cutoff 1260 nm, MFD 9.2 µm at 1310 nm.
const e = equivalentStepIndex({ cutoffWavelengthNm: 1260, cutoffKind: 'cable', mfdUm: 9.2, mfdWavelengthNm: 1310 });
const fiber = { coreRadiusUm: e.coreRadiusUm, na: e.na };
const mfdAt = (wavelengthNm: number) => modeFieldDiameterUm({ ...fiber, wavelengthNm, definition: 'petermann2' }).mfdUm;
const at = (pairs: [number, number][]): EventReading[] => pairs.map(([wavelengthNm, lossDb]) => ({ wavelengthNm, lossDb }));

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

describe('the readings a technician meets (issue 15)', () => {
  it('0.05 dB at 1310 nm and 0.40 dB at 1550 nm on standard fiber is a bend (loss rising steeply with wavelength)', () => {
    const r = classifyEvent({ fiber, readings: at([[1310, 0.05], [1550, 0.4]]) });
    expect(r.verdict).toBe('bend');
    expect(r.splice.fits).toBe(false);
    expect(r.bend.radiusRangeMm![0]).toBeLessThanOrEqual(r.bend.bendRadiusMm!);
    expect(r.bend.radiusRangeMm![1]).toBeGreaterThanOrEqual(r.bend.bendRadiusMm!);
  });

  it('0.20 dB at 1310 nm and 0.19 dB at 1550 nm is a splice (nearly flat with wavelength)', () => {
    const r = classifyEvent({ fiber, readings: at([[1310, 0.2], [1550, 0.19]]) });
    expect(r.verdict).toBe('splice');
    expect(r.bend.fits).toBe(false);
  });

  it('a loss that falls steeply with wavelength fits neither, and says so', () => {
    expect(classifyEvent({ fiber, readings: at([[1310, 0.5], [1550, 0.1]]) }).verdict).toBe('neither');
  });

  it('two readings below zero are a one-way gainer, not an event loss: neither, flagged', () => {
    const r = classifyEvent({ fiber, readings: at([[1310, -0.2], [1550, -0.25]]) });
    expect(r.verdict).toBe('neither');
    expect(r.hasGain).toBe(true);
  });

  it('losses within the reading uncertainty are no event at all', () => {
    expect(classifyEvent({ fiber, readings: at([[1310, 0.01], [1550, 0.02]]) }).verdict).toBe('no-loss');
  });

  it('readings given out of order are sorted by wavelength', () => {
    const r = classifyEvent({ fiber, readings: at([[1550, 0.4], [1310, 0.05]]) });
    expect(r.readings.map((x) => x.wavelengthNm)).toEqual([1310, 1550]);
  });

  it('two readings at the same wavelength are refused with the reason', () => {
    expect(() => classifyEvent({ fiber, readings: at([[1550, 0.4], [1550, 0.05]]) })).toThrow(/same wavelength/);
  });
});

describe('forward then inverse: a bend made with the bend model is found again', () => {
  it.each([
    [4, 0.01],
    [5, 0.02],
    [6.5, 0.05],
    [8, 0.2],
    [10, 1],
  ])('%s mm radius, %s turns, read at 1310/1550/1625 nm', (radiusMm, turns) => {
    const readings = [1310, 1550, 1625].map((wavelengthNm) => ({ wavelengthNm, lossDb: bendEventLossDb({ fiber, wavelengthNm, bendRadiusMm: radiusMm, turns }) }));
    const r = classifyEvent({ fiber, readings, toleranceDb: 0.001 });
    expect(r.bend.fits).toBe(true);
    // The radius grid is 0.05 mm: the best radius is within one step, the turns within the loss change of that step.
    near(r.bend.bendRadiusMm!, radiusMm, 0.05, 'radius');
    near(r.bend.turns! / turns, 1, 0.1, 'turns ratio');
    expect(r.verdict).toBe('bend');
  });

  it('a wider reading uncertainty widens the radius range around the true radius', () => {
    const readings = [1310, 1550].map((wavelengthNm) => ({ wavelengthNm, lossDb: bendEventLossDb({ fiber, wavelengthNm, bendRadiusMm: 6, turns: 0.05 }) }));
    const tight = classifyEvent({ fiber, readings, toleranceDb: 0.005 }).bend.radiusRangeMm!;
    const loose = classifyEvent({ fiber, readings, toleranceDb: 0.05 }).bend.radiusRangeMm!;
    expect(tight[0]).toBeLessThanOrEqual(6.05);
    expect(tight[1]).toBeGreaterThanOrEqual(5.95);
    expect(loose[1] - loose[0]).toBeGreaterThan(tight[1] - tight[0]);
  });
});

describe('forward then inverse: a splice made with the joint model is found again', () => {
  it.each([0.5, 1, 1.5])('a %s µm offset between equal fibers: splice, offset found back', (offsetUm) => {
    const readings = [1310, 1550, 1625].map((wavelengthNm) => ({ wavelengthNm, lossDb: lateralOffsetLossDb(mfdAt(wavelengthNm), mfdAt(wavelengthNm), offsetUm) }));
    const r = classifyEvent({ fiber, readings, toleranceDb: 0.001 });
    expect(r.verdict).toBe('splice');
    near(r.splice.offsetUm, offsetUm, 1e-9 * offsetUm + 1e-9, 'offset');
    near(r.splice.flatPartDb, 0, 1e-9, 'flat part');
  });

  it.each([1.1, 1.2, 1.4])('an MFD ratio of %s alone (flat loss): splice, ratio found back', (ratio) => {
    const loss = mfdMismatchLossDb(9.2, 9.2 * ratio);
    const r = classifyEvent({ fiber, readings: at([[1310, loss], [1550, loss], [1625, loss]]), toleranceDb: 0.001 });
    expect(r.verdict).toBe('splice');
    near(r.splice.mfdRatio, ratio, 1e-9, 'MFD ratio');
  });

  it('offset plus mismatch together are split back into their parts', () => {
    const readings = [1310, 1550].map((wavelengthNm) => ({ wavelengthNm, lossDb: spliceEventLossDb({ mfdUm: mfdAt(wavelengthNm), lateralOffsetUm: 1, mfdRatio: 1.15 }) }));
    const r = classifyEvent({ fiber, readings, toleranceDb: 0.001 });
    expect(r.verdict).toBe('splice');
    near(r.splice.offsetUm, 1, 1e-6, 'offset');
    near(r.splice.mfdRatio, 1.15, 1e-6, 'ratio');
  });
});

describe('the inverses of the joint formulas (Marcuse 1977) round-trip', () => {
  it.each([0.01, 0.1, 0.5, 2])('offset for %s dB, put back into the offset formula, gives that loss', (lossDb) => {
    near(lateralOffsetLossDb(10, 10, offsetForLossUm({ mfdUm: 10, lossDb })), lossDb, 1e-12, 'loss');
  });

  it.each([0.001, 0.05, 0.3, 3])('MFD ratio for %s dB, put back into the mismatch formula, gives that loss', (lossDb) => {
    near(mfdMismatchLossDb(9, 9 * mfdRatioForLoss({ lossDb })), lossDb, 1e-9, 'loss');
  });
});
