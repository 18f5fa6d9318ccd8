// Link loss budget: a passive link as a list of elements (fiber sections, connector pairs, splices,
// splitters, patch cords, anything else), each costing a loss in dB at each wavelength. Losses of
// elements in series add in dB (definition of the decibel). Each element's loss is a spread
// (lowest / typical / highest to expect); the rule set says which allowance each spread uses and where
// that number comes from. The acceptance value is the sum of the highest allowances: what a measured
// insertion loss must not exceed (the allowance method of TIA-568.3-D, clause on link attenuation;
// common practice for other rule sets).
import { InputError, ModelError, requireInteger, requireNumber, requireWavelengthNm } from './errors';

export type FiberClass = 'single-mode' | 'multimode';
/** Inside plant (premises) or outside plant cable: TIA-568.3-D gives single-mode maxima for each. */
export type PlantKind = 'inside' | 'outside';

export interface AttenuationAt {
  wavelengthNm: number;
  dbPerKm: number;
}

/** Lowest, typical and highest loss to expect for one element, in dB. */
export interface LossSpread {
  minDb: number;
  typicalDb: number;
  maxDb: number;
}

/** A cable maximum attenuation a rule set gives for one fiber class and window. */
export interface FiberMaximum {
  fiberClass: FiberClass;
  /** Absent: applies to both plant kinds. */
  plant?: PlantKind;
  wavelengthNm: number;
  dbPerKm: number;
}

export interface LinkRuleSet {
  id: string;
  name: string;
  /** Where the numbers come from, in plain words, with "from memory" where they were not checked. */
  source: string;
  connectorPairDb: LossSpread;
  connectorPairSource: string;
  spliceDb: LossSpread;
  spliceSource: string;
  /** Splitter excess loss per halving stage (log2 N stages), on top of the ideal 10·log10 N. */
  splitterExcessPerStageDb: LossSpread;
  splitterSource: string;
  /** Cable maxima that raise a fiber section's highest loss; empty: the fiber type's own value is used. */
  fiberMaxima: FiberMaximum[];
  fiberMaximaSource: string;
}

// Cable attenuation maxima per edition. The standards are not freely published; a search of published summaries
// (tester makers' notes, trade articles) confirmed the 0.75 dB per mated connector pair for 568.3-D and the
// 0.5 dB/km single-mode outside-plant and 3.5 dB/km multimode 850 nm figures "per TIA 568" without naming an
// edition; no summary stating the 568.3-D multimode figure was found. Every value not confirmed is marked
// "from memory" here and in the text shown on screen (the rule set's sources are listed under the budget).

/** Single-mode cable maxima, inside plant (premises) and outside plant, at 1310 and 1550 nm: the same in both editions. */
const SINGLE_MODE_CABLE_MAXIMA: FiberMaximum[] = [
  // Inside plant 1.0 dB/km, outside plant 0.5 dB/km at 1310 and 1550 nm: TIA-568-C.3 (2008) and TIA-568.3-D (2016),
  // from memory; the outside-plant 0.5 dB/km "per TIA 568" was confirmed in a published summary (no edition named).
  { fiberClass: 'single-mode', plant: 'inside', wavelengthNm: 1310, dbPerKm: 1.0 },
  { fiberClass: 'single-mode', plant: 'inside', wavelengthNm: 1550, dbPerKm: 1.0 },
  { fiberClass: 'single-mode', plant: 'outside', wavelengthNm: 1310, dbPerKm: 0.5 },
  { fiberClass: 'single-mode', plant: 'outside', wavelengthNm: 1550, dbPerKm: 0.5 },
];

/** TIA-568.3-D (2016) maximum allowances. Only the maxima are the standard's; min and typical are common practice. */
export const TIA_568_3_D: LinkRuleSet = {
  id: 'tia-568.3-d',
  name: 'TIA-568.3-D (2016) maximum allowances',
  source: 'ANSI/TIA-568.3-D (2016), optical fiber cabling and components: maximum loss allowances',
  // 0.75 dB per mated pair: TIA-568.3-D, confirmed in a tester maker's note on that edition. Min/typical: common practice.
  connectorPairDb: { minDb: 0.1, typicalDb: 0.3, maxDb: 0.75 },
  connectorPairSource: 'maximum 0.75 dB per mated connector pair (TIA-568.3-D); lowest 0.1 dB and typical 0.3 dB are common practice',
  // 0.3 dB per splice: TIA-568.3-D, from memory. Min/typical fusion-splice values: common practice.
  spliceDb: { minDb: 0.01, typicalDb: 0.05, maxDb: 0.3 },
  spliceSource: 'maximum 0.3 dB per splice (TIA-568.3-D, from memory); lowest 0.01 dB and typical 0.05 dB for fusion splices are common practice',
  splitterExcessPerStageDb: { minDb: 0.1, typicalDb: 0.3, maxDb: 0.5 },
  splitterSource:
    'TIA-568.3-D gives no splitter allowance: ideal 10·log10 N plus 0.1 / 0.3 / 0.5 dB excess per halving stage (common practice, from memory)',
  fiberMaxima: [
    // Multimode 3.0 / 1.5 dB/km at 850 / 1300 nm: TIA-568.3-D lowered the 850 nm figure from 568-C.3's 3.5 (from memory;
    // not confirmed by any published summary found).
    { fiberClass: 'multimode', wavelengthNm: 850, dbPerKm: 3.0 },
    { fiberClass: 'multimode', wavelengthNm: 1300, dbPerKm: 1.5 },
    ...SINGLE_MODE_CABLE_MAXIMA,
  ],
  fiberMaximaSource:
    'cable maxima of TIA-568.3-D (2016): multimode 3.0 / 1.5 dB/km at 850 / 1300 nm (from memory, not confirmed); single-mode 1.0 dB/km inside plant, 0.5 dB/km outside plant at 1310 and 1550 nm (from memory)',
};

/** TIA-568-C.3 (2008) maximum allowances: the edition before 568.3-D; differs in the multimode 850 nm cable maximum. */
export const TIA_568_C_3: LinkRuleSet = {
  id: 'tia-568-c.3',
  name: 'TIA-568-C.3 (2008) maximum allowances',
  source: 'ANSI/TIA-568-C.3 (2008), optical fiber cabling components: maximum loss allowances (the edition before 568.3-D)',
  // 0.75 dB per mated pair and 0.3 dB per splice: TIA-568-C.3, from memory (the 0.75 dB is quoted "per TIA 568" widely).
  connectorPairDb: { minDb: 0.1, typicalDb: 0.3, maxDb: 0.75 },
  connectorPairSource: 'maximum 0.75 dB per mated connector pair (TIA-568-C.3, from memory); lowest 0.1 dB and typical 0.3 dB are common practice',
  spliceDb: { minDb: 0.01, typicalDb: 0.05, maxDb: 0.3 },
  spliceSource: 'maximum 0.3 dB per splice (TIA-568-C.3, from memory); lowest 0.01 dB and typical 0.05 dB for fusion splices are common practice',
  splitterExcessPerStageDb: { minDb: 0.1, typicalDb: 0.3, maxDb: 0.5 },
  splitterSource:
    'TIA-568-C.3 gives no splitter allowance: ideal 10·log10 N plus 0.1 / 0.3 / 0.5 dB excess per halving stage (common practice, from memory)',
  fiberMaxima: [
    // Multimode 3.5 / 1.5 dB/km at 850 / 1300 nm: TIA-568-C.3, from memory; 3.5 dB/km at 850 nm "per TIA 568" is confirmed
    // in published summaries without an edition.
    { fiberClass: 'multimode', wavelengthNm: 850, dbPerKm: 3.5 },
    { fiberClass: 'multimode', wavelengthNm: 1300, dbPerKm: 1.5 },
    ...SINGLE_MODE_CABLE_MAXIMA,
  ],
  fiberMaximaSource:
    'cable maxima of TIA-568-C.3 (2008): multimode 3.5 / 1.5 dB/km at 850 / 1300 nm (from memory); single-mode 1.0 dB/km inside plant, 0.5 dB/km outside plant at 1310 and 1550 nm (from memory)',
};

/** Typical installed values (common practice): a planning estimate, not an acceptance limit of any standard. */
export const TYPICAL_VALUES: LinkRuleSet = {
  id: 'typical',
  name: 'Typical installed values',
  source: 'typical values for good workmanship, common practice (not a standard)',
  connectorPairDb: { minDb: 0.1, typicalDb: 0.3, maxDb: 0.5 },
  connectorPairSource: 'mated connector pair 0.1 / 0.3 / 0.5 dB, common practice',
  spliceDb: { minDb: 0.01, typicalDb: 0.05, maxDb: 0.1 },
  spliceSource: 'fusion splice 0.01 / 0.05 / 0.1 dB, common practice',
  splitterExcessPerStageDb: { minDb: 0.1, typicalDb: 0.3, maxDb: 0.5 },
  splitterSource: 'ideal 10·log10 N plus 0.1 / 0.3 / 0.5 dB excess per halving stage (common practice, from memory)',
  fiberMaxima: [],
  fiberMaximaSource: 'the fiber type’s own attenuation values',
};

/** Builds the user's own rule set from the allowances they type; the fiber type's attenuation is used as is. */
export function ownRuleSet(values: {
  connectorPairDb: LossSpread;
  spliceDb: LossSpread;
  splitterExcessPerStageDb?: LossSpread;
}): LinkRuleSet {
  const connector = requireSpread('connectorPairDb', values?.connectorPairDb);
  const splice = requireSpread('spliceDb', values?.spliceDb);
  const splitter = values.splitterExcessPerStageDb
    ? requireSpread('splitterExcessPerStageDb', values.splitterExcessPerStageDb)
    : TYPICAL_VALUES.splitterExcessPerStageDb;
  return {
    id: 'own',
    name: 'Your own values',
    source: 'values entered by the user',
    connectorPairDb: connector,
    connectorPairSource: 'entered by the user',
    spliceDb: splice,
    spliceSource: 'entered by the user',
    splitterExcessPerStageDb: splitter,
    splitterSource: values.splitterExcessPerStageDb ? 'entered by the user' : TYPICAL_VALUES.splitterSource,
    fiberMaxima: [],
    fiberMaximaSource: 'the fiber type’s own attenuation values',
  };
}

export const RULE_SETS: readonly LinkRuleSet[] = [TIA_568_3_D, TIA_568_C_3, TYPICAL_VALUES];

export type LinkElement =
  | { kind: 'fiber'; label: string; lengthKm: number; fiberClass: FiberClass; plant?: PlantKind; attenuationDbPerKm: AttenuationAt[] }
  | { kind: 'connectorPair'; label: string; count: number }
  | { kind: 'splice'; label: string; count: number }
  /** Splitter 1×N (or 2×N): ideal 10·log10 N plus excess; `excessDb` replaces the rule set's per-stage excess. */
  | { kind: 'splitter'; label: string; ways: number; excessDb?: LossSpread }
  | { kind: 'patchCord'; label: string; count: number; lengthM: number; fiberClass: FiberClass; attenuationDbPerKm: AttenuationAt[] }
  | { kind: 'other'; label: string; lossDb: LossSpread };

/** Transmitter and receiver limits for one wavelength, all in dBm (from the equipment's data). */
export interface EquipmentSpec {
  wavelengthNm: number;
  txMinDbm: number;
  txMaxDbm: number;
  rxSensitivityDbm: number;
  rxOverloadDbm: number;
}

export interface LinkBudgetInput {
  elements: LinkElement[];
  wavelengthsNm: number[];
  ruleSet: LinkRuleSet;
  /** Margin kept in hand for repairs and ageing, ≥ 0 dB. */
  designMarginDb: number;
  equipment?: EquipmentSpec[];
}

export interface ElementLoss extends LossSpread {
  index: number;
  label: string;
  kind: LinkElement['kind'];
  /** How the numbers were reached, e.g. "2 km × 3.5 dB/km (TIA-568.3-D maximum)". */
  basis: string;
}

export type EquipmentVerdict = 'pass' | 'no-margin' | 'too-little-power' | 'overload';

export interface EquipmentCheck {
  spec: EquipmentSpec;
  /** Weakest transmitter through the highest loss. */
  worstCaseRxDbm: number;
  /** Strongest transmitter through the lowest loss. */
  bestCaseRxDbm: number;
  /** Weakest transmitter minus receiver sensitivity. */
  powerBudgetDb: number;
  /** What is left after the highest loss and the design margin; negative means short. */
  remainingMarginDb: number;
  /** Receiver overload minus the strongest power that can arrive; negative means overload. */
  overloadHeadroomDb: number;
  verdict: EquipmentVerdict;
  /** Plain-words findings, first the verdict, then what to do. */
  findings: string[];
}

export interface WavelengthBudget extends LossSpread {
  wavelengthNm: number;
  elements: ElementLoss[];
  /** Highest expected loss: a measured loss above this fails acceptance. */
  acceptanceDb: number;
  /** Highest loss plus the design margin: what the equipment must cover. */
  withMarginDb: number;
  /** Element with the highest maximum loss (undefined for an empty link). */
  costliest: ElementLoss | undefined;
  equipment?: EquipmentCheck;
}

export interface LinkBudgetResult {
  ruleSet: { id: string; name: string; source: string };
  designMarginDb: number;
  wavelengths: WavelengthBudget[];
  /** Sources and assumptions used, one per line. */
  notes: string[];
}

/** Largest counts and sizes accepted; beyond these the input is surely a slip. Common practice. */
export const MAX_ELEMENT_COUNT = 10_000;
export const MAX_LINK_LENGTH_KM = 20_000;
export const MAX_SPLITTER_WAYS = 1024;
export const MAX_ELEMENT_LOSS_DB = 100;
/**
 * A listed attenuation applies within ±30 nm of its wavelength: the 1300 nm multimode and 1310 nm
 * single-mode figures name the same transmission window. Common practice.
 */
export const WINDOW_TOLERANCE_NM = 30;

function requireSpread(argument: string, s: unknown): LossSpread {
  const v = s as Partial<LossSpread> | undefined;
  const spec = { min: 0, max: MAX_ELEMENT_LOSS_DB, unit: 'dB' };
  const minDb = requireNumber(`${argument}.minDb`, v?.minDb, spec);
  const typicalDb = requireNumber(`${argument}.typicalDb`, v?.typicalDb, spec);
  const maxDb = requireNumber(`${argument}.maxDb`, v?.maxDb, spec);
  if (!(minDb <= typicalDb && typicalDb <= maxDb)) {
    throw new InputError(argument, `${minDb} / ${typicalDb} / ${maxDb} dB`, 'lowest ≤ typical ≤ highest', 'the three values are out of order');
  }
  return { minDb, typicalDb, maxDb };
}

function scale(s: LossSpread, k: number): LossSpread {
  return { minDb: s.minDb * k, typicalDb: s.typicalDb * k, maxDb: s.maxDb * k };
}

/** The attenuation listed nearest to the wavelength, within ±30 nm; ModelError when none is near. */
export function attenuationAt(list: readonly AttenuationAt[], wavelengthNm: number, label = 'fiber'): AttenuationAt {
  const w = requireWavelengthNm('wavelengthNm', wavelengthNm);
  if (!Array.isArray(list) || list.length === 0) {
    throw new ModelError(`${label}: no attenuation values are listed.`, 'link budget', 'add the attenuation in dB/km at each wavelength used');
  }
  let best: AttenuationAt | undefined;
  list.forEach((p, i) => {
    requireWavelengthNm(`attenuationDbPerKm[${i}].wavelengthNm`, p?.wavelengthNm);
    requireNumber(`attenuationDbPerKm[${i}].dbPerKm`, p?.dbPerKm, { min: 0, max: MAX_ELEMENT_LOSS_DB, unit: 'dB/km' });
    if (!best || Math.abs(p.wavelengthNm - w) < Math.abs(best.wavelengthNm - w)) best = p;
  });
  if (!best || Math.abs(best.wavelengthNm - w) > WINDOW_TOLERANCE_NM) {
    const listed = list.map((p) => `${p.wavelengthNm} nm`).join(', ');
    throw new ModelError(
      `${label}: no attenuation is listed near ${w} nm (listed: ${listed}).`,
      'link budget',
      `add the attenuation at ${w} nm to the fiber type, or pick a listed wavelength`,
    );
  }
  return best;
}

function fiberMaximum(rules: LinkRuleSet, fiberClass: FiberClass, plant: PlantKind, wavelengthNm: number): FiberMaximum | undefined {
  return rules.fiberMaxima.find(
    (m) => m.fiberClass === fiberClass && (m.plant === undefined || m.plant === plant) && Math.abs(m.wavelengthNm - wavelengthNm) <= WINDOW_TOLERANCE_NM,
  );
}

function fiberLoss(
  rules: LinkRuleSet,
  label: string,
  lengthKm: number,
  fiberClass: FiberClass,
  plant: PlantKind,
  list: AttenuationAt[],
  wavelengthNm: number,
): { spread: LossSpread; basis: string } {
  const own = attenuationAt(list, wavelengthNm, label);
  const cap = fiberMaximum(rules, fiberClass, plant, wavelengthNm);
  const maxPerKm = cap ? Math.max(cap.dbPerKm, own.dbPerKm) : own.dbPerKm;
  const km = formatKm(lengthKm);
  const basis = cap
    ? `${km} × ${own.dbPerKm} dB/km (fiber type at ${own.wavelengthNm} nm); highest ${km} × ${maxPerKm} dB/km (${rules.name})`
    : `${km} × ${own.dbPerKm} dB/km (fiber type at ${own.wavelengthNm} nm)`;
  return {
    spread: { minDb: lengthKm * own.dbPerKm, typicalDb: lengthKm * own.dbPerKm, maxDb: lengthKm * maxPerKm },
    basis,
  };
}

function formatKm(km: number): string {
  return km < 1 ? `${Number((km * 1000).toPrecision(6))} m` : `${Number(km.toPrecision(6))} km`;
}

/** Ideal split loss of a 1×N splitter, 10·log10 N: power shared equally among N outputs (definition). */
export function idealSplitLossDb(ways: number): number {
  const n = requireInteger('ways', ways, 2, MAX_SPLITTER_WAYS);
  return 10 * Math.log10(n);
}

function elementLoss(rules: LinkRuleSet, e: LinkElement, index: number, wavelengthNm: number): ElementLoss {
  const where = `elements[${index}]`;
  const label = typeof e?.label === 'string' && e.label !== '' ? e.label : `element ${index + 1}`;
  const base = { index, label, kind: e?.kind };
  switch (e?.kind) {
    case 'fiber': {
      const km = requireNumber(`${where}.lengthKm`, e.lengthKm, { min: 0, max: MAX_LINK_LENGTH_KM, unit: 'km' });
      const { spread, basis } = fiberLoss(rules, label, km, requireClass(where, e.fiberClass), e.plant ?? 'outside', e.attenuationDbPerKm, wavelengthNm);
      return { ...base, kind: 'fiber', ...spread, basis };
    }
    case 'patchCord': {
      const count = requireInteger(`${where}.count`, e.count, 0, MAX_ELEMENT_COUNT);
      const m = requireNumber(`${where}.lengthM`, e.lengthM, { min: 0, max: 10_000, unit: 'm' });
      const { spread, basis } = fiberLoss(rules, label, (count * m) / 1000, requireClass(where, e.fiberClass), 'inside', e.attenuationDbPerKm, wavelengthNm);
      return { ...base, kind: 'patchCord', ...spread, basis: `${count} cord(s) of ${m} m: ${basis}` };
    }
    case 'connectorPair': {
      const count = requireInteger(`${where}.count`, e.count, 0, MAX_ELEMENT_COUNT);
      const s = rules.connectorPairDb;
      return { ...base, kind: 'connectorPair', ...scale(s, count), basis: `${count} × ${s.minDb} / ${s.typicalDb} / ${s.maxDb} dB per mated pair (${rules.connectorPairSource})` };
    }
    case 'splice': {
      const count = requireInteger(`${where}.count`, e.count, 0, MAX_ELEMENT_COUNT);
      const s = rules.spliceDb;
      return { ...base, kind: 'splice', ...scale(s, count), basis: `${count} × ${s.minDb} / ${s.typicalDb} / ${s.maxDb} dB per splice (${rules.spliceSource})` };
    }
    case 'splitter': {
      const ways = requireInteger(`${where}.ways`, e.ways, 2, MAX_SPLITTER_WAYS);
      const ideal = idealSplitLossDb(ways);
      const stages = Math.log2(ways);
      const excess = e.excessDb ? requireSpread(`${where}.excessDb`, e.excessDb) : scale(rules.splitterExcessPerStageDb, stages);
      const basis = e.excessDb
        ? `1×${ways}: ideal 10·log10 ${ways} = ${ideal.toFixed(2)} dB plus excess entered for this splitter`
        : `1×${ways}: ideal 10·log10 ${ways} = ${ideal.toFixed(2)} dB plus ${Number(stages.toPrecision(4))} stage(s) of excess (${rules.splitterSource})`;
      return { ...base, kind: 'splitter', minDb: ideal + excess.minDb, typicalDb: ideal + excess.typicalDb, maxDb: ideal + excess.maxDb, basis };
    }
    case 'other': {
      const s = requireSpread(`${where}.lossDb`, e.lossDb);
      return { ...base, kind: 'other', ...s, basis: 'entered loss' };
    }
    default:
      throw new InputError(`${where}.kind`, (e as { kind?: unknown })?.kind, 'fiber, connectorPair, splice, splitter, patchCord or other');
  }
}

function requireClass(where: string, c: unknown): FiberClass {
  if (c !== 'single-mode' && c !== 'multimode') throw new InputError(`${where}.fiberClass`, c, 'single-mode or multimode');
  return c;
}

function checkEquipment(spec: EquipmentSpec, minDb: number, maxDb: number, designMarginDb: number, index: number): EquipmentCheck {
  const where = `equipment[${index}]`;
  const p = { min: -100, max: 60, unit: 'dBm' };
  const txMinDbm = requireNumber(`${where}.txMinDbm`, spec?.txMinDbm, p);
  const txMaxDbm = requireNumber(`${where}.txMaxDbm`, spec?.txMaxDbm, p);
  const rxSensitivityDbm = requireNumber(`${where}.rxSensitivityDbm`, spec?.rxSensitivityDbm, p);
  const rxOverloadDbm = requireNumber(`${where}.rxOverloadDbm`, spec?.rxOverloadDbm, p);
  if (txMinDbm > txMaxDbm) throw new InputError(`${where}.txMinDbm`, txMinDbm, `at most the highest transmitter power (${txMaxDbm} dBm)`, 'lowest and highest are swapped');
  if (rxSensitivityDbm >= rxOverloadDbm) {
    throw new InputError(`${where}.rxSensitivityDbm`, rxSensitivityDbm, `below the receiver overload (${rxOverloadDbm} dBm)`, 'sensitivity and overload are swapped');
  }
  const worstCaseRxDbm = txMinDbm - maxDb;
  const bestCaseRxDbm = txMaxDbm - minDb;
  const powerBudgetDb = txMinDbm - rxSensitivityDbm;
  const remainingMarginDb = worstCaseRxDbm - rxSensitivityDbm - designMarginDb;
  const overloadHeadroomDb = rxOverloadDbm - bestCaseRxDbm;
  const findings: string[] = [];
  let verdict: EquipmentVerdict = 'pass';
  if (worstCaseRxDbm < rxSensitivityDbm) {
    verdict = 'too-little-power';
    findings.push(`Fails: the weakest signal (${fmt(worstCaseRxDbm)} dBm) is ${fmt(rxSensitivityDbm - worstCaseRxDbm)} dB below the receiver sensitivity.`);
  } else if (remainingMarginDb < 0) {
    verdict = 'no-margin';
    findings.push(`Works, but ${fmt(-remainingMarginDb)} dB short of the ${fmt(designMarginDb)} dB design margin.`);
  }
  if (overloadHeadroomDb < 0) {
    if (verdict === 'pass') verdict = 'overload';
    findings.push(`Fails: the strongest signal (${fmt(bestCaseRxDbm)} dBm) overloads the receiver; add an attenuator of at least ${fmt(-overloadHeadroomDb)} dB.`);
  }
  if (findings.length === 0) {
    findings.push(`Passes: ${fmt(remainingMarginDb)} dB left after the highest loss and the ${fmt(designMarginDb)} dB design margin.`);
  }
  return {
    spec: { wavelengthNm: spec.wavelengthNm, txMinDbm, txMaxDbm, rxSensitivityDbm, rxOverloadDbm },
    worstCaseRxDbm,
    bestCaseRxDbm,
    powerBudgetDb,
    remainingMarginDb,
    overloadHeadroomDb,
    verdict,
    findings,
  };
}

function fmt(v: number): string {
  return (Math.round(v * 100) / 100).toFixed(2);
}

/** Loss budget of a link at each wavelength, with the equipment check where equipment is given. */
export function linkBudget(input: LinkBudgetInput): LinkBudgetResult {
  if (!input || !Array.isArray(input.elements)) throw new InputError('elements', input?.elements, 'a list of link elements');
  if (input.elements.length > MAX_ELEMENT_COUNT) throw new InputError('elements', input.elements.length, `at most ${MAX_ELEMENT_COUNT} elements`);
  if (!Array.isArray(input.wavelengthsNm) || input.wavelengthsNm.length === 0) {
    throw new InputError('wavelengthsNm', input.wavelengthsNm, 'at least one wavelength in nm');
  }
  const rules = input.ruleSet;
  if (!rules || typeof rules.name !== 'string') throw new InputError('ruleSet', rules, 'a rule set such as TIA_568_3_D');
  // A rule set built by hand (or read back from storage) must be whole: its sources are shown and its maxima used.
  for (const key of ['id', 'source', 'connectorPairSource', 'spliceSource', 'splitterSource', 'fiberMaximaSource'] as const) {
    if (typeof rules[key] !== 'string') throw new InputError(`ruleSet.${key}`, rules[key], 'a text');
  }
  if (!Array.isArray(rules.fiberMaxima)) throw new InputError('ruleSet.fiberMaxima', rules.fiberMaxima, 'a list of cable maxima (may be empty)');
  rules.fiberMaxima.forEach((m, i) => {
    requireClass(`ruleSet.fiberMaxima[${i}]`, m?.fiberClass);
    requireWavelengthNm(`ruleSet.fiberMaxima[${i}].wavelengthNm`, m?.wavelengthNm);
    requireNumber(`ruleSet.fiberMaxima[${i}].dbPerKm`, m?.dbPerKm, { min: 0, max: MAX_ELEMENT_LOSS_DB, unit: 'dB/km' });
  });
  requireSpread('ruleSet.connectorPairDb', rules.connectorPairDb);
  requireSpread('ruleSet.spliceDb', rules.spliceDb);
  requireSpread('ruleSet.splitterExcessPerStageDb', rules.splitterExcessPerStageDb);
  const designMarginDb = requireNumber('designMarginDb', input.designMarginDb, { min: 0, max: MAX_ELEMENT_LOSS_DB, unit: 'dB' });
  const equipment = input.equipment ?? [];
  if (!Array.isArray(equipment)) throw new InputError('equipment', equipment, 'a list of transmitter/receiver limits');

  const wavelengths = input.wavelengthsNm.map((w, wi) => {
    const wavelengthNm = requireWavelengthNm(`wavelengthsNm[${wi}]`, w);
    const elements = input.elements.map((e, i) => elementLoss(rules, e, i, wavelengthNm));
    let minDb = 0;
    let typicalDb = 0;
    let maxDb = 0;
    let costliest: ElementLoss | undefined;
    for (const el of elements) {
      minDb += el.minDb;
      typicalDb += el.typicalDb;
      maxDb += el.maxDb;
      if (!costliest || el.maxDb > costliest.maxDb) costliest = el;
    }
    const budget: WavelengthBudget = {
      wavelengthNm,
      elements,
      minDb,
      typicalDb,
      maxDb,
      acceptanceDb: maxDb,
      withMarginDb: maxDb + designMarginDb,
      costliest,
    };
    const ei = equipment.findIndex((s) => typeof s?.wavelengthNm === 'number' && Math.abs(s.wavelengthNm - wavelengthNm) <= WINDOW_TOLERANCE_NM);
    if (ei >= 0) budget.equipment = checkEquipment(equipment[ei]!, minDb, maxDb, designMarginDb, ei);
    return budget;
  });

  const notes = [
    `Rule set: ${rules.name} — ${rules.source}.`,
    `Connector pairs: ${rules.connectorPairSource}.`,
    `Splices: ${rules.spliceSource}.`,
    `Splitters: ${rules.splitterSource}.`,
    `Fiber: ${rules.fiberMaximaSource}.`,
    'Losses in series add in dB. Acceptance value = sum of the highest allowances (a measured loss above it fails).',
  ];
  return { ruleSet: { id: rules.id, name: rules.name, source: rules.source }, designMarginDb, wavelengths, notes };
}

/** Plain-text report of a budget, for pasting into a test record. */
export function linkBudgetReport(result: LinkBudgetResult): string {
  if (!result || typeof result !== 'object' || !Array.isArray(result.wavelengths) || !result.ruleSet) {
    throw new InputError('result', result, 'a link budget from linkBudget');
  }
  const lines: string[] = ['Link loss budget', `Rule set: ${result.ruleSet.name}`, `Design margin: ${fmt(result.designMarginDb)} dB`, ''];
  for (const w of result.wavelengths) {
    lines.push(`At ${w.wavelengthNm} nm`);
    for (const e of w.elements) {
      lines.push(`  ${e.label}: ${fmt(e.minDb)} / ${fmt(e.typicalDb)} / ${fmt(e.maxDb)} dB (lowest / typical / highest) — ${e.basis}`);
    }
    lines.push(`  Total: ${fmt(w.minDb)} / ${fmt(w.typicalDb)} / ${fmt(w.maxDb)} dB (lowest / typical / highest)`);
    lines.push(`  Acceptance value: ${fmt(w.acceptanceDb)} dB (a measured loss above this fails)`);
    lines.push(`  With design margin: ${fmt(w.withMarginDb)} dB`);
    if (w.costliest) lines.push(`  Costs most: ${w.costliest.label} (${fmt(w.costliest.maxDb)} dB highest)`);
    if (w.equipment) {
      const q = w.equipment;
      lines.push(
        `  Equipment: transmitter ${fmt(q.spec.txMinDbm)} to ${fmt(q.spec.txMaxDbm)} dBm, receiver sensitivity ${fmt(q.spec.rxSensitivityDbm)} dBm, overload ${fmt(q.spec.rxOverloadDbm)} dBm`,
      );
      lines.push(`  Weakest signal at receiver: ${fmt(q.worstCaseRxDbm)} dBm; strongest: ${fmt(q.bestCaseRxDbm)} dBm`);
      for (const f of q.findings) lines.push(`  ${f}`);
    }
    lines.push('');
  }
  lines.push('Sources and assumptions:');
  for (const n of result.notes) lines.push(`  ${n}`);
  return lines.join('\n');
}
