import { describe, expect, it } from 'vitest';
import { attenuationAtWavelength, ModelError } from '../../src/physics';

// G.652.D cable maxima as the presets list them (G.652 (11/2016), from memory).
const G652D = [
  { wavelengthNm: 1310, dbPerKm: 0.4 },
  { wavelengthNm: 1550, dbPerKm: 0.3 },
  { wavelengthNm: 1625, dbPerKm: 0.4 },
];

describe('attenuation at a plan’s wavelength from the fiber type’s listed values', () => {
  it('a listed wavelength is used as is', () => {
    expect(attenuationAtWavelength({ attenuationDbPerKm: G652D, wavelengthNm: 1550 })).toMatchObject({ dbPerKm: 0.3, basis: 'listed' });
  });
  it('1490 nm lies 3/4 of the way from 1310 to 1550 nm: 0.325 dB/km (linear interpolation, common practice)', () => {
    const r = attenuationAtWavelength({ attenuationDbPerKm: G652D, wavelengthNm: 1490 });
    expect(r.basis).toBe('interpolated');
    expect(r.dbPerKm).toBeCloseTo(0.325, 12);
    expect(r.how).toMatch(/between 1310 nm .* and 1550 nm/);
  });
  it('1270 nm, below the shortest listed value, scales as λ⁻⁴ (Rayleigh scattering, Rayleigh 1899)', () => {
    const r = attenuationAtWavelength({ attenuationDbPerKm: G652D, wavelengthNm: 1270 });
    expect(r.basis).toBe('rayleigh');
    expect(r.dbPerKm).toBeCloseTo(0.4 * (1310 / 1270) ** 4, 12);
  });
  it('1640 nm, within 30 nm of the longest listed value, takes that value', () => {
    expect(attenuationAtWavelength({ attenuationDbPerKm: G652D, wavelengthNm: 1640 })).toMatchObject({ dbPerKm: 0.4, basis: 'nearest' });
  });
  it('beyond the longest listed value by more than 30 nm no estimate is made', () => {
    expect(() => attenuationAtWavelength({ attenuationDbPerKm: [{ wavelengthNm: 1310, dbPerKm: 0.4 }], wavelengthNm: 1550 })).toThrow(ModelError);
  });
  it('1383 nm is flagged as the water-peak region with no listed value there; listing one clears the flag', () => {
    expect(attenuationAtWavelength({ attenuationDbPerKm: G652D, wavelengthNm: 1383 }).waterPeakUnlisted).toBe(true);
    const withPeak = [...G652D, { wavelengthNm: 1383, dbPerKm: 0.4 }];
    const r = attenuationAtWavelength({ attenuationDbPerKm: withPeak, wavelengthNm: 1383 });
    expect(r).toMatchObject({ dbPerKm: 0.4, basis: 'listed', inWaterPeakRegion: true, waterPeakUnlisted: false });
  });
});
