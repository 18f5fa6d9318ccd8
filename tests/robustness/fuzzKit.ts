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
import fc from 'fast-check';
import { mkdirSync, writeFileSync } from 'node:fs';
import { afterAll, it } from 'vitest';
import { CalcError } from '../../src/physics/errors';

/** Generated inputs per function (issue 8: at least 10,000 each). */
export const FUZZ_RUNS = 10_000;

/**
 * A call slower than this is treated as a hang. Not a speed target (those live in bench/): it is a
 * detector for the "valid extreme input takes seconds or never ends" class of bug, set well above the
 * slowest legitimate call measured on a shared 2-core machine (see the table each suite prints).
 */
export const HANG_LIMIT_MS = 5_000;

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
    arbs.push({ arbitrary: uniform(min, max), weight: Math.ceil(valid / 2) });
    arbs.push({ arbitrary: fc.double({ min, max, noNaN: true }), weight: Math.floor(valid / 2) || 1 });
  }
  if (edge > 0) arbs.push({ arbitrary: edgeNumber, weight: edge });
  if (any > 0) arbs.push({ arbitrary: anyDouble, weight: any });
  if (junk > 0) arbs.push({ arbitrary: notANumber, weight: junk });
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
  return fc.oneof({ arbitrary: valid, weight: validWeight }, { arbitrary: hostile, weight: hostileWeight });
}

/** An integer argument whose sensible range is [min, max]; the rest non-integers, edges and junk. */
export function int(min: number, max: number, mix: NumberMix = {}): fc.Arbitrary<number> {
  const { valid = 6, edge = 2, any = 1, junk = 1 } = mix;
  return fc.oneof(
    { arbitrary: fc.integer({ min, max }), weight: valid },
    { arbitrary: edgeNumber, weight: edge },
    { arbitrary: fc.oneof(anyDouble, fc.integer()), weight: any },
    { arbitrary: notANumber, weight: junk },
  ) as fc.Arbitrary<number>;
}

/** Sometimes the value, sometimes the property left out (undefined). */
export function maybe<T>(arb: fc.Arbitrary<T>, missingWeight = 1): fc.Arbitrary<T | undefined> {
  return fc.oneof({ arbitrary: arb, weight: 4 }, { arbitrary: fc.constant(undefined), weight: missingWeight });
}

/** A whole argument that should be an object: mostly the generated object, sometimes not an object at all. */
export function objectOr<T>(arb: fc.Arbitrary<T>, junkWeight = 1): fc.Arbitrary<T> {
  return fc.oneof({ arbitrary: arb, weight: 8 }, { arbitrary: notANumber, weight: junkWeight }, { arbitrary: anyDouble, weight: junkWeight }) as fc.Arbitrary<T>;
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
}

const stats = new Map<string, CallStats>();

function statsFor(module: string, name: string): CallStats {
  let s = stats.get(name);
  if (!s) {
    s = { module, name, tried: 0, returned: 0, refused: 0, slowestMs: 0, slowestArgs: '', totalMs: 0 };
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
 * First place in `value` that is not a finite number (or a text that shows NaN/Infinity/undefined),
 * as "path = value"; undefined when every number is finite. Walks objects, arrays, typed arrays and Maps.
 * Functions inside results (field shapes, index profiles) are skipped: they are code, not numbers.
 */
export function findNonFinite(value: unknown, path = 'result', seen = new WeakSet<object>()): string | undefined {
  if (typeof value === 'number') return Number.isFinite(value) ? undefined : `${path} = ${value}`;
  if (typeof value === 'string') return NON_NUMBER_TEXT.test(value) ? `${path} shows ${JSON.stringify(value.match(NON_NUMBER_TEXT)![0])} in ${JSON.stringify(value.slice(0, 120))}` : undefined;
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
      const bad = findNonFinite(v, `${path}.get(${String(k)})`, seen);
      if (bad) return bad;
    }
    return undefined;
  }
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const bad = findNonFinite(value[i], `${path}[${i}]`, seen);
      if (bad) return bad;
    }
    return undefined;
  }
  for (const [k, v] of Object.entries(value)) {
    const bad = findNonFinite(v, `${path}.${k}`, seen);
    if (bad) return bad;
  }
  return undefined;
}

/** A validity check on a result: throws with a message naming what is wrong; `args` is for the message. */
export type Validator<R, A extends unknown[]> = (result: R, args: A) => void;

/** Calls fn once and enforces the contract; throws an Error describing the input on any breach. */
export function checkCall<A extends unknown[], R>(module: string, name: string, fn: (...args: A) => R, args: A, validate?: Validator<R, A>): void {
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
      return;
    }
    const err = e as Error;
    throw new Error(`${name}(${describeArgs(args)}) threw an untyped ${err?.name ?? typeof e}: ${err?.message ?? String(e)} — only InputError/ModelError are allowed`);
  }
  note(s, performance.now() - t0, args);
  const bad = findNonFinite(result);
  if (bad) throw new Error(`${name}(${describeArgs(args)}) returned a non-finite value: ${bad}`);
  if (validate) {
    try {
      validate(result, args);
    } catch (e) {
      throw new Error(`${name}(${describeArgs(args)}) returned a physically invalid result: ${(e as Error).message}`);
    }
  }
  s.returned++;
}

function note(s: CallStats, ms: number, args: readonly unknown[]): void {
  s.totalMs += ms;
  if (ms > s.slowestMs) {
    s.slowestMs = ms;
    s.slowestArgs = describeArgs(args);
  }
  if (ms > HANG_LIMIT_MS) throw new Error(`${s.name}(${describeArgs(args)}) took ${ms.toFixed(0)} ms (hang limit ${HANG_LIMIT_MS} ms)`);
}

/**
 * Declares one fuzz entry: a test running FUZZ_RUNS generated argument lists through checkCall.
 * The coverage test (coverage.test.ts) finds entries by the literal `fuzz('<module>', '<name>'` in the source,
 * so every exported physics function must appear in exactly such a call.
 */
export function fuzz<A extends unknown[], R>(
  module: string,
  name: string,
  fn: (...args: A) => R,
  args: fc.Arbitrary<A>,
  validate?: Validator<R, A>,
): void {
  statsFor(module, name);
  it(`${name}: ${FUZZ_RUNS.toLocaleString('en')} generated inputs each give a finite, physically valid result or a typed error`, () => {
    fc.assert(
      fc.property(args, (a) => {
        checkCall(module, name, fn, a, validate);
      }),
      { numRuns: FUZZ_RUNS },
    );
  });
}

/** Prints (and writes to test-results/robustness/<module>.json) the inputs tried per function of this suite. */
export function reportAfterAll(module: string): void {
  afterAll(() => {
    const rows = [...stats.values()].filter((s) => s.module === module);
    const lines = rows.map(
      (s) =>
        `${s.name.padEnd(28)} ${String(s.tried).padStart(7)} tried ${String(s.returned).padStart(7)} returned ${String(s.refused).padStart(7)} refused   slowest ${s.slowestMs.toFixed(1).padStart(7)} ms   total ${(s.totalMs / 1000).toFixed(2).padStart(6)} s`,
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
