// Number formatting for the screen. Never shows "NaN" or "Infinity": a value that is
// not finite is shown as a dash, because a number on screen must be one a person can use.

export const NOT_A_NUMBER_TEXT = '—';

/**
 * The space between a number and its unit, and inside a number: a no-break space, so a value and
 * its unit are laid out on one line at any width (a broken number is a misread number).
 */
export const NBSP = '\u00a0';

/** Significant-digit formatting without exponent for everyday magnitudes. */
export function formatNumber(v: number | undefined, significant = 4): string {
  if (v === undefined || !Number.isFinite(v)) return NOT_A_NUMBER_TEXT;
  if (v === 0) return '0';
  const a = Math.abs(v);
  if (a >= 1e-3 && a < 1e7) {
    const digits = Math.max(0, significant - 1 - Math.floor(Math.log10(a)));
    return trimZeros(v.toFixed(Math.min(digits, 12)));
  }
  return v.toExponential(Math.max(0, significant - 1)).replace('e', `${NBSP}×${NBSP}10^`).replace('^+', '^');
}

/** Fixed decimals, the way dB and dBm are read off a meter. */
export function formatFixed(v: number | undefined, decimals: number): string {
  if (v === undefined || !Number.isFinite(v)) return NOT_A_NUMBER_TEXT;
  const s = v.toFixed(decimals);
  return s === `-${(0).toFixed(decimals)}` ? (0).toFixed(decimals) : s;
}

export function formatDb(v: number | undefined, decimals = 2): string {
  return withUnit(formatFixed(v, decimals), 'dB');
}

export function formatPercent(fraction: number | undefined, decimals = 1): string {
  return fraction === undefined ? NOT_A_NUMBER_TEXT : withUnit(formatFixed(fraction * 100, decimals), '%');
}

/** A formatted number and its unit, joined by a no-break space. */
export function withUnit(value: string, unit: string): string {
  return unit ? `${value}${NBSP}${unit}` : value;
}

/** formatNumber with its unit, unbreakable: `formatQuantity(9.21, 'µm')` → "9.21 µm". */
export function formatQuantity(v: number | undefined, unit: string, significant = 4): string {
  return withUnit(formatNumber(v, significant), unit);
}


function trimZeros(s: string): string {
  return s.includes('.') ? s.replace(/\.?0+$/, '') : s;
}

/** An LP mode's name (LP01, LP10,1): defined with the modes, so the physics' own sentences use it too. */
export { lpName } from '../physics';
