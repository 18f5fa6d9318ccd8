import { useMemo, useRef } from 'preact/hooks';
import { InputError } from '../physics/errors';
import { errorText } from './errorText';

/** An InputError's parts, so the field it names can explain it with its own label and unit. */
export interface FieldFault {
  argument: string;
  allowed: string;
  hint?: string;
}

export interface ResultState<R> {
  /** The latest good result; on error, the last good one (then `stale` is true). */
  result: R | undefined;
  /** Plain-words reason the current inputs give no result (no internal names). */
  error: string | undefined;
  /** The argument an InputError named, so the field itself can show the message. */
  errorArgument: string | undefined;
  /** The InputError's range and hint, for the field that shows it. */
  fault?: FieldFault;
  /** True when `result` belongs to earlier inputs. */
  stale: boolean;
}

export function faultOf(e: unknown): FieldFault | undefined {
  return e instanceof InputError ? { argument: e.argument, allowed: e.allowed, hint: e.hint } : undefined;
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
      const fault = faultOf(e);
      return {
        result: lastGood.current,
        error: errorText(e),
        errorArgument: fault?.argument,
        fault,
        stale: lastGood.current !== undefined,
      };
    }
  }, deps);
}

/** What the headline says when a field already explains the fault beside itself. */
export const SEE_MARKED_FIELD = 'Check the field marked ⚠.';

/**
 * The error line of the headline or a card. When the error names a field on the screen, that
 * field already explains it, so the headline points there instead of saying it twice.
 */
export function cardError(state: Pick<ResultState<unknown>, 'error' | 'errorArgument'>, fieldArguments: readonly string[]): string | undefined {
  return state.errorArgument !== undefined && fieldArguments.includes(state.errorArgument) ? SEE_MARKED_FIELD : state.error;
}
