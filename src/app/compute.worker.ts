// The compute worker: runs named tasks off the main thread so typing never stutters.
// It holds no state and no app logic beyond dispatch; see src/features/tasks.ts.
import { TASKS } from '../features/tasks';
import { CalcError, InputError } from '../physics/errors';
import { errorText } from '../ui/errorText';
import type { WorkerReply, WorkerRequest } from './workerProtocol';

self.onmessage = (ev: MessageEvent<WorkerRequest>) => {
  const { id, task, input } = ev.data;
  const reply = (msg: WorkerReply) => (self as unknown as Worker).postMessage(msg);
  const fn = TASKS[task] as ((i: unknown) => unknown) | undefined;
  if (!fn) {
    reply({ id, ok: false, message: `Unknown task "${task}".`, defect: true });
    return;
  }
  try {
    reply({ id, ok: true, result: fn(input) });
  } catch (e) {
    if (e instanceof CalcError) {
      const fault = e instanceof InputError ? { argument: e.argument, allowed: e.allowed, hint: e.hint } : {};
      reply({ id, ok: false, message: errorText(e), ...fault });
    } else {
      reply({ id, ok: false, message: String(e instanceof Error ? e.message : e), defect: true });
    }
  }
};
