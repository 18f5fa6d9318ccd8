// The single-mode check: at this wavelength, how many modes does this step-index fiber guide,
// and how far is it from the LP11 cutoff?
import { InputError, requireWavelengthNm } from './errors';
import { naFromDelta, numericalAperture, requireCoreRadiusUm, requireNa, requireRefractiveIndex, NM_PER_UM } from './fiber';
import { LP11_CUTOFF_V, lpModes, lpName, totalModeCount, type LPMode } from './lpModes';

/** One of three ways to give the index contrast. */
export type IndexContrast =
  | { na: number; coreIndex?: number }
  | { coreIndex: number; claddingIndex: number }
  | { coreIndex: number; deltaPercent: number };

export type SingleModeInput = { coreRadiusUm: number; wavelengthNm: number } & IndexContrast;

export interface SingleModeCheck {
  /** Normalized frequency V = 2π a NA / λ. */
  v: number;
  /** The NA used (given, or from the indices). */
  na: number;
  /** True when only LP01 is guided (V < 2.405). */
  singleMode: boolean;
  /** Theoretical LP11 cutoff wavelength λc = 2π a NA / 2.405, nm. */
  lp11CutoffWavelengthNm: number;
  /** Guided LP modes (LP01, LP11, …). */
  lpModeCount: number;
  /** Exact (vector) mode families: HE11 counts 1; TE01, TM01, HE21 count 3; … */
  vectorFamilyCount: number;
  /** All modes with their degeneracy (both polarizations, both orientations). */
  totalModeCount: number;
  /** The guided modes, b descending. */
  modes: LPMode[];
  /** (V − 2.405)/2.405: negative below the LP11 cutoff (single-mode), positive above it. */
  relativeDistanceToCutoff: number;
  /** λ − λc, nm: positive when the wavelength is above the cutoff wavelength (single-mode). */
  wavelengthMarginNm: number;
  /** The answer in plain words. */
  summary: string;
}

/** Resolves the NA from any of the three accepted forms, naming the argument at fault. */
export function resolveNa(input: IndexContrast): number {
  if (input === null || typeof input !== 'object') throw new InputError('na', input, 'an NA, core and cladding indices, or core index and Δ');
  const given = input as Partial<{ na: number; coreIndex: number; claddingIndex: number; deltaPercent: number }>;
  const hasNa = given.na !== undefined;
  const hasCladding = given.claddingIndex !== undefined;
  const hasDelta = given.deltaPercent !== undefined;
  const forms = [hasNa, hasCladding, hasDelta].filter(Boolean).length;
  if (forms === 0) {
    throw new InputError('na', undefined, 'an NA, or core and cladding indices, or a core index and Δ', 'give one way of stating the index contrast');
  }
  if (forms > 1) {
    throw new InputError(hasNa ? 'na' : 'claddingIndex', hasNa ? given.na : given.claddingIndex, 'only one of: NA; core and cladding indices; core index and Δ', 'the values could disagree, so give just one form');
  }
  if (hasNa) {
    // A core index given beside the NA is only validated: NA < 1 ≤ n1, so it cannot exceed it.
    if (given.coreIndex !== undefined) requireRefractiveIndex('coreIndex', given.coreIndex);
    return requireNa('na', given.na);
  }
  if (hasCladding) return numericalAperture({ coreIndex: given.coreIndex as number, claddingIndex: given.claddingIndex as number });
  return naFromDelta({ coreIndex: given.coreIndex as number, deltaPercent: given.deltaPercent as number });
}

/** Vector families per LP mode: 1 for LP0m (HE1m), 3 for LP1m (TE0m, TM0m, HE2m), 2 otherwise (Gloge 1971). */
function familyCount(mode: LPMode): number {
  return mode.vectorModes.length;
}

function percent(x: number): string {
  const p = Math.abs(x) * 100;
  return p >= 10 ? p.toFixed(0) : p >= 1 ? p.toFixed(1) : p.toFixed(2);
}

function modeList(modes: readonly LPMode[]): string {
  const names = modes.map((m) => lpName(m.l, m.m));
  return names.length <= 6 ? names.join(', ') : `${names.slice(0, 5).join(', ')} and ${names.length - 5} more`;
}

/**
 * The inspector's question answered: a step-index fiber of core radius a and this index contrast,
 * used at this wavelength — how many modes, and how far from the LP11 cutoff (V = 2.405, the first
 * zero of J_0; Gloge 1971)?
 */
export function singleModeCheck(input: SingleModeInput): SingleModeCheck {
  const coreRadiusUm = requireCoreRadiusUm('coreRadiusUm', input?.coreRadiusUm);
  const wavelengthNm = requireWavelengthNm('wavelengthNm', input?.wavelengthNm);
  const na = resolveNa(input);
  const v = (2 * Math.PI * coreRadiusUm * na * NM_PER_UM) / wavelengthNm;
  const modes = lpModes(v);
  const lp11CutoffWavelengthNm = (2 * Math.PI * coreRadiusUm * na * NM_PER_UM) / LP11_CUTOFF_V;
  const singleMode = modes.length === 1;
  const relative = (v - LP11_CUTOFF_V) / LP11_CUTOFF_V;
  const margin = wavelengthNm - lp11CutoffWavelengthNm;
  const total = totalModeCount(modes);
  const vText = `V = ${v.toFixed(2)}`;
  const cutoffText = `the LP11 cutoff V = 2.405`;
  let summary: string;
  if (singleMode) {
    summary =
      `${vText}, ${percent(relative)} % below ${cutoffText}: single-mode. Only LP01 (HE11, two polarizations) is guided; ` +
      `LP11 would appear below ${lp11CutoffWavelengthNm.toFixed(0)} nm, ${Math.abs(margin).toFixed(0)} nm shorter than ${wavelengthNm.toFixed(0)} nm.`;
  } else {
    summary =
      `${vText}, ${percent(relative)} % above ${cutoffText}: not single-mode. ${modes.length} LP modes are guided (${modeList(modes)}), ` +
      `${total} modes counting polarizations and orientations; single-mode only above ${lp11CutoffWavelengthNm.toFixed(0)} nm.`;
  }
  const near = modes.find((m) => m.nearCutoff);
  if (near) summary += ` ${lpName(near.l, near.m)} is right at its cutoff: it is barely guided and easily lost.`;
  return {
    v,
    na,
    singleMode,
    lp11CutoffWavelengthNm,
    lpModeCount: modes.length,
    vectorFamilyCount: modes.reduce((sum, m) => sum + familyCount(m), 0),
    totalModeCount: total,
    modes,
    relativeDistanceToCutoff: relative,
    wavelengthMarginNm: margin,
    summary,
  };
}
