import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  checkEncircledFlux,
  EF_TEMPLATES,
  efTemplateFor,
  encircledFlux,
  encircledFluxAt,
  gaussianRadialField,
  groupModePowers,
  InputError,
  multimodeModes,
  overfilledModePowers,
  powerPerGroup,
  singleModeToMultimode,
  type EncircledFluxCurve,
} from '../../src/physics';


function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

/** The 50 µm, NA 0.2 graded-index fiber of the issue, solved at both template wavelengths. */
const OM50 = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };
const SETS = { 850: multimodeModes(OM50, 850), 1300: multimodeModes(OM50, 1300) };

describe('encircled flux of the classic launches against the 50 µm template', () => {
  // The requirement, from the mode physics: equal power in every solved mode (overfilled) and a centred
  // single-mode spot (5.5 µm MFD at 850 nm, 9.2 µm at 1300 nm: common single-mode fibers at those wavelengths).
  it.each([850, 1300] as const)('an overfilled launch at %d nm comes out overfilled (too little power inside the outer control radii)', (w) => {
    const modes = SETS[w];
    const curve = encircledFlux({ modes, powers: overfilledModePowers({ modes }), coreRadiusUm: 25 });
    const check = checkEncircledFlux({ curve, template: efTemplateFor({ coreDiameterUm: 50, wavelengthNm: w })! });
    expect(check.verdict).toBe('overfilled');
    // The deciding radius is an outer one: the high-order groups put their power near the core edge.
    expect(check.decidingRadiusUm).toBeGreaterThanOrEqual(15);
  });

  it.each([
    { w: 850 as const, mfdUm: 5.5 },
    { w: 1300 as const, mfdUm: 9.2 },
  ])('a centred single-mode launch ($mfdUm µm MFD) at $w nm comes out underfilled at 10 µm', ({ w, mfdUm }) => {
    const modes = SETS[w];
    const launch = singleModeToMultimode({ source: gaussianRadialField(mfdUm, w), modes });
    const curve = encircledFlux({ modes, powers: launch.perMode.map((m) => m.fraction), coreRadiusUm: 25 });
    const check = checkEncircledFlux({ curve, template: efTemplateFor({ coreDiameterUm: 50, wavelengthNm: w })! });
    expect(check.verdict).toBe('underfilled');
    expect(check.points[0].status).toBe('too-much-inside');
  });
});

describe('encircled flux against closed forms', () => {
  // A uniformly filled α-profile fiber has the near field I(r) ∝ n²(r) − n₂² ∝ 1 − (r/a)^α (local numerical
  // aperture; Gloge & Marcatili 1973), so EF(x) = [x²/2 − x^{α+2}/(α+2)] / [1/2 − 1/(α+2)], x = r/a; for α = 2,
  // 2x² − x⁴, and for a step x². The solved modes are discrete and leak a little into the cladding: tolerance
  // 0.01 at V = 37 (850 nm), 0.03 at V = 24 (1300 nm), the continuum limit being approached as V grows.
  const closedForm = (x: number, alpha: number) => (x * x / 2 - x ** (alpha + 2) / (alpha + 2)) / (0.5 - 1 / (alpha + 2));
  it.each([
    { w: 850 as const, tol: 0.01 },
    { w: 1300 as const, tol: 0.03 },
  ])('an overfilled parabolic fiber at $w nm follows 2x² − x⁴ within $tol', ({ w, tol }) => {
    const modes = SETS[w];
    const curve = encircledFlux({ modes, powers: overfilledModePowers({ modes }), coreRadiusUm: 25 });
    for (const x of [0.2, 0.4, 0.6, 0.8, 0.9]) near(encircledFluxAt({ curve, radiusUm: 25 * x }), closedForm(x, 2), tol, `EF at r/a = ${x}`);
  });

  it('an overfilled step-index fiber follows x² within 0.02 (uniform near field)', () => {
    const modes = multimodeModes({ profile: 'step', coreRadiusUm: 25, na: 0.2 }, 1300);
    const curve = encircledFlux({ modes, powers: overfilledModePowers({ modes }), coreRadiusUm: 25 });
    for (const x of [0.2, 0.4, 0.6, 0.8, 0.9]) near(encircledFluxAt({ curve, radiusUm: 25 * x }), x * x, 0.02, `EF at r/a = ${x}`);
  });

  it('all the power in group 1 of a parabolic fiber gives the Gaussian EF 1 − exp(−2r²/w²), w = a√(2/V) (within 1e-3)', () => {
    // Fundamental mode of an infinite parabolic profile (Gloge & Marcatili 1973); the real profile is cut at r = a,
    // far out in the Gaussian's tail (w ≈ 5.8 µm), so the closed form holds to the FD grid's accuracy.
    const modes = SETS[850];
    const w = 25 * Math.sqrt(2 / modes.v);
    const curve = encircledFlux({ modes, powers: groupModePowers({ modes, groupPowers: [{ principal: 1, power: 1 }] }), coreRadiusUm: 25 });
    for (const r of [2, 4, 6, 8, 12]) near(encircledFluxAt({ curve, radiusUm: r }), 1 - Math.exp((-2 * r * r) / (w * w)), 1e-3, `EF at ${r} µm`);
  });
});

describe('laws every encircled-flux curve obeys', () => {
  const modes = SETS[1300];
  it('EF starts at 0, never decreases, stays within [0, 1] and the group shares add to 1, for any mode powers', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: modes.modes.length, maxLength: modes.modes.length }), (raw) => {
        fc.pre(raw.some((x) => x > 0));
        const curve = encircledFlux({ modes, powers: raw, coreRadiusUm: 25 });
        if (curve.ef[0] !== 0) return false;
        for (let i = 1; i < curve.ef.length; i++) if (curve.ef[i] < curve.ef[i - 1] - 1e-15 || curve.ef[i] > 1) return false;
        const sum = curve.perGroup.reduce((s, g) => s + g.fraction, 0);
        return Math.abs(sum - 1) < 1e-12;
      }),
      { numRuns: 60 },
    );
  });

  it('typed group powers land in their groups (power per group read back)', () => {
    const powers = groupModePowers({ modes, groupPowers: [{ principal: 2, power: 3 }, { principal: 5, power: 1 }] });
    const groups = powerPerGroup({ modes, powers });
    near(groups.find((g) => g.principal === 2)!.fraction, 0.75, 1e-12, 'group 2');
    near(groups.find((g) => g.principal === 5)!.fraction, 0.25, 1e-12, 'group 5');
  });

  it('the overfilled launch gives each group a share proportional to its mode count (2g modes in group g of a parabolic fiber)', () => {
    // Gloge & Marcatili 1973: group g of a parabolic profile holds 2g modes (polarisations and orientations counted).
    const groups = powerPerGroup({ modes, powers: overfilledModePowers({ modes }) });
    const total = modes.totalModeCount;
    for (const g of groups) near(g.fraction, (2 * g.principal) / total, 1e-12, `group ${g.principal}`);
  });
});

describe('the template check', () => {
  const template = EF_TEMPLATES.find((t) => t.wavelengthNm === 850)!;
  /** A synthetic curve through given EF values at the control radii (linear between, 0 at 0, 1 at 30 µm). */
  const curveThrough = (values: number[]): EncircledFluxCurve => {
    const rUm = [0, ...template.points.map((p) => p.radiusUm), 30];
    return { rUm, ef: [0, ...values, 1], perGroup: [], coreRadiusUm: 25 };
  };
  // encircledFluxAt expects evenly spaced radii, so the check below uses a fine, evenly spaced resampling.
  const resample = (c: EncircledFluxCurve): EncircledFluxCurve => {
    const rUm: number[] = [];
    const ef: number[] = [];
    for (let i = 0; i <= 300; i++) {
      const r = (30 * i) / 300;
      let j = 0;
      while (j < c.rUm.length - 2 && c.rUm[j + 1] < r) j++;
      const t = (r - c.rUm[j]) / (c.rUm[j + 1] - c.rUm[j]);
      rUm.push(r);
      ef.push(c.ef[j] + t * (c.ef[j + 1] - c.ef[j]));
    }
    return { rUm, ef, perGroup: [], coreRadiusUm: 25 };
  };
  const mid = template.points.map((p) => (p.lower + p.upper) / 2);

  it.each([
    { what: 'the middle of every band', values: mid, verdict: 'compliant' },
    { what: 'too much power inside 10 µm', values: [0.4, mid[1], mid[2], mid[3]], verdict: 'underfilled' },
    { what: 'too little power inside 20 µm', values: [mid[0], mid[1], 0.85, mid[3]], verdict: 'overfilled' },
    { what: 'too much at 10 µm and too little at 22 µm', values: [0.4, mid[1], mid[2], 0.95], verdict: 'outside both ways' },
  ])('$what reads $verdict', ({ values, verdict }) => {
    expect(checkEncircledFlux({ curve: resample(curveThrough(values)), template }).verdict).toBe(verdict);
  });

  it('names the radius furthest outside its band', () => {
    const check = checkEncircledFlux({ curve: resample(curveThrough([mid[0], 0.5, 0.85, mid[3]])), template });
    // 15 µm: 0.598 − 0.5 = 0.098 out; 20 µm: 0.9105 − 0.85 = 0.06 out.
    expect(check.decidingRadiusUm).toBe(15);
    near(check.marginEf, 0.098, 1e-9, 'distance outside');
  });

  it('has a template for 50 µm at 850 and 1300 nm and none for 62.5 µm or 1550 nm', () => {
    expect(efTemplateFor({ coreDiameterUm: 50, wavelengthNm: 850 })?.id).toBe('ef-50-850');
    expect(efTemplateFor({ coreDiameterUm: 50, wavelengthNm: 1310 })?.id).toBe('ef-50-1300');
    expect(efTemplateFor({ coreDiameterUm: 62.5, wavelengthNm: 850 })).toBeUndefined();
    expect(efTemplateFor({ coreDiameterUm: 50, wavelengthNm: 1550 })).toBeUndefined();
  });

  it('every template band is ordered and the bands rise with radius (a template must itself be an EF curve)', () => {
    for (const t of EF_TEMPLATES) {
      for (let i = 0; i < t.points.length; i++) {
        expect(t.points[i].lower).toBeLessThan(t.points[i].upper);
        if (i > 0) expect(t.points[i].lower).toBeGreaterThan(t.points[i - 1].upper);
      }
    }
  });
});

describe('refusals in plain words', () => {
  const modes = SETS[1300];
  it.each([
    { what: 'powers of the wrong length', call: () => encircledFlux({ modes, powers: [1, 2], coreRadiusUm: 25 }) },
    { what: 'all powers zero', call: () => encircledFlux({ modes, powers: modes.modes.map(() => 0), coreRadiusUm: 25 }) },
    { what: 'a negative power', call: () => encircledFlux({ modes, powers: modes.modes.map((_, i) => (i === 0 ? -1 : 1)), coreRadiusUm: 25 }) },
    { what: 'a group that does not exist', call: () => groupModePowers({ modes, groupPowers: [{ principal: 99, power: 1 }] }) },
    { what: 'a core radius beyond the solved grid', call: () => encircledFlux({ modes, powers: overfilledModePowers({ modes }), coreRadiusUm: 500 }) },
  ])('$what is an InputError', ({ call }) => {
    expect(call).toThrow(InputError);
  });
});
