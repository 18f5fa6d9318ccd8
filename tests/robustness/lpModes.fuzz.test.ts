// Fuzzing of src/physics/lpModes.ts (Gloge 1971 LP modes). lpModes(v) costs about V²: ~0.3 s at its cap
// V = 300, microseconds at V < 10. So its valid share is mostly V ≤ 12 with a thin tail to the cap (about one
// input in 300), and hostile values (instant refusals) make up the rest: 10,000 runs in a few seconds.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { LP_MAX_V, LP_MIN_V } from '../../src/physics';
import { expectFinitePositive, fuzz, inRange, int, mixValid, notANumber, num, reportAfterAll } from './fuzzKit';

const M = 'lpModes';

export function checkMode(m: physics.LPMode, v: number): void {
  // 0 < b < 1 for a guided mode; b may round to 0 only when flagged nearCutoff (Gloge 1971, b = w²/V²).
  if (!(m.b < 1 && (m.b > 0 || (m.b === 0 && m.nearCutoff)))) throw new Error(`b of LP${m.l}${m.m} = ${m.b}`);
  if (!(m.cutoffV < v)) throw new Error(`LP${m.l}${m.m} returned at V = ${v} but cut off at ${m.cutoffV}`);
  if (Math.abs(m.u * m.u + m.w * m.w - v * v) > 1e-8 * v * v) throw new Error(`u² + w² = ${m.u * m.u + m.w * m.w}, V² = ${v * v}`);
  if (m.degeneracy !== (m.l === 0 ? 2 : 4)) throw new Error(`degeneracy ${m.degeneracy} for l = ${m.l}`);
}

const smallV = fc.oneof({ arbitrary: inRange(LP_MIN_V, 12), weight: 300 }, { arbitrary: inRange(12, LP_MAX_V), weight: 1 });
// Hostile share: every kind of bad value, but its in-range part kept small too; the range edges are named.
// V = LP_MAX_V itself costs ~0.2 s, so the edges are drawn rarely (about 1 in 400 inputs).
const edges = fc.constantFrom(LP_MIN_V, LP_MIN_V * (1 - 1e-12), LP_MAX_V, LP_MAX_V * (1 + 1e-12), 2.404825557695773);
const v = mixValid(smallV, fc.oneof({ arbitrary: num(0, 12), weight: 200 }, { arbitrary: edges, weight: 1 }));
const l = int(0, 12);
const m = int(1, 6);

describe('lpModes: every V gives guided modes with 0 < b < 1 or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'lpVectorModes', physics.lpVectorModes, fc.tuple(int(0, 50), int(1, 20)), (r) => {
    if (!Array.isArray(r) || r.length === 0 || r.some((s) => typeof s !== 'string' || s === '')) throw new Error(`families ${JSON.stringify(r)}`);
  });
  fuzz(M, 'lpName', physics.lpName, fc.tuple(int(0, 40), int(1, 40)), (r, [ll, mm]) => {
    // A technician reads both indices back from the name, one way only: LPl,m, or LPlm with one digit each.
    const read = /^LP(\d+),(\d+)$/.exec(r) ?? /^LP(\d)(\d)$/.exec(r);
    if (!read || Number(read[1]) !== ll || Number(read[2]) !== mm) throw new Error(`LP name ${r} does not read back as l = ${ll}, m = ${mm}`);
  });
  fuzz(M, 'lpCutoffV', physics.lpCutoffV, fc.tuple(l, m), (r, [ll, mm]) => {
    if (ll === 0 && mm === 1 ? r !== 0 : !(r > 0)) throw new Error(`cutoff ${r}`);
  });
  fuzz(M, 'solveLpMode', physics.solveLpMode, mixValid(fc.tuple(fc.integer({ min: 0, max: 3 }), fc.integer({ min: 1, max: 2 }), inRange(7.1, 12)), fc.tuple(l, m, v)), (r, [, , vv]) => checkMode(r, vv));
  fuzz(M, 'lpModes', physics.lpModes, fc.tuple(v), (r, [vv]) => {
    if (r.length === 0 || r[0]!.l !== 0 || r[0]!.m !== 1) throw new Error('LP01 missing or not first');
    for (const mode of r) checkMode(mode, vv);
  });
  const modeLists = fc.oneof(
    { arbitrary: inRange(LP_MIN_V, 12).map((x) => physics.lpModes(x)), weight: 4 },
    { arbitrary: fc.oneof(notANumber, fc.array(fc.oneof(notANumber, fc.record({ degeneracy: num(0, 4) })), { maxLength: 4 })), weight: 1 },
  ) as fc.Arbitrary<physics.LPMode[]>;
  fuzz(M, 'totalModeCount', physics.totalModeCount, fc.tuple(modeLists), (r) => {
    if (!(Number.isInteger(r) && r >= 0 && r % 2 === 0)) throw new Error(`mode count ${r}`);
  });
  // Samples up to 10,000 each solve a mode: the valid share keeps samples ≤ 40 (see the header's budget).
  fuzz(M, 'lpBvCurve', (ll: number, mm: number, vMax: number, samples?: number) => physics.lpBvCurve(ll, mm, vMax, samples), fc.tuple(int(0, 6), int(1, 4), v, fc.oneof(fc.constant(undefined), int(2, 40), num(-5, 20_000))), (r) => {
    for (const [vv, b] of r) {
      expectFinitePositive(vv, 'V on the curve');
      if (!(b >= 0 && b < 1)) throw new Error(`b = ${b} at V = ${vv}`);
    }
  });
});
