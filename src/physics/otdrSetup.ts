// Setting up an OTDR and reading distances off its trace: pulse width ⇄ spatial extent, the distance on the trace
// ⇄ the distance along the cable jacket, what a wrong group index does to a distance, and whether an event sits
// where a ghost (a reflection bounced twice) would appear.
//
// An OTDR measures time and turns it into distance with the group index it is told: z = c·t / (2·n_g), the factor 2
// because the light goes out and back. Everything in this file follows from that one relation (Personick 1977,
// BSTJ 56(3); ITU-T G.650.3 (03/2008) for the OTDR terms) plus the geometry of fiber laid in a cable.
import { InputError, requireNumber } from './errors';
import { SPEED_OF_LIGHT_M_PER_S } from './dispersion';

/** Group index range accepted: silica fibers sit near 1.46–1.47; anything outside 1.3–1.7 is a typing slip. */
export const GROUP_INDEX_MIN = 1.3;
export const GROUP_INDEX_MAX = 1.7;
/**
 * Group index of a standard (G.652-type) single-mode fiber, typical values an OTDR is set to: 1.4677 at 1310 nm and
 * 1.4682 at 1550 nm (typical, common practice; the fiber maker's figure for the actual fiber is what to use).
 */
export const TYPICAL_GROUP_INDEX_1310 = 1.4677;
export const TYPICAL_GROUP_INDEX_1550 = 1.4682;
/** Pulse widths an OTDR offers run from a few ns to tens of µs; 1 ps to 1 ms is accepted. */
export const PULSE_WIDTH_MIN_NS = 0.001;
export const PULSE_WIDTH_MAX_NS = 1e6;
/** Longest distance accepted (km): beyond any OTDR range. */
export const OTDR_MAX_DISTANCE_KM = 1000;
/** Fiber excess length in a cable accepted (%): 0 (tight) up to far beyond any cable (common practice: 0–3 %). */
export const EXCESS_LENGTH_MAX_PERCENT = 20;

const M_PER_KM = 1000;
const S_PER_NS = 1e-9;

function requireGroupIndex(argument: string, value: unknown): number {
  return requireNumber(argument, value, {
    min: GROUP_INDEX_MIN,
    max: GROUP_INDEX_MAX,
    hint: (v) => (v > 1300 && v < 1700 ? 'this looks like a wavelength; the group index of silica fiber is about 1.468' : undefined),
  });
}

export interface PulseExtent {
  pulseWidthNs: number;
  groupIndex: number;
  /** Length of fiber the pulse fills at one instant: c·τ / n_g (m). */
  pulseLengthM: number;
  /**
   * Spatial extent on the trace, Δz = c·τ / (2·n_g) (m): the length of fiber whose backscatter arrives together, so
   * the two-point resolution of two events and the smallest distance over which a step settles (definition).
   */
  twoPointResolutionM: number;
}

/** Pulse width → spatial extent Δz = c·τ / (2·n_g) (definition; Personick 1977, BSTJ 56(3)). */
export function pulseSpatialExtent(input: { pulseWidthNs: number; groupIndex: number }): PulseExtent {
  const tau = requireNumber('pulseWidthNs', input?.pulseWidthNs, { min: PULSE_WIDTH_MIN_NS, max: PULSE_WIDTH_MAX_NS, unit: 'ns' });
  const ng = requireGroupIndex('groupIndex', input?.groupIndex);
  const pulseLengthM = (SPEED_OF_LIGHT_M_PER_S * tau * S_PER_NS) / ng;
  return { pulseWidthNs: tau, groupIndex: ng, pulseLengthM, twoPointResolutionM: pulseLengthM / 2 };
}

/** Spatial extent → the longest pulse width that still gives it: τ = 2·n_g·Δz / c (the same definition, inverted). */
export function pulseWidthForResolution(input: { resolutionM: number; groupIndex: number }): number {
  const dz = requireNumber('resolutionM', input?.resolutionM, { min: 1e-4, max: 1e5, unit: 'm' });
  const ng = requireGroupIndex('groupIndex', input?.groupIndex);
  const ns = (2 * ng * dz) / SPEED_OF_LIGHT_M_PER_S / S_PER_NS;
  if (ns < PULSE_WIDTH_MIN_NS || ns > PULSE_WIDTH_MAX_NS) {
    throw new InputError('resolutionM', dz, `a resolution that needs a pulse of ${PULSE_WIDTH_MIN_NS} to ${PULSE_WIDTH_MAX_NS} ns`);
  }
  return ns;
}

/**
 * Typical excess length of fiber over cable jacket (helix factor), by cable construction. Values are typical, not a
 * standard: cable makers publish the figure for each cable, and that figure is what to use.
 */
export interface CableLayTypical {
  id: 'tight' | 'central-tube' | 'stranded-loose-tube';
  name: string;
  excessPercent: number;
  source: string;
}

export const CABLE_LAY_TYPICAL: readonly CableLayTypical[] = [
  { id: 'tight', name: 'Tight-buffered or flat drop cable', excessPercent: 0, source: 'typical, common practice (fiber lies straight)' },
  { id: 'central-tube', name: 'Central loose tube', excessPercent: 0.2, source: 'typical, common practice: excess fiber length about 0.2–0.3 %' },
  { id: 'stranded-loose-tube', name: 'Stranded loose tubes (tubes laid in a helix)', excessPercent: 1, source: 'typical, from memory: helix factors of about 0.5–2 % depending on the strand pitch and core size' },
];

export interface TraceCableDistance {
  /** Distance along the fiber, as the OTDR shows it with the right group index (km). */
  fiberKm: number;
  /** Distance along the cable jacket (km): fiber / (1 + excess). */
  cableKm: number;
  /** Fiber minus cable (m): how much further the OTDR reads than the jacket markings. */
  differenceM: number;
  excessPercent: number;
}

/**
 * Distance on the trace → distance along the cable jacket: L_cable = L_fiber / (1 + ε), ε the excess fiber length
 * (helix factor) as a fraction (geometry; common practice). A fiber laid in a helix of pitch p and radius r has
 * ε = √(1 + (2πr/p)²) − 1.
 */
export function cableDistanceFromTrace(input: { traceKm: number; excessPercent: number }): TraceCableDistance {
  const fiberKm = requireNumber('traceKm', input?.traceKm, { min: 0, max: OTDR_MAX_DISTANCE_KM, unit: 'km' });
  const e = requireNumber('excessPercent', input?.excessPercent, { min: 0, max: EXCESS_LENGTH_MAX_PERCENT, unit: '%' });
  const cableKm = fiberKm / (1 + e / 100);
  return { fiberKm, cableKm, differenceM: (fiberKm - cableKm) * M_PER_KM, excessPercent: e };
}

/** Distance along the cable jacket → where it shows on the trace: L_fiber = L_cable · (1 + ε) (the inverse). */
export function traceDistanceFromCable(input: { cableKm: number; excessPercent: number }): TraceCableDistance {
  const cableKm = requireNumber('cableKm', input?.cableKm, { min: 0, max: OTDR_MAX_DISTANCE_KM, unit: 'km' });
  const e = requireNumber('excessPercent', input?.excessPercent, { min: 0, max: EXCESS_LENGTH_MAX_PERCENT, unit: '%' });
  const fiberKm = cableKm * (1 + e / 100);
  if (fiberKm > OTDR_MAX_DISTANCE_KM) throw new InputError('cableKm', cableKm, `a length whose fiber stays within ${OTDR_MAX_DISTANCE_KM} km`);
  return { fiberKm, cableKm, differenceM: (fiberKm - cableKm) * M_PER_KM, excessPercent: e };
}

/** Helix geometry: excess length of a fiber (or tube) laid in a helix of radius r and pitch p, √(1 + (2πr/p)²) − 1, in %. */
export function helixExcessPercent(input: { helixRadiusMm: number; pitchMm: number }): number {
  const r = requireNumber('helixRadiusMm', input?.helixRadiusMm, { min: 0, max: 100, unit: 'mm' });
  const p = requireNumber('pitchMm', input?.pitchMm, { min: 1, max: 10000, unit: 'mm' });
  const x = (2 * Math.PI * r) / p;
  // √(1 + x²) − 1 written so small x keeps its digits: x² / (√(1 + x²) + 1).
  return (100 * x * x) / (Math.sqrt(1 + x * x) + 1);
}

export interface GroupIndexEffect {
  /** Distance the OTDR shows with the index it was set to (km). */
  shownKm: number;
  /** Distance with the true index: shown × n_set / n_true (km). */
  trueKm: number;
  /** Shown minus true (m): positive when the set index is too low. */
  errorM: number;
  /** The same error scaled to 10 km and an index error of 0.001 (m): about 6.8 m for silica. */
  errorPer10KmPerMilliIndexM: number;
}

/**
 * Effect of a wrong group index on a distance: z = c·t/(2·n), so the distance shown with n_set is the true one
 * times n_true/n_set; the error is z·Δn/n (definition; about 6.8 m per 10 km for Δn = 0.001 at n = 1.468).
 */
export function groupIndexEffect(input: { shownKm: number; groupIndexSet: number; groupIndexTrue: number }): GroupIndexEffect {
  const shownKm = requireNumber('shownKm', input?.shownKm, { min: 0, max: OTDR_MAX_DISTANCE_KM, unit: 'km' });
  const nSet = requireGroupIndex('groupIndexSet', input?.groupIndexSet);
  const nTrue = requireGroupIndex('groupIndexTrue', input?.groupIndexTrue);
  const trueKm = (shownKm * nSet) / nTrue;
  return {
    shownKm,
    trueKm,
    // z·(n_true − n_set)/n_true rather than shown − true: no cancellation, exactly 0 for the right index.
    errorM: (shownKm * (nTrue - nSet) * M_PER_KM) / nTrue,
    errorPer10KmPerMilliIndexM: (10 * M_PER_KM * 0.001) / nTrue,
  };
}

export interface GhostCandidate {
  /** Plain words for the path the ghost light took. */
  path: 'front-and-event' | 'between-events';
  /** Distance of the reflective event (the farther one, for a pair), km. */
  reflectorKm: number;
  /** The nearer reflection of a pair (0 = the OTDR's own connector), km. */
  nearKm: number;
  /** How many times the light crossed the gap: the ghost sits at nearKm + multiple × (reflectorKm − nearKm). */
  multiple: number;
  /** Where a ghost from this path would appear, km. */
  expectedKm: number;
  /** Event distance minus expected distance (m). */
  offsetM: number;
}

export interface GhostCheck {
  eventKm: number;
  toleranceM: number;
  /** Every path whose ghost lands within the tolerance of the event, nearest first. */
  candidates: GhostCandidate[];
  /** True when at least one path explains the event as a ghost. */
  possibleGhost: boolean;
}

/** Most reflective events accepted in one check, and the highest multiple looked at. */
export const GHOST_MAX_REFLECTORS = 50;
export const GHOST_MAX_MULTIPLE = 10;

/**
 * Is an event where a ghost would be? Light reflected by a strong reflector at distance d, reflected again by the OTDR's
 * front connector and sent out once more, returns as if from 2d (and 3d, …); between two reflectors at d1 < d2 it
 * appears at d1 + k·(d2 − d1), k ≥ 2 (echo geometry, common practice in trace reading). A match is a hint, not a
 * proof: a ghost has no loss step after it and sits in the noise-free part of the trace only by chance.
 */
export function ghostCheck(input: { eventKm: number; reflectiveEventsKm: readonly number[]; toleranceM: number; launchCordKm?: number }): GhostCheck {
  const eventKm = requireNumber('eventKm', input?.eventKm, { min: 0, max: OTDR_MAX_DISTANCE_KM, unit: 'km' });
  const toleranceM = requireNumber('toleranceM', input?.toleranceM, { min: 0, max: 10_000, unit: 'm' });
  const list = input?.reflectiveEventsKm;
  if (!Array.isArray(list)) throw new InputError('reflectiveEventsKm', list, 'a list of distances in km');
  if (list.length > GHOST_MAX_REFLECTORS) throw new InputError('reflectiveEventsKm', list.length, `at most ${GHOST_MAX_REFLECTORS} reflective events`);
  const reflectors = list.map((d, i) => requireNumber(`reflectiveEventsKm[${i}]`, d, { min: 0, max: OTDR_MAX_DISTANCE_KM, unit: 'km' }));
  if (input.launchCordKm !== undefined) reflectors.push(requireNumber('launchCordKm', input.launchCordKm, { min: 0, max: OTDR_MAX_DISTANCE_KM, unit: 'km' }));
  const distinct = [...new Set(reflectors)].filter((d) => d > 0).sort((a, b) => a - b);
  const candidates: GhostCandidate[] = [];
  const consider = (path: GhostCandidate['path'], nearKm: number, farKm: number) => {
    const gap = farKm - nearKm;
    if (!(gap > 0)) return;
    for (let k = 2; k <= GHOST_MAX_MULTIPLE; k++) {
      const expectedKm = nearKm + k * gap;
      const offsetM = (eventKm - expectedKm) * M_PER_KM;
      if (Math.abs(offsetM) <= toleranceM) candidates.push({ path, reflectorKm: farKm, nearKm, multiple: k, expectedKm, offsetM });
    }
  };
  for (let j = 0; j < distinct.length; j++) {
    consider('front-and-event', 0, distinct[j]!);
    for (let i = 0; i < j; i++) consider('between-events', distinct[i]!, distinct[j]!);
  }
  candidates.sort((a, b) => Math.abs(a.offsetM) - Math.abs(b.offsetM));
  return { eventKm, toleranceM, candidates, possibleGhost: candidates.length > 0 };
}
