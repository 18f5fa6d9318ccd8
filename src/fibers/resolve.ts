// Turns each way of choosing a fiber into the one ResolvedFiber every calculator reads.
// Pure functions (no DOM, no store): the picker and the library call them, the tests call them.
import { InputError, numericalAperture, requireNumber, requirePositive, requireWavelengthNm } from '../physics';
import type { ResolvedFiber } from './resolved';
import { findPreset, type CategoryPreset, type FiberKind } from './presets';
import { deriveStepIndex, type LabelValues } from './fromLabel';
import type { FiberType } from './model';

/** Plausible size limits for a silica fiber; anything outside is a typing slip. Common practice. */
export const CORE_DIAMETER_MAX_UM = 1000;
export const CLADDING_DIAMETER_MAX_UM = 3000;
/** NA must be below 1 by definition (NA = sin of the acceptance half-angle in air). */
export const NA_MAX_EXCLUSIVE = 1;
/** Graded-index exponent: 1 (triangular) to 20 (close to a step); common practice. */
export const GRADED_ALPHA_MIN = 1;
export const GRADED_ALPHA_MAX = 20;
/** The nominal cladding of telecom fiber, used when a label gives none. Common practice. */
export const DEFAULT_CLADDING_DIAMETER_UM = 125;

export interface TypedFiberValues {
  name?: string;
  profile: 'step' | 'graded';
  gradedAlpha?: number;
  coreDiameterUm: number;
  na: number;
  claddingDiameterUm?: number;
}

export function requireCoreDiameterUm(argument: string, value: unknown): number {
  return requirePositive(argument, value, {
    max: CORE_DIAMETER_MAX_UM,
    unit: 'µm',
    hint: (v) => (v > CORE_DIAMETER_MAX_UM ? 'a fiber core is a few µm to a few hundred µm across' : undefined),
  });
}

export function requireNa(argument: string, value: unknown): number {
  return requirePositive(argument, value, {
    max: NA_MAX_EXCLUSIVE,
    maxInclusive: false,
    hint: (v) => (v >= 1 && v < 100 ? `an NA is below 1; did you mean ${v / 100}?` : undefined),
  });
}

function requireCladding(argument: string, value: unknown, coreDiameterUm: number): number {
  const c = requirePositive(argument, value, { max: CLADDING_DIAMETER_MAX_UM, unit: 'µm' });
  if (c <= coreDiameterUm) throw new InputError(argument, c, `more than the core diameter (${coreDiameterUm} µm)`, 'the cladding surrounds the core');
  return c;
}

/** Core diameter + NA (+ profile) typed by hand. */
export function resolveTyped(v: TypedFiberValues, argPrefix = ''): ResolvedFiber {
  const core = requireCoreDiameterUm(`${argPrefix}coreDiameterUm`, v.coreDiameterUm);
  const na = requireNa(`${argPrefix}na`, v.na);
  const cladding = requireCladding(`${argPrefix}claddingDiameterUm`, v.claddingDiameterUm ?? DEFAULT_CLADDING_DIAMETER_UM, core);
  const graded = v.profile === 'graded';
  const alpha = graded
    ? requireNumber(`${argPrefix}gradedAlpha`, v.gradedAlpha ?? 2, { min: GRADED_ALPHA_MIN, max: GRADED_ALPHA_MAX })
    : undefined;
  return {
    name: v.name ?? `Typed: ${core} µm core, NA ${na}${graded ? `, graded α = ${alpha}` : ', step-index'}`,
    origin: 'typed',
    profile: graded ? 'graded' : 'step',
    ...(graded ? { gradedAlpha: alpha } : {}),
    coreRadiusUm: core / 2,
    na,
    claddingDiameterUm: cladding,
    attenuationDbPerKm: [],
    notes: [],
  };
}

/** Label values typed by hand (or a saved "from label" type): derived through the mode engine. */
export function resolveLabel(label: LabelValues & { name?: string; claddingDiameterUm?: number }, argPrefix = ''): ResolvedFiber {
  const cutoff = requireWavelengthNm(`${argPrefix}cutoffWavelengthNm`, label.cutoffWavelengthNm);
  const mfd = requirePositive(`${argPrefix}mfdUm`, label.mfdUm, { max: 100, unit: 'µm' });
  const mfdWl = requireWavelengthNm(`${argPrefix}mfdWavelengthNm`, label.mfdWavelengthNm);
  if (label.cutoffKind !== 'fiber' && label.cutoffKind !== 'cable') {
    throw new InputError(`${argPrefix}cutoffKind`, label.cutoffKind, 'fiber cutoff or cable cutoff', 'the label says which one it gives');
  }
  const coreLabel = label.coreDiameterUm === undefined ? undefined : requireCoreDiameterUm(`${argPrefix}coreDiameterUm`, label.coreDiameterUm);
  const derived = deriveStepIndex({ cutoffWavelengthNm: cutoff, cutoffKind: label.cutoffKind, mfdUm: mfd, mfdWavelengthNm: mfdWl, coreDiameterUm: coreLabel });
  const cladding = requireCladding(`${argPrefix}claddingDiameterUm`, label.claddingDiameterUm ?? DEFAULT_CLADDING_DIAMETER_UM, 2 * derived.coreRadiusUm);
  return {
    name: label.name ?? `From label: ${label.cutoffKind} cutoff ${cutoff} nm, MFD ${mfd} µm at ${mfdWl} nm`,
    origin: 'label',
    profile: 'step',
    coreRadiusUm: derived.coreRadiusUm,
    na: derived.na,
    claddingDiameterUm: cladding,
    cutoffWavelengthNm: cutoff,
    cutoffKind: label.cutoffKind,
    mfdUm: mfd,
    mfdWavelengthNm: mfdWl,
    attenuationDbPerKm: [],
    notes: ['Equivalent step-index fiber derived from the label values.', ...derived.notes, ...derived.warnings.map((w) => `Warning: ${w}`)],
  };
}

/** A standard category preset. Single-mode categories go through the label path. */
export function resolvePreset(p: CategoryPreset): ResolvedFiber {
  const attenuation = p.attenuationDbPerKm.map((a) => ({ ...a.value }));
  const base = { name: `${p.category} (category preset)`, category: p.category, attenuationDbPerKm: attenuation };
  if (p.kind === 'multimode') {
    const typed = resolveTyped({
      profile: p.profile.value,
      gradedAlpha: p.gradedAlpha?.value,
      coreDiameterUm: p.coreDiameterUm!.value,
      na: p.na!.value,
      claddingDiameterUm: p.claddingDiameterUm.value,
    });
    return { ...typed, ...base, origin: 'category', notes: [`Nominal values of ${p.standard}.`, ...p.notes] };
  }
  const fromLabel = resolveLabel({
    cutoffWavelengthNm: p.cutoffWavelengthNm!.value,
    cutoffKind: p.cutoffKind!,
    mfdUm: p.mfdUm!.value,
    mfdWavelengthNm: p.mfdWavelengthNm!,
    claddingDiameterUm: p.claddingDiameterUm.value,
  });
  return {
    ...fromLabel,
    ...base,
    origin: 'category',
    notes: [
      `Equivalent step-index fiber for ${p.category}: ${p.cutoffKind} cutoff ${p.cutoffWavelengthNm!.value} nm (${p.cutoffWavelengthNm!.source}), MFD ${p.mfdUm!.value} µm at ${p.mfdWavelengthNm} nm (${p.mfdUm!.source}).`,
      ...fromLabel.notes.slice(1),
    ],
  };
}

/** A saved fiber type (already validated by the store). */
export function resolveSaved(r: FiberType): ResolvedFiber {
  const extras = {
    name: r.name,
    origin: 'saved' as const,
    attenuationDbPerKm: r.attenuation.map((a) => ({ ...a })),
    ...(r.category ? { category: r.category } : {}),
  };
  if (r.profile === 'label') {
    const fromLabel = resolveLabel({
      cutoffWavelengthNm: r.cutoffWavelengthNm!,
      cutoffKind: r.cutoffKind!,
      mfdUm: r.mfdUm!,
      mfdWavelengthNm: r.mfdWavelengthNm!,
      coreDiameterUm: r.coreDiameterUm,
      claddingDiameterUm: r.claddingDiameterUm,
    });
    return { ...fromLabel, ...extras };
  }
  const usesIndices = r.na === undefined && r.coreIndex !== undefined && r.claddingIndex !== undefined;
  const na = usesIndices ? numericalAperture({ coreIndex: r.coreIndex!, claddingIndex: r.claddingIndex! }) : r.na!;
  const typed = resolveTyped({ profile: r.profile, gradedAlpha: r.gradedAlpha, coreDiameterUm: r.coreDiameterUm!, na, claddingDiameterUm: r.claddingDiameterUm });
  return {
    ...typed,
    ...extras,
    ...(r.cutoffWavelengthNm !== undefined ? { cutoffWavelengthNm: r.cutoffWavelengthNm, cutoffKind: r.cutoffKind } : {}),
    ...(r.mfdUm !== undefined ? { mfdUm: r.mfdUm, mfdWavelengthNm: r.mfdWavelengthNm } : {}),
    notes: usesIndices ? [`NA = √(n₁² − n₂²) from the saved indices ${r.coreIndex} and ${r.claddingIndex}.`] : [],
  };
}

/** Single-mode or multimode when it is known (label types are single-mode; a category says); else undefined. */
export function kindOfSaved(r: Pick<FiberType, 'profile' | 'category'>): FiberKind | undefined {
  if (r.profile === 'label') return 'single-mode';
  return r.category ? findPreset(r.category)?.kind : undefined;
}
