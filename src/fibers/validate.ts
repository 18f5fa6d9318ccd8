// Validation at the edge of the store: every write and every imported record passes here first.
// The result names each wrong field in plain words, so the form can show the reason beside it.
// A record that fails is never written (db.ts calls validateRecord inside every write).
import { CORE_DIAMETER_MAX_UM, CLADDING_DIAMETER_MAX_UM, GRADED_ALPHA_MAX, GRADED_ALPHA_MIN } from './resolve';
import { WAVELENGTH_MAX_NM, WAVELENGTH_MIN_NM } from '../physics/errors';
import { findPreset } from './presets';
import { nameKeyOf, type AttenuationAt, type FiberField, type FiberProfile, type FiberType, type FiberTypeInput } from './model';

export const NAME_MAX_CHARS = 80;
export const NOTES_MAX_CHARS = 2000;
export const ATTENUATION_MAX_POINTS = 20;
/** Highest attenuation accepted: 1000 dB/km covers plastic and lossy test fibers. Common practice. */
export const ATTENUATION_MAX_DB_PER_KM = 1000;
/** Refractive index range of optical glasses and polymers. Common practice. */
export const INDEX_MIN = 1;
export const INDEX_MAX = 4;
export const MFD_MAX_UM = 100;
const ID_RE = /^[A-Za-z0-9_-]{1,64}$/;
/** Control characters other than tab and newline: never part of a name or a note. */
const CONTROL_RE = /[\u0000-\u0008\u000b-\u001f\u007f-\u009f\u2028\u2029]/;
const NAME_CONTROL_RE = /[\u0000-\u001f\u007f-\u009f\u2028\u2029]/;
/**
 * Text that looks like markup (“<b”, “</”, “<!”, “<?”) or a script address. Names are always shown as
 * text, but a name that looks like code is almost surely not a fiber's name (a pasted page, a crafted
 * file), so it is refused rather than stored. “Tray <3>” or “A & B” remain allowed.
 */
const MARKUP_RE = /<\s*[a-z!/?]|javascript:|data:text\/html/i;
export const EARLIEST_TIME_MS = Date.UTC(2000, 0, 1);

export type FieldErrors = Partial<Record<FiberField, string>>;

export type Validation<T> = { ok: true; value: T } | { ok: false; errors: FieldErrors };

const PROFILES: readonly FiberProfile[] = ['step', 'graded', 'label'];

function isNum(v: unknown): v is number {
  return typeof v === 'number' && Number.isFinite(v);
}

class Collector {
  errors: FieldErrors = {};
  out: Record<string, unknown> = {};
  constructor(private readonly src: Record<string, unknown>) {}
  fail(field: FiberField, msg: string): void {
    if (!this.errors[field]) this.errors[field] = msg;
  }
  has(field: string): boolean {
    return this.src[field] !== undefined && this.src[field] !== null;
  }
  /** A number in [min, max] (exclusive where said), with unit and plain words. */
  num(field: FiberField, what: string, opts: { min: number; max: number; minEx?: boolean; maxEx?: boolean; unit?: string; required: boolean }): number | undefined {
    const v = this.src[field];
    if (v === undefined || v === null || v === '') {
      if (opts.required) this.fail(field, `${what} is needed.`);
      return undefined;
    }
    const u = opts.unit ? ` ${opts.unit}` : '';
    if (!isNum(v)) {
      this.fail(field, `${what} must be a number${u ? ` in${u}` : ''}.`);
      return undefined;
    }
    const low = opts.minEx ? v <= opts.min : v < opts.min;
    const high = opts.maxEx ? v >= opts.max : v > opts.max;
    if (low || high) {
      this.fail(field, `${what} must be ${opts.minEx ? 'more than' : 'at least'} ${opts.min}${u} and ${opts.maxEx ? 'less than' : 'at most'} ${opts.max}${u}; ${v}${u} was given.`);
      return undefined;
    }
    this.out[field] = v;
    return v;
  }
  absent(field: FiberField, why: string): void {
    if (this.has(field)) this.fail(field, why);
  }
}

/** Checks what a person entered (no id, no times). */
export function validateInput(raw: unknown): Validation<FiberTypeInput> {
  if (raw === null || typeof raw !== 'object' || Array.isArray(raw)) return { ok: false, errors: { record: 'This is not a fiber type record.' } };
  const src = raw as Record<string, unknown>;
  const c = new Collector(src);

  // Name
  const name = src.name;
  if (typeof name !== 'string') c.fail('name', 'A name is needed.');
  else {
    const trimmed = name.normalize('NFC').trim();
    if (trimmed === '') c.fail('name', 'A name is needed.');
    else if (trimmed.length > NAME_MAX_CHARS) c.fail('name', `The name is too long: at most ${NAME_MAX_CHARS} characters (it has ${trimmed.length}).`);
    else if (NAME_CONTROL_RE.test(trimmed)) c.fail('name', 'The name contains invisible control characters or line breaks; type it on one line.');
    else if (MARKUP_RE.test(trimmed)) c.fail('name', 'The name contains text that looks like markup or code (such as “<b>”); use plain words.');
    else c.out.name = trimmed;
  }

  // Profile and core
  const profile = src.profile;
  if (typeof profile !== 'string' || !PROFILES.includes(profile as FiberProfile)) {
    c.fail('profile', 'Choose the index profile: step-index, graded-index, or from the label.');
  } else c.out.profile = profile;
  const isLabel = profile === 'label';
  const isGraded = profile === 'graded';

  const core = c.num('coreDiameterUm', 'The core diameter', { min: 0, minEx: true, max: CORE_DIAMETER_MAX_UM, unit: 'µm', required: !isLabel });
  const cladding = c.num('claddingDiameterUm', 'The cladding diameter', { min: 0, minEx: true, max: CLADDING_DIAMETER_MAX_UM, unit: 'µm', required: true });
  if (core !== undefined && cladding !== undefined && cladding <= core) {
    c.fail('claddingDiameterUm', `The cladding diameter (${cladding} µm) must be larger than the core diameter (${core} µm).`);
  }

  if (isGraded) c.num('gradedAlpha', 'The profile exponent α', { min: GRADED_ALPHA_MIN, max: GRADED_ALPHA_MAX, required: true });
  else c.absent('gradedAlpha', 'A profile exponent α belongs to a graded-index fiber only.');

  // Guidance: NA or both indices (step, graded); none for a label type.
  if (isLabel) {
    c.absent('na', 'A “from label” type gets its NA from the label values; leave NA empty or choose step-index.');
    c.absent('coreIndex', 'A “from label” type has no indices; choose step-index or graded-index to give them.');
    c.absent('claddingIndex', 'A “from label” type has no indices; choose step-index or graded-index to give them.');
  } else if (profile === 'step' || isGraded) {
    const hasNa = c.has('na');
    const hasIdx = c.has('coreIndex') || c.has('claddingIndex');
    if (hasNa && hasIdx) c.fail('na', 'Give the NA or the two refractive indices, not both.');
    else if (hasNa) c.num('na', 'The numerical aperture (NA)', { min: 0, minEx: true, max: 1, maxEx: true, required: true });
    else if (hasIdx) {
      const n1 = c.num('coreIndex', 'The core index', { min: INDEX_MIN, max: INDEX_MAX, required: true });
      const n2 = c.num('claddingIndex', 'The cladding index', { min: INDEX_MIN, max: INDEX_MAX, required: true });
      if (n1 !== undefined && n2 !== undefined && n1 <= n2) c.fail('coreIndex', `The core index (${n1}) must be higher than the cladding index (${n2}) for the fiber to guide light.`);
      // NA = √(n1² − n2²) must stay below 1 (Snyder & Love 1983, definition of NA).
      else if (n1 !== undefined && n2 !== undefined && n1 * n1 - n2 * n2 >= 1) c.fail('coreIndex', `These indices give an NA of 1 or more, which no fiber in air can have; check them.`);
    } else c.fail('na', 'The numerical aperture (NA) is needed, or else the core and cladding indices.');
  }

  // Cutoff and MFD: required on a label type; optional otherwise, but complete when given.
  const cutoff = c.num('cutoffWavelengthNm', 'The cutoff wavelength', { min: WAVELENGTH_MIN_NM, max: WAVELENGTH_MAX_NM, unit: 'nm', required: isLabel });
  const kind = src.cutoffKind;
  if (kind !== undefined && kind !== null) {
    if (kind !== 'fiber' && kind !== 'cable') c.fail('cutoffKind', 'Say whether the cutoff is the fiber cutoff or the cable cutoff.');
    else c.out.cutoffKind = kind;
  }
  if ((cutoff !== undefined || isLabel) && (kind === undefined || kind === null)) c.fail('cutoffKind', 'Say whether the cutoff is the fiber cutoff or the cable cutoff: they differ by tens of nm.');
  if (cutoff === undefined && !c.has('cutoffWavelengthNm') && kind !== undefined && kind !== null && !isLabel) c.fail('cutoffWavelengthNm', 'A cutoff kind is given but no cutoff wavelength.');

  const mfd = c.num('mfdUm', 'The mode field diameter', { min: 0, minEx: true, max: MFD_MAX_UM, unit: 'µm', required: isLabel });
  const mfdWl = c.num('mfdWavelengthNm', 'The wavelength of the MFD', { min: WAVELENGTH_MIN_NM, max: WAVELENGTH_MAX_NM, unit: 'nm', required: isLabel || c.has('mfdUm') });
  if (mfdWl !== undefined && mfd === undefined && !c.has('mfdUm')) c.fail('mfdUm', 'A wavelength for the MFD is given but no MFD.');

  // Attenuation
  const att = src.attenuation ?? [];
  if (!Array.isArray(att)) c.fail('attenuation', 'Attenuation must be a list of wavelength and dB/km pairs.');
  else if (att.length > ATTENUATION_MAX_POINTS) c.fail('attenuation', `At most ${ATTENUATION_MAX_POINTS} attenuation values (${att.length} given).`);
  else {
    const seen = new Set<number>();
    const list: AttenuationAt[] = [];
    att.forEach((a: unknown, i) => {
      const p = a as Partial<AttenuationAt> | null;
      const row = `Attenuation row ${i + 1}`;
      if (!p || typeof p !== 'object') return c.fail('attenuation', `${row} is not a wavelength and dB/km pair.`);
      if (!isNum(p.wavelengthNm) || p.wavelengthNm < WAVELENGTH_MIN_NM || p.wavelengthNm > WAVELENGTH_MAX_NM)
        return c.fail('attenuation', `${row}: the wavelength must be ${WAVELENGTH_MIN_NM} to ${WAVELENGTH_MAX_NM} nm.`);
      if (!isNum(p.dbPerKm) || p.dbPerKm < 0 || p.dbPerKm > ATTENUATION_MAX_DB_PER_KM)
        return c.fail('attenuation', `${row}: the attenuation must be 0 to ${ATTENUATION_MAX_DB_PER_KM} dB/km.`);
      if (seen.has(p.wavelengthNm)) return c.fail('attenuation', `${row}: ${p.wavelengthNm} nm is listed twice.`);
      seen.add(p.wavelengthNm);
      list.push({ wavelengthNm: p.wavelengthNm, dbPerKm: p.dbPerKm });
    });
    c.out.attenuation = list.sort((a, b) => a.wavelengthNm - b.wavelengthNm);
  }

  // Category
  if (c.has('category')) {
    const cat = src.category;
    if (typeof cat !== 'string' || !findPreset(cat)) c.fail('category', 'The category must be one of the standard categories offered (for example G.652.D or OM3).');
    else c.out.category = cat;
  }

  // Notes
  const notes = src.notes ?? '';
  if (typeof notes !== 'string') c.fail('notes', 'Notes must be text.');
  else if (notes.length > NOTES_MAX_CHARS) c.fail('notes', `Notes are too long: at most ${NOTES_MAX_CHARS} characters (${notes.length} given).`);
  else if (CONTROL_RE.test(notes)) c.fail('notes', 'Notes contain invisible control characters.');
  else c.out.notes = notes;

  if (Object.keys(c.errors).length > 0) return { ok: false, errors: c.errors };
  return { ok: true, value: c.out as unknown as FiberTypeInput };
}

/** Checks a whole stored record (every write, every imported record). */
export function validateRecord(raw: unknown): Validation<FiberType> {
  const input = validateInput(raw);
  const errors: FieldErrors = input.ok ? {} : { ...input.errors };
  const src = (raw ?? {}) as Record<string, unknown>;
  if (typeof src.id !== 'string' || !ID_RE.test(src.id)) errors.id = 'The record id is missing or not a plain id (letters, digits, - and _ only).';
  const now = Date.now() + 24 * 3600 * 1000; // one day of clock skew between phones is tolerated
  for (const f of ['createdAt', 'updatedAt'] as const) {
    const t = src[f];
    if (!isNum(t) || t < EARLIEST_TIME_MS || t > now) errors[f] = `The ${f === 'createdAt' ? 'creation' : 'change'} time is missing or not a plausible date.`;
  }
  if (!errors.createdAt && !errors.updatedAt && (src.updatedAt as number) < (src.createdAt as number)) errors.updatedAt = 'The change time is before the creation time.';
  if (!input.ok || Object.keys(errors).length > 0) return { ok: false, errors };
  return {
    ok: true,
    value: { ...input.value, id: src.id as string, createdAt: src.createdAt as number, updatedAt: src.updatedAt as number, nameKey: nameKeyOf(input.value.name) },
  };
}

/** One line per wrong field, for reports. */
export function describeErrors(errors: FieldErrors): string[] {
  return Object.entries(errors).map(([, msg]) => msg as string);
}
