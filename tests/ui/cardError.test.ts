import { describe, expect, it } from 'vitest';
import { cardError } from '../../src/ui/useResult';

describe('a result card says an error once', () => {
  it('points at the field when the field itself explains the error', () => {
    expect(cardError({ error: 'wavelengthNm = 1.55 is not allowed…', errorArgument: 'wavelengthNm' }, ['wavelengthNm'])).toBe('Check the value marked above.');
  });

  it('says the error in full when no field on the screen names it', () => {
    expect(cardError({ error: 'Pick a fiber type.', errorArgument: 'fiber' }, ['wavelengthNm'])).toBe('Pick a fiber type.');
  });

  it('says nothing when there is no error', () => {
    expect(cardError({ error: undefined, errorArgument: undefined }, ['wavelengthNm'])).toBeUndefined();
  });
});
