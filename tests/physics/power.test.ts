import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  dbToRatio,
  dbmToMw,
  dbmToUw,
  InputError,
  mwToDbm,
  powerAfterLossDbm,
  powerChain,
  ratioToDb,
  sumDb,
  uwToDbm,
} from '../../src/physics';

// Relative tolerance for pure arithmetic on the log scale: a few ulps of 10**x and log10.
const REL = 1e-12;

function expectClose(got: number, expected: number, tol: number, input: unknown) {
  const err = Math.abs(got - expected);
  const bound = tol * Math.max(1, Math.abs(expected));
  if (!(err <= bound)) {
    throw new Error(`input ${JSON.stringify(input)}: got ${got}, expected ${expected}, tolerance ${bound}`);
  }
}

describe('dBm, mW and µW (definition of dBm, common practice)', () => {
  // Each row follows from P[dBm] = 10·log10(P/1 mW): definition of dBm.
  it.each([
    [0, 1],
    [10, 10],
    [-10, 0.1],
    [20, 100],
    [-30, 0.001],
    [30, 1000],
  ])('%s dBm is %s mW', (dbm, mw) => {
    expectClose(dbmToMw(dbm), mw, REL, dbm);
    expectClose(mwToDbm(mw), dbm, REL, mw);
  });

  it.each([
    [0, 1000],
    [-30, 1],
    [-20, 10],
  ])('%s dBm is %s µW', (dbm, uw) => {
    expectClose(dbmToUw(dbm), uw, REL, dbm);
    expectClose(uwToDbm(uw), dbm, REL, uw);
  });

  it('+3.0103 dB doubles the power (10·log10 2 = 3.0103, definition of the decibel)', () => {
    expectClose(dbToRatio(10 * Math.log10(2)), 2, REL, '10 log10 2');
    // The rounded trade figure 3.0103 dB doubles to within 1e-5 (next digit of 10·log10 2 = 3.010299957).
    expectClose(dbToRatio(3.0103), 2, 1e-5, 3.0103);
    expectClose(ratioToDb(2), 3.0102999566398, 1e-12, 2);
  });

  it('a 3 dB loss leaves about half the power: 1 mW becomes 0.501 mW', () => {
    expectClose(dbmToMw(powerAfterLossDbm(0, 3)), 0.501187233627, 1e-11, [0, 3]);
  });

  it('round trip dBm → mW → dBm returns the same value anywhere in −150…+90 dBm', () => {
    fc.assert(
      fc.property(fc.double({ min: -150, max: 90, noNaN: true }), (dbm) => {
        expectClose(mwToDbm(dbmToMw(dbm)), dbm, 1e-12, dbm);
      }),
    );
  });

  it('round trip mW → dBm → mW keeps the relative value', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-12, max: 1e6, noNaN: true }), (mw) => {
        const back = dbmToMw(mwToDbm(mw));
        if (!(Math.abs(back - mw) <= 1e-12 * mw)) throw new Error(`input ${mw}: got ${back}, tolerance 1e-12 relative`);
      }),
    );
  });

  it('dB add where ratios multiply (definition of the decibel)', () => {
    fc.assert(
      fc.property(fc.double({ min: -100, max: 100, noNaN: true }), fc.double({ min: -100, max: 100, noNaN: true }), (a, b) => {
        expectClose(dbToRatio(a) * dbToRatio(b) / dbToRatio(a + b), 1, 1e-12, [a, b]);
      }),
    );
  });
});

describe('chains of losses', () => {
  it('power after a chain equals the start minus the sum of the losses, step by step', () => {
    const chain = powerChain(-3, [
      { label: 'patch cord', lossDb: 0.3 },
      { label: 'splitter 1×8', lossDb: 10.5 },
      { label: 'amplifier', lossDb: -15 },
    ]);
    expect(chain.points.map((p) => p.label)).toEqual(['patch cord', 'splitter 1×8', 'amplifier']);
    expectClose(chain.points[0]!.powerDbm, -3.3, 1e-14, 'after cord');
    expectClose(chain.points[1]!.powerDbm, -13.8, 1e-14, 'after splitter');
    expectClose(chain.endDbm, 1.2, 1e-14, 'after amplifier');
    expectClose(chain.totalLossDb, -4.2, 1e-14, 'total');
    expectClose(chain.overallRatio, dbmToMw(chain.endDbm) / dbmToMw(-3), 1e-12, 'ratio');
  });

  it('the order of losses does not change the end power (addition commutes)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 10, noNaN: true }), { maxLength: 20 }), (losses) => {
        const a = powerChain(0, losses.map((l) => ({ label: '', lossDb: l })));
        const b = powerChain(0, [...losses].reverse().map((l) => ({ label: '', lossDb: l })));
        expectClose(a.endDbm, b.endDbm, 1e-12, losses);
        expectClose(a.totalLossDb, sumDb(losses), 1e-12, losses);
      }),
    );
  });
});

describe('bad input is refused in plain words, never NaN', () => {
  it.each([
    ['zero milliwatts', () => mwToDbm(0)],
    ['negative milliwatts', () => mwToDbm(-1)],
    ['NaN dBm', () => dbmToMw(Number.NaN)],
    ['infinite dBm', () => dbmToMw(Number.POSITIVE_INFINITY)],
    ['a ratio of zero', () => ratioToDb(0)],
    ['a chain that ends below −150 dBm', () => powerChain(-140, [{ label: 'long span', lossDb: 20 }])],
    ['a loss that is not a number', () => powerAfterLossDbm(0, Number.NaN)],
    ['a µW power of zero', () => uwToDbm(0)],
  ])('%s', (_name, f) => {
    expect(f).toThrow(InputError);
  });
});
