import { describe, expect, it } from 'vitest';
import { InputError, requireNumber, requireWavelengthNm } from '../../src/physics/errors';

describe('input errors say which argument, what range and the likely slip', () => {
  it('a wavelength typed in µm gets a "did you mean" in nm', () => {
    expect(() => requireWavelengthNm('wavelengthNm', 1.55)).toThrow(/did you mean 1550 nm/);
  });

  it('a wavelength typed in metres gets a "did you mean" in nm', () => {
    expect(() => requireWavelengthNm('wavelengthNm', 1.31e-6)).toThrow(/did you mean 1310 nm/);
  });

  it.each([NaN, Infinity, -Infinity, undefined, '1550'])('refuses %s as a wavelength', (v) => {
    expect(() => requireWavelengthNm('wavelengthNm', v)).toThrow(InputError);
  });

  it('names the argument and the allowed range', () => {
    try {
      requireNumber('na', 1.2, { min: 0, max: 1, maxInclusive: false });
      expect.unreachable();
    } catch (e) {
      const err = e as InputError;
      expect(err.argument).toBe('na');
      expect(err.allowed).toBe('a number ≥ 0 and < 1');
    }
  });

  it('describes NaN in words, never as a bare NaN', () => {
    expect(() => requireNumber('lengthKm', NaN)).toThrow('lengthKm = NaN (not a number)');
  });
});
