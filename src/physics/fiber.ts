// Basic step-index fiber parameters: V-number, numerical aperture, relative index difference.
import { InputError, requireNumber, requirePositive, requireWavelengthNm } from './errors';

/** Nanometres per micrometre: V mixes a core radius in µm with a wavelength in nm. */
export const NM_PER_UM = 1000;
/** Largest core radius accepted, µm (1 mm core: far beyond any glass or plastic fiber in the trade). */
export const MAX_CORE_RADIUS_UM = 500;
/** Refractive indices accepted: 1 (vacuum) to 4 (beyond silicon); glass fibers sit near 1.44–1.48. */
export const MIN_REFRACTIVE_INDEX = 1;
export const MAX_REFRACTIVE_INDEX = 4;
/** Δ above this is no longer a fiber (Δ = 50 % means n2 = 0); weakly guiding needs Δ ≪ 1. */
export const MAX_DELTA_PERCENT = 50;

export function requireCoreRadiusUm(argument: string, value: unknown): number {
  return requirePositive(argument, value, {
    max: MAX_CORE_RADIUS_UM,
    unit: 'µm',
    hint: (v) =>
      v > MAX_CORE_RADIUS_UM && v <= MAX_CORE_RADIUS_UM * 1000
        ? `did you give it in nm? ${v} nm = ${v / 1000} µm`
        : v <= 0
          ? 'a core radius is a positive size'
          : undefined,
  });
}

export function requireNa(argument: string, value: unknown): number {
  return requirePositive(argument, value, {
    max: 1,
    maxInclusive: false,
    hint: (v) => (v >= 1 ? 'a glass fiber in air has NA < 1 (typical: 0.1 to 0.3); did you type an angle?' : 'NA is positive'),
  });
}

export function requireRefractiveIndex(argument: string, value: unknown): number {
  return requireNumber(argument, value, {
    min: MIN_REFRACTIVE_INDEX,
    max: MAX_REFRACTIVE_INDEX,
    hint: (v) => (v < 1 && v > 0 ? 'a refractive index is at least 1 (silica is about 1.45)' : undefined),
  });
}

function requireIndexPair(coreIndex: unknown, claddingIndex: unknown): [number, number] {
  const n1 = requireRefractiveIndex('coreIndex', coreIndex);
  const n2 = requireRefractiveIndex('claddingIndex', claddingIndex);
  if (!(n2 < n1)) {
    throw new InputError('claddingIndex', n2, `less than the core index ${n1}`, 'light is guided only when the core index is above the cladding index; are the two swapped?');
  }
  return [n1, n2];
}

/** V = 2π a NA / λ (Gloge 1971, Appl. Opt. 10(10), definition of V). */
export function vNumber(input: { coreRadiusUm: number; na: number; wavelengthNm: number }): number {
  const a = requireCoreRadiusUm('coreRadiusUm', input?.coreRadiusUm);
  const na = requireNa('na', input?.na);
  const wavelengthNm = requireWavelengthNm('wavelengthNm', input?.wavelengthNm);
  const v = (2 * Math.PI * a * na * NM_PER_UM) / wavelengthNm;
  // A subnormal radius times a subnormal NA underflows to V = 0: no fiber, and not what the inputs say.
  if (!(v > 0)) throw new InputError('coreRadiusUm', a, 'a core radius and NA large enough to compute V', 'fibers have V from about 1 to 100');
  return v;
}

/** NA = √(n1² − n2²) (Snyder & Love 1983, definitions of NA and Δ). */
export function numericalAperture(input: { coreIndex: number; claddingIndex: number }): number {
  const [n1, n2] = requireIndexPair(input?.coreIndex, input?.claddingIndex);
  const na = Math.sqrt((n1 - n2) * (n1 + n2));
  if (!(na < 1)) {
    throw new InputError('coreIndex', n1, `indices giving NA < 1 (these give NA = ${na.toFixed(3)})`, 'a fiber in air cannot accept light at NA ≥ 1; check the indices');
  }
  return na;
}

/** Relative index difference Δ = (n1² − n2²)/(2 n1²) (Snyder & Love 1983, definition of Δ; ≈ (n1 − n2)/n1 when Δ ≪ 1, Gloge 1971). */
export function relativeIndexDifference(input: { coreIndex: number; claddingIndex: number }): number {
  const [n1, n2] = requireIndexPair(input?.coreIndex, input?.claddingIndex);
  return ((n1 - n2) * (n1 + n2)) / (2 * n1 * n1);
}

/** NA = n1 √(2Δ), the inverse of the definition of Δ (Snyder & Love 1983, definitions of NA and Δ). */
export function naFromDelta(input: { coreIndex: number; deltaPercent: number }): number {
  const n1 = requireRefractiveIndex('coreIndex', input?.coreIndex);
  const deltaPercent = requirePositive('deltaPercent', input?.deltaPercent, {
    max: MAX_DELTA_PERCENT,
    maxInclusive: false,
    unit: '%',
    hint: (v) => (v >= MAX_DELTA_PERCENT ? 'Δ is given in percent; single-mode fibers have about 0.35 %' : undefined),
  });
  const na = n1 * Math.sqrt((2 * deltaPercent) / 100);
  if (!(na > 0)) throw new InputError('deltaPercent', deltaPercent, 'a Δ large enough to give an NA', 'single-mode fibers have about 0.35 %');
  if (!(na < 1)) {
    throw new InputError('deltaPercent', deltaPercent, `a Δ giving NA < 1 (this gives NA = ${na.toFixed(3)})`, 'Δ is given in percent; single-mode fibers have about 0.35 %');
  }
  return na;
}
