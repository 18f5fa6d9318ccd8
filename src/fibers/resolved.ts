// The one shape every calculator receives when a person picks a fiber (CONTRACTS.md, "Fiber choice").
// Whatever the source — a saved type, a standard category, typed values or a label — the picker turns it
// into this record so a screen never needs to know where the numbers came from, only the notes to show.

export interface ResolvedFiber {
  /** Shown to the user. */
  name: string;
  origin: 'typed' | 'category' | 'saved' | 'label';
  profile: 'step' | 'graded';
  /** Graded-index α (≈ 2 for the OM classes). */
  gradedAlpha?: number;
  coreRadiusUm: number;
  na: number;
  claddingDiameterUm: number;
  cutoffWavelengthNm?: number;
  cutoffKind?: 'fiber' | 'cable';
  mfdUm?: number;
  mfdWavelengthNm?: number;
  attenuationDbPerKm: { wavelengthNm: number; dbPerKm: number }[];
  /** e.g. 'G.652.D', 'OM3'. */
  category?: string;
  /** Derivation notes to show, e.g. "equivalent step-index from label". */
  notes: string[];
}
