// Field tools (issue 6): the dispersion curve a screen draws and a long link budget.
import { benchSync } from './harness';
import { dispersionSweep, zeroDispersion } from '../src/physics/dispersion';
import { linkBudget, TIA_568_3_D, type LinkElement } from '../src/physics/linkBudget';

// Standard-like single-mode model (4.1 µm core radius, 3.5 mol % GeO₂), as in tests/physics/dispersion.test.ts.
const FIBER = { coreRadiusUm: 4.1, germaniaFraction: 0.035 };

benchSync('D(λ) sweep 1200–1650 nm, 1 nm step (451 points)', () => dispersionSweep(FIBER, { fromNm: 1200, toNm: 1650, stepNm: 1 }), {
  goal: '≤ 20 ms',
});
benchSync('zero-dispersion wavelength and slope', () => zeroDispersion(FIBER), { goal: '≤ 5 ms' });

const SM = [
  { wavelengthNm: 1310, dbPerKm: 0.35 },
  { wavelengthNm: 1550, dbPerKm: 0.22 },
];
const kinds: ((i: number) => LinkElement)[] = [
  (i) => ({ kind: 'fiber', label: `section ${i}`, lengthKm: 2.5, fiberClass: 'single-mode', plant: 'outside', attenuationDbPerKm: SM }),
  (i) => ({ kind: 'splice', label: `splice ${i}`, count: 1 }),
  (i) => ({ kind: 'connectorPair', label: `panel ${i}`, count: 2 }),
  (i) => ({ kind: 'patchCord', label: `cord ${i}`, count: 1, lengthM: 3, fiberClass: 'single-mode', attenuationDbPerKm: SM }),
  (i) => ({ kind: 'splitter', label: `splitter ${i}`, ways: 2 }),
];
const ELEMENTS: LinkElement[] = Array.from({ length: 50 }, (_, i) => kinds[i % kinds.length]!(i));

benchSync(
  'link budget, 50 elements at 2 wavelengths with equipment check',
  () =>
    linkBudget({
      elements: ELEMENTS,
      wavelengthsNm: [1310, 1550],
      ruleSet: TIA_568_3_D,
      designMarginDb: 3,
      equipment: [{ wavelengthNm: 1550, txMinDbm: 0, txMaxDbm: 5, rxSensitivityDbm: -28, rxOverloadDbm: -7 }],
    }),
  { goal: '≤ 1 ms' },
);
