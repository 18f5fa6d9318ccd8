// Encircled flux EF(r) of a multimode launch, from the power in each guided mode and the mode fields.
//
// EF(r) = ∫₀^r I(ρ) ρ dρ / ∫₀^∞ I(ρ) ρ dρ, with I the azimuthally integrated near-field intensity (the quantity
// IEC 61280-4-1 defines for a launch into 50 µm fiber). The modes add in power, not in field:
//   - different azimuthal orders l ≠ l′ cancel in the azimuthal integral (∫ cos lφ cos l′φ dφ = 0), exactly;
//   - modes of one l and different radial order m belong to different principal groups g = 2m + l − 1, whose
//     propagation constants differ by ≈ (NA/a)·… per group (Gloge & Marcatili 1973): over the metres of a launch
//     cord and the spectral width of a real source their relative phase is scrambled (common practice in modal
//     power distribution work; a narrow laser on a very short cord shows speckle instead).
// With each radial field normalised so that ∫ψ² r dr = 1 (src/physics/radialSolver.ts), the ring power of an
// LP mode carrying power p is p ψ(r)² r whatever its orientation, so
//   EF(r) = Σ_i p_i C_i(r) / Σ_i p_i,    C_i(r) = ∫₀^r ψ_i² ρ dρ.
import { InputError, ModelError, requireNumber } from './errors';
import type { MultimodeModeSet } from './coupling';

/** Power in one principal mode group g = 2m + l − 1 (g = 1 is LP01 alone). */
export interface GroupPower {
  principal: number;
  /** Share of the launched power carried by the group, 0..1 (the shares sum to 1). */
  fraction: number;
  /** LP modes in the group. */
  modeCount: number;
}

export interface EncircledFluxCurve {
  /** Radii (µm) at which EF is given, ascending, from 0. */
  rUm: number[];
  /** EF at each radius, 0..1, non-decreasing. */
  ef: number[];
  /** Share of the power in each principal group (ascending g). */
  perGroup: GroupPower[];
  /** Core radius of the fiber the modes belong to (µm): the plots end a little beyond it. */
  coreRadiusUm: number;
}

/** Most modes a set may hold (the solver's own cap is far below this). */
const MAX_MODES = 20_000;

/** Checks a mode set as multimodeModes returns it (fields on one grid). */
function requireModes(set: unknown): MultimodeModeSet {
  const s = set as MultimodeModeSet;
  if (s === null || typeof s !== 'object' || !ArrayBuffer.isView(s.rUm) || !Array.isArray(s.modes) || s.modes.length === 0 || s.modes.length > MAX_MODES) {
    throw new InputError('modes', set, 'a mode set from multimodeModes');
  }
  const n = s.rUm.length;
  if (n < 2) throw new InputError('modes.rUm', n, 'a radial grid of at least 2 cells');
  requireNumber('modes.stepUm', s.stepUm, { min: 0, minInclusive: false, max: 1000, unit: 'µm' });
  for (let j = 0; j < n; j++) requireNumber(`modes.rUm[${j}]`, s.rUm[j], { min: 0, max: 1e5, unit: 'µm' });
  for (const m of s.modes) {
    if (!m || !ArrayBuffer.isView(m.field) || m.field.length !== n || !Number.isInteger(m.principal) || m.principal < 1 || !(m.degeneracy === 2 || m.degeneracy === 4)) {
      throw new InputError('modes.modes', m, 'modes sampled on the set’s own grid, as multimodeModes returns them');
    }
  }
  return s;
}

/** Checks one power per LP mode of the set, each ≥ 0 and finite, not all zero; returns them as numbers. */
function requirePowers(set: MultimodeModeSet, powers: unknown): number[] {
  if (!Array.isArray(powers) && !ArrayBuffer.isView(powers)) throw new InputError('powers', powers, 'one power per mode of the set');
  const list = powers as ArrayLike<number>;
  if (list.length !== set.modes.length) throw new InputError('powers', `${list.length} values`, `${set.modes.length} values, one per LP mode of the set`);
  const out: number[] = [];
  let total = 0;
  for (let i = 0; i < list.length; i++) {
    const p = requireNumber(`powers[${i}]`, list[i], { min: 0, max: 1e300 });
    out.push(p);
    total += p;
  }
  if (!(total > 0) || !Number.isFinite(total)) throw new InputError('powers', 'all zero', 'some power in at least one mode');
  return out.map((p) => p / total);
}

/**
 * Overfilled (uniform) launch: every guided mode, orientations and polarisations counted, carries the same
 * power, so an LP mode carries degeneracy/M. This is what a spatially incoherent source of uniform radiance larger
 * than the core and the NA excites (Gloge & Marcatili 1973: equal power per mode for a Lambertian source filling
 * the phase space; leaky modes left out, they are gone after the first metres).
 */
export function overfilledModePowers(input: { modes: MultimodeModeSet }): number[] {
  const set = requireModes(input?.modes);
  const total = set.modes.reduce((s, m) => s + m.degeneracy, 0);
  return set.modes.map((m) => m.degeneracy / total);
}

/**
 * Powers typed in per principal group, spread over the group's modes by degeneracy (the modes of one group are
 * nearly degenerate and couple strongly among themselves, common practice). Groups not listed carry nothing.
 */
export function groupModePowers(input: { modes: MultimodeModeSet; groupPowers: readonly { principal: number; power: number }[] }): number[] {
  const set = requireModes(input?.modes);
  const list = input.groupPowers;
  if (!Array.isArray(list) || list.length === 0 || list.length > MAX_MODES) throw new InputError('groupPowers', list, 'a list of { principal, power } for the groups that carry power');
  const gMax = set.modes.reduce((mx, m) => Math.max(mx, m.principal), 1);
  const byGroup = new Map<number, number>();
  list.forEach((item, i) => {
    const g = requireNumber(`groupPowers[${i}].principal`, item?.principal, { min: 1, max: gMax });
    if (!Number.isInteger(g)) throw new InputError(`groupPowers[${i}].principal`, g, `a whole group number from 1 to ${gMax}`);
    const p = requireNumber(`groupPowers[${i}].power`, item?.power, { min: 0, max: 1e300 });
    byGroup.set(g, (byGroup.get(g) ?? 0) + p);
  });
  const degeneracyOfGroup = new Map<number, number>();
  for (const m of set.modes) degeneracyOfGroup.set(m.principal, (degeneracyOfGroup.get(m.principal) ?? 0) + m.degeneracy);
  const powers = set.modes.map((m) => ((byGroup.get(m.principal) ?? 0) * m.degeneracy) / degeneracyOfGroup.get(m.principal)!);
  const total = powers.reduce((s, x) => s + x, 0);
  if (!(total > 0) || !Number.isFinite(total)) throw new InputError('groupPowers', 'no power', 'some power in at least one group');
  return powers.map((p) => p / total);
}

/** Share of the power per principal group (ascending g) for powers per LP mode of the set. */
export function powerPerGroup(input: { modes: MultimodeModeSet; powers: readonly number[] }): GroupPower[] {
  const set = requireModes(input?.modes);
  const p = requirePowers(set, input.powers);
  const groups = new Map<number, { fraction: number; modeCount: number }>();
  set.modes.forEach((m, i) => {
    const g = groups.get(m.principal) ?? { fraction: 0, modeCount: 0 };
    g.fraction += p[i];
    g.modeCount += 1;
    groups.set(m.principal, g);
  });
  return [...groups.entries()].sort((a, b) => a[0] - b[0]).map(([principal, g]) => ({ principal, fraction: Math.min(1, g.fraction), modeCount: g.modeCount }));
}

/** Points of the EF curve handed to plots and tables (the solver grid itself is finer). */
const DEFAULT_CURVE_POINTS = 121;
const MAX_CURVE_POINTS = 2001;
/** The curve runs to this multiple of the core radius (the template's last radius is 0.88 a for 50 µm). */
const CURVE_EXTENT_CORE_RADII = 1.2;

/**
 * EF(r) of a launch given as power per LP mode of the set: EF(r) = Σ p_i C_i(r) / Σ p_i (see top of file).
 * C_i is accumulated with the midpoint rule on the solver's cell-centred grid, the rule that made ∫ψ² r dr = 1
 * there, so every C_i ends at 1 and EF at the grid's edge is 1 to rounding. Between cell edges EF is interpolated
 * linearly (EF is smooth on the cell scale: the grid resolves every mode's radial oscillation, radialSolver.ts).
 */
export function encircledFlux(input: { modes: MultimodeModeSet; powers: readonly number[]; coreRadiusUm: number; points?: number }): EncircledFluxCurve {
  const set = requireModes(input?.modes);
  const p = requirePowers(set, input.powers);
  const h = set.stepUm;
  const n = set.rUm.length;
  const edge = n * h;
  const a = requireNumber('coreRadiusUm', input.coreRadiusUm, { min: 0, minInclusive: false, max: edge / CURVE_EXTENT_CORE_RADII, unit: 'µm', hint: 'the core radius of the fiber the modes were solved for' });
  const points = input.points === undefined ? DEFAULT_CURVE_POINTS : requireNumber('points', input.points, { min: 2, max: MAX_CURVE_POINTS });
  if (!Number.isInteger(points)) throw new InputError('points', points, `a whole number from 2 to ${MAX_CURVE_POINTS}`);
  // Ring power per cell, summed over modes: Σ_i p_i ψ_i(r_j)² r_j h.
  const ring = new Float64Array(n);
  set.modes.forEach((m, i) => {
    if (p[i] === 0) return;
    const f = m.field;
    for (let j = 0; j < n; j++) ring[j] += p[i] * f[j] * f[j];
  });
  // Cumulative at cell edges r = (j+1) h.
  const cum = new Float64Array(n + 1);
  for (let j = 0; j < n; j++) cum[j + 1] = cum[j] + ring[j] * set.rUm[j] * h;
  const total = cum[n];
  if (!(total > 0) || !Number.isFinite(total)) throw new ModelError('The modes carry no power on their grid.', 'encircled flux');
  const extent = CURVE_EXTENT_CORE_RADII * a;
  const rUm: number[] = [];
  const ef: number[] = [];
  for (let k = 0; k < points; k++) {
    const r = (extent * k) / (points - 1);
    rUm.push(r);
    ef.push(efFromCumulative(cum, h, total, r));
  }
  return { rUm, ef, perGroup: powerPerGroup({ modes: set, powers: p }), coreRadiusUm: a };
}

function efFromCumulative(cum: Float64Array, h: number, total: number, r: number): number {
  const x = r / h;
  const j = Math.floor(x);
  if (j >= cum.length - 1) return 1;
  const t = x - j;
  return Math.min(1, Math.max(0, (cum[j] * (1 - t) + cum[j + 1] * t) / total));
}

/** EF of a curve at one radius (linear between the curve's points; the last value beyond its end). */
export function encircledFluxAt(input: { curve: EncircledFluxCurve; radiusUm: number }): number {
  const c = input?.curve;
  if (!c || !Array.isArray(c.rUm) || !Array.isArray(c.ef) || c.rUm.length < 2 || c.rUm.length !== c.ef.length || c.rUm.length > 100_000) {
    throw new InputError('curve', c, 'an encircled-flux curve from encircledFlux');
  }
  for (let i = 0; i < c.rUm.length; i++) {
    requireNumber(`curve.rUm[${i}]`, c.rUm[i], { min: i === 0 ? 0 : c.rUm[i - 1], minInclusive: i === 0, max: 1e5, unit: 'µm' });
    requireNumber(`curve.ef[${i}]`, c.ef[i], { min: 0, max: 1 });
  }
  const r = requireNumber('radiusUm', input.radiusUm, { min: 0, max: 1e5, unit: 'µm' });
  const last = c.rUm.length - 1;
  if (r >= c.rUm[last]) return c.ef[last];
  if (r <= c.rUm[0]) return c.ef[0];
  let lo = 0;
  let hi = last;
  while (hi - lo > 1) {
    const mid = (lo + hi) >> 1;
    if (c.rUm[mid] <= r) lo = mid;
    else hi = mid;
  }
  const t = (r - c.rUm[lo]) / (c.rUm[hi] - c.rUm[lo]);
  return Math.min(1, Math.max(0, c.ef[lo] * (1 - t) + c.ef[hi] * t));
}

// ---------------------------------------------------------------- the template

export interface EfControlPoint {
  radiusUm: number;
  /** EF at this radius must lie within [lower, upper]. */
  lower: number;
  upper: number;
}

export interface EfTemplate {
  id: string;
  coreDiameterUm: number;
  wavelengthNm: number;
  points: EfControlPoint[];
  /** Where the numbers come from, with "from memory" where they were not checked against the text. */
  source: string;
}

/**
 * Encircled-flux templates for 50 µm core fiber (IEC 61280-4-1 Ed. 2.0, 2009, launch condition requirements for
 * loss measurement of 50 µm links; the same template is in TIA-526-14-B). The four control radii 10, 15, 20 and
 * 22 µm and the limits below were written from memory: the text of the standard could not be found to check them.
 */
export const EF_TEMPLATE_SOURCE = 'IEC 61280-4-1 Ed. 2.0 (2009), encircled-flux template for 50 µm fiber; control radii and limits from memory, not checked against the text';

export const EF_TEMPLATES: readonly EfTemplate[] = [
  {
    id: 'ef-50-850',
    coreDiameterUm: 50,
    wavelengthNm: 850,
    points: [
      { radiusUm: 10, lower: 0.2785, upper: 0.335 },
      { radiusUm: 15, lower: 0.598, upper: 0.655 },
      { radiusUm: 20, lower: 0.9105, upper: 0.9225 },
      { radiusUm: 22, lower: 0.969, upper: 0.9772 },
    ],
    source: EF_TEMPLATE_SOURCE,
  },
  {
    id: 'ef-50-1300',
    coreDiameterUm: 50,
    wavelengthNm: 1300,
    points: [
      { radiusUm: 10, lower: 0.2792, upper: 0.3359 },
      { radiusUm: 15, lower: 0.6021, upper: 0.656 },
      { radiusUm: 20, lower: 0.9147, upper: 0.9257 },
      { radiusUm: 22, lower: 0.9715, upper: 0.9795 },
    ],
    source: EF_TEMPLATE_SOURCE,
  },
];

/** How far a core or a wavelength may be from a template's own and still be judged by it. */
const TEMPLATE_CORE_TOLERANCE_UM = 2.5; // 50 ± 2.5 µm: the core tolerance of category A1a fiber (IEC 60793-2-10), from memory
const TEMPLATE_WAVELENGTH_TOLERANCE_NM = 30; // 850 and 1300 nm windows (as WINDOW_TOLERANCE_NM in linkBudget.ts)

/** The template that applies to this core and wavelength, or undefined (no template for 62.5 µm or 1550 nm here). */
export function efTemplateFor(input: { coreDiameterUm: number; wavelengthNm: number }): EfTemplate | undefined {
  const d = requireNumber('coreDiameterUm', input?.coreDiameterUm, { min: 0, minInclusive: false, max: 1000, unit: 'µm' });
  const w = requireNumber('wavelengthNm', input.wavelengthNm, { min: 200, max: 2500, unit: 'nm' });
  return EF_TEMPLATES.find((t) => Math.abs(t.coreDiameterUm - d) <= TEMPLATE_CORE_TOLERANCE_UM && Math.abs(t.wavelengthNm - w) <= TEMPLATE_WAVELENGTH_TOLERANCE_NM);
}

export type EfPointStatus = 'within' | 'too-little-inside' | 'too-much-inside';
export type EfVerdict = 'compliant' | 'underfilled' | 'overfilled' | 'outside both ways';

export interface EfCheck {
  verdict: EfVerdict;
  points: (EfControlPoint & { ef: number; status: EfPointStatus })[];
  /** The control radius that decides the verdict: the one furthest outside its limits (none when compliant). */
  decidingRadiusUm?: number;
  /** Distance outside the limit there (EF units, > 0), or the smallest distance inside any limit when compliant. */
  marginEf: number;
  template: EfTemplate;
}

/**
 * Compares EF with a template. Too much power inside a control radius (EF above the upper limit) means the launch
 * leaves the outer, high-order modes dark: underfilled, and it reads link loss low. Too little (below the lower
 * limit) means the outer modes carry more than the template allows: overfilled, and it reads loss high
 * (IEC 61280-4-1 and TIA-526-14-B use these words the same way).
 */
export function checkEncircledFlux(input: { curve: EncircledFluxCurve; template: EfTemplate }): EfCheck {
  const t = input?.template;
  if (!t || !Array.isArray(t.points) || t.points.length === 0) throw new InputError('template', t, 'an encircled-flux template (EF_TEMPLATES)');
  let worst = 0;
  let decidingRadiusUm: number | undefined;
  let minInside = Number.POSITIVE_INFINITY;
  let low = false;
  let high = false;
  const points = t.points.map((cp) => {
    const lower = requireNumber('template.lower', cp.lower, { min: 0, max: 1 });
    const upper = requireNumber('template.upper', cp.upper, { min: lower, max: 1 });
    const ef = encircledFluxAt({ curve: input.curve, radiusUm: cp.radiusUm });
    let status: EfPointStatus = 'within';
    let out = 0;
    if (ef < lower) {
      status = 'too-little-inside';
      out = lower - ef;
      low = true;
    } else if (ef > upper) {
      status = 'too-much-inside';
      out = ef - upper;
      high = true;
    } else {
      minInside = Math.min(minInside, ef - lower, upper - ef);
    }
    if (out > worst) {
      worst = out;
      decidingRadiusUm = cp.radiusUm;
    }
    return { radiusUm: cp.radiusUm, lower, upper, ef, status };
  });
  const verdict: EfVerdict = low && high ? 'outside both ways' : low ? 'overfilled' : high ? 'underfilled' : 'compliant';
  return { verdict, points, decidingRadiusUm, marginEf: verdict === 'compliant' ? minInside : worst, template: t };
}
