import { describe, expect, it } from 'vitest';
import { lpName } from '../../src/ui/format';

// LP mode names: LP_lm with l the azimuthal and m the radial order (Gloge 1971, Appl. Opt. 10(10)).
// Written without subscripts, two indices run together only while both are single digits; with a
// two-digit index a comma separates them (common practice, as in "LP_{10,1}"), so a technician never
// reads LP101 as LP10,1 or LP1,01.
describe('LP mode names as printed', () => {
  it.each([
    [0, 1, 'LP01'],
    [1, 1, 'LP11'],
    [2, 3, 'LP23'],
    [9, 9, 'LP99'],
    [10, 1, 'LP10,1'],
    [1, 10, 'LP1,10'],
    [0, 12, 'LP0,12'],
    [12, 10, 'LP12,10'],
  ])('l = %i, m = %i is written %s', (l, m, expected) => {
    expect(lpName(l, m)).toBe(expected);
  });

  it('LP10,1 and LP1,01 can never print alike', () => {
    expect(lpName(10, 1)).not.toBe(lpName(1, 1));
    expect(lpName(10, 1)).not.toBe('LP101');
  });
});
