// The saved fiber type: what a technician records once and picks in every calculator.
// This is the shape of schema version 3 of the store (see db.ts for the history) and of
// backup format version 1 (see BACKUP_FORMAT.md). Units are in the field names.

/**
 * How the core is described:
 * - 'step': step-index, core diameter + NA (or indices);
 * - 'graded': graded-index with exponent α, core diameter + NA (or indices);
 * - 'label': only label values (cutoff + MFD at a wavelength); the equivalent step-index
 *   core radius and NA are derived by the mode engine each time it is used.
 */
export type FiberProfile = 'step' | 'graded' | 'label';

export interface AttenuationAt {
  wavelengthNm: number;
  dbPerKm: number;
}

/** What a person enters: everything but the id and the times. */
export interface FiberTypeInput {
  name: string;
  profile: FiberProfile;
  /** Graded-index exponent; present only for 'graded'. */
  gradedAlpha?: number;
  /** Required for 'step' and 'graded'; optional on a label (checked against the derived value). */
  coreDiameterUm?: number;
  claddingDiameterUm: number;
  /** NA, or else both indices, for 'step' and 'graded'. Not used by 'label'. */
  na?: number;
  coreIndex?: number;
  claddingIndex?: number;
  /** Required for 'label'; optional otherwise (then cutoffKind must be given with it). */
  cutoffWavelengthNm?: number;
  cutoffKind?: 'fiber' | 'cable';
  /** Required for 'label'; optional otherwise (both or neither). */
  mfdUm?: number;
  mfdWavelengthNm?: number;
  attenuation: AttenuationAt[];
  /** A standard category code from presets.ts, e.g. 'G.652.D'. */
  category?: string;
  notes: string;
}

export interface FiberType extends FiberTypeInput {
  /** Random, URL-safe, never reused. */
  id: string;
  /** Milliseconds since 1970 (UTC). */
  createdAt: number;
  updatedAt: number;
  /** Lower-cased, space-normalised name, for search and duplicate detection (derived, stored for the index). */
  nameKey: string;
}

/** Fields a form can show an error beside. */
export type FiberField = keyof FiberType | 'record';

export function nameKeyOf(name: string): string {
  return name.normalize('NFKC').trim().replace(/\s+/g, ' ').toLowerCase();
}

/** A new random id: 16 bytes of crypto randomness in base-36-like hex. */
export function newFiberId(): string {
  const bytes = new Uint8Array(16);
  globalThis.crypto.getRandomValues(bytes);
  return 'ft_' + Array.from(bytes, (b) => b.toString(16).padStart(2, '0')).join('');
}

/** The fields that define a fiber's content (not its identity or times), in a fixed order. */
export const CONTENT_FIELDS = [
  'name',
  'profile',
  'gradedAlpha',
  'coreDiameterUm',
  'claddingDiameterUm',
  'na',
  'coreIndex',
  'claddingIndex',
  'cutoffWavelengthNm',
  'cutoffKind',
  'mfdUm',
  'mfdWavelengthNm',
  'attenuation',
  'category',
  'notes',
] as const satisfies readonly (keyof FiberTypeInput)[];

/** A stable text of the content, for "same fiber under another id" duplicate detection. */
export function contentSignature(f: FiberTypeInput): string {
  const parts = CONTENT_FIELDS.map((k) => {
    const v = k === 'name' && typeof f.name === 'string' ? nameKeyOf(f.name) : f[k]; // a damaged record may have no name
    return v === undefined ? null : v;
  });
  return JSON.stringify(parts);
}

/** The input part of a stored record (for editing and duplicating). */
export function inputOf(f: FiberType): FiberTypeInput {
  const out: Record<string, unknown> = {};
  for (const k of CONTENT_FIELDS) if (f[k] !== undefined) out[k] = k === 'attenuation' ? (Array.isArray(f.attenuation) ? f.attenuation.map((a) => ({ ...a })) : []) : f[k];
  return out as unknown as FiberTypeInput;
}
