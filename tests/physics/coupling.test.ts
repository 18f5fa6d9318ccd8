import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  fieldOverlapLoss,
  gaussianRadialField,
  InputError,
  lateralOffsetLossDb,
  mfdMismatchLossDb,
  multimodeModes,
  multimodeToSingleMode,
  singleModeToMultimode,
  tabulatedRadialField,
} from '../../src/physics';

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

/** OM-class 50 µm graded-index fiber at 850 nm (NA 0.2): V ≈ 37, ≈ 340 modes. */
const OM_50 = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };
const om50At850 = multimodeModes(OM_50, 850);

describe('overlap of two single-mode fields', () => {
  it('identical fields overlap completely: 0 dB', () => {
    const f = gaussianRadialField(9.2);
    near(fieldOverlapLoss(f, f, 0).lossDb, 0, 1e-9, 'loss');
  });

  // Gaussian fields through the numerical overlap must reproduce Marcuse 1977 (mismatch × offset factors).
  // Quadrature: ≥ 400 midpoint cells per field extent, powers by the same rule; error measured ≤ 2e-5 dB.
  it.each([
    { mfd1: 9.2, mfd2: 9.2, d: 1 },
    { mfd1: 9.2, mfd2: 10.4, d: 0 },
    { mfd1: 9.2, mfd2: 10.4, d: 2 },
    { mfd1: 6, mfd2: 10.4, d: 4 },
  ])('Gaussian $mfd1 µm into $mfd2 µm at $d µm offset matches Marcuse 1977 within 1e-4 dB', ({ mfd1, mfd2, d }) => {
    const expected = mfdMismatchLossDb(mfd1, mfd2) + lateralOffsetLossDb(mfd1, mfd2, d);
    near(fieldOverlapLoss(gaussianRadialField(mfd1), gaussianRadialField(mfd2), d).lossDb, expected, 1e-4, 'loss');
  });

  it('a tabulated copy of a Gaussian behaves like the Gaussian (interpolation check, 1e-3 dB)', () => {
    const step = 0.02;
    const values = Array.from({ length: 1200 }, (_, i) => Math.exp(-((i * step) ** 2) / 4.6 ** 2));
    const tab = tabulatedRadialField('table', step, values);
    near(fieldOverlapLoss(tab, gaussianRadialField(9.2), 1.5).lossDb, lateralOffsetLossDb(9.2, 9.2, 1.5), 1e-3, 'loss');
  });
});

describe('single-mode into a graded-index multimode fiber', () => {
  // Fundamental of an infinite parabolic profile: exp(−r²/w²) with w = a √(2/V) (Gloge & Marcatili 1973).
  const matchedMfdUm = 2 * 25 * Math.sqrt(2 / om50At850.v);

  it('a Gaussian matched to the fundamental mode puts all its power in LP01', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(matchedMfdUm), modes: om50At850 });
    near(r.perMode.find((m) => m.l === 0 && m.m === 1)?.fraction ?? 0, 1, 1e-4, 'LP01 share');
    expect(r.modesFor90Percent).toBe(1);
  });

  // A displaced ground state of a 2-D harmonic oscillator is a coherent state: the power in principal group g
  // is Poisson with mean d²/w², P_g = e^{−μ} μ^{g−1}/(g−1)! (Glauber 1963). The parabolic fiber is that
  // oscillator; the real profile is cut at r = a, so the check stops at groups far inside (g ≤ 8).
  // Tolerance 5e-4 absolute: FD grid (b error ~1e-4) plus the cut profile. Covers l > 0 modes at offset.
  it.each([2, 5, 9])('a matched Gaussian offset by %d µm spreads over mode groups as a Poisson law', (d) => {
    const w = matchedMfdUm / 2;
    const mu = (d * d) / (w * w);
    const r = singleModeToMultimode({ source: gaussianRadialField(matchedMfdUm), modes: om50At850, offsetUm: d });
    let fact = 1;
    for (let g = 1; g <= 8; g++) {
      if (g > 1) fact *= g - 1;
      const expected = (Math.exp(-mu) * mu ** (g - 1)) / fact;
      near(r.perGroup.find((x) => x.principal === g)?.fraction ?? 0, expected, 5e-4, `group ${g} at ${d} µm`);
    }
  });

  it('a 5.5 µm single-mode field centred in a 50 µm core is launched with under 0.05 dB loss', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(5.5), modes: om50At850 });
    expect(r.lossDb).toBeLessThan(0.05);
    expect(r.lossDb).toBeGreaterThanOrEqual(0);
  });

  it('a centred launch excites only l = 0 modes (no azimuthal variation to couple to)', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(5.5), modes: om50At850 });
    for (const m of r.perMode.filter((x) => x.l > 0)) near(m.fraction, 0, 1e-15, `LP${m.l}${m.m}`);
  });
});

describe('multimode into single-mode', () => {
  const sm = gaussianRadialField(5.5);

  it('a fully filled 50 µm fiber loses about 10 log10(M/2) ≈ 22 dB into a single-mode fiber', () => {
    // ≈ 170 spatial modes per polarisation carry equal, incoherent power; the single-mode fiber accepts what
    // overlaps its one mode, about one mode's worth. Reciprocity makes it exact:
    // loss(MM→SM) = 10 log10(M/2) + loss(SM→MM) (see multimodeToSingleMode).
    const back = multimodeToSingleMode({ target: sm, modes: om50At850, distribution: { kind: 'uniform' } });
    const fwd = singleModeToMultimode({ source: sm, modes: om50At850 });
    near(back.lossDb, 10 * Math.log10(om50At850.totalModeCount / 2) + fwd.lossDb, 1e-9, 'reciprocity');
    expect(back.lossDb).toBeGreaterThan(21);
    expect(back.lossDb).toBeLessThan(23.5);
  });

  it('a restricted launch (only the lowest fifth of the mode groups lit) loses far less than a full one', () => {
    const full = multimodeToSingleMode({ target: sm, modes: om50At850, distribution: { kind: 'uniform' } });
    const restricted = multimodeToSingleMode({ target: sm, modes: om50At850, distribution: { kind: 'restricted', groupFraction: 0.2 } });
    expect(restricted.lossDb).toBeLessThan(full.lossDb - 8);
  });

  it('single-mode into multimode is low-loss while the reverse is high-loss', () => {
    const fwd = singleModeToMultimode({ source: sm, modes: om50At850, offsetUm: 3 });
    const back = multimodeToSingleMode({ target: sm, modes: om50At850, distribution: { kind: 'uniform' }, offsetUm: 3 });
    expect(fwd.lossDb).toBeLessThan(0.1);
    expect(back.lossDb).toBeGreaterThan(20);
  });
});

describe('physical laws', () => {
  const stepMm = multimodeModes({ profile: 'step', coreRadiusUm: 25, na: 0.12 }, 1310);

  it('coupling into all guided modes never exceeds 1, at any offset, into step or graded fibers', () => {
    fc.assert(
      fc.property(fc.double({ min: 3, max: 30, noNaN: true }), fc.double({ min: 0, max: 35, noNaN: true }), fc.boolean(), (mfdUm, offsetUm, graded) => {
        const r = singleModeToMultimode({ source: gaussianRadialField(mfdUm), modes: graded ? om50At850 : stepMm, offsetUm });
        const sum = r.perMode.reduce((s, m) => s + m.fraction, 0);
        return sum <= 1 + 1e-12 && r.perMode.every((m) => m.fraction >= 0) && r.lossDb >= 0;
      }),
      { numRuns: 40 },
    );
  });

  it('no overlap loss is negative', () => {
    fc.assert(
      fc.property(fc.double({ min: 3, max: 15, noNaN: true }), fc.double({ min: 3, max: 15, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (a, b, d) => {
        return fieldOverlapLoss(gaussianRadialField(a), gaussianRadialField(b), d).lossDb >= 0;
      }),
      { numRuns: 50 },
    );
  });

  it('power per mode group adds up to the total coupled power', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(9), modes: stepMm, offsetUm: 7 });
    near(r.perGroup.reduce((s, g) => s + g.fraction, 0), r.coupledFraction, 1e-12, 'sum of groups');
  });
});

describe('bad input', () => {
  it.each([
    () => gaussianRadialField(-2),
    () => multimodeModes({ profile: 'bent' as never, coreRadiusUm: 25, na: 0.2 }, 850),
    () => singleModeToMultimode({ source: gaussianRadialField(5), modes: om50At850, offsetUm: -1 }),
    () => multimodeToSingleMode({ target: gaussianRadialField(5), modes: om50At850, distribution: { kind: 'restricted', groupFraction: 0 } }),
    () => fieldOverlapLoss(gaussianRadialField(5), gaussianRadialField(5), Number.NaN),
  ])('is refused with an InputError (%#)', (call) => {
    expect(call).toThrow(InputError);
  });
});
