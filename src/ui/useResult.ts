import { useMemo, useRef } from 'preact/hooks';
import { InputError } from '../physics/errors';
import { errorText } from './errorText';

export interface ResultState<R> {
  /** The latest good result; on error, the last good one (then `stale` is true). */
  result: R | undefined;
  /** Plain-words reason the current inputs give no result. */
  error: string | undefined;
  /** The argument an InputError named, so the field itself can show the message. */
  errorArgument: string | undefined;
  /** True when `result` belongs to earlier inputs. */
  stale: boolean;
}

/**
 * Runs a synchronous computation whenever `deps` change. A thrown error never blanks the
 * screen: the last good result stays, marked stale, and the error is said in plain words.
 */
export function useResult<R>(compute: () => R, deps: unknown[]): ResultState<R> {
  const lastGood = useRef<R | undefined>(undefined);
  return useMemo(() => {
    try {
      const result = compute();
      lastGood.current = result;
      return { result, error: undefined, errorArgument: undefined, stale: false };
    } catch (e) {
      return {
        result: lastGood.current,
        error: errorText(e),
        errorArgument: e instanceof InputError ? e.argument : undefined,
        stale: lastGood.current !== undefined,
      };
    }
  }, deps);
}

/**
 * The error line of a result card. When the error names a field on the screen, that field
 * already explains it, so the card points there instead of saying it twice.
 */
export function cardError(state: Pick<ResultState<unknown>, 'error' | 'errorArgument'>, fieldArguments: readonly string[]): string | undefined {
  return state.errorArgument !== undefined && fieldArguments.includes(state.errorArgument) ? 'Check the value marked above.' : state.error;
}
