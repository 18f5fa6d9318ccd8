// A fiber from its label: the equivalent step-index core radius and NA that reproduce the label's
// cutoff wavelength and mode field diameter, so every calculator can work at any wavelength.
import { InputError, ModelError, requirePositive, requireWavelengthNm } from './errors';
import { MAX_CORE_RADIUS_UM, NM_PER_UM } from './fiber';
import { LP11_CUTOFF_V } from './lpModes';
import { modeFieldDiameterUm, petermann2SpotRatio } from './modeField';
import { singleModeCheck, type SingleModeCheck } from './singleMode';

export type CutoffKind = 'fiber' | 'cable';

/**
 * How far the theoretical (step-index, V = 2.405) LP11 cutoff sits above a measured fiber cutoff, nm.
 * Common practice, rough: the fiber-cutoff measurement (ITU-T G.650.1, 2 m of fiber with a loop)
 * calls LP11 cut off once it is lossy enough to vanish over that length, which happens a few tens of
 * nm before its theoretical cutoff; the figure depends on the real index profile and the coating.
 */
export const THEORETICAL_ABOVE_FIBER_CUTOFF_NM = 30;
/**
 * How far a cable cutoff sits below the fiber cutoff of the same fiber, nm. Common practice, rough:
 * the cable-cutoff measurement (ITU-T G.650.1, 22 m of cabled fiber) strips LP11 over a longer length
 * and with cabling bends, typically some tens of nm (30–100 nm) below the 2 m fiber cutoff.
 */
export const CABLE_BELOW_FIBER_CUTOFF_NM = 50;
/** MFD accepted, µm: far beyond any single-mode fiber at both ends. */
export const LABEL_MFD_MIN_UM = 1;
export const LABEL_MFD_MAX_UM = 50;
/** NA range that looks like a real single-mode fiber (common practice); outside it we warn. */
const TYPICAL_SM_NA_MIN = 0.08;
const TYPICAL_SM_NA_MAX = 0.3;
/** A typed core diameter further than this from the inferred one earns a warning. */
const CORE_DIAMETER_MISMATCH = 0.2;

export interface EquivalentStepIndexInput {
  cutoffWavelengthNm: number;
  cutoffKind: CutoffKind;
  mfdUm: number;
  mfdWavelengthNm: number;
  /** Optional nominal core diameter from the label: only compared, never used to fit. */
  coreDiameterUm?: number;
}

export interface EquivalentStepIndex {
  coreRadiusUm: number;
  na: number;
  /** The step-index LP11 cutoff the fit reproduces (label cutoff + offsets), nm. */
  theoreticalCutoffWavelengthNm: number;
  /** V at the MFD reference wavelength. */
  vAtMfdWavelength: number;
  /** How the values were derived, in plain words. */
  notes: string[];
  /** Physically odd inputs: the fit is made, but the user should look twice. */
  warnings: string[];
}

function requireCutoffKind(kind: unknown): CutoffKind {
  if (kind !== 'fiber' && kind !== 'cable') {
    throw new InputError('cutoffKind', kind, "'fiber' or 'cable'", 'say which cutoff the label gives: cable cutoff (λcc) or fiber cutoff (λc)');
  }
  return kind;
}

/**
 * Equivalent step-index fiber from label values. With V(λc,th) = 2.405 (Gloge 1971) tying NA to a,
 * V at the MFD wavelength is fixed: V_ref = 2.405 λc,th/λref, independent of a. The Petermann II MFD
 * (ITU-T G.650.1) is then 2 a s(V_ref), linear in a, so the 1-D fit in a is solved exactly:
 * a = MFD/(2 s(V_ref)), NA = 2.405 λc,th/(2π a).
 */
export function equivalentStepIndex(input: EquivalentStepIndexInput): EquivalentStepIndex {
  const cutoffWavelengthNm = requireWavelengthNm('cutoffWavelengthNm', input?.cutoffWavelengthNm);
  const cutoffKind = requireCutoffKind(input?.cutoffKind);
  const mfdUm = requirePositive('mfdUm', input?.mfdUm, {
    max: LABEL_MFD_MAX_UM,
    unit: 'µm',
    hint: (x) => (x > LABEL_MFD_MAX_UM && x < LABEL_MFD_MAX_UM * 1000 ? `did you give it in nm? ${x} nm = ${x / 1000} µm` : undefined),
  });
  if (mfdUm < LABEL_MFD_MIN_UM) {
    throw new InputError('mfdUm', mfdUm, `a number from ${LABEL_MFD_MIN_UM} to ${LABEL_MFD_MAX_UM} µm`, 'single-mode fibers have MFDs of about 4 to 12 µm; check the unit');
  }
  const mfdWavelengthNm = requireWavelengthNm('mfdWavelengthNm', input?.mfdWavelengthNm);
  const notes: string[] = [];
  const warnings: string[] = [];

  const fiberCutoffNm = cutoffKind === 'cable' ? cutoffWavelengthNm + CABLE_BELOW_FIBER_CUTOFF_NM : cutoffWavelengthNm;
  const theoreticalCutoffWavelengthNm = fiberCutoffNm + THEORETICAL_ABOVE_FIBER_CUTOFF_NM;
  if (cutoffKind === 'cable') {
    notes.push(
      `The label gives a cable cutoff (${cutoffWavelengthNm} nm, 22 m of cable). A fiber cutoff (2 m) is typically some tens of nm higher; we take ${fiberCutoffNm} nm (+${CABLE_BELOW_FIBER_CUTOFF_NM} nm, common practice).`,
    );
  } else {
    notes.push(`The label gives a fiber cutoff (${cutoffWavelengthNm} nm, measured on 2 m of fiber).`);
  }
  notes.push(
    `The theoretical step-index LP11 cutoff (V = 2.405) sits above a measured cutoff, since LP11 is already lost over the test length just before it; we take ${theoreticalCutoffWavelengthNm} nm (+${THEORETICAL_ABOVE_FIBER_CUTOFF_NM} nm, common practice).`,
  );

  // ≥ 2.405 × 230/2500 ≈ 0.22 for any accepted wavelengths, so always above LP_MIN_V.
  const vAtMfdWavelength = (LP11_CUTOFF_V * theoreticalCutoffWavelengthNm) / mfdWavelengthNm;
  const spot = petermann2SpotRatio(vAtMfdWavelength);
  const coreRadiusUm = mfdUm / (2 * spot);
  const na = (LP11_CUTOFF_V * theoreticalCutoffWavelengthNm) / (2 * Math.PI * coreRadiusUm * NM_PER_UM);
  if (!(na < 1) || coreRadiusUm > MAX_CORE_RADIUS_UM) {
    throw new ModelError(
      `No step-index fiber has an MFD of ${mfdUm} µm at ${mfdWavelengthNm} nm together with a ${cutoffWavelengthNm} nm cutoff: it would need NA = ${na.toFixed(2)}.`,
      'equivalent step-index',
      'a single-mode label usually reads a cutoff of 1150–1330 nm and an MFD of 8–10.5 µm at 1310 nm; check for a typing slip',
    );
  }
  notes.push(
    `Fitted core radius ${coreRadiusUm.toFixed(2)} µm (diameter ${(2 * coreRadiusUm).toFixed(2)} µm) and NA ${na.toFixed(4)} reproduce that cutoff and the Petermann II MFD of ${mfdUm} µm at ${mfdWavelengthNm} nm (V = ${vAtMfdWavelength.toFixed(3)} there).`,
  );

  if (mfdWavelengthNm <= cutoffWavelengthNm) {
    warnings.push(`The MFD is quoted at ${mfdWavelengthNm} nm, at or below the ${cutoffWavelengthNm} nm cutoff: MFDs are normally specified where the fiber is single-mode.`);
  }
  if (na > TYPICAL_SM_NA_MAX || na < TYPICAL_SM_NA_MIN) {
    warnings.push(`The fitted NA ${na.toFixed(3)} is unusual for a single-mode fiber (typically ${TYPICAL_SM_NA_MIN}–${TYPICAL_SM_NA_MAX}); check the label values.`);
  }
  if (vAtMfdWavelength < 1.2) {
    warnings.push(`V = ${vAtMfdWavelength.toFixed(2)} at ${mfdWavelengthNm} nm is low: the field reaches far into the cladding and such a fiber would be very sensitive to bends.`);
  }
  if (input.coreDiameterUm !== undefined) {
    const typed = requirePositive('coreDiameterUm', input.coreDiameterUm, { max: 2 * MAX_CORE_RADIUS_UM, unit: 'µm' });
    const mismatch = Math.abs(typed / (2 * coreRadiusUm) - 1);
    if (mismatch > CORE_DIAMETER_MISMATCH) {
      warnings.push(
        `The label's core diameter ${typed} µm differs by ${(mismatch * 100).toFixed(0)} % from the equivalent step-index one (${(2 * coreRadiusUm).toFixed(2)} µm). That is common for graded or trench profiles: the equivalent fiber matches the cutoff and MFD, not the physical core.`,
      );
    }
  }
  return { coreRadiusUm, na, theoreticalCutoffWavelengthNm, vAtMfdWavelength, notes, warnings };
}

export type LabelVerdict = 'single-mode' | 'single-mode-in-practice' | 'not-single-mode';

export interface LabelCheck {
  verdict: LabelVerdict;
  /** The reasons, in plain words, in the order an inspector would give them. */
  reasons: string[];
  fiber: EquivalentStepIndex;
  check: SingleModeCheck;
  /** Petermann II MFD of the equivalent fiber at the system wavelength, µm. */
  mfdAtWavelengthUm: number;
}

/** Closer than this to the label's cutoff, the verdict carries a caution (common practice, rough). */
export const CLOSE_TO_CUTOFF_NM = 30;

/**
 * The inspector's flow: a fiber with this label, used at this wavelength — single-mode or not, and why.
 * The label's (measured) cutoff decides in practice; the equivalent step-index fiber gives the
 * theoretical mode count and the MFD at the system wavelength.
 */
export function checkLabel(input: EquivalentStepIndexInput & { wavelengthNm: number }): LabelCheck {
  const wavelengthNm = requireWavelengthNm('wavelengthNm', input?.wavelengthNm);
  const fiber = equivalentStepIndex(input);
  const check = singleModeCheck({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm });
  const mfdAtWavelengthUm = modeFieldDiameterUm({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm, definition: 'petermann2' }).mfdUm;
  const kindText = input.cutoffKind === 'cable' ? 'cable cutoff' : 'fiber cutoff';
  const labelCutoff = input.cutoffWavelengthNm;
  const margin = wavelengthNm - labelCutoff;
  const reasons: string[] = [];
  let verdict: LabelVerdict;
  if (margin <= 0) {
    verdict = 'not-single-mode';
    reasons.push(`${wavelengthNm} nm is at or below the label's ${kindText} of ${labelCutoff} nm, so LP11 can carry light here.`);
    reasons.push(`The equivalent step-index fiber guides ${check.lpModeCount} LP modes at ${wavelengthNm} nm (${check.totalModeCount} counting polarizations); expect modal noise and unstable loss readings.`);
  } else if (!check.singleMode) {
    verdict = 'single-mode-in-practice';
    reasons.push(`${wavelengthNm} nm is ${margin.toFixed(0)} nm above the label's ${kindText} of ${labelCutoff} nm, so the fiber counts as single-mode here.`);
    reasons.push(`In theory LP11 is still guided (V = ${check.v.toFixed(2)} > 2.405), but so weakly that it is lost within metres; that is what the measured cutoff means.`);
  } else {
    verdict = 'single-mode';
    reasons.push(`${wavelengthNm} nm is ${margin.toFixed(0)} nm above the label's ${kindText} of ${labelCutoff} nm.`);
    reasons.push(`Only LP01 is guided: V = ${check.v.toFixed(2)}, ${(Math.abs(check.relativeDistanceToCutoff) * 100).toFixed(0)} % below the LP11 cutoff V = 2.405.`);
  }
  if (margin > 0 && margin < CLOSE_TO_CUTOFF_NM) {
    reasons.push(`That is within ${CLOSE_TO_CUTOFF_NM} nm of the cutoff: short jumpers or loosely coiled fiber may still carry some LP11.`);
  }
  reasons.push(`Mode field diameter at ${wavelengthNm} nm: ${mfdAtWavelengthUm.toFixed(2)} µm (Petermann II, equivalent step-index fiber).`);
  for (const w of fiber.warnings) reasons.push(w);
  return { verdict, reasons, fiber, check, mfdAtWavelengthUm };
}
