// Chromatic dispersion of a weakly guiding step-index single-mode fiber (GeO₂-doped core, silica cladding).
//
// Total D(λ) comes from the LP01 effective index within the scalar (weakly guiding) model of Gloge 1971:
//   n_eff² = n₂² + b(V)·(n₁² − n₂²),  V = (2πa/λ)·√(n₁² − n₂²),  D = −(λ/c)·d²n_eff/dλ²,
// with n₁(λ), n₂(λ) from Sellmeier equations (materials.ts) and b(V) from the mode engine (lpModes.ts).
// The chain rule is carried out analytically: no numerical differentiation anywhere. The derivatives of
// b(V) come from Gloge 1971: du/dV = (u/V)(1 − κ), κ = K₀²(w)/K₁²(w), so d(Vb)/dV = 1 − (u²/V²)(1 − 2κ);
// d²(Vb)/dV² is the analytic derivative of that expression (K₀' = −K₁, K₁' = −K₀ − K₁/w, A&S 9.6.27).
// Because n₁ and n₂ each vary with λ, this includes material, waveguide and profile dispersion together.
// The parts shown beside it are the textbook split (Gloge 1971; Marcuse 1979 form for weakly guiding fibers):
//   material  D_M = −(λ/c)·d²n_m/dλ²,   n_m = n₂ + b·(n₁ − n₂) at fixed b (the glass the mode sees),
//   waveguide D_W = −(N₂²·Δ/(n₂·c·λ))·V·d²(Vb)/dV²,  N₂ the cladding group index, Δ = (n₁ − n₂)/n₁,
//   profile   = total − D_M − D_W (what the wavelength dependence of Δ and the cross terms add).
import { besselKScaled } from './bessel';
import { InputError, ModelError, requireNumber, requirePositive } from './errors';
import { solveLpMode } from './lpModes';
import {
  DOPED_VALID_MAX_NM,
  DOPED_VALID_MIN_NM,
  FUSED_SILICA,
  germaniaDopedSilica,
  germaniaFractionForNa,
  MAX_GERMANIA_FRACTION,
  refractiveIndexDerivatives,
  type SellmeierGlass,
} from './materials';

/** Speed of light in vacuum, m/s (SI definition). */
export const SPEED_OF_LIGHT_M_PER_S = 299_792_458;

/** −λ·n'' with λ in µm and n'' in 1/µm² becomes D in ps/(nm·km) after × 1e12 / c (1 s/m² = 1e6 ps/(nm·km)). */
const PS_PER_NM_KM_FACTOR = 1e12 / SPEED_OF_LIGHT_M_PER_S;

const NM_PER_UM = 1000;

/**
 * Material dispersion of one glass: D_M(λ) = −(λ/c)·d²n/dλ², ps/(nm·km) (Gloge 1971; the definition of group-delay
 * dispersion per unit length, with n″ analytic from the Sellmeier sum, materials.ts). For fused silica (Malitson 1965)
 * it crosses zero near 1.27 µm and is about +21.9 ps/(nm·km) at 1550 nm.
 */
export function materialDispersionPsPerNmKm(input: { glass: SellmeierGlass; wavelengthNm: number }): number {
  if (input === null || typeof input !== 'object') throw new InputError('input', input, 'an object with glass and wavelengthNm');
  const d = refractiveIndexDerivatives(input.glass, input.wavelengthNm);
  const lamUm = input.wavelengthNm / NM_PER_UM;
  const dM = -lamUm * d.d2nPerUm2 * PS_PER_NM_KM_FACTOR;
  if (!Number.isFinite(dM)) throw new ModelError(`The material dispersion of ${input.glass.name} overflows at ${input.wavelengthNm} nm.`, `Sellmeier (${input.glass.source})`);
  return dM;
}

/** A step-index single-mode fiber model: GeO₂-doped silica core of radius a, pure silica cladding. */
export interface DispersionFiber {
  coreRadiusUm: number;
  /** GeO₂ mole fraction of the core, 0–0.2. */
  germaniaFraction: number;
}

/** Largest core radius for the dispersion model: beyond this the fiber is far from single-mode. */
export const DISPERSION_MAX_CORE_RADIUS_UM = 30;

function requireFiber(f: DispersionFiber): DispersionFiber {
  const coreRadiusUm = requirePositive('coreRadiusUm', f?.coreRadiusUm, { max: DISPERSION_MAX_CORE_RADIUS_UM, unit: 'µm' });
  const germaniaFraction = requirePositive('germaniaFraction', f?.germaniaFraction, { max: MAX_GERMANIA_FRACTION });
  return { coreRadiusUm, germaniaFraction };
}

/**
 * The dispersion model of a fiber described by core radius and NA (as the fiber picker gives them): the
 * GeO₂ fraction is the one whose Sellmeier index gives that NA at `referenceWavelengthNm` over silica.
 */
export function dispersionFiberFromNa(input: { coreRadiusUm: number; na: number; referenceWavelengthNm?: number }): DispersionFiber {
  const coreRadiusUm = requirePositive('coreRadiusUm', input?.coreRadiusUm, { max: DISPERSION_MAX_CORE_RADIUS_UM, unit: 'µm' });
  const germaniaFraction = germaniaFractionForNa(input.na, input.referenceWavelengthNm ?? 1310);
  return { coreRadiusUm, germaniaFraction };
}

export interface Lp01WaveguideFunctions {
  v: number;
  u: number;
  w: number;
  b: number;
  /** d(Vb)/dV. */
  dVbDv: number;
  /** V·d²(Vb)/dV². */
  vD2VbDv2: number;
}

/**
 * b, d(Vb)/dV and V·d²(Vb)/dV² of LP01 at V, analytically (Gloge 1971): with r = K₀(w)/K₁(w), κ = r²,
 *   u' = (u/V)(1 − κ), w' = (V − u·u')/w, dκ/dw = 2r(r² − 1 + r/w),
 *   (Vb)' = 1 − (u²/V²)(1 − 2κ),  (Vb)'' = −(2u·u'/V² − 2u²/V³)(1 − 2κ) + 2(u²/V²)·κ'·w'.
 * Accurate to the mode solver's u (about 1e-13) — checked against finite differences in the tests.
 */
export function lp01WaveguideFunctions(v: number): Lp01WaveguideFunctions {
  const mode = solveLpMode(0, 1, v);
  const { u, w, b } = mode;
  // Scaled K's: the e^w factors cancel in the ratio, so large w never underflows.
  const r = besselKScaled(0, w) / besselKScaled(1, w);
  const kappa = r * r;
  const du = (u / v) * (1 - kappa);
  const dw = (v - u * du) / w;
  const dKappa = 2 * r * (r * r - 1 + r / w) * dw;
  const u2v2 = (u * u) / (v * v);
  const dVbDv = 1 - u2v2 * (1 - 2 * kappa);
  const d2 = -((2 * u * du) / (v * v) - (2 * u * u) / (v * v * v)) * (1 - 2 * kappa) + 2 * u2v2 * dKappa;
  return { v, u, w, b, dVbDv, vD2VbDv2: v * d2 };
}

export interface DispersionPoint {
  wavelengthNm: number;
  /** Total chromatic dispersion D, ps/(nm·km). */
  totalPsPerNmKm: number;
  materialPsPerNmKm: number;
  waveguidePsPerNmKm: number;
  /** total − material − waveguide. */
  profilePsPerNmKm: number;
  v: number;
  b: number;
  effectiveIndex: number;
  /** Group index of LP01, N = n_eff − λ·dn_eff/dλ. */
  groupIndex: number;
  /** Δ = (n₁ − n₂)/n₁ at this wavelength. */
  delta: number;
}

/** Wavelength range of the dispersion model: where the doped-silica Sellmeier interpolation applies. */
export const DISPERSION_MIN_NM = DOPED_VALID_MIN_NM;
export const DISPERSION_MAX_NM = DOPED_VALID_MAX_NM;

function requireDispersionWavelength(argument: string, value: unknown): number {
  return requireNumber(argument, value, {
    min: DISPERSION_MIN_NM,
    max: DISPERSION_MAX_NM,
    unit: 'nm',
    hint: (x) => (x >= 0.6 && x <= 1.8 ? `did you mean ${x * 1000} nm (${x} µm)?` : undefined),
  });
}

/** D(λ) and its parts for LP01 of the fiber at one wavelength. ModelError where LP01 is not bound (V < 0.1). */
export function chromaticDispersion(fiber: DispersionFiber, wavelengthNm: number): DispersionPoint {
  const { coreRadiusUm: a, germaniaFraction } = requireFiber(fiber);
  const wNm = requireDispersionWavelength('wavelengthNm', wavelengthNm);
  const lam = wNm / NM_PER_UM;
  const core = refractiveIndexDerivatives(germaniaDopedSilica(germaniaFraction), wNm);
  const clad = refractiveIndexDerivatives(FUSED_SILICA, wNm);
  const [n1, n1p, n1pp] = [core.n, core.dnPerUm, core.d2nPerUm2];
  const [n2, n2p, n2pp] = [clad.n, clad.dnPerUm, clad.d2nPerUm2];

  // Q = n₁² − n₂² = NA², and its λ-derivatives.
  const q = n1 * n1 - n2 * n2;
  if (!(q > 0)) throw new ModelError(`The core index is not above the cladding index at ${wNm} nm.`, 'step-index dispersion model');
  const qp = 2 * (n1 * n1p - n2 * n2p);
  const qpp = 2 * (n1p * n1p + n1 * n1pp - n2p * n2p - n2 * n2pp);
  const na = Math.sqrt(q);
  const nap = qp / (2 * na);
  const napp = qpp / (2 * na) - (qp * qp) / (4 * na * na * na);

  // V = 2πa·NA/λ and its λ-derivatives.
  const k = 2 * Math.PI * a;
  const v = (k * na) / lam;
  const vp = k * (nap / lam - na / (lam * lam));
  const vpp = k * (napp / lam - (2 * nap) / (lam * lam) + (2 * na) / (lam * lam * lam));

  const g = lp01WaveguideFunctions(v);
  const b = g.b;
  // b' = ((Vb)' − b)/V and b'' = ((Vb)'' − 2b')/V, from Vb differentiated once and twice.
  const bv = (g.dVbDv - b) / v;
  const bvv = (g.vD2VbDv2 / v - 2 * bv) / v;
  const bp = bv * vp;
  const bpp = bvv * vp * vp + bv * vpp;

  // S = n_eff² = n₂² + b·Q.
  const s = n2 * n2 + b * q;
  const sp = 2 * n2 * n2p + bp * q + b * qp;
  const spp = 2 * (n2p * n2p + n2 * n2pp) + bpp * q + 2 * bp * qp + b * qpp;
  const nEff = Math.sqrt(s);
  const nEffP = sp / (2 * nEff);
  const nEffPP = spp / (2 * nEff) - (sp * sp) / (4 * nEff * nEff * nEff);

  const total = -lam * nEffPP * PS_PER_NM_KM_FACTOR;
  // The glass the mode sees, at fixed b: n_m = n₂ + b·(n₁ − n₂), so D_M = (1 − b)·D_M(cladding) + b·D_M(core).
  const material = -lam * (n2pp + b * (n1pp - n2pp)) * PS_PER_NM_KM_FACTOR;
  const delta = (n1 - n2) / n1;
  const n2Group = n2 - lam * n2p;
  // −(N₂²Δ/(n₂cλ))·V(Vb)'': with λ in µm the bracket is in 1/µm², the same unit as n'' above.
  const waveguide = -lam * ((n2Group * n2Group * delta) / (n2 * lam * lam)) * g.vD2VbDv2 * PS_PER_NM_KM_FACTOR;

  const point: DispersionPoint = {
    wavelengthNm: wNm,
    totalPsPerNmKm: total,
    materialPsPerNmKm: material,
    waveguidePsPerNmKm: waveguide,
    profilePsPerNmKm: total - material - waveguide,
    v,
    b,
    effectiveIndex: nEff,
    groupIndex: nEff - lam * nEffP,
    delta,
  };
  for (const [key, value] of Object.entries(point)) {
    if (!Number.isFinite(value)) throw new ModelError(`Dispersion at ${wNm} nm: ${key} is not finite.`, 'step-index dispersion model');
  }
  return point;
}

/** Largest number of points in one sweep (1 nm over the whole model range is 1201). */
export const MAX_SWEEP_POINTS = 5000;

/** D(λ) from `fromNm` to `toNm` every `stepNm` (default 1200–1650 nm, 1 nm). */
export function dispersionSweep(fiber: DispersionFiber, opts: { fromNm?: number; toNm?: number; stepNm?: number } = {}): DispersionPoint[] {
  const from = requireDispersionWavelength('fromNm', opts.fromNm ?? 1200);
  const to = requireDispersionWavelength('toNm', opts.toNm ?? 1650);
  const step = requirePositive('stepNm', opts.stepNm ?? 1, { unit: 'nm' });
  if (to < from) throw new InputError('toNm', to, `at least fromNm (${from} nm)`, 'the range is reversed');
  const count = Math.floor((to - from) / step + 1e-9) + 1;
  if (count > MAX_SWEEP_POINTS) throw new InputError('stepNm', step, `a step giving at most ${MAX_SWEEP_POINTS} points`);
  const points: DispersionPoint[] = [];
  for (let i = 0; i < count; i++) points.push(chromaticDispersion(fiber, Math.min(to, from + i * step)));
  return points;
}

export interface ZeroDispersion {
  wavelengthNm: number;
  /** dD/dλ at the zero, ps/(nm²·km). */
  slopePsPerNm2Km: number;
}

/**
 * Step for the slope dD/dλ by central difference: 0.5 nm. D is analytic and smooth, truncation
 * h²/6·D''' ≈ 1e-7 ps/(nm²·km); round-off ~1e-13·D/h — both far below the 3rd digit shown.
 */
export const SLOPE_STEP_NM = 0.5;

/** dD/dλ at a wavelength, ps/(nm²·km). */
export function dispersionSlope(fiber: DispersionFiber, wavelengthNm: number): number {
  const w = requireNumber('wavelengthNm', wavelengthNm, { min: DISPERSION_MIN_NM + SLOPE_STEP_NM, max: DISPERSION_MAX_NM - SLOPE_STEP_NM, unit: 'nm' });
  const hi = chromaticDispersion(fiber, w + SLOPE_STEP_NM).totalPsPerNmKm;
  const lo = chromaticDispersion(fiber, w - SLOPE_STEP_NM).totalPsPerNmKm;
  return (hi - lo) / (2 * SLOPE_STEP_NM);
}

/**
 * Zero-dispersion wavelength λ₀ between `fromNm` and `toNm` (default 1200–1700 nm): scan every 10 nm for a
 * sign change of D, then bisect to 1e-9 nm. Undefined when D keeps one sign over the range.
 */
export function zeroDispersion(fiber: DispersionFiber, opts: { fromNm?: number; toNm?: number } = {}): ZeroDispersion | undefined {
  const from = requireDispersionWavelength('fromNm', opts.fromNm ?? 1200);
  const to = requireDispersionWavelength('toNm', opts.toNm ?? 1700);
  const d = (w: number) => chromaticDispersion(fiber, w).totalPsPerNmKm;
  const scanStep = 10;
  let lo = from;
  let dLo = d(lo);
  for (let w = from + scanStep; w <= to + 1e-9; w += scanStep) {
    const hi = Math.min(w, to);
    const dHi = d(hi);
    if (dLo === 0) return { wavelengthNm: lo, slopePsPerNm2Km: dispersionSlope(fiber, clampForSlope(lo)) };
    if (Math.sign(dHi) !== Math.sign(dLo)) {
      let a = lo;
      let bnd = hi;
      let fa = dLo;
      while (bnd - a > 1e-9) {
        const mid = 0.5 * (a + bnd);
        const fm = d(mid);
        if (Math.sign(fm) === Math.sign(fa)) {
          a = mid;
          fa = fm;
        } else bnd = mid;
      }
      const w0 = 0.5 * (a + bnd);
      return { wavelengthNm: w0, slopePsPerNm2Km: dispersionSlope(fiber, clampForSlope(w0)) };
    }
    lo = hi;
    dLo = dHi;
  }
  return undefined;
}

function clampForSlope(w: number): number {
  return Math.min(DISPERSION_MAX_NM - SLOPE_STEP_NM, Math.max(DISPERSION_MIN_NM + SLOPE_STEP_NM, w));
}

/** Accumulated dispersion of a link, ps/nm = D·L. */
export function linkDispersionPsPerNm(dispersionPsPerNmKm: number, lengthKm: number): number {
  const d = requireNumber('dispersionPsPerNmKm', dispersionPsPerNmKm, { min: -1000, max: 1000, unit: 'ps/(nm·km)' });
  const l = requireNumber('lengthKm', lengthKm, { min: 0, max: 20_000, unit: 'km' });
  return d * l;
}

/**
 * The dispersion limit used, stated as common practice: the pulse spread |D|·L·Δλ must stay within a quarter
 * of a bit slot, |D|·L·Δλ ≤ 1/(4B), with Δλ the source's RMS spectral width (Agrawal, Fiber-Optic Communication
 * Systems, §2.4: B·L·|D|·σ_λ ≤ 1/4 for sources much wider than the signal spectrum).
 */
export const DISPERSION_CRITERION =
  'pulse spread within a quarter bit slot: |D|·L·Δλ ≤ 1/(4B), Δλ the RMS source spectral width (common practice, Agrawal §2.4); assumes a source much wider than the signal spectrum';

export interface DispersionReach {
  /** Largest length meeting the criterion, km; undefined when D = 0 (no first-order limit: slope and PMD then set it). */
  reachKm: number | undefined;
  /** Largest accumulated dispersion allowed, ps/nm. */
  maxPsPerNm: number;
  criterion: string;
}

/** Dispersion-limited reach for a bit rate (Gbit/s) and source RMS spectral width (nm). */
export function dispersionLimitedReach(input: { dispersionPsPerNmKm: number; bitRateGbps: number; spectralWidthNm: number }): DispersionReach {
  const d = Math.abs(requireNumber('dispersionPsPerNmKm', input?.dispersionPsPerNmKm, { min: -1000, max: 1000, unit: 'ps/(nm·km)' }));
  const bitRate = requirePositive('bitRateGbps', input.bitRateGbps, { max: 10_000, unit: 'Gbit/s' });
  const width = requirePositive('spectralWidthNm', input.spectralWidthNm, { max: 500, unit: 'nm' });
  // 1/(4B) with B in Gbit/s is 250/B ps.
  const maxSpreadPs = 1000 / (4 * bitRate);
  const maxPsPerNm = maxSpreadPs / width;
  // A subnormal bit rate or width overflows the allowance; a subnormal D the reach (treated as D = 0: no limit).
  if (!Number.isFinite(maxPsPerNm)) throw new InputError('spectralWidthNm', width, 'a bit rate and spectral width large enough to set a dispersion limit');
  const reachKm = maxPsPerNm / d;
  return { reachKm: d === 0 || !Number.isFinite(reachKm) ? undefined : reachKm, maxPsPerNm, criterion: DISPERSION_CRITERION };
}
