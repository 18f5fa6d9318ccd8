import { describe, expect, it } from 'vitest';
import { formatFixed, formatNumber } from '../../src/ui/format';
import { niceTicks } from '../../src/ui/ticks';
import { reportText } from '../../src/ui/copyText';
import { keepNumbersWithUnits } from '../../src/ui/keepTogether';

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

describe('a number and its unit stay together in text built from data', () => {
  it.each([
    ['cutoff 1260 nm on the label', 'cutoff 1260\u00a0nm on the label'],
    ['0.35 dB/km at 1310 nm', '0.35\u00a0dB/km at 1310\u00a0nm'],
    ['−3 dBm and 0.5 mW', '−3\u00a0dBm and 0.5\u00a0mW'],
    ['1 turn, 10 turns, 30 %', '1\u00a0turn, 10\u00a0turns, 30\u00a0%'],
    ['G.652 fiber, 2 modes', 'G.652 fiber, 2 modes'],
    ['12 mmHg is no unit of ours', '12 mmHg is no unit of ours'],
  ])('"%s" is laid out as "%s"', (text, expected) => {
    expect(keepNumbersWithUnits(text)).toBe(expected);
  });
});
