// The add/edit form's state as typed text, and its conversion to a FiberTypeInput.
// Pure (no DOM): the screen renders it, validate.ts judges the result.
import { InputError } from '../../physics/errors';
import { parseQuantity, type QuantityKind } from '../../physics/units';
import type { FiberField, FiberProfile, FiberType, FiberTypeInput } from '../../fibers/model';
import type { CategoryPreset } from '../../fibers/presets';
import { validateInput, type FieldErrors } from '../../fibers/validate';

export interface AttenuationDraft {
  wavelength: string;
  dbPerKm: string;
}

export interface FiberDraft {
  name: string;
  profile: FiberProfile;
  /** 'na' or 'indices': how a step/graded core is described. */
  guidance: 'na' | 'indices';
  gradedAlpha: string;
  coreDiameter: string;
  claddingDiameter: string;
  na: string;
  coreIndex: string;
  claddingIndex: string;
  cutoffWavelength: string;
  cutoffKind: '' | 'fiber' | 'cable';
  mfd: string;
  mfdWavelength: string;
  attenuation: AttenuationDraft[];
  category: string;
  notes: string;
}

export function emptyDraft(profile: FiberProfile = 'step'): FiberDraft {
  return {
    name: '',
    profile,
    guidance: 'na',
    gradedAlpha: profile === 'graded' ? '2' : '',
    coreDiameter: '',
    claddingDiameter: '125',
    na: '',
    coreIndex: '',
    claddingIndex: '',
    cutoffWavelength: '',
    cutoffKind: profile === 'label' ? 'cable' : '',
    mfd: '',
    mfdWavelength: profile === 'label' ? '1310' : '',
    attenuation: [],
    category: '',
    notes: '',
  };
}

const t = (v: number | undefined) => (v === undefined ? '' : String(v));

export function draftFromInput(f: FiberTypeInput): FiberDraft {
  return {
    name: f.name,
    profile: f.profile,
    guidance: f.na === undefined && (f.coreIndex !== undefined || f.claddingIndex !== undefined) ? 'indices' : 'na',
    gradedAlpha: t(f.gradedAlpha),
    coreDiameter: t(f.coreDiameterUm),
    claddingDiameter: t(f.claddingDiameterUm),
    na: t(f.na),
    coreIndex: t(f.coreIndex),
    claddingIndex: t(f.claddingIndex),
    cutoffWavelength: t(f.cutoffWavelengthNm),
    cutoffKind: f.cutoffKind ?? '',
    mfd: t(f.mfdUm),
    mfdWavelength: t(f.mfdWavelengthNm),
    attenuation: f.attenuation.map((a) => ({ wavelength: String(a.wavelengthNm), dbPerKm: String(a.dbPerKm) })),
    category: f.category ?? '',
    notes: f.notes,
  };
}

export function draftFromRecord(r: FiberType): FiberDraft {
  return draftFromInput(r);
}

/** A preset cloned into an editable type: single-mode as label values, multimode as core + NA. */
export function draftFromPreset(p: CategoryPreset): FiberDraft {
  const d = emptyDraft(p.kind === 'single-mode' ? 'label' : p.profile.value);
  d.name = `My ${p.category}`;
  d.category = p.category;
  d.claddingDiameter = String(p.claddingDiameterUm.value);
  if (p.kind === 'single-mode') {
    d.cutoffWavelength = t(p.cutoffWavelengthNm?.value);
    d.cutoffKind = p.cutoffKind ?? 'cable';
    d.mfd = t(p.mfdUm?.value);
    d.mfdWavelength = t(p.mfdWavelengthNm);
  } else {
    d.coreDiameter = t(p.coreDiameterUm?.value);
    d.na = t(p.na?.value);
    d.gradedAlpha = t(p.gradedAlpha?.value ?? 2);
  }
  d.attenuation = p.attenuationDbPerKm.map((a) => ({ wavelength: String(a.value.wavelengthNm), dbPerKm: String(a.value.dbPerKm) }));
  d.notes = `Cloned from the ${p.category} preset (${p.standard}); category values, not measured on this fiber.`;
  return d;
}

function num(text: string, field: FiberField, kind: QuantityKind, errors: FieldErrors): number | undefined {
  if (text.trim() === '') return undefined;
  try {
    return parseQuantity(field, text, kind).value;
  } catch (e) {
    if (e instanceof InputError) errors[field] = `Expected ${e.allowed}${e.hint ? `: ${e.hint}` : ''}.`;
    else throw e;
    return undefined;
  }
}

export interface DraftResult {
  input?: FiberTypeInput;
  errors: FieldErrors;
}

/** Parses the typed text (units accepted: "1,31 µm", "62.5 um") and validates the result. */
export function draftToInput(d: FiberDraft): DraftResult {
  const errors: FieldErrors = {};
  const usesCore = d.profile !== 'label';
  const raw: Record<string, unknown> = {
    name: d.name,
    profile: d.profile,
    coreDiameterUm: num(d.coreDiameter, 'coreDiameterUm', 'size', errors),
    claddingDiameterUm: num(d.claddingDiameter, 'claddingDiameterUm', 'size', errors),
    cutoffWavelengthNm: num(d.cutoffWavelength, 'cutoffWavelengthNm', 'wavelength', errors),
    cutoffKind: d.cutoffKind === '' ? undefined : d.cutoffKind,
    mfdUm: num(d.mfd, 'mfdUm', 'size', errors),
    mfdWavelengthNm: num(d.mfdWavelength, 'mfdWavelengthNm', 'wavelength', errors),
    category: d.category === '' ? undefined : d.category,
    notes: d.notes,
  };
  if (d.profile === 'graded') raw.gradedAlpha = num(d.gradedAlpha, 'gradedAlpha', 'plain', errors);
  if (usesCore && d.guidance === 'na') raw.na = num(d.na, 'na', 'plain', errors);
  if (usesCore && d.guidance === 'indices') {
    raw.coreIndex = num(d.coreIndex, 'coreIndex', 'plain', errors);
    raw.claddingIndex = num(d.claddingIndex, 'claddingIndex', 'plain', errors);
  }
  const att: { wavelengthNm: number; dbPerKm: number }[] = [];
  d.attenuation.forEach((row, i) => {
    if (row.wavelength.trim() === '' && row.dbPerKm.trim() === '') return;
    const e: FieldErrors = {};
    const w = num(row.wavelength, 'attenuation', 'wavelength', e);
    const a = num(row.dbPerKm, 'attenuation', 'plain', e);
    if (e.attenuation || w === undefined || a === undefined) errors.attenuation ??= `Attenuation row ${i + 1}: give both the wavelength (nm) and the loss (dB/km) as numbers.`;
    else att.push({ wavelengthNm: w, dbPerKm: a });
  });
  raw.attenuation = att;
  const v = validateInput(raw);
  const all: FieldErrors = { ...(v.ok ? {} : v.errors), ...errors };
  if (Object.keys(all).length > 0) return { errors: all };
  return { input: v.ok ? v.value : undefined, errors: {} };
}
