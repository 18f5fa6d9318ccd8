// Shared machinery for the physics fuzz suite (tests/robustness/*.fuzz.test.ts).
//
// The contract under test (src/physics/errors.ts, DEVELOPERS.md "Bad input never crashes"): every public
// physics function, for ANY argument, either returns a result whose every number is finite and physically
// valid, or throws the project's CalcError (InputError / ModelError). Never NaN, never Infinity, never a
// TypeError/RangeError, never a hang.
//
// Each fuzz entry runs FUZZ_RUNS generated argument lists. Generators mix three families with fc.oneof:
//   - in-range values (a good share, so the mathematics itself is exercised, not only the guards),
//   - the edge values every guard must know (NaN, ±Infinity, 0, −0, subnormals, 1e308, …),
//   - anything at all (every double, and non-numbers a JavaScript caller could pass: undefined, null, strings).
//
// Deterministic by default: every property test (these and the fc.assert calls elsewhere) runs on a seed fixed
// per test (tests/setup/propertySeed.ts), which fast-check prints on failure. `npm run fuzz` draws fresh seeds and
// more runs for exploration; `FUZZ_SEED=<n> npx vitest run <file>` replays one seed.
//
// Besides "never NaN, never an untyped error", each entry must return a result for a minimum share of its
// in-range inputs (a function that refuses nearly everything passes the first rule trivially). An input counts as
// in range when every generator helper of this kit that drew it (num, inRange, int, mixValid, objectOr) took its
// in-range branch; an entry can instead declare its own in-range generator (FuzzOptions.inRange).
import fc from 'fast-check';
import { mkdirSync, writeFileSync } from 'node:fs';
import { afterAll, it } from 'vitest';
import { CalcError } from '../../src/physics/errors';
import { FRESH_SEEDS } from '../setup/propertySeed';

/** Generated inputs per function in an ordinary run (issue 8: at least 10,000 each). */
export const DEFAULT_FUZZ_RUNS = 10_000;

/** Generated inputs per function: 10,000, or FUZZ_RUNS from the environment (`npm run fuzz` sets 50,000). */
export const FUZZ_RUNS = runsFromEnv();

function runsFromEnv(): number {
  const n = Number(typeof process === 'undefined' ? undefined : process.env.FUZZ_RUNS);
  return Number.isInteger(n) && n > 0 ? n : DEFAULT_FUZZ_RUNS;
}

/**
 * No wall-clock limit applies in an ordinary test run: on a shared machine a timing limit can fail by chance.
 * Slowness is reported (the table each suite prints: slowest call and its input) and speed goals live in
 * `npm run bench`. Only the exploration run (`npm run fuzz`) flags a call slower than this as a probable hang,
 * a limit 10× the slowest legitimate call measured on a shared 2-core machine (about 0.5 s).
 */
export const HANG_LIMIT_MS = 5_000;

/** Whether the hang detector is on: only in the exploration run (`npm run fuzz`), never in `npm test`. */
const HANG_DETECTOR_ON = FRESH_SEEDS;

/**
 * Smallest share of in-range inputs that must give a result (not a refusal), unless an entry states its own:
 * the mathematics must run for most sensible inputs, not only the guards. Entries whose valid range is
 * legitimately narrower than their generator's state a lower share with the reason.
 */
export const DEFAULT_MIN_SUCCESS_SHARE = 0.5;

/** Below this many in-range inputs the share is shown but not enforced (too few to judge). */
export const MIN_IN_RANGE_SAMPLES = 100;

/** Inputs drawn from an entry's declared in-range generator (FuzzOptions.inRange), on top of FUZZ_RUNS. */
export const IN_RANGE_RUNS = 1_000;

// ---------------------------------------------------------------- which branch drew an input

/** Draws of the current input from in-range and from hostile branches of this kit's helpers. */
const draws = { inRange: 0, hostile: 0 };

function markInRange<T>(arb: fc.Arbitrary<T>): fc.Arbitrary<T> {
  return arb.map((v) => {
    draws.inRange++;
    return v;
  });
}

function markHostile<T>(arb: fc.Arbitrary<T>): fc.Arbitrary<T> {
  return arb.map((v) => {
    draws.hostile++;
    return v;
  });
}

/** Whether the input just generated came only from in-range branches; resets the tally for the next input. */
function takeInRangeVerdict(): boolean {
  const verdict = draws.inRange > 0 && draws.hostile === 0;
  draws.inRange = 0;
  draws.hostile = 0;
  return verdict;
}

/** Edge values every numeric guard must handle. */
export const EDGE_NUMBERS: readonly number[] = [
  Number.NaN,
  Number.POSITIVE_INFINITY,
  Number.NEGATIVE_INFINITY,
  0,
  -0,
  Number.MIN_VALUE, // smallest subnormal
  -Number.MIN_VALUE,
  2.2250738585072014e-308, // smallest normal
  Number.EPSILON,
  1e-300,
  1e308,
  -1e308,
  Number.MAX_VALUE,
  -Number.MAX_VALUE,
  Number.MAX_SAFE_INTEGER,
  -1,
  1,
  0.5,
  1e-9,
  1e9,
];

export const edgeNumber: fc.Arbitrary<number> = fc.constantFrom(...EDGE_NUMBERS);

/** Every double, NaN and ±Infinity included (fast-check spreads them over all magnitudes). */
export const anyDouble: fc.Arbitrary<number> = fc.double();

/** Values a JavaScript caller (a form, a stored record, a message from the worker) could pass instead of a number. */
export const notANumber: fc.Arbitrary<unknown> = fc.constantFrom(undefined, null, '', '1550', '1e3', true, false, {}, [], [1], 10n);

/** Uniform on [min, max] (linear, unlike fc.double which spreads over magnitudes). */
export function uniform(min: number, max: number): fc.Arbitrary<number> {
  return fc.integer({ min: 0, max: 1_000_000 }).map((i) => min + ((max - min) * i) / 1_000_000);
}

export interface NumberMix {
  /** Weight of in-range values (uniform and spread over magnitudes). Default 6. */
  valid?: number;
  /** Weight of edge values. Default 2. */
  edge?: number;
  /** Weight of any double. Default 1. */
  any?: number;
  /** Weight of non-numbers. Default 1. */
  junk?: number;
}

/**
 * A numeric argument whose sensible range is [min, max]: mostly inside it, the rest hostile.
 * Typed `number` because that is what the signature says; the junk share is the lie a caller can tell.
 */
export function num(min: number, max: number, mix: NumberMix = {}): fc.Arbitrary<number> {
  const { valid = 6, edge = 2, any = 1, junk = 1 } = mix;
  const arbs: fc.WeightedArbitrary<unknown>[] = [];
  if (valid > 0) {
    arbs.push({ arbitrary: markInRange(uniform(min, max)), weight: Math.ceil(valid / 2) });
    arbs.push({ arbitrary: markInRange(fc.double({ min, max, noNaN: true })), weight: Math.floor(valid / 2) || 1 });
  }
  if (edge > 0) arbs.push({ arbitrary: markHostile(edgeNumber), weight: edge });
  if (any > 0) arbs.push({ arbitrary: markHostile(anyDouble), weight: any });
  if (junk > 0) arbs.push({ arbitrary: markHostile(notANumber), weight: junk });
  return fc.oneof(...arbs) as fc.Arbitrary<number>;
}

/** Only in-range values (for the "all arguments valid" share of a multi-argument generator). */
export function inRange(min: number, max: number): fc.Arbitrary<number> {
  return num(min, max, { edge: 0, any: 0, junk: 0 });
}

/**
 * With several arguments each mostly valid, the chance that all are valid at once shrinks fast; this mixes a
 * share where every argument is in range (so the mathematics runs) with the fully hostile generator.
 */
export function mixValid<T>(valid: fc.Arbitrary<T>, hostile: fc.Arbitrary<T>, validWeight = 1, hostileWeight = 1): fc.Arbitrary<T> {
  return fc.oneof({ arbitrary: markInRange(valid), weight: validWeight }, { arbitrary: markHostile(hostile), weight: hostileWeight });
}

/** An integer argument whose sensible range is [min, max]; the rest non-integers, edges and junk. */
export function int(min: number, max: number, mix: NumberMix = {}): fc.Arbitrary<number> {
  const { valid = 6, edge = 2, any = 1, junk = 1 } = mix;
  const arbs: fc.WeightedArbitrary<unknown>[] = [{ arbitrary: markInRange(fc.integer({ min, max })), weight: valid }];
  if (edge > 0) arbs.push({ arbitrary: markHostile(edgeNumber), weight: edge });
  if (any > 0) arbs.push({ arbitrary: markHostile(fc.oneof(anyDouble, fc.integer())), weight: any });
  if (junk > 0) arbs.push({ arbitrary: markHostile(notANumber), weight: junk });
  return fc.oneof(...arbs) as fc.Arbitrary<number>;
}

/** Sometimes the value, sometimes the property left out (undefined). */
export function maybe<T>(arb: fc.Arbitrary<T>, missingWeight = 1): fc.Arbitrary<T | undefined> {
  return fc.oneof({ arbitrary: arb, weight: 4 }, { arbitrary: fc.constant(undefined), weight: missingWeight });
}

/** A whole argument that should be an object: mostly the generated object, sometimes not an object at all. */
export function objectOr<T>(arb: fc.Arbitrary<T>, junkWeight = 1): fc.Arbitrary<T> {
  return fc.oneof({ arbitrary: arb, weight: 8 }, { arbitrary: markHostile(notANumber), weight: junkWeight }, { arbitrary: markHostile(anyDouble), weight: junkWeight }) as fc.Arbitrary<T>;
}

// ---------------------------------------------------------------- checking one call

export interface CallStats {
  module: string;
  name: string;
  tried: number;
  returned: number;
  refused: number;
  slowestMs: number;
  slowestArgs: string;
  /** Time spent inside the function over all calls (ms). */
  totalMs: number;
  /** In-range inputs tried, and how many of them gave a result. */
  inRangeTried: number;
  inRangeReturned: number;
  /** The share of in-range inputs that must give a result. */
  minSuccessShare: number;
}

const stats = new Map<string, CallStats>();

function statsFor(module: string, name: string): CallStats {
  let s = stats.get(name);
  if (!s) {
    s = { module, name, tried: 0, returned: 0, refused: 0, slowestMs: 0, slowestArgs: '', totalMs: 0, inRangeTried: 0, inRangeReturned: 0, minSuccessShare: DEFAULT_MIN_SUCCESS_SHARE };
    stats.set(name, s);
  }
  return s;
}

/** Readable form of an argument list for a failure message: NaN, ±Infinity, −0 and typed arrays shown as such. */
export function describeArgs(args: readonly unknown[]): string {
  const text = args.map((a) => describeValue(a, 0)).join(', ');
  return text.length > 400 ? text.slice(0, 400) + '…' : text;
}

function describeValue(v: unknown, depth: number): string {
  if (typeof v === 'number') return Object.is(v, -0) ? '-0' : String(v);
  if (typeof v === 'bigint') return `${v}n`;
  if (typeof v === 'string') return JSON.stringify(v.length > 60 ? v.slice(0, 60) + '…' : v);
  if (typeof v === 'function') return '[function]';
  if (v === null || typeof v !== 'object') return String(v);
  if (depth > 3) return '…';
  if (ArrayBuffer.isView(v)) return `${v.constructor.name}(${(v as unknown as ArrayLike<number>).length})`;
  if (Array.isArray(v)) return `[${v.slice(0, 8).map((x) => describeValue(x, depth + 1)).join(', ')}${v.length > 8 ? `, … ${v.length} items` : ''}]`;
  return `{ ${Object.entries(v as Record<string, unknown>)
    .slice(0, 12)
    .map(([k, x]) => `${k}: ${describeValue(x, depth + 1)}`)
    .join(', ')} }`;
}

/** Text a result may never show a person. */
const NON_NUMBER_TEXT = /\bNaN\b|Infinity|undefined|\[object Object\]/;

/**
 * Texts among the arguments that themselves read "NaN", "Infinity", "undefined"…: a name or a note the user typed.
 * A result that shows them back (a field named "NaN") echoes the user's words; it has not computed a NaN.
 */
export function userTextsIn(args: readonly unknown[]): string[] {
  const out = new Set<string>();
  const seen = new WeakSet<object>();
  const walk = (v: unknown, depth: number) => {
    if (typeof v === 'string') {
      if (NON_NUMBER_TEXT.test(v)) out.add(v);
      return;
    }
    if (v === null || typeof v !== 'object' || depth > 6 || seen.has(v) || ArrayBuffer.isView(v)) return;
    seen.add(v);
    for (const x of Array.isArray(v) ? v : Object.values(v as Record<string, unknown>)) walk(x, depth + 1);
  };
  for (const a of args) walk(a, 0);
  // Longest first, so that "NaN NaN" is taken out whole before "NaN".
  return [...out].sort((a, b) => b.length - a.length);
}

/**
 * First place in `value` that is not a finite number (or a text that shows NaN/Infinity/undefined),
 * as "path = value"; undefined when every number is finite. Walks objects, arrays, typed arrays and Maps.
 * Functions inside results (field shapes, index profiles) are skipped: they are code, not numbers.
 * `userText`: texts the caller supplied (userTextsIn); where a result text repeats one, that part is not judged.
 */
export function findNonFinite(value: unknown, path = 'result', seen = new WeakSet<object>(), userText: readonly string[] = []): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : `${path} = ${value}`;
  if (typeof value === 'string') {
    let own = value;
    for (const t of userText) own = own.split(t).join(' ');
    return NON_NUMBER_TEXT.test(own) ? `${path} shows ${JSON.stringify(own.match(NON_NUMBER_TEXT)![0])} in ${JSON.stringify(value.slice(0, 120))}` : undefined;
  }
  if (value === null || typeof value !== 'object') return undefined;
  if (seen.has(value)) return undefined;
  seen.add(value);
  if (ArrayBuffer.isView(value)) {
    const arr = value as unknown as ArrayLike<number>;
    for (let i = 0; i < arr.length; i++) if (!Number.isFinite(arr[i])) return `${path}[${i}] = ${arr[i]}`;
    return undefined;
  }
  if (value instanceof Map) {
    for (const [k, v] of value) {
      const bad = findNonFinite(v, `${path}.get(${String(k)})`, seen, userText);
      if (bad) return bad;
    }
    return undefined;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const bad = findNonFinite(value[i], `${path}[${i}]`, seen, userText);
      if (bad) return bad;
    }
    return undefined;
  }
  for (const [k, v] of Object.entries(value)) {
    const bad = findNonFinite(v, `${path}.${k}`, seen, userText);
    if (bad) return bad;
  }
  return undefined;
}

/** A validity check on a result: throws with a message naming what is wrong; `args` is for the message. */
export type Validator<R, A extends unknown[]> = (result: R, args: A) => void;

/**
 * Calls fn once and enforces the contract; throws an Error describing the input on any breach.
 * Returns true when the call gave a (valid) result, false when it refused with a typed error.
 */
export function checkCall<A extends unknown[], R>(module: string, name: string, fn: (...args: A) => R, args: A, validate?: Validator<R, A>): boolean {
  const s = statsFor(module, name);
  s.tried++;
  const t0 = performance.now();
  let result: R;
  try {
    result = fn(...args);
  } catch (e) {
    note(s, performance.now() - t0, args);
    if (e instanceof CalcError) {
      if (typeof e.message !== 'string' || e.message.trim() === '') throw new Error(`${name}(${describeArgs(args)}) threw ${e.name} with no message`);
      s.refused++;
      return false;
    }
    const err = e as Error;
    throw new Error(`${name}(${describeArgs(args)}) threw an untyped ${err?.name ?? typeof e}: ${err?.message ?? String(e)} — only InputError/ModelError are allowed`);
  }
  note(s, performance.now() - t0, args);
  const bad = findNonFinite(result, 'result', new WeakSet<object>(), userTextsIn(args));
  if (bad) throw new Error(`${name}(${describeArgs(args)}) returned a non-finite value: ${bad}`);
  if (validate) {
    try {
      validate(result, args);
    } catch (e) {
      throw new Error(`${name}(${describeArgs(args)}) returned a physically invalid result: ${(e as Error).message}`);
    }
  }
  s.returned++;
  return true;
}

function note(s: CallStats, ms: number, args: readonly unknown[]): void {
  s.totalMs += ms;
  if (ms > s.slowestMs) {
    s.slowestMs = ms;
    s.slowestArgs = describeArgs(args);
  }
  if (HANG_DETECTOR_ON && ms > HANG_LIMIT_MS) throw new Error(`${s.name}(${describeArgs(args)}) took ${ms.toFixed(0)} ms (hang limit ${HANG_LIMIT_MS} ms)`);
}

/** Optional settings of one fuzz entry; an entry without them behaves as before (10,000 runs, default share). */
export interface FuzzOptions<A extends unknown[]> {
  /**
   * A generator of in-range inputs only. When given, IN_RANGE_RUNS inputs are drawn from it (on top of the
   * FUZZ_RUNS mixed ones) and they alone define the success share; otherwise in-range inputs are recognised
   * among the mixed ones (see the file header).
   */
  inRange?: fc.Arbitrary<A>;
  /** Share of in-range inputs that must give a result (default DEFAULT_MIN_SUCCESS_SHARE); say why when lower. */
  minSuccessShare?: number;
  /** Generated inputs (default FUZZ_RUNS); say why when fewer. */
  runs?: number;
}

/**
 * Declares one fuzz entry: a test running FUZZ_RUNS generated argument lists through checkCall, then checking
 * that enough of the in-range inputs gave a result.
 * The coverage test (coverage.test.ts) finds entries by the literal `fuzz('<module>', '<name>'` in the source,
 * so every exported physics function must appear in exactly such a call.
 */
export function fuzz<A extends unknown[], R>(
  module: string,
  name: string,
  fn: (...args: A) => R,
  args: fc.Arbitrary<A>,
  validate?: Validator<R, A>,
  options: FuzzOptions<A> = {},
): void {
  const s = statsFor(module, name);
  const minShare = options.minSuccessShare ?? DEFAULT_MIN_SUCCESS_SHARE;
  s.minSuccessShare = minShare;
  const runs = options.runs ?? FUZZ_RUNS;
  it(`${name}: ${runs.toLocaleString('en')} generated inputs each give a finite, physically valid result or a typed error, and at least ${Math.round(minShare * 100)} % of in-range inputs a result`, () => {
    takeInRangeVerdict();
    fc.assert(
      fc.property(args, (a) => {
        const inRange = takeInRangeVerdict();
        const returned = checkCall(module, name, fn, a, validate);
        if (inRange && !options.inRange) {
          s.inRangeTried++;
          if (returned) s.inRangeReturned++;
        }
      }),
      { numRuns: runs },
    );
    if (options.inRange) {
      fc.assert(
        fc.property(options.inRange, (a) => {
          takeInRangeVerdict();
          s.inRangeTried++;
          if (checkCall(module, name, fn, a, validate)) s.inRangeReturned++;
        }),
        { numRuns: IN_RANGE_RUNS },
      );
    }
    const share = s.inRangeTried === 0 ? undefined : s.inRangeReturned / s.inRangeTried;
    if (share !== undefined && s.inRangeTried >= MIN_IN_RANGE_SAMPLES && share < minShare) {
      throw new Error(
        `${name} gave a result for only ${s.inRangeReturned} of ${s.inRangeTried} in-range inputs (${(share * 100).toFixed(1)} %, at least ${(minShare * 100).toFixed(0)} % required): it refuses inputs it should answer`,
      );
    }
  });
}

/** The success share as the table shows it. */
function shareText(s: CallStats): string {
  if (s.inRangeTried === 0) return 'in range: none recognised';
  const pct = ((100 * s.inRangeReturned) / s.inRangeTried).toFixed(1);
  const enforced = s.inRangeTried >= MIN_IN_RANGE_SAMPLES ? `min ${Math.round(s.minSuccessShare * 100)} %` : 'too few to judge';
  return `in range ${String(s.inRangeTried).padStart(6)}: ${pct.padStart(5)} % answered (${enforced})`;
}

/** Prints (and writes to test-results/robustness/<module>.json) the inputs tried per function of this suite. */
export function reportAfterAll(module: string): void {
  afterAll(() => {
    const rows = [...stats.values()].filter((s) => s.module === module);
    const lines = rows.map(
      (s) =>
        `${s.name.padEnd(28)} ${String(s.tried).padStart(7)} tried ${String(s.returned).padStart(7)} returned ${String(s.refused).padStart(7)} refused   ${shareText(s)}   slowest ${s.slowestMs.toFixed(1).padStart(7)} ms   total ${(s.totalMs / 1000).toFixed(2).padStart(6)} s`,
    );
    console.log(`fuzz ${module}: inputs per function\n${lines.join('\n')}`);
    try {
      mkdirSync('test-results/robustness', { recursive: true });
      writeFileSync(`test-results/robustness/${module}.json`, JSON.stringify(rows, null, 2));
    } catch {
      // The table on the console is the record; the file is a convenience.
    }
  });
}

// ---------------------------------------------------------------- validity helpers

export function expectFinitePositive(x: number, what: string): void {
  if (!(x > 0 && Number.isFinite(x))) throw new Error(`${what} = ${x}, expected > 0`);
}

export function expectNonNegative(x: number, what: string): void {
  if (!(x >= 0)) throw new Error(`${what} = ${x}, expected ≥ 0`);
}

export function expectBetween(x: number, lo: number, hi: number, what: string): void {
  if (!(x >= lo && x <= hi)) throw new Error(`${what} = ${x}, expected in [${lo}, ${hi}]`);
}

export function expectStrictlyBetween(x: number, lo: number, hi: number, what: string): void {
  if (!(x > lo && x < hi)) throw new Error(`${what} = ${x}, expected in (${lo}, ${hi})`);
}

export function expectCount(x: number, what: string): void {
  if (!(Number.isInteger(x) && x >= 0)) throw new Error(`${what} = ${x}, expected a whole number ≥ 0`);
}

export function expectClose(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol * Math.max(1, Math.abs(expected)))) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol} (relative)`);
}
