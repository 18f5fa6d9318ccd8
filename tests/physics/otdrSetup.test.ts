// OTDR set-up and distances: each check names where its expected value comes from.
import { describe, expect, it } from 'vitest';
import {
  cableDistanceFromTrace,
  ghostCheck,
  groupIndexEffect,
  helixExcessPercent,
  InputError,
  pulseSpatialExtent,
  pulseWidthForResolution,
  traceDistanceFromCable,
} from '../../src/physics';

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

describe('pulse width and spatial extent, Δz = c·τ/(2·n_g) (definition; Personick 1977)', () => {
  it.each([
    // Worked by hand: 299 792 458 m/s × τ / (2 × 1.4682).
    [1, 0.10210],
    [10, 1.02095],
    [100, 10.2095],
    [1000, 102.095],
  ])('a %s ns pulse on fiber with group index 1.4682 resolves %s m', (ns, metres) => {
    near(pulseSpatialExtent({ pulseWidthNs: ns, groupIndex: 1.4682 }).twoPointResolutionM, metres, 1e-4 * metres, 'Δz');
  });

  it('the pulse itself fills twice the resolution length (out-and-back halves it)', () => {
    const r = pulseSpatialExtent({ pulseWidthNs: 30, groupIndex: 1.468 });
    near(r.pulseLengthM, 2 * r.twoPointResolutionM, 1e-12, 'pulse length');
  });

  it.each([0.5, 3, 25, 1000])('forward then inverse: the pulse for a %s m resolution gives that resolution back', (m) => {
    const ns = pulseWidthForResolution({ resolutionM: m, groupIndex: 1.4677 });
    near(pulseSpatialExtent({ pulseWidthNs: ns, groupIndex: 1.4677 }).twoPointResolutionM, m, 1e-12 * m, 'round trip');
  });

  it('a group index typed as a wavelength is refused with a hint', () => {
    expect(() => pulseSpatialExtent({ pulseWidthNs: 10, groupIndex: 1550 })).toThrow(/group index of silica fiber/);
  });
});

describe('distance on the trace and along the cable jacket', () => {
  it('10 km of fiber in a cable with 1 % excess length is 9.901 km of jacket, 99 m less (geometry)', () => {
    const r = cableDistanceFromTrace({ traceKm: 10, excessPercent: 1 });
    near(r.cableKm, 10 / 1.01, 1e-12, 'cable');
    near(r.differenceM, 99.0099, 1e-3, 'difference');
  });

  it.each([0, 0.2, 1, 2.5])('forward then inverse at %s % excess length gives the trace distance back', (e) => {
    const cable = cableDistanceFromTrace({ traceKm: 37.25, excessPercent: e }).cableKm;
    near(traceDistanceFromCable({ cableKm: cable, excessPercent: e }).fiberKm, 37.25, 1e-12, 'round trip');
  });

  it('a tube laid in a 3 mm radius helix of 100 mm pitch is 1.761 % longer than its axis (√(1 + (2πr/p)²) − 1, worked by hand)', () => {
    near(helixExcessPercent({ helixRadiusMm: 3, pitchMm: 100 }), 1.76102, 1e-5, 'excess');
  });

  it('a straight lay (no helix) adds nothing', () => {
    expect(helixExcessPercent({ helixRadiusMm: 0, pitchMm: 100 })).toBe(0);
  });
});

describe('a wrong group index', () => {
  it('0.001 too low over 10 km reads about 6.8 m too far (issue 15: "about 6.8 m per 10 km")', () => {
    const r = groupIndexEffect({ shownKm: 10, groupIndexSet: 1.4672, groupIndexTrue: 1.4682 });
    near(r.errorM, 6.811, 1e-3, 'error');
    near(r.errorPer10KmPerMilliIndexM, 6.811, 1e-3, 'scaled error');
  });

  it('the right index gives no error', () => {
    expect(groupIndexEffect({ shownKm: 25, groupIndexSet: 1.468, groupIndexTrue: 1.468 }).errorM).toBe(0);
  });

  it('too high an index reads short', () => {
    expect(groupIndexEffect({ shownKm: 25, groupIndexSet: 1.47, groupIndexTrue: 1.468 }).errorM).toBeLessThan(0);
  });
});

describe('ghost check (echo geometry, common practice)', () => {
  it('an event at twice a strong reflection’s distance may be its ghost (front connector and event)', () => {
    const r = ghostCheck({ eventKm: 4.002, reflectiveEventsKm: [2.0], toleranceM: 5 });
    expect(r.possibleGhost).toBe(true);
    expect(r.candidates[0]).toMatchObject({ path: 'front-and-event', multiple: 2, reflectorKm: 2 });
    near(r.candidates[0]!.offsetM, 2, 1e-9, 'offset');
  });

  it('an event at three times the distance is also a candidate (a second round trip)', () => {
    expect(ghostCheck({ eventKm: 6, reflectiveEventsKm: [2], toleranceM: 1 }).candidates[0]!.multiple).toBe(3);
  });

  it('between two reflections at 1.0 and 1.5 km the echo lands at 2.0 km', () => {
    const r = ghostCheck({ eventKm: 2.0, reflectiveEventsKm: [1.5, 1.0], toleranceM: 1 });
    const between = r.candidates.find((c) => c.path === 'between-events');
    expect(between).toMatchObject({ nearKm: 1, reflectorKm: 1.5, multiple: 2 });
    // The same spot is also twice the 1.0 km reflection: both paths are listed.
    expect(r.candidates.some((c) => c.path === 'front-and-event' && c.reflectorKm === 1)).toBe(true);
  });

  it('the end of a 500 m launch cord puts a ghost at 1.0 km', () => {
    expect(ghostCheck({ eventKm: 1.0, reflectiveEventsKm: [], launchCordKm: 0.5, toleranceM: 2 }).possibleGhost).toBe(true);
  });

  it('an event at no multiple is not called a ghost', () => {
    expect(ghostCheck({ eventKm: 2.7, reflectiveEventsKm: [1.0, 1.5], toleranceM: 5 }).possibleGhost).toBe(false);
  });

  it('a list that is not a list is refused in words', () => {
    expect(() => ghostCheck({ eventKm: 1, reflectiveEventsKm: 3 as unknown as number[], toleranceM: 1 })).toThrow(InputError);
  });
});
