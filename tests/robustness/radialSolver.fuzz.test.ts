// Fuzzing of src/physics/radialSolver.ts. Profiles are cheap: full 10,000 runs over the whole range.
// solveRadialModes is the expensive one (about V³): its valid share uses small cores (a ≤ 4 µm, V ≲ 13,
// well under a millisecond each) so 10,000 runs fit the suite's time budget; large V is refused by
// MAX_SOLVER_V, checked once at the cap below (each call at the cap costs about a second).
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as physics from '../../src/physics';
import { MAX_SOLVER_V, ModelError } from '../../src/physics';
import { expectBetween, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'radialSolver';
const hostileOpts = fc.record({ coreRadiusUm: num(0, 550), na: num(0, 0.6), alpha: num(0, 1100), claddingIndex: maybe(num(0.9, 4.5)) });
const validOpts = fc.record({ coreRadiusUm: inRange(0.5, 500), na: inRange(0.01, 0.5), alpha: inRange(0.5, 1000), claddingIndex: maybe(inRange(1, 2)) });

function checkProfile(p: physics.IndexProfile): void {
  if (!(p.coreIndex > p.claddingIndex)) throw new Error(`core index ${p.coreIndex} not above cladding ${p.claddingIndex}`);
  for (const rOverA of [0, 0.3, 0.999, 1, 2, 50]) {
    const n = p.indexAt(rOverA * p.coreRadiusUm);
    expectBetween(n, p.claddingIndex, p.coreIndex, `n(${rOverA} a)`);
  }
}

function checkSolution(s: physics.RadialSolution): void {
  let count = 0;
  for (const m of s.modes) {
    expectBetween(m.b, 0, 1, `b of LP${m.l}${m.m}`);
    expectBetween(m.effectiveIndex, s.profile.claddingIndex, s.profile.coreIndex, `effective index of LP${m.l}${m.m}`);
    if (!Number.isInteger(m.l) || !Number.isInteger(m.m) || m.m < 1 || m.l < 0) throw new Error(`mode numbers l = ${m.l}, m = ${m.m}`);
    if (m.field.length !== s.rUm.length) throw new Error('field not on the grid');
    count += m.degeneracy;
  }
  if (count !== s.totalModeCount) throw new Error(`mode count ${s.totalModeCount}, degeneracies sum to ${count}`);
}

// Small cores only in the valid share (see the header); a profile object of any shape in the rest.
const smallProfile = fc
  .record({ coreRadiusUm: inRange(0.3, 4), na: inRange(0.05, 0.3), alpha: fc.oneof(inRange(1, 10), fc.constant(2)), step: fc.boolean() })
  .map((o) => (o.step ? physics.stepIndexProfile(o) : physics.gradedIndexProfile(o)));
const brokenProfile = fc.oneof(
  notANumber,
  fc.record({ name: fc.string(), coreRadiusUm: num(0, 10), coreIndex: num(0.9, 4.5), claddingIndex: num(0.9, 4.5), indexAt: fc.constantFrom(() => Number.NaN, () => 1.45, () => 0.5, () => Infinity) }),
) as fc.Arbitrary<physics.IndexProfile>;
const solverOptions = fc.oneof(
  { arbitrary: fc.constant(undefined), weight: 4 },
  { arbitrary: fc.record({ cellsPerCore: maybe(int(1, 400)), rMaxUm: maybe(num(0, 200)), maxL: maybe(int(0, 20)) }, { requiredKeys: [] }), weight: 2 },
) as fc.Arbitrary<physics.RadialSolverOptions | undefined>;

describe('radialSolver: every profile gives guided modes with 0 ≤ b ≤ 1 or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'gradedIndexProfile', physics.gradedIndexProfile, fc.tuple(mixValid(validOpts, objectOr(hostileOpts))), checkProfile);
  fuzz(M, 'stepIndexProfile', physics.stepIndexProfile, fc.tuple(mixValid(validOpts, objectOr(hostileOpts))), checkProfile);
  fuzz(
    M,
    'solveRadialModes',
    (p: physics.IndexProfile, w: number, o?: physics.RadialSolverOptions) => physics.solveRadialModes(p, w, o),
    fc.tuple(fc.oneof({ arbitrary: smallProfile, weight: 3 }, { arbitrary: brokenProfile, weight: 1 }), mixValid(inRange(600, 1700), num(150, 2600)), solverOptions),
    checkSolution,
  );
  it(`a fiber above V = ${MAX_SOLVER_V} is refused with a ModelError that names V, not solved for seconds`, () => {
    // a = 80 µm, NA 0.3 at 850 nm: V = 2π·80·0.3/0.85 = 177 (definition of V).
    const p = physics.stepIndexProfile({ coreRadiusUm: 80, na: 0.3 });
    expect(() => physics.solveRadialModes(p, 850)).toThrow(ModelError);
    expect(() => physics.solveRadialModes(p, 850)).toThrow(/V = 177/);
  });
});
