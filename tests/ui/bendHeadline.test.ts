import { describe, expect, it } from 'vitest';
import { chooseBendHeadline } from '../../src/features/bendLoss/headline';

// Macrobending loss limits as printed in ITU-T G.657 (11/2016), clause 8 "Recommended value tables":
// the category A attributes table (G.657.A1, G.657.A2) and the category B attributes table
// (G.657.B2, G.657.B3), rows "Macrobending loss: radius, number of turns, maximum at 1550 nm,
// maximum at 1625 nm". A1 and A2 rows checked against a reproduction of the category A table;
// B2 and B3 rows and the table numbering recalled from memory.
// [category, radius mm, turns, max dB at 1550 nm, max dB at 1625 nm]
const G657_TABLE: [string, number, number, number, number][] = [
  ['G.657.A1', 15, 10, 0.25, 1.0],
  ['G.657.A1', 10, 1, 0.75, 1.5],
  ['G.657.A2', 15, 10, 0.03, 0.1],
  ['G.657.A2', 10, 1, 0.1, 0.2],
  ['G.657.A2', 7.5, 1, 0.5, 1.0],
  ['G.657.B2', 15, 10, 0.03, 0.1],
  ['G.657.B2', 10, 1, 0.1, 0.2],
  ['G.657.B2', 7.5, 1, 0.5, 1.0],
  ['G.657.B3', 10, 1, 0.03, 0.1],
  ['G.657.B3', 7.5, 1, 0.08, 0.25],
  ['G.657.B3', 5, 1, 0.15, 0.45],
];
const TOL_DB = 1e-12;

describe('bend loss headline: which figure leads', () => {
  describe('a G.657 fiber at a radius the standard specifies leads with the category limit', () => {
    it.each(G657_TABLE)('%s, %s mm × %i turns: ≤ %s dB at 1550 nm, ≤ %s dB at 1625 nm', (category, radius, turns, db1550, db1625) => {
      const at1550 = chooseBendHeadline({ category, wavelengthNm: 1550, bendRadiusMm: radius, turns });
      const at1625 = chooseBendHeadline({ category, wavelengthNm: 1625, bendRadiusMm: radius, turns });
      for (const [choice, limit] of [[at1550, db1550], [at1625, db1625]] as const) {
        expect(choice.lead).toBe('category');
        if (choice.lead !== 'category') continue;
        expect(choice.basis).toBe('specified');
        expect(choice.scaledTurns).toBe(false);
        expect(Math.abs(choice.totalDb - limit)).toBeLessThan(TOL_DB);
      }
    });
  });

  it('scales the limit to the turns the person has: 3 turns at 15 mm on G.657.A1 is 3/10 of 0.25 dB', () => {
    const c = chooseBendHeadline({ category: 'G.657.A1', wavelengthNm: 1550, bendRadiusMm: 15, turns: 3 });
    expect(c.lead).toBe('category');
    if (c.lead !== 'category') return;
    expect(c.totalDb).toBeCloseTo(0.075, 12); // 0.25 dB / 10 turns × 3 turns (loss adds per turn, common practice)
    expect(c.scaledTurns).toBe(true);
  });

  it('between two specified radii it gives an estimate between their limits, marked as one', () => {
    // G.657.A2 at 1550 nm: 0.1 dB per turn at 10 mm, 0.5 dB per turn at 7.5 mm.
    const c = chooseBendHeadline({ category: 'G.657.A2', wavelengthNm: 1550, bendRadiusMm: 8.75, turns: 1 });
    expect(c.lead).toBe('category');
    if (c.lead !== 'category') return;
    expect(c.basis).toBe('between');
    expect(c.from.map((r) => r.bendRadiusMm)).toEqual([7.5, 10]);
    expect(c.totalDb).toBeGreaterThan(0.1);
    expect(c.totalDb).toBeLessThan(0.5);
    // Halfway in radius is the geometric mean of the two per-turn limits (loss exponential in R).
    expect(c.totalDb).toBeCloseTo(Math.sqrt(0.1 * 0.5), 12);
  });

  it('a gentler bend than any specified is bounded by the largest radius limit', () => {
    // G.657.B3's largest specified radius is 10 mm (0.03 dB per turn at 1550 nm).
    const c = chooseBendHeadline({ category: 'G.657.B3', wavelengthNm: 1550, bendRadiusMm: 20, turns: 2 });
    expect(c.lead).toBe('category');
    if (c.lead !== 'category') return;
    expect(c.basis).toBe('gentler');
    expect(c.totalDb).toBeCloseTo(0.06, 12);
  });

  it('a bend tighter than the tightest specified radius gets no category figure (and never the model)', () => {
    // G.657.A1 specifies nothing below 10 mm.
    const c = chooseBendHeadline({ category: 'G.657.A1', wavelengthNm: 1550, bendRadiusMm: 7.5, turns: 1 });
    expect(c).toEqual({ lead: 'category-silent', category: 'G.657.A1', why: 'tighter-than-specified', limitValue: 10 });
  });

  it('at 1310 nm the 1550 nm limit is used as a bound; at 1577 nm the 1625 nm limit', () => {
    const at1310 = chooseBendHeadline({ category: 'G.657.A2', wavelengthNm: 1310, bendRadiusMm: 10, turns: 1 });
    const at1577 = chooseBendHeadline({ category: 'G.657.A2', wavelengthNm: 1577, bendRadiusMm: 10, turns: 1 });
    expect(at1310).toMatchObject({ lead: 'category', limitWavelengthNm: 1550, shorterWavelength: true });
    expect(at1577).toMatchObject({ lead: 'category', limitWavelengthNm: 1625, shorterWavelength: true });
    if (at1310.lead === 'category') expect(at1310.totalDb).toBeCloseTo(0.1, 12);
    if (at1577.lead === 'category') expect(at1577.totalDb).toBeCloseTo(0.2, 12);
  });

  it('beyond 1625 nm the standard says nothing: no category figure', () => {
    expect(chooseBendHeadline({ category: 'G.657.B2', wavelengthNm: 1650, bendRadiusMm: 10, turns: 1 })).toMatchObject({
      lead: 'category-silent',
      why: 'wavelength-beyond-specified',
    });
  });

  it.each([['G.652.D'], ['G.654.E'], [undefined]])('a step-index fiber (%s) leads with the step-index model', (category) => {
    expect(chooseBendHeadline({ category, wavelengthNm: 1550, bendRadiusMm: 15, turns: 10 })).toEqual({ lead: 'model' });
  });
});
