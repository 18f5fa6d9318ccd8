import { describe, expect, it } from 'vitest';
import { formatFixed, formatNumber } from '../../src/ui/format';
import { niceTicks } from '../../src/ui/ticks';
import { reportText } from '../../src/ui/copyText';

describe('numbers on screen', () => {
  it.each([NaN, Infinity, -Infinity, undefined])('%s is shown as a dash, never as NaN or Infinity', (v) => {
    expect(formatNumber(v)).toBe('—');
    expect(formatFixed(v, 2)).toBe('—');
  });

  it.each([
    [1550, 4, '1550'],
    [2.40482, 4, '2.405'],
    [0.000123, 3, '1.23\u00a0×\u00a010^-4'],
    [8.6123, 3, '8.61'],
  ])('%s to %s significant digits reads %s', (v, sig, expected) => {
    expect(formatNumber(v, sig)).toBe(expected);
  });

  it('a tiny negative loss rounds to 0.00, not -0.00', () => {
    expect(formatFixed(-0.0001, 2)).toBe('0.00');
  });
});

describe('plot axes', () => {
  it('linear ticks fall on 1-2-5 steps inside the range', () => {
    expect(niceTicks(0, 10, 5)).toEqual([0, 2, 4, 6, 8, 10]);
  });

  it('log ticks fall on decades', () => {
    expect(niceTicks(-3, 1, 6, true)).toEqual([0.001, 0.01, 0.1, 1, 10]);
  });
});

describe('hand-over text', () => {
  it('holds inputs, results, assumptions, date and version', () => {
    const t = reportText({
      title: 'Joint loss',
      inputs: [['Wavelength', '1550 nm']],
      outputs: [['Loss', '0.12 dB']],
      assumptions: ['Gaussian fields'],
      date: new Date('2026-12-01T10:00:00Z'),
    });
    expect(t).toContain('Wavelength: 1550 nm');
    expect(t).toContain('Loss: 0.12 dB');
    expect(t).toContain('- Gaussian fields');
    expect(t).toContain('2026-12-01 10:00 UTC');
    expect(t).toMatch(/Modewright .* \(build .*\)/);
  });
});
