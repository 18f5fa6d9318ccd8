// Mode engine (issue 3): every guided LP mode at several V, and a full single-mode check.
import { benchSync } from './harness';
import { lpModes } from '../src/physics/lpModes';
import { singleModeCheck } from '../src/physics/singleMode';
import { modeFieldDiameterUm } from '../src/physics/modeField';

benchSync('lpModes(v = 2.4): single-mode fiber', () => lpModes(2.4), { goal: '≤ 1 ms' });
benchSync('lpModes(v = 10): few-mode fiber', () => lpModes(10), { goal: '≤ 2 ms' });
benchSync('lpModes(v = 50): ~1270 modes', () => lpModes(50), { goal: '≤ 5 ms' });
benchSync('lpModes(v = 100): ~5040 modes', () => lpModes(100), { goal: '≤ 25 ms' });
benchSync(
  'singleModeCheck (a 4.1 µm, NA 0.12, 1310 nm)',
  () => singleModeCheck({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 1310 }),
  { goal: '≤ 50 µs' },
);
benchSync(
  'modeFieldDiameterUm gaussian fit (1310 nm)',
  () => modeFieldDiameterUm({ coreRadiusUm: 4.1, na: 0.12, wavelengthNm: 1310, definition: 'gaussian' }),
  { goal: '≤ 2 ms' },
);
