import { CalcError, InputError } from '../physics/errors';

/**
 * Plain words for any error a calculation throws, never with an internal argument name
 * (`fromADb`, `elements[0].lengthKm`): those are for developers. Our own errors carry their
 * explanation; anything else is a defect, reported without internals so the screen stays calm.
 */
export function errorText(e: unknown): string {
  if (e instanceof InputError) return sentence(argumentWords(e.argument), e.allowed, e.hint);
  if (e instanceof CalcError) return e.message;
  console.error(e);
  return 'This combination could not be computed. Check the values; the last good result is kept.';
}

/** "Wavelength: type a number from 200 to 2500 nm (did you mean 1550 nm?)." */
export function sentence(subject: string, allowed: string, hint?: string): string {
  const h = hint ? ` (${hint.replace(/[.]$/, '')})` : '';
  return `${subject}: type ${allowed.replace(/^expected /, '')}${h}.`;
}

/**
 * Words for the arguments physics names, for errors whose field is not on the screen (a value
 * derived from the chosen fiber, a row of a list). A field on the screen speaks with its own label.
 */
const WORDS: Record<string, string> = {
  wavelengthNm: 'Wavelength',
  coreRadiusUm: 'Core radius of the fiber',
  coreDiameterUm: 'Core diameter',
  na: 'Numerical aperture (NA)',
  v: 'V-number',
  mfdUm: 'Mode field diameter',
  mfd1Um: 'Mode field diameter of the sending fiber',
  mfd2Um: 'Mode field diameter of the receiving fiber',
  bendRadiusMm: 'Bend radius',
  turns: 'Number of turns',
  lengthKm: 'Length',
  lateralOffsetUm: 'Lateral offset',
  tiltDeg: 'Angle',
  gapUm: 'End gap',
  powerDbm: 'Power',
  lossDb: 'Loss',
  fiber: 'Fiber',
  cutoffWavelengthNm: 'Cutoff wavelength',
};

export function argumentWords(argument: string): string {
  if (Object.hasOwn(WORDS, argument)) return WORDS[argument]!;
  // A list row: "elements[2].lengthKm" → "Row 3, length".
  const row = /^\w+\[(\d+)\]\.(\w+)$/.exec(argument);
  if (row) return `Row ${Number(row[1]) + 1}, ${(argumentWords(row[2]!)).toLowerCase()}`;
  // A picker's own field: "joint-1-coreDiameterUm" → its words.
  const tail = /-(\w+)$/.exec(argument);
  if (tail && Object.hasOwn(WORDS, tail[1]!)) return WORDS[tail[1]!]!;
  return 'One of the values';
}
