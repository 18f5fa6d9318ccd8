import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  fieldOverlapLoss,
  gaussianRadialField,
  InputError,
  lateralOffsetLossDb,
  lp01RadialField,
  ModelError,
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
    const f = gaussianRadialField(9.2, 1550);
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
    near(fieldOverlapLoss(gaussianRadialField(mfd1, 1550), gaussianRadialField(mfd2, 1550), d).lossDb, expected, 1e-4, 'loss');
  });

  it('a tabulated copy of a Gaussian behaves like the Gaussian (interpolation check, 1e-3 dB)', () => {
    const step = 0.02;
    const values = Array.from({ length: 1200 }, (_, i) => Math.exp(-((i * step) ** 2) / 4.6 ** 2));
    const tab = tabulatedRadialField('table', step, values, 1550);
    near(fieldOverlapLoss(tab, gaussianRadialField(9.2, 1550), 1.5).lossDb, lateralOffsetLossDb(9.2, 9.2, 1.5), 1e-3, 'loss');
  });
});

describe('single-mode into a graded-index multimode fiber', () => {
  // Fundamental of an infinite parabolic profile: exp(−r²/w²) with w = a √(2/V) (Gloge & Marcatili 1973).
  const matchedMfdUm = 2 * 25 * Math.sqrt(2 / om50At850.v);

  it('a Gaussian matched to the fundamental mode puts all its power in LP01', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(matchedMfdUm, 850), modes: om50At850 });
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
    const r = singleModeToMultimode({ source: gaussianRadialField(matchedMfdUm, 850), modes: om50At850, offsetUm: d });
    let fact = 1;
    for (let g = 1; g <= 8; g++) {
      if (g > 1) fact *= g - 1;
      const expected = (Math.exp(-mu) * mu ** (g - 1)) / fact;
      near(r.perGroup.find((x) => x.principal === g)?.fraction ?? 0, expected, 5e-4, `group ${g} at ${d} µm`);
    }
  });

  it('a 5.5 µm single-mode field centred in a 50 µm core is launched with under 0.05 dB loss', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(5.5, 850), modes: om50At850 });
    expect(r.lossDb).toBeLessThan(0.05);
    expect(r.lossDb).toBeGreaterThanOrEqual(0);
  });

  it('a centred launch excites only l = 0 modes (no azimuthal variation to couple to)', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(5.5, 850), modes: om50At850 });
    for (const m of r.perMode.filter((x) => x.l > 0)) near(m.fraction, 0, 1e-15, `LP${m.l}${m.m}`);
  });
});

describe('multimode into single-mode', () => {
  const sm = gaussianRadialField(5.5, 850);

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
        const r = singleModeToMultimode({ source: gaussianRadialField(mfdUm, graded ? 850 : 1310), modes: graded ? om50At850 : stepMm, offsetUm });
        const sum = r.perMode.reduce((s, m) => s + m.fraction, 0);
        return sum <= 1 + 1e-12 && r.perMode.every((m) => m.fraction >= 0) && r.lossDb >= 0;
      }),
      { numRuns: 40 },
    );
  });

  it('no overlap loss is negative', () => {
    fc.assert(
      fc.property(fc.double({ min: 3, max: 15, noNaN: true }), fc.double({ min: 3, max: 15, noNaN: true }), fc.double({ min: 0, max: 10, noNaN: true }), (a, b, d) => {
        return fieldOverlapLoss(gaussianRadialField(a, 1550), gaussianRadialField(b, 1550), d).lossDb >= 0;
      }),
      { numRuns: 50 },
    );
  });

  it('power per mode group adds up to the total coupled power', () => {
    const r = singleModeToMultimode({ source: gaussianRadialField(9, 1310), modes: stepMm, offsetUm: 7 });
    near(r.perGroup.reduce((s, g) => s + g.fraction, 0), r.coupledFraction, 1e-12, 'sum of groups');
  });
});

describe('bad input', () => {
  it.each([
    () => gaussianRadialField(-2, 1550),
    () => multimodeModes({ profile: 'bent' as never, coreRadiusUm: 25, na: 0.2 }, 850),
    () => singleModeToMultimode({ source: gaussianRadialField(5, 850), modes: om50At850, offsetUm: -1 }),
    () => multimodeToSingleMode({ target: gaussianRadialField(5, 850), modes: om50At850, distribution: { kind: 'restricted', groupFraction: 0 } }),
    () => fieldOverlapLoss(gaussianRadialField(5, 1550), gaussianRadialField(5, 1550), Number.NaN),
  ])('is refused with an InputError (%#)', (call) => {
    expect(call).toThrow(InputError);
  });
});

// A mode field belongs to one wavelength (V = 2πa·NA/λ, Gloge 1971): overlapping a 1550 nm single-mode field with
// modes solved at 1310 nm answers no physical question. The inputs are each valid, so it is a ModelError.
describe('fields and modes carry their wavelength', () => {
  const sm = { coreRadiusUm: 4.1, na: 0.12 };
  const mm = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2 };
  const modes1310 = multimodeModes(mm, 1310);

  it('every field and mode set says which wavelength it was computed for', () => {
    expect(modes1310.wavelengthNm).toBe(1310);
    expect(lp01RadialField(sm, 1550).wavelengthNm).toBe(1550);
    expect(gaussianRadialField(9.2, 1310).wavelengthNm).toBe(1310);
    expect(tabulatedRadialField('measured', 0.5, [1, 0.8, 0.4, 0.1, 0], 1625).wavelengthNm).toBe(1625);
  });

  it('a 1550 nm single-mode field launched into 1310 nm multimode modes is refused, both ways', () => {
    const at1550 = lp01RadialField(sm, 1550);
    expect(() => singleModeToMultimode({ source: at1550, modes: modes1310 })).toThrow(ModelError);
    expect(() => multimodeToSingleMode({ target: at1550, modes: modes1310, distribution: { kind: 'uniform' } })).toThrow(ModelError);
    expect(() => singleModeToMultimode({ source: at1550, modes: modes1310 })).toThrow(/1550 nm.*1310 nm/);
  });

  it('the same launch with the field at 1310 nm gives an answer', () => {
    const r = multimodeToSingleMode({ target: lp01RadialField(sm, 1310), modes: modes1310, distribution: { kind: 'uniform' } });
    expect(r.lossDb).toBeGreaterThan(10);
  });

  it('two single-mode fields of different wavelengths are not overlapped', () => {
    expect(() => fieldOverlapLoss(lp01RadialField(sm, 1310), lp01RadialField(sm, 1550), 0)).toThrow(ModelError);
  });

  it('a hand-made field without a wavelength is refused in plain words', () => {
    const handMade = { name: 'x', at: () => 1, extentUm: 5, powerUm2: 10 } as unknown as Parameters<typeof fieldOverlapLoss>[0];
    expect(() => fieldOverlapLoss(handMade, gaussianRadialField(9.2, 1550), 0)).toThrow(InputError);
  });
});
