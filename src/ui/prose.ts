// Sentences that come from physics (hazard context, rule-set sources) are written with ordinary
// spaces. On screen a value and its unit must stay on one line: this joins them with a no-break space.
import { NBSP } from './format';

/** Units that follow a number in the prose of the physics layer. */
const UNIT = '(?:dB\\/km|dBm|dB|nm|µm|mW|µW|nW|W|km|mm|m|°|%)';
const NUMBER_THEN_UNIT = new RegExp(`(\\d)[ \\t]+(${UNIT})(?![\\w/])`, 'g');
/** "0.1 / 0.3 / 0.5 dB": the slashes of a spread stay with their numbers. */
const SPREAD = /(\d) \/ (?=[\d−-])/g;

/** The text with every "number unit" and "a / b" spread joined by no-break spaces. */
export function keepNumbersWhole(text: string): string {
  return text.replace(NUMBER_THEN_UNIT, `$1${NBSP}$2`).replace(SPREAD, `$1${NBSP}/${NBSP}`);
}
