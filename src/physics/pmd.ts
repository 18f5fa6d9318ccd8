// Polarization mode dispersion (PMD) of a route: link PMD from a coefficient and a length, concatenated sections,
// the link design values PMDQ of the fiber categories, the Maxwell statistics of the instantaneous differential group
// delay (DGD), and whether a signal can be carried.
//
// In a long fiber with random mode coupling the DGD wanders with time and wavelength and follows a Maxwell
// distribution whose mean is the PMD value; the mean grows with the square root of length, PMD = PMD_coef·√L
// (Poole & Wagner 1986, Electron. Lett. 22(19); definitions of ITU-T G.650.2 (07/2007)). Independent sections add
// in quadrature. Reference values used below are marked "from memory" where the texts were not at hand.
import { InputError, requireNumber } from './errors';

/** Largest PMD coefficient accepted (ps/√km): old fibers reached a few ps/√km; 100 is beyond any. */
export const PMD_COEFFICIENT_MAX = 100;
export const PMD_MAX_LENGTH_KM = 40_000;
export const PMD_MAX_SECTIONS = 1000;

export interface PmdSection {
  /** PMD coefficient of the section (ps/√km). */
  coefficientPsPerSqrtKm: number;
  lengthKm: number;
}

/** Link PMD of one uniform section: PMD = coefficient·√L (Poole & Wagner 1986; ITU-T G.650.2). */
export function linkPmdPs(input: PmdSection): number {
  const c = requireNumber('coefficientPsPerSqrtKm', input?.coefficientPsPerSqrtKm, { min: 0, max: PMD_COEFFICIENT_MAX, unit: 'ps/√km' });
  const l = requireNumber('lengthKm', input?.lengthKm, { min: 0, max: PMD_MAX_LENGTH_KM, unit: 'km' });
  return c * Math.sqrt(l);
}

export interface ConcatenatedPmd {
  /** Total PMD of the route (ps): √(Σ PMD_i²). */
  totalPs: number;
  /** Each section's PMD (ps), in input order. */
  sectionsPs: number[];
  /** Each extra component's PMD (ps), in input order. */
  componentsPs: number[];
  totalLengthKm: number;
  /** The single coefficient that gives the same PMD over the whole length (ps/√km); 0 for a zero length. */
  equivalentCoefficientPsPerSqrtKm: number;
}

/**
 * PMD of concatenated sections and components: independent random birefringence adds in quadrature,
 * PMD_total = √(Σ PMD_i²) (ITU-T G.650.2 / G.671 link PMD statistics; common practice).
 */
export function concatenatedPmd(input: { sections: readonly PmdSection[]; componentsPs?: readonly number[] }): ConcatenatedPmd {
  const sections = input?.sections;
  if (!Array.isArray(sections)) throw new InputError('sections', sections, 'a list of sections with a coefficient and a length');
  const components = input.componentsPs ?? [];
  if (!Array.isArray(components)) throw new InputError('componentsPs', components, 'a list of PMD values in ps');
  if (sections.length + components.length > PMD_MAX_SECTIONS) throw new InputError('sections', sections.length, `at most ${PMD_MAX_SECTIONS} sections and components`);
  if (sections.length + components.length === 0) throw new InputError('sections', sections.length, 'at least one section');
  const sectionsPs = sections.map((s, i) => {
    try {
      return linkPmdPs(s);
    } catch (e) {
      if (e instanceof InputError) throw new InputError(`sections[${i}].${e.argument}`, e.value, e.allowed, e.hint);
      throw e;
    }
  });
  const componentsPs = components.map((c, i) => requireNumber(`componentsPs[${i}]`, c, { min: 0, max: 10_000, unit: 'ps' }));
  const totalPs = Math.sqrt([...sectionsPs, ...componentsPs].reduce((s, p) => s + p * p, 0));
  const totalLengthKm = sections.reduce((s, x) => s + x.lengthKm, 0);
  return { totalPs, sectionsPs, componentsPs, totalLengthKm, equivalentCoefficientPsPerSqrtKm: totalLengthKm > 0 ? totalPs / Math.sqrt(totalLengthKm) : 0 };
}

export interface PmdqValue {
  category: string;
  /** Maximum link design value PMDQ (ps/√km) for cabled fiber. */
  pmdqPsPerSqrtKm: number;
  recommendation: string;
}

/**
 * Link design value PMDQ of cabled fiber by category (statistical upper bound of the concatenated-link coefficient
 * for M = 20 cable sections at Q = 0.01 %; from memory of the recommendations named, check the current edition).
 */
export const PMDQ_BY_CATEGORY: readonly PmdqValue[] = [
  { category: 'G.652.A / G.652.C', pmdqPsPerSqrtKm: 0.5, recommendation: 'ITU-T G.652 (11/2016), from memory' },
  { category: 'G.652.B / G.652.D', pmdqPsPerSqrtKm: 0.2, recommendation: 'ITU-T G.652 (11/2016), from memory' },
  { category: 'G.654 (all)', pmdqPsPerSqrtKm: 0.2, recommendation: 'ITU-T G.654 (03/2020), from memory' },
  { category: 'G.655.C / D / E', pmdqPsPerSqrtKm: 0.2, recommendation: 'ITU-T G.655 (11/2009), from memory' },
  { category: 'G.656', pmdqPsPerSqrtKm: 0.2, recommendation: 'ITU-T G.656 (07/2010), from memory' },
  { category: 'G.657.A1 / A2', pmdqPsPerSqrtKm: 0.2, recommendation: 'ITU-T G.657 (11/2016), from memory' },
];

/** M and Q behind PMDQ (ITU-T G.652 and the others, clause on PMD; from memory). */
export const PMDQ_SECTIONS_M = 20;
export const PMDQ_PROBABILITY_Q = 1e-4;

/**
 * Complementary error function, erfc(x) for x ≥ 0 by the Chebyshev-fitted form of Press et al. (Numerical Recipes,
 * 2nd ed. 1992, §6.2 `erfcc`), fractional error below 1.2e-7 everywhere; negative x by erfc(−x) = 2 − erfc(x).
 */
export function erfc(x: number): number {
  const v = requireNumber('x', x);
  const z = Math.abs(v);
  const t = 1 / (1 + 0.5 * z);
  const ans =
    t *
    Math.exp(
      -z * z -
        1.26551223 +
        t * (1.00002368 + t * (0.37409196 + t * (0.09678418 + t * (-0.18628806 + t * (0.27886807 + t * (-1.13520398 + t * (1.48851587 + t * (-0.82215223 + t * 0.17087277)))))))),
    );
  return v >= 0 ? ans : 2 - ans;
}

/** Scale a of the Maxwell distribution with the given mean: mean = 2a√(2/π) (standard Maxwell moments). */
function maxwellScale(meanPs: number): number {
  return meanPs * Math.sqrt(Math.PI / 8);
}

/**
 * Probability that the instantaneous DGD exceeds a value, for a Maxwell distribution of mean ⟨DGD⟩ = PMD:
 * P(X > x) = erfc(x/(a√2)) + √(2/π)·(x/a)·exp(−x²/(2a²)), a = ⟨DGD⟩·√(π/8) (Maxwell tail; Poole & Wagner 1986).
 */
export function maxwellExceedProbability(input: { dgdPs: number; meanDgdPs: number }): number {
  const x = requireNumber('dgdPs', input?.dgdPs, { min: 0, max: 1e6, unit: 'ps' });
  const mean = requireNumber('meanDgdPs', input?.meanDgdPs, { min: 0, max: 1e6, minInclusive: false, unit: 'ps' });
  const a = maxwellScale(mean);
  const u = x / a;
  // exp underflows to 0 beyond u ≈ 38: the probability is then below 1e-300, reported as 0.
  const p = erfc(u / Math.SQRT2) + Math.sqrt(2 / Math.PI) * u * Math.exp(-(u * u) / 2);
  return Math.min(1, Math.max(0, p));
}

/** Smallest probability the inverse is asked for: below it the Chebyshev erfc's relative accuracy is not shown. */
export const MAXWELL_MIN_PROBABILITY = 1e-15;

/**
 * The DGD exceeded with probability p (inverse of maxwellExceedProbability), by bisection on x/mean in [0, 20]: the
 * tail is monotone, and P(X > 20·mean) ≈ 1e-110, far below MAXWELL_MIN_PROBABILITY.
 */
export function maxwellDgdExceeded(input: { probability: number; meanDgdPs: number }): number {
  const p = requireNumber('probability', input?.probability, { min: MAXWELL_MIN_PROBABILITY, max: 1, minInclusive: true, maxInclusive: false });
  const mean = requireNumber('meanDgdPs', input?.meanDgdPs, { min: 0, max: 1e6, minInclusive: false, unit: 'ps' });
  let lo = 0;
  let hi = 20;
  for (let i = 0; i < 80; i++) {
    const mid = 0.5 * (lo + hi);
    if (maxwellExceedProbability({ dgdPs: mid * mean, meanDgdPs: mean }) > p) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi) * mean;
}

export interface PmdSignal {
  id: string;
  name: string;
  /** Symbol rate the period is taken from (GBd). */
  symbolRateGbaud: number;
  /** Largest link PMD (mean DGD) the signal tolerates, as a share of the symbol period; used when no fixed value. */
  periodShare?: number;
  /** Largest link PMD as a fixed value (ps), for receivers that compensate PMD electronically. */
  fixedMaxPmdPs?: number;
  source: string;
}

/**
 * Tolerated link PMD per signal. Uncompensated on-off keying: mean DGD up to 10 % of the bit period (for about 1 dB
 * penalty at a small outage probability; common practice, e.g. the "PMD < 10 % of the bit duration" rule). Coherent
 * receivers compensate PMD in their signal processing; their tolerance is set by the equipment (value from memory).
 */
export const PMD_SIGNALS: readonly PmdSignal[] = [
  { id: '2g5-nrz', name: '2.5 Gbit/s on-off keyed', symbolRateGbaud: 2.488, periodShare: 0.1, source: '10 % of the bit period, common practice' },
  { id: '10g-nrz', name: '10 Gbit/s on-off keyed', symbolRateGbaud: 10.3125, periodShare: 0.1, source: '10 % of the bit period, common practice' },
  { id: '25g-nrz', name: '25 Gbit/s on-off keyed', symbolRateGbaud: 25.78125, periodShare: 0.1, source: '10 % of the bit period, common practice' },
  { id: '40g-nrz', name: '40 Gbit/s on-off keyed', symbolRateGbaud: 39.8, periodShare: 0.1, source: '10 % of the bit period, common practice' },
  { id: '100g-coherent', name: '100 Gbit/s coherent (dual-polarization QPSK)', symbolRateGbaud: 32, fixedMaxPmdPs: 25, source: 'from memory: typical equipment tolerance of about 25 ps mean DGD; check the equipment data' },
];

export interface PmdVerdict {
  linkPmdPs: number;
  /** Largest link PMD the signal tolerates (ps). */
  maxPmdPs: number;
  /** Symbol period (ps). */
  periodPs: number;
  carries: boolean;
  /** maxPmdPs − linkPmdPs (ps); negative when it does not carry. */
  marginPs: number;
  /** Probability that the instantaneous DGD exceeds 3 × the tolerated PMD on this link (a measure of outage). */
  outageProbability: number;
}

/** "This route carries X / does not": link PMD against the signal's tolerated PMD (PMD_SIGNALS or own share). */
export function pmdVerdict(input: { linkPmdPs: number; symbolRateGbaud: number; periodShare?: number; fixedMaxPmdPs?: number }): PmdVerdict {
  const pmd = requireNumber('linkPmdPs', input?.linkPmdPs, { min: 0, max: 1e5, unit: 'ps' });
  const rate = requireNumber('symbolRateGbaud', input?.symbolRateGbaud, { min: 0.001, max: 10_000, unit: 'GBd' });
  const periodPs = 1000 / rate;
  let maxPmdPs: number;
  if (input.fixedMaxPmdPs !== undefined) maxPmdPs = requireNumber('fixedMaxPmdPs', input.fixedMaxPmdPs, { min: 0, max: 1e5, minInclusive: false, unit: 'ps' });
  else maxPmdPs = requireNumber('periodShare', input.periodShare ?? 0.1, { min: 0.001, max: 1 }) * periodPs;
  const outageProbability = pmd > 0 ? maxwellExceedProbability({ dgdPs: 3 * maxPmdPs, meanDgdPs: pmd }) : 0;
  return { linkPmdPs: pmd, maxPmdPs, periodPs, carries: pmd <= maxPmdPs, marginPs: maxPmdPs - pmd, outageProbability };
}
