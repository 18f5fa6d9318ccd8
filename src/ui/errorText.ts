import { CalcError, InputError } from '../physics/errors';

/**
 * Plain words for any error a calculation throws. Our own errors carry their explanation;
 * anything else is a defect, reported without internals so the screen stays calm.
 */
export function errorText(e: unknown): string {
  if (e instanceof InputError) return e.message;
  if (e instanceof CalcError) return e.message;
  console.error(e);
  return 'This combination could not be computed. Check the values; the last good result is kept.';
}
