// Minimal benchmark harness: `benchSync(name, fn, { goal: '≤ 5 ms' })` times fn after a
// warm-up and prints one table row: median and 90th percentile per call, runs, and the
// median's ratio to the goal (≤ 1 meets it). Speed goals live here, never in tests.

export interface BenchOptions {
  /** e.g. '≤ 5 ms', '≤ 200 µs'. */
  goal?: string;
  /** Timed samples at least (default 20). */
  minRuns?: number;
  /** Total timed time at least, in ms (default 300). */
  minTimeMs?: number;
}

export interface BenchResult {
  name: string;
  medianMs: number;
  p90Ms: number;
  runs: number;
  goal?: string;
  goalMs?: number;
  ratio?: number;
}

export const results: BenchResult[] = [];

const UNIT_MS: Record<string, number> = { ns: 1e-6, µs: 1e-3, us: 1e-3, ms: 1, s: 1000 };

export function parseGoalMs(goal: string): number {
  const m = /([0-9]+(?:[.,][0-9]+)?)\s*(ns|µs|us|ms|s)\b/.exec(goal);
  if (!m) throw new Error(`Cannot read a time from the goal "${goal}" (write e.g. '≤ 5 ms')`);
  return Number(m[1]!.replace(',', '.')) * UNIT_MS[m[2]!]!;
}

export function formatMs(ms: number): string {
  if (ms >= 1000) return `${(ms / 1000).toPrecision(3)} s`;
  if (ms >= 1) return `${ms.toPrecision(3)} ms`;
  if (ms >= 1e-3) return `${(ms * 1e3).toPrecision(3)} µs`;
  return `${(ms * 1e6).toPrecision(3)} ns`;
}

export function quantile(sorted: number[], q: number): number {
  if (sorted.length === 0) return NaN;
  const pos = (sorted.length - 1) * q;
  const lo = Math.floor(pos);
  const hi = Math.ceil(pos);
  return sorted[lo]! + (sorted[hi]! - sorted[lo]!) * (pos - lo);
}

let headerPrinted = false;
export function printRow(r: { name: string; median: string; p90: string; runs: string; goal: string; ratio: string }): void {
  if (!headerPrinted) {
    headerPrinted = true;
    printRow({ name: 'benchmark', median: 'median', p90: 'p90', runs: 'runs', goal: 'goal', ratio: 'median/goal' });
  }
  console.log(
    `${r.name.padEnd(52)} ${r.median.padStart(10)} ${r.p90.padStart(10)} ${r.runs.padStart(6)}  ${r.goal.padEnd(10)} ${r.ratio.padStart(11)}`,
  );
}

// Keeps results alive so the engine cannot drop the call being timed.
let sink: unknown;
export function blackhole(): unknown {
  return sink;
}

const MAX_TIME_MS = 5000;
const MIN_SAMPLE_MS = 1; // below this, timer resolution dominates: calls are batched

export function benchSync(name: string, fn: () => unknown, opts: BenchOptions = {}): BenchResult {
  const minRuns = opts.minRuns ?? 20;
  const minTimeMs = opts.minTimeMs ?? 300;

  // Warm-up: let the JIT settle (≥ 10 calls and ≥ 50 ms), and learn a batch size.
  let calls = 0;
  const warmStart = performance.now();
  while (calls < 10 || performance.now() - warmStart < 50) {
    sink = fn();
    calls++;
    if (performance.now() - warmStart > MAX_TIME_MS) break;
  }
  const perCallGuess = (performance.now() - warmStart) / calls;
  const batch = Math.max(1, Math.ceil(MIN_SAMPLE_MS / Math.max(perCallGuess, 1e-6)));

  const samples: number[] = [];
  const start = performance.now();
  while (samples.length < minRuns || performance.now() - start < minTimeMs) {
    const t0 = performance.now();
    for (let i = 0; i < batch; i++) sink = fn();
    samples.push((performance.now() - t0) / batch);
    if (performance.now() - start > MAX_TIME_MS && samples.length >= 5) break;
  }
  samples.sort((a, b) => a - b);
  const result: BenchResult = {
    name,
    medianMs: quantile(samples, 0.5),
    p90Ms: quantile(samples, 0.9),
    runs: samples.length * batch,
  };
  if (opts.goal) {
    result.goal = opts.goal;
    result.goalMs = parseGoalMs(opts.goal);
    result.ratio = result.medianMs / result.goalMs;
  }
  results.push(result);
  printRow({
    name,
    median: formatMs(result.medianMs),
    p90: formatMs(result.p90Ms),
    runs: String(result.runs),
    goal: opts.goal ?? '—',
    ratio: result.ratio === undefined ? '—' : `${result.ratio.toFixed(2)}${result.ratio > 1 ? ' over' : ''}`,
  });
  return result;
}
