// Loss physics (issue 4): the joint, bend and launch calculations the screens run.
import { benchSync } from './harness';
import { bendLossSweep } from '../src/physics/bending';
import { gaussianRadialField, multimodeModes, singleModeToMultimode } from '../src/physics/coupling';

// Matched-clad single-mode model fiber of tests/physics/bending.test.ts (a = 4.1 µm, NA 0.12).
const SM_FIBER = { coreRadiusUm: 4.1, na: 0.12 };
// OM-class 50 µm graded-index fiber (α = 2, NA 0.2) at 850 nm: V ≈ 37, 342 guided modes counting degeneracy.
const OM_50 = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };

benchSync('bend loss sweep, 200 radii 3–40 mm (one LP01 solve)', () => bendLossSweep({ ...SM_FIBER, wavelengthNm: 1550, minRadiusMm: 3, maxRadiusMm: 40, count: 200 }), {
  goal: '≤ 5 ms',
});

benchSync('single-mode (5.5 µm MFD, 3 µm offset) into every mode of a 50 µm GI fiber at 850 nm, mode solve included', () => {
  const modes = multimodeModes(OM_50, 850);
  return singleModeToMultimode({ source: gaussianRadialField(5.5), modes, offsetUm: 3 });
}, { goal: '≤ 100 ms' });
