// Loss budget of a passive optical network (PON): the optical path from the central equipment to each home
// through a feeder fiber, one or more splitter stages, the distribution and drop fiber, connectors, splices and
// any extra element, checked in both directions at their own wavelengths against the optical path loss class of
// the equipment (ITU-T G.984.2, G.987.2, G.9807.1): the farthest home against the class maximum, the nearest home
// against the class minimum (receiver overload).
//
// The sums are the link budget's (linkBudget.ts: losses in series add in dB, definition of the decibel; lowest /
// typical / highest spread per element); the fiber attenuation at each wavelength comes from the fiber type
// (attenuationSpectrum.ts).
import { InputError, ModelError, requireInteger, requireNumber } from './errors';
import { attenuationAtWavelength, type SpectralAttenuation } from './attenuationSpectrum';
import { idealSplitLossDb, linkBudget, TYPICAL_VALUES, type AttenuationAt, type ElementLoss, type LinkElement, type LinkRuleSet, type LossSpread, type WavelengthBudget } from './linkBudget';

export type PonGeneration = 'G-PON' | 'XG-PON' | 'XGS-PON';
export type PonDirection = 'downstream' | 'upstream';

/**
 * Where the class limits come from. The clause numbers were checked against the recommendations' published
 * tables of contents; the dB values could not be checked against the recommendations' text while this was
 * written and are from memory (they agree with what test-set makers and installers reproduce). Check them
 * against the edition in force before relying on a limit.
 */
const G984_2 = 'ITU-T G.984.2 (08/2019), clause 8.2.7.1 "Attenuation range"';
const G987_2 = 'ITU-T G.987.2 (02/2023), clause 6.1 "Classes for optical path loss"';
const G9807_1 = 'ITU-T G.9807.1 (02/2023), Annex B, clause B.6 (optical path loss classes, as in G.987.2)';

export interface PonLossClass {
  /** Unique id, e.g. 'G-PON B+'. */
  id: string;
  generation: PonGeneration;
  /** The class as the recommendation names it: 'B+', 'N1'. */
  name: string;
  /** Lowest optical path loss the equipment is built for (below it, the receiver may overload), dB. */
  minDb: number;
  /** Highest optical path loss the equipment is built for, dB. */
  maxDb: number;
  /** Recommendation, edition and clause, with "from memory" where the value was not checked. */
  source: string;
}

function lossClass(generation: PonGeneration, name: string, minDb: number, maxDb: number, source: string): PonLossClass {
  return { id: `${generation} ${name}`, generation, name, minDb, maxDb, source };
}

/**
 * Optical path loss classes. G.984.2 classes A, B, C are in the 2003 edition; B+ (13–28 dB) came with
 * Amendment 1 (2006) and C+ (17–32 dB) with Amendment 2 (2008) (editions of the amendments from memory).
 * G.987.2 and G.9807.1: N1 14–29, N2 16–31, E1 18–33, E2 20–35 dB. All dB values from memory.
 */
export const PON_LOSS_CLASSES: readonly PonLossClass[] = [
  lossClass('G-PON', 'A', 5, 20, `${G984_2}; 5–20 dB from memory (agrees with the A/B/C ranges of G.982 as reproduced in trade literature)`),
  lossClass('G-PON', 'B', 10, 25, `${G984_2}; 10–25 dB from memory (agrees with the A/B/C ranges of G.982 as reproduced in trade literature)`),
  lossClass('G-PON', 'C', 15, 30, `${G984_2}; 15–30 dB from memory (agrees with the A/B/C ranges of G.982 as reproduced in trade literature)`),
  lossClass('G-PON', 'B+', 13, 28, `${G984_2}, class B+ (first in Amendment 1); 13–28 dB from memory`),
  lossClass('G-PON', 'C+', 17, 32, `${G984_2}, class C+ (first in Amendment 2); 17–32 dB from memory`),
  lossClass('XG-PON', 'N1', 14, 29, `${G987_2}; 14–29 dB from memory`),
  lossClass('XG-PON', 'N2', 16, 31, `${G987_2}; 16–31 dB from memory`),
  lossClass('XG-PON', 'E1', 18, 33, `${G987_2}; 18–33 dB from memory`),
  lossClass('XG-PON', 'E2', 20, 35, `${G987_2}; 20–35 dB from memory`),
  lossClass('XGS-PON', 'N1', 14, 29, `${G9807_1}; 14–29 dB from memory`),
  lossClass('XGS-PON', 'N2', 16, 31, `${G9807_1}; 16–31 dB from memory`),
  lossClass('XGS-PON', 'E1', 18, 33, `${G9807_1}; 18–33 dB from memory`),
  lossClass('XGS-PON', 'E2', 20, 35, `${G9807_1}; 20–35 dB from memory`),
];

/**
 * Largest difference in optical path loss between the homes of one PON that the central receiver handles:
 * 15 dB (G.984.2 clause 8.2.8.7 "Differential optical path loss"; the same 15 dB in G.987.2 — value from memory).
 */
export const DIFFERENTIAL_PATH_LOSS_MAX_DB = 15;

/** Nominal operating wavelengths per generation and direction, nm. */
export const PON_WAVELENGTHS: Readonly<Record<PonGeneration, { downstreamNm: number; upstreamNm: number; source: string }>> = {
  // G.984.2 clause 8.2.5: downstream 1480–1500 nm, upstream 1260–1360 nm (ranges from memory; centres common practice).
  'G-PON': { downstreamNm: 1490, upstreamNm: 1310, source: 'G.984.2 clause 8.2.5: downstream 1480–1500 nm, upstream 1260–1360 nm (from memory)' },
  // G.987.2: downstream 1575–1580 nm, upstream 1260–1280 nm (from memory).
  'XG-PON': { downstreamNm: 1577, upstreamNm: 1270, source: 'G.987.2 clause 9.2.5: downstream 1575–1580 nm, upstream 1260–1280 nm (from memory)' },
  'XGS-PON': { downstreamNm: 1577, upstreamNm: 1270, source: 'G.9807.1 Annex B: downstream 1575–1580 nm, upstream 1260–1280 nm (from memory)' },
};

/** An RF broadcast overlay's downstream wavelength, 1550 nm (1550–1560 nm band of G.983.3, from memory; centre common practice). */
export const VIDEO_OVERLAY_NM = 1550;
/** Overlay wavelengths accepted: the C and L bands, where overlays sit (common practice). */
export const VIDEO_OVERLAY_RANGE_NM = { min: 1530, max: 1625 } as const;

/** Typical planar splitter data: the highest insertion loss of any output and the spread between outputs. */
export interface SplitterTypical {
  ways: number;
  maxInsertionLossDb: number;
  uniformityDb: number;
  source: string;
}

const SPLITTER_SOURCE = 'typical, common practice (rounded from the range planar-splitter data sheets print; not one product’s data)';

/** Typical maximum insertion loss and uniformity of 1×N planar splitters, 1260–1650 nm. Typical, common practice. */
export const TYPICAL_SPLITTERS: readonly SplitterTypical[] = [
  { ways: 2, maxInsertionLossDb: 4.0, uniformityDb: 0.6, source: SPLITTER_SOURCE },
  { ways: 4, maxInsertionLossDb: 7.3, uniformityDb: 0.8, source: SPLITTER_SOURCE },
  { ways: 8, maxInsertionLossDb: 10.5, uniformityDb: 1.0, source: SPLITTER_SOURCE },
  { ways: 16, maxInsertionLossDb: 13.7, uniformityDb: 1.3, source: SPLITTER_SOURCE },
  { ways: 32, maxInsertionLossDb: 17.1, uniformityDb: 1.6, source: SPLITTER_SOURCE },
  { ways: 64, maxInsertionLossDb: 20.6, uniformityDb: 2.0, source: SPLITTER_SOURCE },
  { ways: 128, maxInsertionLossDb: 24.0, uniformityDb: 2.5, source: SPLITTER_SOURCE },
];

/** Split ratios per stage accepted: 1×2 to 1×128. */
export const SPLIT_WAYS_MIN = 2;
export const SPLIT_WAYS_MAX = 128;
/** Stages in cascade accepted, and the total split (G.987 systems address up to 1:256 logically; common practice). */
export const MAX_SPLITTER_STAGES = 4;
export const MAX_TOTAL_SPLIT = 1024;
/** Fiber length accepted per section: the logical reach of these systems is at most 60 km (G.984.2, from memory); beyond 100 km is a slip. */
export const MAX_PON_FIBER_KM = 100;
/** Largest loss accepted for one typed element (insertion loss, uniformity, extra), dB. */
export const MAX_PON_ELEMENT_DB = 60;

export interface SplitterStage {
  ways: number;
  /** The data sheet's highest insertion loss; absent: the typical table value. */
  maxInsertionLossDb?: number;
  /** The data sheet's uniformity (highest minus lowest output); absent: the typical table value, or 0 with a typed loss. */
  uniformityDb?: number;
}

export interface SplitterLoss extends LossSpread {
  ways: number;
  /** 10·log10 N: an ideal, lossless splitter sharing the power equally (definition). */
  idealDb: number;
  /** Highest insertion loss minus the ideal: what a real splitter adds. */
  excessMaxDb: number;
  /** How the numbers were reached. */
  basis: string;
}

/**
 * Loss through one output of a 1×N splitter: the highest is the data sheet's maximum insertion loss, the lowest
 * that minus the uniformity (the best output), the typical midway. Ideal share 10·log10 N (definition).
 */
export function splitterLoss(stage: SplitterStage): SplitterLoss {
  const ways = requireInteger('ways', stage?.ways, SPLIT_WAYS_MIN, SPLIT_WAYS_MAX);
  const idealDb = idealSplitLossDb(ways);
  const typical = TYPICAL_SPLITTERS.find((t) => t.ways === ways);
  let maxDb: number;
  let uniformityDb: number;
  let basis: string;
  if (stage.maxInsertionLossDb !== undefined) {
    maxDb = requireNumber('maxInsertionLossDb', stage.maxInsertionLossDb, { min: idealDb, max: MAX_PON_ELEMENT_DB, unit: 'dB', hint: `a 1×${ways} splitter loses at least ${idealDb.toFixed(2)} dB (10·log10 ${ways})` });
    uniformityDb = requireNumber('uniformityDb', stage.uniformityDb ?? 0, { min: 0, max: MAX_PON_ELEMENT_DB, unit: 'dB' });
    basis = `1×${ways}: highest ${fmt(maxDb)} dB from the data sheet${uniformityDb > 0 ? `, uniformity ${fmt(uniformityDb)} dB` : ''}; ideal 10·log10 ${ways} = ${fmt(idealDb)} dB`;
  } else {
    if (!typical) {
      throw new ModelError(`There is no typical value for a 1×${ways} splitter.`, 'PON splitter table', 'type the highest insertion loss from its data sheet');
    }
    maxDb = typical.maxInsertionLossDb;
    uniformityDb = stage.uniformityDb === undefined ? typical.uniformityDb : requireNumber('uniformityDb', stage.uniformityDb, { min: 0, max: MAX_PON_ELEMENT_DB, unit: 'dB' });
    basis = `1×${ways}: highest ${fmt(maxDb)} dB, uniformity ${fmt(uniformityDb)} dB (${typical.source}); ideal 10·log10 ${ways} = ${fmt(idealDb)} dB`;
  }
  if (uniformityDb > maxDb) throw new InputError('uniformityDb', uniformityDb, `at most the highest insertion loss (${fmt(maxDb)} dB)`);
  const minDb = maxDb - uniformityDb;
  return { ways, idealDb, minDb, typicalDb: (minDb + maxDb) / 2, maxDb, excessMaxDb: maxDb - idealDb, basis };
}

export interface PonExtra {
  label: string;
  lossDb: number;
}

export interface PonPlanInput {
  generation: PonGeneration;
  /** Name of the class to check against, e.g. 'B+', 'N1'. */
  className: string;
  feederKm: number;
  /** Fiber after the feeder to the farthest home (distribution + drop). */
  farthestDropKm: number;
  /** Fiber after the feeder to the nearest home: the overload check. */
  nearestDropKm: number;
  /** Splitter stages in cascade, central office side first. */
  splitters: SplitterStage[];
  connectorPairs: number;
  splices: number;
  /** Fixed losses in every path: a WDM coupler for an RF broadcast overlay, an attenuator. */
  extras?: PonExtra[];
  /** Reserve kept for repairs and ageing, added to the farthest home's loss only. */
  reserveDb: number;
  /** The fiber type's listed attenuation. */
  attenuationDbPerKm: AttenuationAt[];
  /** Add an RF broadcast overlay's downstream wavelength to the check. */
  broadcastOverlay?: boolean;
  /** The overlay's wavelength, nm; default 1550 nm (VIDEO_OVERLAY_NM). */
  overlayWavelengthNm?: number;
  /** Connector and splice allowances; default: typical installed values (linkBudget.ts). */
  ruleSet?: LinkRuleSet;
}

export interface DirectionCheck {
  direction: PonDirection;
  wavelengthNm: number;
  attenuation: SpectralAttenuation;
  /** The farthest home's budget (highest losses plus the reserve in withMarginDb). */
  farthest: WavelengthBudget;
  /** The nearest home's budget (lowest losses, no reserve). */
  nearest: WavelengthBudget;
  /** Highest loss to the farthest home plus the reserve. */
  maxLossDb: number;
  /** Lowest loss to the nearest home. */
  minLossDb: number;
  /** Class maximum minus maxLossDb: negative means too much loss. */
  marginDb: number;
  /** minLossDb minus the class minimum: negative means the nearest home may overload its receiver. */
  overloadMarginDb: number;
  fits: boolean;
}

export interface ClassFit {
  lossClass: PonLossClass;
  fits: boolean;
  /** Smallest margin over both limits and all wavelengths (negative: by how much it misses). */
  worstMarginDb: number;
}

export type PonVerdict = 'fits' | 'too-much-loss' | 'overload' | 'too-much-loss-and-overload';

export interface PonPlanResult {
  lossClass: PonLossClass;
  verdict: PonVerdict;
  /** The headline in words, e.g. "Fits class B+: 2.1 dB to spare (upstream at 1310 nm)". */
  headline: string;
  directions: DirectionCheck[];
  /** The direction with the smallest margin to the class maximum. */
  tightest: DirectionCheck;
  totalSplit: number;
  splitters: SplitterLoss[];
  /** The element that costs most (highest loss) in the tightest direction. */
  costliest: ElementLoss | undefined;
  /** Each class of the same generation, whether the plan fits it. */
  classFits: ClassFit[];
  /** Longest feeder that keeps the farthest home within the class maximum in every direction; undefined when none does. */
  longestFeederKm: number | undefined;
  /** Largest total split (changing the last stage through the typical table) that still fits the class maximum; undefined when none. */
  largestSplit: number | undefined;
  /** Typical loss to the farthest home minus typical loss to the nearest, worst direction. */
  differentialDb: number;
  differentialOk: boolean;
  /** Findings in words, verdict first, then what to do. */
  findings: string[];
  /** Sources and assumptions, one per line. */
  notes: string[];
}

function fmt(v: number): string {
  return (Math.round(v * 100) / 100).toFixed(2);
}

/** The class of a generation by name; InputError naming the classes there are. */
export function findPonLossClass(input: { generation: PonGeneration; className: string }): PonLossClass {
  const g = input?.generation;
  if (typeof g !== 'string' || !Object.hasOwn(PON_WAVELENGTHS, g)) throw new InputError('generation', g, 'G-PON, XG-PON or XGS-PON');
  const c = PON_LOSS_CLASSES.find((x) => x.generation === g && x.name === input.className);
  if (!c) {
    const names = PON_LOSS_CLASSES.filter((x) => x.generation === g).map((x) => x.name).join(', ');
    throw new InputError('className', input.className, `one of the ${g} classes: ${names}`);
  }
  return c;
}

interface Checked {
  generation: PonGeneration;
  lossClass: PonLossClass;
  feederKm: number;
  farthestDropKm: number;
  nearestDropKm: number;
  splitters: SplitterLoss[];
  connectorPairs: number;
  splices: number;
  extras: PonExtra[];
  reserveDb: number;
  attenuationDbPerKm: AttenuationAt[];
  wavelengths: { direction: PonDirection; wavelengthNm: number }[];
  ruleSet: LinkRuleSet;
}

function check(input: PonPlanInput): Checked {
  if (!input || typeof input !== 'object') throw new InputError('input', input, 'a PON plan');
  const lossClass = findPonLossClass({ generation: input.generation, className: input.className });
  const km = { min: 0, max: MAX_PON_FIBER_KM, unit: 'km' };
  const feederKm = requireNumber('feederKm', input.feederKm, km);
  const farthestDropKm = requireNumber('farthestDropKm', input.farthestDropKm, km);
  const nearestDropKm = requireNumber('nearestDropKm', input.nearestDropKm, km);
  if (nearestDropKm > farthestDropKm) {
    throw new InputError('nearestDropKm', nearestDropKm, `at most the farthest home’s fiber (${farthestDropKm} km)`, 'nearest and farthest are swapped');
  }
  if (!Array.isArray(input.splitters) || input.splitters.length === 0 || input.splitters.length > MAX_SPLITTER_STAGES) {
    throw new InputError('splitters', input.splitters, `1 to ${MAX_SPLITTER_STAGES} splitter stages`);
  }
  const splitters = input.splitters.map((s, i) => {
    try {
      return splitterLoss(s);
    } catch (e) {
      // Name the stage, so a screen can point at the field of the right stage.
      if (e instanceof InputError) throw new InputError(`splitters[${i}].${e.argument}`, e.value, e.allowed, e.hint);
      throw e;
    }
  });
  const totalSplit = splitters.reduce((p, s) => p * s.ways, 1);
  if (totalSplit > MAX_TOTAL_SPLIT) throw new InputError('splitters', totalSplit, `a total split of at most 1:${MAX_TOTAL_SPLIT}`);
  const connectorPairs = requireInteger('connectorPairs', input.connectorPairs, 0, 100);
  const splices = requireInteger('splices', input.splices, 0, 1000);
  const extrasIn = input.extras ?? [];
  if (!Array.isArray(extrasIn) || extrasIn.length > 20) throw new InputError('extras', extrasIn, 'a list of up to 20 extra losses');
  const extras = extrasIn.map((e, i) => ({
    label: typeof e?.label === 'string' && e.label.trim() !== '' ? e.label : `extra element ${i + 1}`,
    lossDb: requireNumber(`extras[${i}].lossDb`, e?.lossDb, { min: 0, max: MAX_PON_ELEMENT_DB, unit: 'dB' }),
  }));
  const reserveDb = requireNumber('reserveDb', input.reserveDb, { min: 0, max: MAX_PON_ELEMENT_DB, unit: 'dB' });
  const wl = PON_WAVELENGTHS[input.generation];
  const overlayNm =
    input.overlayWavelengthNm === undefined
      ? VIDEO_OVERLAY_NM
      : requireNumber('overlayWavelengthNm', input.overlayWavelengthNm, { ...VIDEO_OVERLAY_RANGE_NM, unit: 'nm', hint: (v) => (v >= 1.53 && v <= 1.625 ? `did you mean ${v * 1000} nm?` : undefined) });
  const wavelengths: Checked['wavelengths'] = [
    { direction: 'downstream', wavelengthNm: wl.downstreamNm },
    ...(input.broadcastOverlay ? [{ direction: 'downstream' as const, wavelengthNm: overlayNm }] : []),
    { direction: 'upstream', wavelengthNm: wl.upstreamNm },
  ];
  const ruleSet = input.ruleSet ?? TYPICAL_VALUES;
  return {
    generation: input.generation,
    lossClass,
    feederKm,
    farthestDropKm,
    nearestDropKm,
    splitters,
    connectorPairs,
    splices,
    extras,
    reserveDb,
    attenuationDbPerKm: input.attenuationDbPerKm,
    wavelengths,
    ruleSet,
  };
}

function pathElements(c: Checked, dropKm: number, feederKm: number, splitters: SplitterLoss[], atten: AttenuationAt[]): LinkElement[] {
  const fiber = (label: string, lengthKm: number): LinkElement => ({ kind: 'fiber', label, lengthKm, fiberClass: 'single-mode', plant: 'outside', attenuationDbPerKm: atten });
  return [
    fiber('Feeder fiber', feederKm),
    ...splitters.map((s, i): LinkElement => ({
      kind: 'other',
      label: splitters.length > 1 ? `Splitter 1×${s.ways} (stage ${i + 1})` : `Splitter 1×${s.ways}`,
      lossDb: { minDb: s.minDb, typicalDb: s.typicalDb, maxDb: s.maxDb },
    })),
    fiber('Distribution and drop fiber', dropKm),
    { kind: 'connectorPair', label: 'Connector pairs', count: c.connectorPairs },
    { kind: 'splice', label: 'Splices', count: c.splices },
    ...c.extras.map((e): LinkElement => ({ kind: 'other', label: e.label, lossDb: { minDb: e.lossDb, typicalDb: e.lossDb, maxDb: e.lossDb } })),
  ];
}

/** Replaces the 'entered loss' basis of splitter elements with how their numbers were reached. */
function withSplitterBasis(b: WavelengthBudget, splitters: SplitterLoss[]): WavelengthBudget {
  const elements = b.elements.map((e) => (e.index >= 1 && e.index <= splitters.length ? { ...e, basis: splitters[e.index - 1]!.basis } : e));
  const costliest = b.costliest ? elements[b.costliest.index] : undefined;
  return { ...b, elements, costliest };
}

function directions(c: Checked, lossClass: PonLossClass, feederKm: number, splitters: SplitterLoss[]): DirectionCheck[] {
  return c.wavelengths.map(({ direction, wavelengthNm }) => {
    const attenuation = attenuationAtWavelength({ attenuationDbPerKm: c.attenuationDbPerKm, wavelengthNm, label: 'fiber type' });
    const atten = [{ wavelengthNm, dbPerKm: attenuation.dbPerKm }];
    const far = linkBudget({ elements: pathElements(c, c.farthestDropKm, feederKm, splitters, atten), wavelengthsNm: [wavelengthNm], ruleSet: c.ruleSet, designMarginDb: c.reserveDb }).wavelengths[0]!;
    const near = linkBudget({ elements: pathElements(c, c.nearestDropKm, feederKm, splitters, atten), wavelengthsNm: [wavelengthNm], ruleSet: c.ruleSet, designMarginDb: 0 }).wavelengths[0]!;
    const maxLossDb = far.withMarginDb;
    const minLossDb = near.minDb;
    const marginDb = lossClass.maxDb - maxLossDb;
    const overloadMarginDb = minLossDb - lossClass.minDb;
    return {
      direction,
      wavelengthNm,
      attenuation,
      farthest: withSplitterBasis(far, splitters),
      nearest: withSplitterBasis(near, splitters),
      maxLossDb,
      minLossDb,
      marginDb,
      overloadMarginDb,
      fits: marginDb >= 0 && overloadMarginDb >= 0,
    };
  });
}

/** Highest loss of 1 km of feeder at a wavelength under the rule set (its cable maxima may raise the fiber's value). */
function feederLossPerKm(c: Checked, wavelengthNm: number, dbPerKm: number): number {
  const b = linkBudget({
    elements: [{ kind: 'fiber', label: 'Feeder fiber', lengthKm: 1, fiberClass: 'single-mode', plant: 'outside', attenuationDbPerKm: [{ wavelengthNm, dbPerKm }] }],
    wavelengthsNm: [wavelengthNm],
    ruleSet: c.ruleSet,
    designMarginDb: 0,
  });
  return b.wavelengths[0]!.maxDb;
}

function directionName(d: DirectionCheck): string {
  return `${d.direction} at ${d.wavelengthNm} nm`;
}

/**
 * Loss budget of a PON plan in both directions against a loss class, with the classes it fits, the longest
 * feeder and the largest split that still fit, and the element that costs most.
 */
export function ponBudget(input: PonPlanInput): PonPlanResult {
  const c = check(input);
  const { lossClass } = c;
  const ds = directions(c, lossClass, c.feederKm, c.splitters);
  const tightest = ds.reduce((a, b) => (b.marginDb < a.marginDb ? b : a));
  const overloaded = ds.filter((d) => d.overloadMarginDb < 0);
  const tooMuch = ds.filter((d) => d.marginDb < 0);
  const verdict: PonVerdict = tooMuch.length && overloaded.length ? 'too-much-loss-and-overload' : tooMuch.length ? 'too-much-loss' : overloaded.length ? 'overload' : 'fits';
  const worstOverload = overloaded.length ? overloaded.reduce((a, b) => (b.overloadMarginDb < a.overloadMarginDb ? b : a)) : undefined;
  const cls = `class ${lossClass.name}`;
  let headline: string;
  if (verdict === 'fits') headline = `Fits ${cls}: ${fmt(tightest.marginDb)} dB to spare (${directionName(tightest)})`;
  else if (verdict === 'overload') headline = `Nearest home too close for ${cls}: ${fmt(-worstOverload!.overloadMarginDb)} dB below the ${fmt(lossClass.minDb)} dB minimum`;
  else headline = `Does not fit ${cls}: ${fmt(-tightest.marginDb)} dB too much loss (${directionName(tightest)})`;

  // Losses do not depend on the class: every class of the generation is judged on the same directions.
  const classFits: ClassFit[] = PON_LOSS_CLASSES.filter((k) => k.generation === c.generation).map((k) => {
    const w = Math.min(...ds.map((d) => Math.min(k.maxDb - d.maxLossDb, d.minLossDb - k.minDb)));
    return { lossClass: k, fits: w >= 0, worstMarginDb: w };
  });

  // Loss is linear in the feeder length (each km adds the attenuation at each wavelength), so the longest feeder
  // that fits is (class maximum − loss without feeder) / loss per km, the smallest over the wavelengths.
  let longestFeederKm: number | undefined = MAX_PON_FIBER_KM;
  for (const d of ds) {
    const feeder = d.farthest.elements[0]!;
    // Per km from a 1 km budget, not feeder loss / length: a tiny typed length would lose the ratio to rounding.
    const perKm = feederLossPerKm(c, d.wavelengthNm, d.attenuation.dbPerKm);
    const room = lossClass.maxDb - (d.maxLossDb - feeder.maxDb);
    if (room < 0) {
      longestFeederKm = undefined;
      break;
    }
    if (perKm > 0) longestFeederKm = Math.min(longestFeederKm, room / perKm);
  }

  // Largest split: the last (home-side) stage through the typical table, every other element unchanged. Stages are
  // fixed losses in series, so the loss with another last stage is the loss minus the old stage plus the new one.
  let largestSplit: number | undefined;
  const last = c.splitters[c.splitters.length - 1]!;
  const headWays = c.splitters.slice(0, -1).reduce((p, s) => p * s.ways, 1);
  for (const t of TYPICAL_SPLITTERS) {
    if (headWays * t.ways > MAX_TOTAL_SPLIT) break;
    const swap = splitterLoss({ ways: t.ways }).maxDb - last.maxDb;
    if (ds.every((d) => lossClass.maxDb - (d.maxLossDb + swap) >= 0)) largestSplit = headWays * t.ways;
  }

  const differentialDb = Math.max(...ds.map((d) => d.farthest.typicalDb - d.nearest.typicalDb));
  const differentialOk = differentialDb <= DIFFERENTIAL_PATH_LOSS_MAX_DB;
  const costliest = tightest.farthest.costliest;
  const totalSplit = c.splitters.reduce((p, s) => p * s.ways, 1);

  const findings: string[] = [headline + '.'];
  for (const d of ds) {
    findings.push(
      `${d.direction[0]!.toUpperCase()}${d.direction.slice(1)} at ${d.wavelengthNm} nm: farthest home ${fmt(d.maxLossDb)} dB (class maximum ${fmt(lossClass.maxDb)} dB, ${d.marginDb >= 0 ? `${fmt(d.marginDb)} dB to spare` : `${fmt(-d.marginDb)} dB over`}); nearest home ${fmt(d.minLossDb)} dB (class minimum ${fmt(lossClass.minDb)} dB${d.overloadMarginDb >= 0 ? `, ${fmt(d.overloadMarginDb)} dB above` : `, ${fmt(-d.overloadMarginDb)} dB below`}).`,
    );
  }
  if (worstOverload) findings.push(`Add an attenuator of at least ${fmt(-worstOverload.overloadMarginDb)} dB at the nearest home, or check the equipment’s overload level.`);
  if (tooMuch.length && costliest) findings.push(`Costs most: ${costliest.label} (${fmt(costliest.maxDb)} dB).`);
  if (!differentialOk) findings.push(`The typical losses to the nearest and farthest homes differ by ${fmt(differentialDb)} dB, more than the ${DIFFERENTIAL_PATH_LOSS_MAX_DB} dB differential optical path loss (G.984.2 clause 8.2.8.7, from memory).`);

  const notes = [
    `Class ${lossClass.name} (${lossClass.generation}): ${fmt(lossClass.minDb)} to ${fmt(lossClass.maxDb)} dB — ${lossClass.source}.`,
    `Wavelengths: ${PON_WAVELENGTHS[c.generation].source}${c.wavelengths.length > 2 ? `; RF broadcast overlay ${c.wavelengths[1]!.wavelengthNm} nm` : ''}.`,
    ...c.splitters.map((s) => `Splitter ${s.basis}.`),
    ...ds.map((d) => `Fiber at ${d.wavelengthNm} nm: ${fmt(d.attenuation.dbPerKm)} dB/km, ${d.attenuation.how}.`),
    `Connectors and splices: ${c.ruleSet.connectorPairSource}; ${c.ruleSet.spliceSource}.`,
    'Farthest home: highest losses plus the reserve, against the class maximum. Nearest home: lowest losses, no reserve, against the class minimum (receiver overload).',
    'Losses in series add in dB. The equipment’s reach and fiber-distance limits apply as well: this is the loss budget only.',
  ];

  return {
    lossClass,
    verdict,
    headline,
    directions: ds,
    tightest,
    totalSplit,
    splitters: c.splitters,
    costliest,
    classFits,
    longestFeederKm,
    largestSplit,
    differentialDb,
    differentialOk,
    findings,
    notes,
  };
}
