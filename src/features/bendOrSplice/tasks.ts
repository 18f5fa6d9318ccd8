// Worker task of the bend-or-splice screen: the classification sweeps a few thousand bend radii per
// wavelength (about a millisecond on a laptop, several on a phone at CPU ÷4), so it runs off the main thread.
import { classifyEvent, type BendOrSpliceInput, type BendOrSpliceResult } from '../../physics';

export function classifyTask(input: BendOrSpliceInput): BendOrSpliceResult {
  return classifyEvent(input);
}

export const tasks = {
  'bendOrSplice.classify': classifyTask,
};
