import { useEffect, useRef, useState } from 'preact/hooks';
import type { WorkerReply } from '../app/workerProtocol';
import type { ResultState } from './useResult';

export interface ComputedState<R> extends ResultState<R> {
  /** True while the worker is computing for the current input. */
  busy: boolean;
}

const DEFECT_TEXT = 'This combination could not be computed. Check the values; the last good result is kept.';

function startWorker(): Worker {
  return new Worker(new URL('../app/compute.worker.ts', import.meta.url), { type: 'module' });
}

/**
 * How long a typed value must rest before a worker task starts. A number typed key by key
 * (1, 13, 131, 1310) is then computed once, not once per key. Each computation also ends the worker
 * still busy with the older input and starts a fresh one: on a phone with few cores, that worker
 * start-up and the solve took the CPU from the page, and the field lagged behind the thumb (typing
 * into offset launch at CPU ÷4: longest main-thread task 190 ms computing per key, under 50 ms with
 * this pause).
 */
export const TYPING_PAUSE_MS = 250;

/**
 * Runs the named task of src/features/tasks.ts in a Web Worker whenever `input` changes
 * (compared by its JSON form). The latest input wins: a job still running for older
 * input is cancelled by ending that worker, since a synchronous solve cannot be interrupted.
 * `inputError` (a field that does not parse) skips the run and marks the result stale.
 *
 * The first input is computed at once; a later one once it has stayed the same for `settleMs`
 * (TYPING_PAUSE_MS unless told; 0 starts at once). The state says busy from the first key, exactly as
 * while a job runs.
 */
export function useComputed<I, R>(task: string, input: I | undefined, inputError?: string, settleMs = TYPING_PAUSE_MS): ComputedState<R> {
  const [state, setState] = useState<ComputedState<R>>({ result: undefined, error: undefined, errorArgument: undefined, stale: false, busy: false });
  const worker = useRef<Worker | undefined>(undefined);
  const running = useRef(0);
  const seq = useRef(0);
  const posted = useRef(false);
  const key = input === undefined ? undefined : JSON.stringify(input);

  useEffect(() => () => worker.current?.terminate(), []);

  useEffect(() => {
    if (key === undefined || inputError) {
      // Nothing to compute; a job still running for the earlier input must not land as if current.
      ++seq.current;
      cancelRunning();
      setState((s) => ({ ...s, error: inputError ?? s.error, errorArgument: undefined, fault: undefined, stale: s.result !== undefined, busy: false }));
      return;
    }
    // The first input is computed at once: nobody is typing yet, and the answer should show as soon as it can.
    if (settleMs <= 0 || !posted.current) {
      posted.current = true;
      post(key);
      return;
    }
    ++seq.current; // a reply still on its way belongs to older input
    cancelRunning(); // and the job computing it is ended now, not at the next post: it would take a core from the typing
    setState((s) => (s.busy ? s : { ...s, busy: true }));
    const timer = setTimeout(() => post(key), settleMs);
    return () => clearTimeout(timer);
  }, [task, key, inputError, settleMs]);

  /** Ends the worker if it is still computing (a synchronous solve cannot be interrupted any other way). */
  function cancelRunning(): void {
    if (running.current !== 0 && worker.current) {
      worker.current.terminate();
      worker.current = undefined;
    }
    running.current = 0;
  }

  function post(key: string): void {
    const id = ++seq.current;
    cancelRunning();
    if (!worker.current) {
      try {
        worker.current = startWorker();
      } catch {
        setState((s) => ({ ...s, error: 'This browser cannot run the background calculation.', busy: false }));
        return;
      }
    }
    const w = worker.current;
    running.current = id;
    setState((s) => (s.busy ? s : { ...s, busy: true }));
    w.onmessage = (ev: MessageEvent<WorkerReply>) => {
      const msg = ev.data;
      if (msg.id === running.current) running.current = 0; // the worker is free again
      if (msg.id !== seq.current) return;
      if (msg.ok) {
        setState({ result: msg.result as R, error: undefined, errorArgument: undefined, stale: false, busy: false });
      } else {
        if (msg.defect) console.error(`worker task ${task}: ${msg.message}`);
        const fault = msg.argument !== undefined && msg.allowed !== undefined ? { argument: msg.argument, allowed: msg.allowed, hint: msg.hint } : undefined;
        setState((s) => ({ result: s.result, error: msg.defect ? DEFECT_TEXT : msg.message, errorArgument: msg.argument, fault, stale: s.result !== undefined, busy: false }));
      }
    };
    w.onerror = (ev) => {
      ev.preventDefault();
      running.current = 0;
      worker.current?.terminate();
      worker.current = undefined;
      setState((s) => ({ ...s, error: DEFECT_TEXT, stale: s.result !== undefined, busy: false }));
    };
    w.postMessage({ id, task, input: JSON.parse(key) });
  }

  return state;
}
