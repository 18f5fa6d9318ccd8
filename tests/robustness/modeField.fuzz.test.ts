// Fuzzing of src/physics/modeField.ts. Modes are real ones (lpModes at V ≤ 12, computed once) or hand-made
// mode objects with hostile u, w, l. lpIntensityGrid costs cells² field values: the valid share keeps cells
// ≤ 24 (the screens use ~100, checked once below); lp01Field samples ≤ 300 likewise.
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import * as physics from '../../src/physics';
import { LP_MAX_V, LP_MIN_V } from '../../src/physics';
import { expectBetween, expectFinitePositive, fuzz, inRange, int, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'modeField';
const POOL = [0.8, 1.6, 2.2, 2.6, 5, 12].flatMap((v) => physics.lpModes(v));
const realMode = fc.constantFrom(...POOL);
const handMade = fc.record({ l: int(0, 20), m: int(1, 5), u: num(0, 50), w: num(0, 50), b: num(0, 1), cutoffV: num(0, 50), degeneracy: fc.constant(2 as const), vectorModes: fc.constant(['HE11']), nearCutoff: fc.boolean() });
const mode = fc.oneof({ arbitrary: realMode, weight: 6 }, { arbitrary: handMade, weight: 3 }, { arbitrary: notANumber, weight: 1 }) as fc.Arbitrary<physics.LPMode>;
const v = mixValid(inRange(LP_MIN_V, 12), num(0, LP_MAX_V + 50, { valid: 1 }));
const definition = fc.oneof({ arbitrary: fc.constantFrom(...physics.MFD_DEFINITIONS), weight: 9 }, { arbitrary: notANumber, weight: 1 }) as fc.Arbitrary<physics.MfdDefinition>;

describe('modeField: every mode and V gives finite fields and an MFD > 0, or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'lpFieldAt', physics.lpFieldAt, fc.tuple(mode, mixValid(inRange(0, 5), num(0, 1100))));
  fuzz(M, 'lpIntensityGrid', physics.lpIntensityGrid, fc.tuple(mode, mixValid(int(2, 24, { edge: 0, any: 0, junk: 0 }), int(0, 30)), mixValid(inRange(0.5, 4), num(0, 150))), (r) => {
    for (const x of r) expectBetween(x, 0, 1, 'normalised intensity');
  });
  fuzz(M, 'lp01Field', physics.lp01Field, fc.tuple(v, fc.oneof(fc.constant(undefined), fc.record({ samples: maybe(int(2, 300)), rMaxOverA: maybe(num(0, 1100)) }))), (r) => {
    if (r.field.length !== r.rOverA.length || !(Math.abs(r.field[0]! - 1) < 1e-9)) throw new Error('field not 1 on the axis');
  });
  fuzz(M, 'petermann2SpotRatio', physics.petermann2SpotRatio, fc.tuple(v), (r) => expectFinitePositive(r, 'spot ratio'));
  fuzz(M, 'marcuseSpotRatio', physics.marcuseSpotRatio, fc.tuple(v), (r) => expectFinitePositive(r, 'spot ratio'));
  fuzz(M, 'gaussianFitLp01', physics.gaussianFitLp01, fc.tuple(v), (r) => {
    expectFinitePositive(r.spotRatio, 'spot ratio');
    expectBetween(r.overlap, 0, 1, 'overlap with the exact field');
  });
  const input = mixValid(
    fc.record({ coreRadiusUm: inRange(2, 6), na: inRange(0.08, 0.2), wavelengthNm: inRange(1200, 1700), definition }),
    objectOr(fc.record({ coreRadiusUm: num(0, 600), na: num(0, 1.2), wavelengthNm: num(150, 2600), definition })),
  );
  fuzz(M, 'modeFieldDiameterUm', physics.modeFieldDiameterUm, fc.tuple(input), (r) => expectFinitePositive(r.mfdUm, 'MFD'));
  it('the picture grid the screens draw (100 × 100 cells) is finite for every pooled mode', () => {
    for (const m of POOL.slice(0, 12)) expect(physics.lpIntensityGrid(m, 100, 2.5).every((x) => Number.isFinite(x) && x >= 0 && x <= 1)).toBe(true);
  });
});
