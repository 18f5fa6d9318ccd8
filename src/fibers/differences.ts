// What differs between two versions of a fiber type, one line per field in a technician's words
// ("Core diameter: 9 µm → 9.1 µm"). Shown when an imported record takes a name already saved for
// another fiber, and when a type was changed in another tab while this one was editing it.
import { CONTENT_FIELDS, type FiberProfile, type FiberTypeInput } from './model';

const PROFILE_WORDS: Record<FiberProfile, string> = { step: 'step-index', graded: 'graded-index', label: 'from the label' };

type ContentField = (typeof CONTENT_FIELDS)[number];

const LABELS: Record<ContentField, [label: string, unit: string]> = {
  name: ['Name', ''],
  profile: ['Profile', ''],
  gradedAlpha: ['Profile exponent α', ''],
  coreDiameterUm: ['Core diameter', 'µm'],
  claddingDiameterUm: ['Cladding diameter', 'µm'],
  na: ['NA', ''],
  coreIndex: ['Core index', ''],
  claddingIndex: ['Cladding index', ''],
  cutoffWavelengthNm: ['Cutoff wavelength', 'nm'],
  cutoffKind: ['Which cutoff', ''],
  mfdUm: ['Mode field diameter', 'µm'],
  mfdWavelengthNm: ['MFD measured at', 'nm'],
  attenuation: ['Attenuation', ''],
  category: ['Category', ''],
  notes: ['Notes', ''],
};

/** Notes longer than this are shown cut, with an ellipsis: the line says that they changed, not all of them. */
const SHOWN_TEXT_CHARS = 40;

function shown(field: ContentField, v: unknown): string {
  if (v === undefined || v === null || v === '') return '—';
  const unit = LABELS[field][1];
  switch (field) {
    case 'profile':
      return PROFILE_WORDS[v as FiberProfile] ?? String(v);
    case 'cutoffKind':
      return v === 'cable' ? 'cable cutoff' : v === 'fiber' ? 'fiber cutoff' : String(v);
    case 'attenuation':
      return Array.isArray(v) && v.length > 0
        ? v.map((a: { wavelengthNm?: unknown; dbPerKm?: unknown }) => `${String(a?.wavelengthNm)} nm ${String(a?.dbPerKm)} dB/km`).join(', ')
        : 'none';
    case 'name':
    case 'notes': {
      const s = String(v);
      return `“${s.length > SHOWN_TEXT_CHARS ? s.slice(0, SHOWN_TEXT_CHARS) + '…' : s}”`;
    }
    default:
      return unit ? `${String(v)} ${unit}` : String(v);
  }
}

function same(a: unknown, b: unknown): boolean {
  const empty = (v: unknown) => v === undefined || v === null || v === '';
  if (empty(a) && empty(b)) return true;
  return JSON.stringify(a) === JSON.stringify(b);
}

/** One line per field that differs, in the fixed order of CONTENT_FIELDS: "Label: before → after". */
export function fieldChanges(from: Partial<FiberTypeInput>, to: Partial<FiberTypeInput>, opts: { ignoreName?: boolean } = {}): string[] {
  const lines: string[] = [];
  for (const f of CONTENT_FIELDS) {
    if (opts.ignoreName && f === 'name') continue;
    const a = (from as Record<string, unknown>)[f];
    const b = (to as Record<string, unknown>)[f];
    if (!same(a, b)) lines.push(`${LABELS[f][0]}: ${shown(f, a)} → ${shown(f, b)}`);
  }
  return lines;
}
