// A fiber from its label: the label gives a cutoff wavelength (fiber or cable) and a mode field
// diameter at a reference wavelength; the mode engine (src/physics/equivalentStepIndex.ts)
// infers the equivalent step-index core radius and NA that reproduce both. This module only adapts
// that result for the fiber library and adds the label-consistency warnings the library shows.
import { equivalentStepIndex } from '../physics';

export interface LabelValues {
  cutoffWavelengthNm: number;
  cutoffKind: 'fiber' | 'cable';
  mfdUm: number;
  mfdWavelengthNm: number;
  /** Optional label core diameter, only used to warn when it disagrees with the derived one. */
  coreDiameterUm?: number;
}

export interface DerivedStepIndex {
  coreRadiusUm: number;
  na: number;
  /** What was derived and how, in plain words. */
  notes: string[];
  /** Label values that do not sit well together, in plain words. */
  warnings: string[];
}

/** The mode engine’s fit (equivalentStepIndex): cutoff + MFD → equivalent step-index a and NA. */
export function deriveStepIndex(label: LabelValues): DerivedStepIndex {
  const r = equivalentStepIndex(label);
  return { coreRadiusUm: r.coreRadiusUm, na: r.na, notes: r.notes, warnings: r.warnings };
}
