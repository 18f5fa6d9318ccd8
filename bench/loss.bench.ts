// Loss physics (issue 4): the joint, bend and launch calculations the screens run.
import { benchSync } from './harness';
import { bendLossSweep } from '../src/physics/bending';
import { fieldOverlapLoss, lp01RadialField, multimodeModes, singleModeJointComparison, singleModeToMultimode } from '../src/physics/coupling';
import { gaussianJointLoss } from '../src/physics/jointLoss';

// Matched-clad single-mode model fibers (step index): a = 4.1 µm, NA 0.12 (tests/physics/bending.test.ts),
// and a = 4.6 µm, NA 0.13 for an unlike partner at the joint.
const SM_FIBER = { coreRadiusUm: 4.1, na: 0.12 };
const SM_OTHER = { coreRadiusUm: 4.6, na: 0.13 };
// An 850 nm single-mode fiber (a = 2.2 µm, NA 0.13: V ≈ 2.1) for the launch into multimode.
const SM_850 = { coreRadiusUm: 2.2, na: 0.13 };
// OM-class 50 µm graded-index fiber (α = 2, NA 0.2) at 850 nm: V ≈ 37, 342 guided modes counting degeneracy.
const OM_50 = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };

benchSync('exact joint loss: two LP01 fields built and overlapped, 1 µm offset, 1550 nm', () => {
  const f1 = lp01RadialField(SM_FIBER, 1550);
  const f2 = lp01RadialField(SM_OTHER, 1550);
  return fieldOverlapLoss(f1, f2, 1);
}, { goal: '≤ 1 ms' });

benchSync('Gaussian joint loss, all four imperfections', () => gaussianJointLoss({ mfd1Um: 9.2, mfd2Um: 10.4, wavelengthNm: 1550, lateralOffsetUm: 1, tiltDeg: 0.5, gapUm: 20 }), {
  goal: '≤ 50 µs',
});

benchSync('joint screen task: exact vs Gaussian at 31 offsets + field picture', () =>
  singleModeJointComparison({ fiber1: SM_FIBER, fiber2: SM_OTHER, wavelengthNm: 1550, lateralOffsetUm: 1 }), { goal: '≤ 20 ms' });

benchSync('bend loss sweep, 200 radii 3–40 mm (one LP01 solve)', () => bendLossSweep({ ...SM_FIBER, wavelengthNm: 1550, minRadiusMm: 3, maxRadiusMm: 40, count: 200 }), {
  goal: '≤ 5 ms',
});

benchSync('single-mode LP01 (3 µm offset) into every mode of a 50 µm GI fiber at 850 nm, mode solve included', () => {
  const modes = multimodeModes(OM_50, 850);
  return singleModeToMultimode({ source: lp01RadialField(SM_850, 850), modes, offsetUm: 3 });
}, { goal: '≤ 100 ms' });
