// What a person reads when a value is refused: the field's own label and unit, one range, a hint
// that fits the quantity, and never a developer's argument name.
import { describe, expect, it } from 'vitest';
import { cardError, SEE_MARKED_FIELD } from '../../src/ui/useResult';
import { argumentWords, errorText } from '../../src/ui/errorText';
import { parseErrorText, toggleSign } from '../../src/ui/NumberField';
import { InputError, ModelError, requireWavelengthNm } from '../../src/physics';
import { parseQuantity } from '../../src/physics/units';
import type { QuantityState } from '../../src/ui/useQuantity';

/** A developer's name: lower camelCase with a capital inside (fromADb, bendRadiusMm) or a list path. */
const INTERNAL_NAME = /\b[a-z]+[A-Z][A-Za-z0-9]*\b|\w+\[\d+\]\.\w+/;
const TRADE_WORDS = /\b(dBm?|mW|µW|nW|kHz|MHz|GHz|THz)\b/g;

function quantity(text: string, argument: string, kind: QuantityState['kind']): QuantityState {
  let failure: InputError | undefined;
  try {
    parseQuantity(argument, text, kind);
  } catch (e) {
    failure = e as InputError;
  }
  return { text, setText: () => undefined, value: undefined, error: failure && SEE_MARKED_FIELD, conversion: '', argument, kind, failure };
}

describe('a refused value is explained in the words on the screen', () => {
  it('the headline points at the field when the field itself explains the error', () => {
    expect(cardError({ error: 'Wavelength: type …', errorArgument: 'wavelengthNm' }, ['wavelengthNm'])).toBe(SEE_MARKED_FIELD);
  });

  it('the headline says the error in full when no field on the screen names it', () => {
    expect(cardError({ error: 'Pick a fiber type.', errorArgument: 'fiber' }, ['wavelengthNm'])).toBe('Pick a fiber type.');
    expect(cardError({ error: undefined, errorArgument: undefined }, ['wavelengthNm'])).toBeUndefined();
  });

  it('a wavelength out of range reads "Wavelength: type a number from 200 to 2500 nm", with the µm slip caught', () => {
    let text = '';
    try {
      requireWavelengthNm('wavelengthNm', 1.55);
    } catch (e) {
      text = errorText(e);
    }
    expect(text).toBe('Wavelength: type a number from 200 to 2500 nm (did you mean 1550 nm (1.55 µm)?).');
    expect(text.replace(TRADE_WORDS, '')).not.toMatch(INTERNAL_NAME);
  });

  it.each([
    ['elements[2].lengthKm', 'Row 3, length'],
    ['joint-1-coreDiameterUm', 'Core diameter'],
    ['somethingInternalDb', 'One of the values'],
  ])('the argument %s is said as "%s"', (argument, words) => {
    expect(argumentWords(argument)).toBe(words);
    expect(errorText(new InputError(argument, -1, 'a number ≥ 0 km'))).not.toMatch(INTERNAL_NAME);
  });

  it('a model that refuses says its own sentence', () => {
    expect(errorText(new ModelError('No step-index fiber gives this cutoff and MFD together.', 'label fit'))).toBe('No step-index fiber gives this cutoff and MFD together.');
  });

  it('a dB reading that is not a number names the field and gives a dB example, not a wavelength one', () => {
    const q = quantity('abc', 'fromADb', 'plain');
    const text = parseErrorText(q, 'Splice reading measured from A', 'dB', 'such as −0.05')!;
    expect(text.startsWith('Splice reading measured from A: type a number in dB, such as −0.05')).toBe(true);
    expect(text).not.toContain('1550');
    expect(text.replace(TRADE_WORDS, '')).not.toMatch(INTERNAL_NAME);
  });
});

describe('the ± key of a decimal keypad', () => {
  it.each([
    ['3', '-3'],
    ['-3', '3'],
    ['−3', '3'],
    ['–3', '3'],
    ['+0.5', '-0.5'],
    ['', '-'],
  ])('turns "%s" into "%s"', (before, after) => {
    expect(toggleSign(before)).toBe(after);
  });
});
