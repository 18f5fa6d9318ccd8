// Multimode launch conditions (issue 16): EF of a launch into every mode of a 50 µm graded-index fiber at 850 nm,
// the work the compute worker does for the encircled-flux screen (mode solve, overlap launch, EF, template check).
import { benchSync } from './harness';
import { efTask, mandrelTask } from '../src/features/encircledFlux/tasks';

const fiber = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };
benchSync('EF of a centred SM launch, 50 µm GI at 850 nm (worker task)', () => efTask({ fiber, wavelengthNm: 850, launch: { kind: 'single-mode', mfdUm: 5.5, offsetUm: 0 } }), { goal: '≤ 100 ms' });
benchSync('EF of an overfilled launch, 50 µm GI at 850 nm (worker task)', () => efTask({ fiber, wavelengthNm: 850, launch: { kind: 'overfilled' } }), { goal: '≤ 100 ms' });
benchSync('mandrel screen task, 50 µm GI at 850 nm, 55-point sweep', () => mandrelTask({ fiber, wavelengthNm: 850, mandrelDiameterMm: 22, cordDiameterMm: 3, turns: 5 }), { goal: '≤ 250 ms' });
