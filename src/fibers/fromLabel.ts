// A fiber from its label: the label gives a cutoff wavelength (fiber or cable) and a mode field
// diameter at a reference wavelength; the mode engine (P1, src/physics/equivalentStepIndex.ts)
// infers the equivalent step-index core radius and NA that reproduce both. This module only adapts
// that result for the fiber library and adds the label-consistency warnings the library shows.
import { ModelError } from '../physics/errors';

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

/** Replaced by the mode engine's equivalentStepIndex as soon as it is in the tree. */
export function deriveStepIndex(_label: LabelValues): DerivedStepIndex {
  throw new ModelError(
    'Label values cannot be turned into a fiber yet: the mode engine’s label conversion is still being built. Use a multimode class or type the core diameter and NA.',
    'equivalent step-index from label',
  );
}
