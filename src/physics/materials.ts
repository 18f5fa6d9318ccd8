// Refractive index of fiber glasses from three-term Sellmeier equations, with analytic first and second
// wavelength derivatives (for group index and material dispersion).
//   n²(λ) − 1 = Σ B_i λ² / (λ² − λ_i²),  λ in µm (coefficients are published in µm).
import { InputError, ModelError, requireNumber, requirePositive, requireWavelengthNm } from './errors';

export interface SellmeierTerm {
  /** Oscillator strength B_i (dimensionless). */
  strength: number;
  /** Resonance wavelength λ_i in µm. */
  resonanceUm: number;
}

export interface SellmeierGlass {
  name: string;
  /** Short reference key(s), see REFERENCES.md. */
  source: string;
  terms: readonly SellmeierTerm[];
  /** Wavelength range the coefficients are stated for. */
  validMinNm: number;
  validMaxNm: number;
}

// Malitson 1965, JOSA 55(10) 1205, three-term fit to fused silica at 20 °C — valid 0.21–3.71 µm, fit within about 1e-5 in n.
export const FUSED_SILICA: SellmeierGlass = {
  name: 'fused silica (SiO₂)',
  source: 'Malitson1965',
  terms: [
    { strength: 0.6961663, resonanceUm: 0.0684043 },
    { strength: 0.4079426, resonanceUm: 0.1162414 },
    { strength: 0.8974794, resonanceUm: 9.896161 },
  ],
  validMinNm: 210,
  validMaxNm: 3710,
};

// Fleming 1984, Appl. Opt. 23(24) 4486, coefficients for GeO₂ glass — stated 0.36–4.3 µm.
export const GERMANIA_GLASS: SellmeierGlass = {
  name: 'germania glass (GeO₂)',
  source: 'Fleming1984',
  terms: [
    { strength: 0.80686642, resonanceUm: 0.068972606 },
    { strength: 0.71815848, resonanceUm: 0.15396605 },
    { strength: 0.85416831, resonanceUm: 11.841931 },
  ],
  validMinNm: 360,
  validMaxNm: 4300,
};

/** Highest GeO₂ mole fraction accepted for a doped-silica core (20 mol %: beyond any telecom core, common practice). */
export const MAX_GERMANIA_FRACTION = 0.2;

/**
 * Range over which doped-silica Sellmeier interpolation is applied: 0.6–1.8 µm
 * (the range named by Sunak & Bastien 1989 for doped-silica interpolation).
 */
export const DOPED_VALID_MIN_NM = 600;
export const DOPED_VALID_MAX_NM = 1800;

/**
 * GeO₂–SiO₂ glass with GeO₂ mole fraction x: each B_i and λ_i interpolated linearly between fused silica
 * (Malitson 1965) and GeO₂ glass (Fleming 1984). The linear-coefficient scheme is the one commonly used with
 * these two coefficient sets; checked against Fleming's measured 13.5 mol % glass within 1.5e-3 in n
 * (different glass samples), and in Δn per mol % within about 7 %.
 */
export function germaniaDopedSilica(moleFraction: number): SellmeierGlass {
  const x = requireNumber('moleFraction', moleFraction, {
    min: 0,
    max: MAX_GERMANIA_FRACTION,
    hint: (v) => (v > 1 && v <= 100 * MAX_GERMANIA_FRACTION ? `did you mean ${v / 100} (${v} mol %)?` : undefined),
  });
  const terms = FUSED_SILICA.terms.map((s, i) => {
    const g = GERMANIA_GLASS.terms[i]!;
    return { strength: s.strength + x * (g.strength - s.strength), resonanceUm: s.resonanceUm + x * (g.resonanceUm - s.resonanceUm) };
  });
  return {
    name: `GeO₂-doped silica, ${Number((x * 100).toPrecision(4))} mol % GeO₂`,
    source: 'Malitson1965, Fleming1984 (linear interpolation of coefficients)',
    terms,
    validMinNm: x === 0 ? FUSED_SILICA.validMinNm : DOPED_VALID_MIN_NM,
    validMaxNm: x === 0 ? FUSED_SILICA.validMaxNm : DOPED_VALID_MAX_NM,
  };
}

export interface IndexDerivatives {
  n: number;
  /** dn/dλ in 1/µm. */
  dnPerUm: number;
  /** d²n/dλ² in 1/µm². */
  d2nPerUm2: number;
}

const NM_PER_UM = 1000;

function requireGlassWavelength(glass: SellmeierGlass, wavelengthNm: number): number {
  const w = requireWavelengthNm('wavelengthNm', wavelengthNm);
  if (!glass || !Array.isArray(glass.terms)) throw new InputError('glass', glass, 'a Sellmeier glass such as FUSED_SILICA');
  // Sellmeier oscillators have positive strengths and resonances; anything else is not a glass (and gave n' > 0, N < 1).
  glass.terms.forEach((t, i) => {
    requirePositive(`glass.terms[${i}].strength`, t?.strength);
    requirePositive(`glass.terms[${i}].resonanceUm`, t?.resonanceUm);
  });
  if (w < glass.validMinNm || w > glass.validMaxNm) {
    throw new ModelError(
      `${w} nm is outside ${glass.validMinNm}–${glass.validMaxNm} nm, where the Sellmeier coefficients for ${glass.name} are stated.`,
      `Sellmeier (${glass.source})`,
      `use a wavelength from ${glass.validMinNm} to ${glass.validMaxNm} nm`,
    );
  }
  return w;
}

/**
 * n, dn/dλ and d²n/dλ² from the Sellmeier sum, analytically:
 *   f = n², f' = Σ −2 B λ λ_i² / (λ² − λ_i²)²,  f'' = Σ B λ_i² (6λ² + 2λ_i²) / (λ² − λ_i²)³,
 *   n' = f'/(2n),  n'' = f''/(2n) − f'²/(4n³).
 */
export function refractiveIndexDerivatives(glass: SellmeierGlass, wavelengthNm: number): IndexDerivatives {
  const lamUm = requireGlassWavelength(glass, wavelengthNm) / NM_PER_UM;
  const l2 = lamUm * lamUm;
  let f = 1;
  let f1 = 0;
  let f2 = 0;
  for (const t of glass.terms) {
    const r2 = t.resonanceUm * t.resonanceUm;
    const d = l2 - r2;
    f += (t.strength * l2) / d;
    f1 += (-2 * t.strength * lamUm * r2) / (d * d);
    f2 += (t.strength * r2 * (6 * l2 + 2 * r2)) / (d * d * d);
  }
  if (!(f > 1) || !Number.isFinite(f2)) {
    throw new ModelError(`The Sellmeier sum for ${glass.name} gives no real index at ${wavelengthNm} nm.`, `Sellmeier (${glass.source})`);
  }
  const n = Math.sqrt(f);
  const dn = f1 / (2 * n);
  const d2n = f2 / (2 * n) - (f1 * f1) / (4 * n * n * n);
  // Huge strengths or a wavelength on a resonance overflow f or f1² even when f2 stays finite.
  if (!Number.isFinite(n) || !Number.isFinite(d2n)) {
    throw new ModelError(`The Sellmeier sum for ${glass.name} is too close to a resonance at ${wavelengthNm} nm.`, `Sellmeier (${glass.source})`);
  }
  return { n, dnPerUm: dn, d2nPerUm2: d2n };
}

/** Phase refractive index n(λ). */
export function refractiveIndex(glass: SellmeierGlass, wavelengthNm: number): number {
  return refractiveIndexDerivatives(glass, wavelengthNm).n;
}

/** Group index N = n − λ dn/dλ (definition of group velocity v_g = c/N). */
export function groupIndex(glass: SellmeierGlass, wavelengthNm: number): number {
  const d = refractiveIndexDerivatives(glass, wavelengthNm);
  const group = d.n - (wavelengthNm / NM_PER_UM) * d.dnPerUm;
  if (!Number.isFinite(group)) throw new ModelError(`The group index of ${glass.name} overflows at ${wavelengthNm} nm.`, `Sellmeier (${glass.source})`);
  return group;
}

/**
 * GeO₂ mole fraction of a core over a pure-silica cladding that gives the numerical aperture `na` at
 * `wavelengthNm`: solves n_core(x)² − n_silica² = NA² by bisection (n_core rises monotonically with x).
 */
export function germaniaFractionForNa(na: number, wavelengthNm: number): number {
  const target = requirePositive('na', na, { max: 0.5 });
  const w = requireNumber('wavelengthNm', wavelengthNm, { min: DOPED_VALID_MIN_NM, max: DOPED_VALID_MAX_NM, unit: 'nm' });
  const n2 = refractiveIndex(FUSED_SILICA, w);
  const naAt = (x: number) => {
    const n1 = refractiveIndex(germaniaDopedSilica(x), w);
    return Math.sqrt(Math.max(0, n1 * n1 - n2 * n2));
  };
  if (naAt(MAX_GERMANIA_FRACTION) < target) {
    throw new ModelError(
      `An NA of ${target} needs more than ${MAX_GERMANIA_FRACTION * 100} mol % GeO₂ in the core.`,
      'GeO₂–SiO₂ Sellmeier interpolation',
      'check the NA; telecom single-mode fibers have NA near 0.1–0.14',
    );
  }
  let lo = 0;
  let hi = MAX_GERMANIA_FRACTION;
  // 60 halvings of 0.2 reach 2e-19: below double resolution of x, so the loop ends on the exact root to machine precision.
  for (let i = 0; i < 60; i++) {
    const mid = 0.5 * (lo + hi);
    if (naAt(mid) < target) lo = mid;
    else hi = mid;
  }
  return 0.5 * (lo + hi);
}
