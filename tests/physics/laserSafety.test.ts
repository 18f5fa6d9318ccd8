import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  CLASS_3B_UPPER_LIMIT_MW,
  GOVERNING_STATEMENT,
  HAZARD_LEVELS,
  hazardContextText,
  IEC_60825_2_EDITION,
  InputError,
  laserHazardContext,
  LEVELS_ALLOWED_BY_LOCATION,
  USUAL_LASER_CAUTIONS,
} from '../../src/physics';

// Phrasing that would suggest a power level is all right to look at. None may appear anywhere (the user's rule).
const FORBIDDEN = /safe to (look|view|stare|see)|eye[- ]?safe|harmless|no (eye )?hazard|safe for (the )?eyes?|\bis safe\b|\bare safe\b|safe level|safely (look|view)/i;

function allText(c: ReturnType<typeof laserHazardContext>): string {
  return hazardContextText(c) + '\n' + JSON.stringify(c);
}

const arbInput = fc.record({
  wavelengthNm: fc.double({ min: 200, max: 2500, noNaN: true }),
  powerDbm: fc.double({ min: -150, max: 90, noNaN: true }),
});

describe('wording guarantees', () => {
  it('no result, at any wavelength and power, says or suggests a level is all right to look at', () => {
    fc.assert(
      fc.property(arbInput, (input) => {
        const text = allText(laserHazardContext(input));
        const m = FORBIDDEN.exec(text);
        if (m) throw new Error(`input ${JSON.stringify(input)}: forbidden phrase "${m[0]}" in ${text}`);
      }),
      { numRuns: 500 },
    );
  });

  it('the fixed texts carry no such phrasing either', () => {
    for (const t of [...USUAL_LASER_CAUTIONS, GOVERNING_STATEMENT]) expect(t).not.toMatch(FORBIDDEN);
  });

  it('the forbidden-phrase check itself catches the phrasings it is meant to catch', () => {
    for (const bad of ['This level is safe to look at.', 'eye-safe output', 'Harmless at this power', 'Class 1 is safe for the eye']) {
      expect(bad).toMatch(FORBIDDEN);
    }
  });

  it('the usual cautions, the level statement and the governing statement are always present', () => {
    fc.assert(
      fc.property(arbInput, (input) => {
        const c = laserHazardContext(input);
        for (const u of USUAL_LASER_CAUTIONS) expect(c.cautions).toContain(u);
        expect(c.governing).toBe(GOVERNING_STATEMENT);
        expect(c.levelStatement.length).toBeGreaterThan(0);
        const text = hazardContextText(c);
        expect(text).toContain(GOVERNING_STATEMENT);
        expect(text).toContain(USUAL_LASER_CAUTIONS[0]!);
      }),
    );
  });

  it('the cautions name the inspection scope with a filter, live fibers and shards', () => {
    const text = USUAL_LASER_CAUTIONS.join(' ');
    expect(text).toMatch(/never look into a fiber end/i);
    expect(text).toMatch(/inspection scope that has a laser filter|camera probe that shows the end face on a screen/i);
    expect(text).toMatch(/treat every fiber as live/i);
    expect(text).toMatch(/shards/i);
  });
});

describe('hazard level', () => {
  // IEC 60825-1:2014: class 3B ends at 500 mW continuous (0.5 W); above it, class / hazard level 4.
  it.each([
    [1550, 27], // 501 mW
    [1480, 33], // Raman pump range, 2 W
  ])('at %s nm and %s dBm it gives indicative level 4 with the edition named', (w, dbm) => {
    const c = laserHazardContext({ wavelengthNm: w, powerDbm: dbm });
    expect(c.powerMw).toBeGreaterThanOrEqual(CLASS_3B_UPPER_LIMIT_MW);
    expect(c.indicativeLevel?.level).toBe('4');
    expect(c.indicativeLevel?.statement).toMatch(/^Indicative:/);
    expect(c.indicativeLevel?.source).toContain(IEC_60825_2_EDITION);
  });

  it.each([
    [1310, -3],
    [1550, 10],
    [850, -20],
    [1550, 26.9],
  ])('at %s nm and %s dBm it states no level and sends you to the standard as adopted locally', (w, dbm) => {
    const c = laserHazardContext({ wavelengthNm: w, powerDbm: dbm });
    expect(c.indicativeLevel).toBeUndefined();
    expect(c.levelStatement).toContain('look up the limit in the standard as adopted locally');
    expect(c.levelStatement).toContain(IEC_60825_2_EDITION);
  });

  it('lists the seven hazard levels of IEC 60825-2 and the levels each kind of location allows', () => {
    expect(HAZARD_LEVELS).toEqual(['1', '1M', '2', '2M', '3R', '3B', '4']);
    // STUK, "Lasers in optic cables": unrestricted 1–2M, restricted up to 3R, controlled up to 3B; level 4 nowhere.
    expect(LEVELS_ALLOWED_BY_LOCATION.unrestricted).toEqual(['1', '1M', '2', '2M']);
    expect(LEVELS_ALLOWED_BY_LOCATION.restricted.at(-1)).toBe('3R');
    expect(LEVELS_ALLOWED_BY_LOCATION.controlled.at(-1)).toBe('3B');
    for (const levels of Object.values(LEVELS_ALLOWED_BY_LOCATION)) expect(levels).not.toContain('4');
  });
});

describe('wavelength context', () => {
  it.each([850, 1310, 1550, 1625])('%s nm is called invisible infrared with no blink reflex', (w) => {
    const c = laserHazardContext({ wavelengthNm: w, powerDbm: 0 });
    expect(c.band).toBe('infrared');
    expect(c.wavelengthNote).toMatch(/invisible/);
    expect(c.wavelengthNote).toMatch(/no blink reflex/);
  });

  it('650 nm (a visual fault locator) is visible, and the note warns about invisible light in the same fiber', () => {
    const c = laserHazardContext({ wavelengthNm: 650, powerDbm: 0 });
    expect(c.band).toBe('visible');
    expect(c.wavelengthNote).toMatch(/invisible light/);
  });
});

describe('bad input', () => {
  it.each([
    ['a wavelength in µm', { wavelengthNm: 1.55, powerDbm: 0 }],
    ['NaN power', { wavelengthNm: 1550, powerDbm: Number.NaN }],
    ['a power beyond +90 dBm', { wavelengthNm: 1550, powerDbm: 120 }],
  ])('%s is refused', (_n, input) => {
    expect(() => laserHazardContext(input)).toThrow(InputError);
  });
});
