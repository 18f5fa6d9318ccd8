// Every task the compute worker can run, merged from the features that need one.
// A task is a pure function of structured-cloneable input (it calls physics only).
// Add one spread line per feature: `...launchTasks,` with its import above.
export type Task = (input: never) => unknown;

export const TASKS: Record<string, Task> = {
};
