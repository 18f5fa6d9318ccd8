// Rayleigh backscatter: capture fraction, level for a pulse, return loss of a length, and the one-way gainer error.
import { describe, expect, it } from 'vitest';
import {
  backscatterCaptureFraction,
  backscatterLevel,
  backscatterReturnLoss,
  equivalentStepIndex,
  gainerError,
  modeFieldDiameterUm,
  otdrSpliceReading,
  rayleighScatteringDbPerKm,
  TYPICAL_GROUP_INDEX_1550,
} from '../../src/physics';

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

// Standard single-mode fiber as the app's G.652.D preset describes it: cable cutoff 1260 nm, MFD 9.2 µm at 1310 nm.
const G652D = equivalentStepIndex({ cutoffWavelengthNm: 1260, cutoffKind: 'cable', mfdUm: 9.2, mfdWavelengthNm: 1310 });
const mfdAt = (wavelengthNm: number) => modeFieldDiameterUm({ coreRadiusUm: G652D.coreRadiusUm, na: G652D.na, wavelengthNm, definition: 'petermann2' }).mfdUm;

describe('capture fraction of a Gaussian mode, S = 3/(2 (n k w)²) (Brinkmeyer 1980)', () => {
  it('a 10.4 µm MFD at 1550 nm in glass of index 1.46 catches back 1.58e-3 of the scattered light (−28.0 dB)', () => {
    // Worked by hand: n k w = 2π·1.46·5.2/1.55 = 30.776; 3/(2·30.776²) = 1.5837e-3. Textbook single-mode capture
    // fractions sit near 1e-3 to 2e-3 (from memory), far below the multimode NA²/(4n²) ≈ 1e-2.
    const s = backscatterCaptureFraction({ mfdUm: 10.4, wavelengthNm: 1550, fiberIndex: 1.46 });
    near(s.fraction, 1.58374e-3, 1e-8, 'S');
    near(s.fractionDb, -28.003, 1e-3, 'S in dB');
  });

  it.each([
    [8.6, 9.2],
    [9.2, 10.4],
    [6.3, 9.5],
  ])('it goes as 1/MFD² (the assumption of the OTDR splice screen): %s µm against %s µm', (a, b) => {
    const sa = backscatterCaptureFraction({ mfdUm: a, wavelengthNm: 1310 }).fraction;
    const sb = backscatterCaptureFraction({ mfdUm: b, wavelengthNm: 1310 }).fraction;
    near(sa / sb, (b / a) ** 2, 1e-12, 'ratio');
  });

  it('a mode field no wider than the wavelength is outside the model and refused', () => {
    expect(() => backscatterCaptureFraction({ mfdUm: 0.3, wavelengthNm: 1550 })).toThrow(/mode field diameter well above the wavelength/);
  });
});

describe('backscatter level for a pulse, P_bs/P_0 = S·α_s·c·τ/(2 n_g) (Personick 1977)', () => {
  const level = (pulseWidthNs: number, wavelengthNm = 1550) =>
    backscatterLevel({
      mfdUm: mfdAt(wavelengthNm),
      wavelengthNm,
      scatteringDbPerKm: rayleighScatteringDbPerKm({ wavelengthNm }),
      pulseWidthNs,
      groupIndex: TYPICAL_GROUP_INDEX_1550,
    });

  it('standard fiber at 1550 nm, 1 ns: about −82 dB (check value from practice, issue 15; ±1 dB for the fiber-to-fiber spread)', () => {
    near(level(1).coefficientDb1ns, -82, 1, 'backscatter coefficient');
  });

  it('at 1310 nm the level is higher (more Rayleigh scattering, smaller mode): about −79 to −80 dB for 1 ns (from memory, ±1.5 dB)', () => {
    near(level(1, 1310).coefficientDb1ns, -79.5, 1.5, 'backscatter coefficient at 1310 nm');
  });

  it.each([
    [10, 10],
    [100, 20],
    [1000, 30],
  ])('a %s ns pulse returns %s dB more than a 1 ns pulse (Δz ∝ τ)', (ns, db) => {
    near(level(ns).levelDb - level(1).levelDb, db, 1e-9, 'level change');
  });

  it('the scattering loss follows λ⁻⁴: 1310 nm scatters (1550/1310)⁴ = 1.96 times more than 1550 nm', () => {
    near(rayleighScatteringDbPerKm({ wavelengthNm: 1310 }) / rayleighScatteringDbPerKm({ wavelengthNm: 1550 }), (1550 / 1310) ** 4, 1e-12, 'ratio');
  });
});

describe('backscatter return loss of a length of fiber', () => {
  const rl = (lengthKm: number) => backscatterReturnLoss({ mfdUm: mfdAt(1550), wavelengthNm: 1550, scatteringDbPerKm: 0.16, attenuationDbPerKm: 0.19, lengthKm });

  it('a long standard fiber at 1550 nm returns about 31–33 dB (from memory, common practice)', () => {
    near(rl(100).returnLossDb, 32, 1, 'return loss of 100 km');
  });

  it('the return loss falls with length toward its limit and never passes it', () => {
    const values = [0.01, 0.1, 1, 5, 20, 50, 200].map((l) => rl(l).returnLossDb);
    for (let i = 1; i < values.length; i++) expect(values[i]!).toBeLessThan(values[i - 1]!);
    expect(values.at(-1)!).toBeGreaterThanOrEqual(rl(1).limitDb);
  });

  it('at 2αL = ln 2 the fiber returns half its limit: 3.01 dB above it (integral of e^(−2αz))', () => {
    const alphaPerKm = 0.19 / (10 / Math.LN10);
    const r = rl(Math.LN2 / (2 * alphaPerKm));
    near(r.returnLossDb - r.limitDb, 10 * Math.log10(2), 1e-9, 'half the limit');
  });

  it('past nearLimitKm the return loss is within 0.1 dB of the limit', () => {
    const r = rl(1);
    near(rl(r.nearLimitKm).returnLossDb - r.limitDb, 0.1, 1e-9, 'within 0.1 dB');
  });

  it('a total attenuation below the scattering loss alone is refused with the reason', () => {
    expect(() => backscatterReturnLoss({ mfdUm: 10, wavelengthNm: 1550, scatteringDbPerKm: 0.2, attenuationDbPerKm: 0.1, lengthKm: 1 })).toThrow(/includes the scattering loss/);
  });
});

describe('one-way gainer error from two MFDs, tied to the OTDR splice reading', () => {
  it('9.2 µm into 8.6 µm: −0.293 dB from the A end (10·log10(8.6/9.2), as worked in tests/physics/otdr.test.ts)', () => {
    const g = gainerError({ mfdAUm: 9.2, mfdBUm: 8.6, wavelengthNm: 1310 });
    near(g.errorFromADb, -0.2929, 1e-4, 'from A');
    near(g.errorFromBDb, 0.2929, 1e-4, 'from B');
  });

  it.each([
    [9.2, 8.6, 1],
    [10.4, 9.0, 1],
    [8.8, 9.6, 0.9],
  ])('agrees with the OTDR splice reading’s backscatter step for %s → %s µm, scattering ratio %s', (a, b, ratio) => {
    const g = gainerError({ mfdAUm: a, mfdBUm: b, wavelengthNm: 1550, scatteringRatioBA: ratio });
    near(g.errorFromADb, otdrSpliceReading({ mfdAUm: a, mfdBUm: b, rayleighRatioBA: ratio }).backscatterStepDb, 1e-12, 'step');
  });
});
