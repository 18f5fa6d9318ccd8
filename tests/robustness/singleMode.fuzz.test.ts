// Fuzzing of src/physics/singleMode.ts. singleModeCheck lists every guided mode (lpModes): its valid share
// keeps V ≤ ~16 (a ≤ 6 µm, NA ≤ 0.25, 600–1700 nm) so 10,000 runs cost a few seconds.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectCount, expectFinitePositive, fuzz, inRange, maybe, mixValid, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'singleMode';
const contrastValid = fc.oneof(
  fc.record({ na: inRange(0.05, 0.25), coreIndex: maybe(inRange(1.44, 1.48), 3) }),
  fc.tuple(inRange(1.444, 1.46), inRange(0.001, 0.01)).map(([n2, dn]) => ({ coreIndex: n2 + dn, claddingIndex: n2 })),
  fc.record({ coreIndex: inRange(1.44, 1.48), deltaPercent: inRange(0.1, 1) }),
);
const contrastHostile = fc.record({ na: maybe(num(0, 1.2)), coreIndex: maybe(num(0.5, 4.5)), claddingIndex: maybe(num(0.5, 4.5)), deltaPercent: maybe(num(0, 60)) }, { requiredKeys: [] });
const contrast = mixValid<unknown>(contrastValid, objectOr(contrastHostile)) as fc.Arbitrary<physics.IndexContrast>;

describe('singleMode: every fiber gives a finite V, mode counts ≥ 1 and a verdict, or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'resolveNa', physics.resolveNa, fc.tuple(contrast), (r) => {
    if (!(r > 0 && r < 1)) throw new Error(`NA = ${r}`);
  });
  const input = mixValid<unknown>(
    fc.tuple(fc.record({ coreRadiusUm: inRange(1, 6), wavelengthNm: inRange(600, 1700) }), contrastValid).map(([a, b]) => ({ ...a, ...b })),
    objectOr(fc.tuple(fc.record({ coreRadiusUm: num(0, 600), wavelengthNm: num(150, 2600) }), contrastHostile).map(([a, b]) => ({ ...b, ...a }))),
  ) as fc.Arbitrary<physics.SingleModeInput>;
  fuzz(M, 'singleModeCheck', physics.singleModeCheck, fc.tuple(input), (r) => {
    expectFinitePositive(r.v, 'V');
    expectFinitePositive(r.lp11CutoffWavelengthNm, 'LP11 cutoff wavelength');
    for (const [k, n] of [['LP modes', r.lpModeCount], ['families', r.vectorFamilyCount], ['all modes', r.totalModeCount]] as const) {
      expectCount(n, k);
      if (n < 1) throw new Error(`${k}: ${n}`);
    }
    if (r.singleMode !== (r.lpModeCount === 1)) throw new Error(`singleMode ${r.singleMode} with ${r.lpModeCount} LP modes`);
    if (r.summary.trim() === '') throw new Error('no summary');
  });
});
