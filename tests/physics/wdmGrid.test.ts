import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  bandOf,
  CWDM_CHANNEL_COUNT,
  cwdmChannels,
  DWDM_SPACINGS_GHZ,
  dwdmChannel,
  dwdmChannelsInBand,
  flexGridSlot,
  frequencyThzToWavelengthNm,
  InputError,
  nearestCwdmChannel,
  nearestDwdmChannel,
  nearestFlexCentre,
  OPTICAL_BANDS,
  SPEED_OF_LIGHT_M_PER_S,
  wavelengthNmToFrequencyThz,
} from '../../src/physics';

const SEED = 20261202;

describe('frequency ⇄ vacuum wavelength with c = 299 792 458 m/s (exact, SI definition of the metre)', () => {
  it('c is the exact SI value', () => {
    expect(SPEED_OF_LIGHT_M_PER_S).toBe(299_792_458);
  });
  // λ = c / f: 299 792 458 / 193.1e12 m = 1552.5244 nm; 299 792 458 / 196.1e12 m = 1528.7734 nm (definition; the
  // same figures G.694.1 prints in its table of grid points to two decimals).
  it.each([
    [193.1, 1552.52],
    [196.1, 1528.77],
    [193.4, 1550.12],
    [191.7, 1563.86],
  ])('%s THz is %s nm', (thz, nm) => {
    expect(frequencyThzToWavelengthNm({ frequencyThz: thz }).toFixed(2)).toBe(nm.toFixed(2));
  });
  it('frequency → wavelength → frequency returns within 1 MHz anywhere from 1260 to 1675 nm (fixed seed)', () => {
    fc.assert(
      fc.property(fc.double({ min: 179, max: 237.9, noNaN: true }), (thz) => {
        const back = wavelengthNmToFrequencyThz({ wavelengthNm: frequencyThzToWavelengthNm({ frequencyThz: thz }) });
        const errorMHz = Math.abs(back - thz) * 1e6;
        if (!(errorMHz <= 1)) throw new Error(`${thz} THz came back as ${back} THz (${errorMHz} MHz off, tolerance 1 MHz)`);
      }),
      { seed: SEED, numRuns: 2000 },
    );
  });
  it('a wavelength typed into the frequency field gets a hint', () => {
    expect(() => frequencyThzToWavelengthNm({ frequencyThz: 1550 })).toThrow(/did you mean 1550 nm/);
  });
});

describe('dense grid, ITU-T G.694.1', () => {
  it('the anchor channel n = 0 is 193.1 THz at every spacing', () => {
    for (const spacingGHz of DWDM_SPACINGS_GHZ) expect(dwdmChannel({ n: 0, spacingGHz }).frequencyThz).toBe(193.1);
  });
  it('channel n lies at 193.1 THz + n × spacing (G.694.1 fixed grid)', () => {
    expect(dwdmChannel({ n: 30, spacingGHz: 100 }).frequencyThz).toBeCloseTo(196.1, 12);
    expect(dwdmChannel({ n: -3, spacingGHz: 12.5 }).frequencyThz).toBeCloseTo(193.0625, 12);
  });
  it('a 1550.12 nm transceiver sits on the 100 GHz channel at 193.40 THz, 0.3 GHz below it', () => {
    const r = nearestDwdmChannel({ wavelengthNm: 1550.12, spacingGHz: 100 });
    expect(r.channel.n).toBe(3);
    expect(r.channel.frequencyThz).toBeCloseTo(193.4, 12);
    // 299 792 458 / 1550.12 nm = 193 399.7 GHz (definition): 0.3 GHz below the grid point.
    expect(r.offsetGHz).toBeCloseTo(299_792_458 / 1550.12 - 193_400, 9);
    expect(Math.abs(r.offsetGHz)).toBeLessThan(1);
  });
  it('a laser midway between two 50 GHz channels is half a spacing off', () => {
    const r = nearestDwdmChannel({ frequencyThz: 193.125, spacingGHz: 50 });
    expect(r.offsetShareOfSpacing).toBeCloseTo(0.5, 9);
  });
  it('every C-band channel at 100 GHz is inside 1530–1565 nm and 100 GHz from the next', () => {
    const list = dwdmChannelsInBand({ band: 'C', spacingGHz: 100 });
    expect(list.length).toBeGreaterThan(40);
    list.forEach((c, i) => {
      expect(c.wavelengthNm).toBeGreaterThanOrEqual(1530);
      expect(c.wavelengthNm).toBeLessThan(1565);
      if (i > 0) expect((list[i - 1]!.frequencyThz - c.frequencyThz) * 1000).toBeCloseTo(100, 6);
    });
  });
  it('a spacing the grid does not have is refused', () => {
    expect(() => dwdmChannel({ n: 0, spacingGHz: 75 as 100 })).toThrow(InputError);
  });
});

describe('flexible grid, ITU-T G.694.1', () => {
  // Worked slots as reproduced in the flexible-grid framework (IETF RFC 7698 and its tutorials):
  // n = −5, m = 3 → 193.06875 THz, 37.5 GHz; n = 4, m = 4 → 193.125 THz, 50 GHz.
  it.each([
    [-5, 3, 193.06875, 37.5],
    [4, 4, 193.125, 50],
  ])('slot n = %s, m = %s is centred at %s THz, %s GHz wide', (n, m, centre, width) => {
    const s = flexGridSlot({ n, m });
    expect(s.centreThz).toBeCloseTo(centre, 12);
    expect(s.widthGHz).toBe(width);
    expect((s.upperEdgeThz - s.lowerEdgeThz) * 1000).toBeCloseTo(width, 9);
  });
  it('the nearest flexible centre is never more than 3.125 GHz away', () => {
    fc.assert(
      fc.property(fc.double({ min: 185, max: 200, noNaN: true }), (thz) => {
        expect(Math.abs(nearestFlexCentre({ frequencyThz: thz }).offsetGHz)).toBeLessThanOrEqual(3.125 + 1e-6);
      }),
      { seed: SEED, numRuns: 500 },
    );
  });
});

describe('coarse grid, ITU-T G.694.2 (12/2003)', () => {
  const ch = cwdmChannels();
  it('has 18 channels from 1271 to 1611 nm, 20 nm apart (the 2003 edition moved the 2002 grid by 1 nm)', () => {
    expect(CWDM_CHANNEL_COUNT).toBe(18);
    expect(ch).toHaveLength(18);
    expect(ch[0]!.wavelengthNm).toBe(1271);
    expect(ch[17]!.wavelengthNm).toBe(1611);
    ch.forEach((c, i) => i > 0 && expect(c.wavelengthNm - ch[i - 1]!.wavelengthNm).toBe(20));
  });
  it('1551 nm is channel 15 in the C band; 1383 nm is nearest channel 7 (1391 nm), 8 nm short of it', () => {
    expect(ch[14]).toMatchObject({ number: 15, wavelengthNm: 1551, band: 'C' });
    const r = nearestCwdmChannel({ wavelengthNm: 1383 });
    expect(r.channel.wavelengthNm).toBe(1391);
    expect(r.offsetNm).toBe(-8);
  });
});

describe('bands (ITU-T G-series Supplement 39, from memory)', () => {
  it.each([
    [1310, 'O'],
    [1383, 'E'],
    [1490, 'S'],
    [1550, 'C'],
    [1577, 'L'],
    [1650, 'U'],
    [850, undefined],
  ])('%s nm is in band %s', (nm, band) => {
    expect(bandOf({ wavelengthNm: nm })).toBe(band);
  });
  it('the bands tile 1260–1675 nm without gaps', () => {
    OPTICAL_BANDS.forEach((b, i) => i > 0 && expect(b.fromNm).toBe(OPTICAL_BANDS[i - 1]!.toNm));
  });
});
