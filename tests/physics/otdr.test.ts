import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { InputError, mfdMismatchLossDb, otdrSpliceReading, otdrTwoWayAverage } from '../../src/physics';

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

describe('OTDR reading of a splice between unlike fibers (Brinkmeyer 1980 capture fraction S ∝ 1/w²)', () => {
  it('a 9.2 µm fiber spliced to an 8.6 µm fiber reads as a gainer from the 9.2 µm side', () => {
    // Worked by hand: step = 10 log10(8.6/9.2) = −0.2929 dB; true (Marcuse 1977 mismatch) = −20 log10(2·9.2·8.6/(9.2²+8.6²)) = 0.0197 dB.
    const r = otdrSpliceReading({ mfdAUm: 9.2, mfdBUm: 8.6 });
    near(r.backscatterStepDb, -0.2929, 1e-4, 'step');
    near(r.trueLossDb, 0.0197, 1e-4, 'true loss');
    near(r.apparentFromADb, 0.0197 - 0.2929, 2e-4, 'from A');
    near(r.apparentFromBDb, 0.0197 + 0.2929, 2e-4, 'from B');
    expect(r.showsGainer).toBe(true);
  });

  it('identical fibers read the same from both ends, and equal to the true loss', () => {
    const r = otdrSpliceReading({ mfdAUm: 9.2, mfdBUm: 9.2, extraLossDb: 0.05 });
    near(r.apparentFromADb, 0.05, 1e-12, 'from A');
    near(r.apparentFromBDb, 0.05, 1e-12, 'from B');
    expect(r.showsGainer).toBe(false);
  });

  it('the MFD term is 10 log10(wB/wA): a 10 % larger MFD beyond the splice adds 0.41 dB from A', () => {
    // 10 log10(1.1) = 0.4139 dB (Brinkmeyer 1980 capture fraction, one-way scale).
    near(otdrSpliceReading({ mfdAUm: 9, mfdBUm: 9.9 }).backscatterStepDb, 0.4139, 1e-4, 'step');
  });

  it('a lower Rayleigh coefficient beyond the splice reads like extra loss from A (Hartog & Gold 1984)', () => {
    // Half of 10 log10(1/0.9) = 0.2288 dB.
    near(otdrSpliceReading({ mfdAUm: 9.2, mfdBUm: 9.2, rayleighRatioBA: 0.9 }).backscatterStepDb, 0.2288, 1e-4, 'step');
  });
});

describe('two-way average', () => {
  it('0.20 dB one way and 0.10 dB the other is a 0.15 dB splice (common practice)', () => {
    near(otdrTwoWayAverage(0.2, 0.1).trueLossDb, 0.15, 1e-12, 'average');
  });

  it('a gainer of −0.10 dB and 0.30 dB the other way is a 0.10 dB splice between unlike fibers', () => {
    const r = otdrTwoWayAverage(-0.1, 0.3);
    near(r.trueLossDb, 0.1, 1e-12, 'average');
    near(r.backscatterStepDb, -0.2, 1e-12, 'step');
    expect(r.hadGainer).toBe(true);
    // Step −0.2 dB ⇒ wB/wA = 10^(−0.02) = 0.955: the far fiber has the smaller MFD.
    near(r.impliedMfdRatioBA, 0.955, 1e-3, 'MFD ratio');
  });

  it('two gainers cannot be one passive splice', () => {
    expect(otdrTwoWayAverage(-0.1, -0.05).consistent).toBe(false);
  });

  it('averaging the two predicted readings gives back the true loss and the MFD ratio, for any pair of fibers', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 3, max: 15, noNaN: true }),
        fc.double({ min: 3, max: 15, noNaN: true }),
        fc.double({ min: 0, max: 2, noNaN: true }),
        (mfdAUm, mfdBUm, extraLossDb) => {
          const fwd = otdrSpliceReading({ mfdAUm, mfdBUm, extraLossDb });
          const back = otdrTwoWayAverage(fwd.apparentFromADb, fwd.apparentFromBDb);
          return (
            Math.abs(back.trueLossDb - (mfdMismatchLossDb(mfdAUm, mfdBUm) + extraLossDb)) < 1e-12 &&
            Math.abs(back.impliedMfdRatioBA - mfdBUm / mfdAUm) < 1e-9 &&
            back.consistent
          );
        },
      ),
    );
  });

  it('the true loss of a splice is never negative, whichever fibers meet', () => {
    fc.assert(
      fc.property(fc.double({ min: 3, max: 15, noNaN: true }), fc.double({ min: 3, max: 15, noNaN: true }), (a, b) => {
        return otdrSpliceReading({ mfdAUm: a, mfdBUm: b }).trueLossDb >= 0;
      }),
    );
  });
});

describe('bad input', () => {
  it.each([
    () => otdrSpliceReading({ mfdAUm: 0, mfdBUm: 9 }),
    () => otdrSpliceReading({ mfdAUm: 9, mfdBUm: Number.NaN }),
    () => otdrSpliceReading({ mfdAUm: 9, mfdBUm: 9, extraLossDb: -1 }),
    () => otdrTwoWayAverage(Number.POSITIVE_INFINITY, 0.1),
    () => otdrTwoWayAverage(0.1, 99),
  ])('is refused with an InputError (%#)', (call) => {
    expect(call).toThrow(InputError);
  });
});
