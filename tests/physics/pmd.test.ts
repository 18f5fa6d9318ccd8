// PMD of a route and the Maxwell statistics of its DGD. Maxwell values: tests/fixtures/scipy-maxwell (scipy.stats.maxwell).
import { describe, expect, it } from 'vitest';
import fixture from '../fixtures/scipy-maxwell/maxwell.json';
import { concatenatedPmd, erfc, linkPmdPs, maxwellDgdExceeded, maxwellExceedProbability, PMD_SIGNALS, PMDQ_BY_CATEGORY, pmdVerdict } from '../../src/physics';

function rel(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol * Math.abs(expected))) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol} relative`);
}

describe('link PMD', () => {
  it('0.2 ps/√km over 100 km is 2 ps (PMD = coefficient·√L, ITU-T G.650.2)', () => {
    rel(linkPmdPs({ coefficientPsPerSqrtKm: 0.2, lengthKm: 100 }), 2, 1e-15, 'PMD');
  });

  it('1 ps and 2 ps sections add to √5 = 2.236 ps, not 3 ps (root sum of squares)', () => {
    const r = concatenatedPmd({ sections: [{ coefficientPsPerSqrtKm: 0.1, lengthKm: 100 }, { coefficientPsPerSqrtKm: 0.5, lengthKm: 16 }] });
    rel(r.totalPs, Math.sqrt(5), 1e-15, 'total');
    rel(r.equivalentCoefficientPsPerSqrtKm, Math.sqrt(5) / Math.sqrt(116), 1e-15, 'equivalent coefficient');
  });

  it('a component’s PMD adds in quadrature too', () => {
    rel(concatenatedPmd({ sections: [{ coefficientPsPerSqrtKm: 0.3, lengthKm: 100 }], componentsPs: [4] }).totalPs, 5, 1e-15, '3-4-5');
  });

  it('the category table names its recommendation on every line', () => {
    for (const q of PMDQ_BY_CATEGORY) expect(q.recommendation).toMatch(/ITU-T G\.\d{3}/);
  });
});

describe('complementary error function (scipy.special.erfc; Press et al. erfcc, fractional error < 1.2e-7)', () => {
  it.each(fixture.erfc.map((e) => [e.x, e.value]))('erfc(%s) = %s', (x, value) => {
    rel(erfc(x), value, 2e-7, 'erfc');
  });
});

describe('Maxwell distribution of the instantaneous DGD (scipy.stats.maxwell, mean = PMD)', () => {
  it.each(fixture.exceed.map((e) => [e.ratio, e.probability]))('P(DGD > %s × mean) = %s', (ratio, probability) => {
    // 5e-7 relative: the erfc fit's 1.2e-7 enters both terms of the tail.
    rel(maxwellExceedProbability({ dgdPs: ratio * 2.5, meanDgdPs: 2.5 }), probability, 5e-7, 'tail');
  });

  it('the DGD exceeds three times its mean about 4.2e-5 of the time (issue 15 check value, from the scipy fixture)', () => {
    const p = fixture.exceed.find((e) => e.ratio === 3)!.probability;
    rel(maxwellExceedProbability({ dgdPs: 3, meanDgdPs: 1 }), p, 5e-7, 'P(> 3 × mean)');
    rel(p, 4.2e-5, 0.01, 'fixture itself');
  });

  it.each(fixture.inverse.map((e) => [e.probability, e.ratio]))('the DGD exceeded with probability %s is %s × mean', (probability, ratio) => {
    rel(maxwellDgdExceeded({ probability, meanDgdPs: 1.7 }) / 1.7, ratio, 1e-6, 'inverse');
  });

  it('the mean of the distribution is the PMD itself: ∫ P(DGD > x) dx = mean (survival-function identity)', () => {
    const mean = 3;
    const steps = 20000;
    const top = 12 * mean;
    let sum = 0;
    for (let i = 0; i < steps; i++) sum += maxwellExceedProbability({ dgdPs: ((i + 0.5) / steps) * top, meanDgdPs: mean });
    rel((sum * top) / steps, mean, 1e-6, 'mean');
  });
});

describe('does the route carry the signal?', () => {
  const tenG = PMD_SIGNALS.find((s) => s.id === '10g-nrz')!;

  it('10 Gbit/s tolerates 9.7 ps of PMD (10 % of its 97 ps bit period, common practice)', () => {
    const v = pmdVerdict({ linkPmdPs: 2, symbolRateGbaud: tenG.symbolRateGbaud, periodShare: tenG.periodShare });
    rel(v.maxPmdPs, 9.697, 1e-3, 'tolerance');
    expect(v.carries).toBe(true);
  });

  it('an old route of 1 ps/√km over 200 km (14 ps) does not carry 10 Gbit/s on-off keying', () => {
    const pmd = linkPmdPs({ coefficientPsPerSqrtKm: 1, lengthKm: 200 });
    const v = pmdVerdict({ linkPmdPs: pmd, symbolRateGbaud: tenG.symbolRateGbaud, periodShare: tenG.periodShare });
    expect(v.carries).toBe(false);
    expect(v.marginPs).toBeLessThan(0);
  });

  it('the same route carries a coherent signal whose receiver undoes PMD up to its stated tolerance', () => {
    const coherent = PMD_SIGNALS.find((s) => s.fixedMaxPmdPs !== undefined)!;
    expect(coherent.source).toMatch(/from memory/);
    expect(pmdVerdict({ linkPmdPs: linkPmdPs({ coefficientPsPerSqrtKm: 1, lengthKm: 200 }), symbolRateGbaud: coherent.symbolRateGbaud, fixedMaxPmdPs: coherent.fixedMaxPmdPs }).carries).toBe(true);
  });

  it('at exactly the tolerance the outage probability is the Maxwell tail at 3 × mean', () => {
    const v = pmdVerdict({ linkPmdPs: 5, symbolRateGbaud: 20, periodShare: 0.1 });
    rel(v.outageProbability, fixture.exceed.find((e) => e.ratio === 3)!.probability, 5e-7, 'outage');
  });
});
