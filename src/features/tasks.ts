// Every task the compute worker can run, merged from the features that need one.
// A task is a pure function of structured-cloneable input (it calls physics only).
// Add one spread line per feature: `...launchTasks,` with its import above.
import { tasks as jointLossTasks } from './jointLoss/tasks';
import { tasks as bendLossTasks } from './bendLoss/tasks';
import { tasks as launchTasks } from './launch/tasks';
import { tasks as dispersionTasks } from './dispersion/tasks';
import { tasks as encircledFluxTasks } from './encircledFlux/tasks';
import { tasks as bendOrSpliceTasks } from './bendOrSplice/tasks';

export type Task = (input: never) => unknown;

export const TASKS: Record<string, Task> = {
  ...jointLossTasks,
  ...bendLossTasks,
  ...launchTasks,
  ...dispersionTasks,
  ...encircledFluxTasks,
  ...bendOrSpliceTasks,
};
