import { describe, expect, it } from 'vitest';
import { keepNumbersWithUnits as keepNumbersWhole } from '../../src/ui/keepTogether';

const NB = '\u00a0';

describe('numbers in physics prose stay whole on screen (the text rule every rendered text node goes through)', () => {
  it.each([
    ['at 1550 nm and 10 mW is set', `at 1550${NB}nm and 10${NB}mW is set`],
    ['maximum 0.75 dB per mated pair', `maximum 0.75${NB}dB per mated pair`],
    ['0.1 / 0.3 / 0.5 dB excess', `0.1${NB}/${NB}0.3${NB}/${NB}0.5${NB}dB excess`],
    ['3.5 / 1.5 dB/km at 850 / 1300 nm', `3.5${NB}/${NB}1.5${NB}dB/km at 850${NB}/${NB}1300${NB}nm`],
    ['500 mW upper limit', `500${NB}mW upper limit`],
  ])('%s', (text, expected) => {
    expect(keepNumbersWhole(text)).toBe(expected);
  });

  it('leaves words that only start like a unit alone', () => {
    expect(keepNumbersWhole('2 metres and 3 months')).toBe('2 metres and 3 months');
    expect(keepNumbersWhole('level 4 is not allowed')).toBe('level 4 is not allowed');
  });
});
