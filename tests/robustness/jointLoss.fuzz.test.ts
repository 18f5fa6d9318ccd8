// Fuzzing of src/physics/jointLoss.ts: Gaussian-field joint loss. Closed forms, all cheap: full 10,000 runs.
// Half the inputs have every argument in range (MFD 0.1–100 µm, offset 0–500 µm, tilt ±10°, gap 0–5000 µm,
// indices 1–2, 200–2500 nm), the other half mix in-range, edge and junk values per argument, each range a
// little wider than accepted so the guards' edges are crossed.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectBetween, expectNonNegative, fuzz, inRange, maybe, mixValid, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'jointLoss';
const mfd = num(0, 110);
const offset = num(0, 550);
const tilt = num(-12, 12);
const gap = num(0, 5500);
const index = num(0.9, 4.5);
const wavelength = num(150, 2600);
const okMfd = inRange(0.1, 100);
const okOffset = inRange(0, 500);
const okTilt = inRange(-10, 10);
const okGap = inRange(0, 5000);
const okIndex = inRange(1, 2);
const okWavelength = inRange(200, 2500);
const loss = (r: number) => expectNonNegative(r, 'loss in dB');

describe('jointLoss: every joint gives a loss ≥ 0 dB or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'fresnelLoss', physics.fresnelLoss, mixValid(fc.tuple(maybe(inRange(1, 4)), maybe(inRange(1, 4))), fc.tuple(maybe(index), maybe(index))), (r) => {
    expectBetween(r.reflectancePerSurface, 0, 1, 'reflectance per face');
    expectNonNegative(r.lossDb, 'Fresnel loss');
    // Airy: the etalon's worst case is never better than the incoherent two-face loss.
    if (!(r.etalonMaxLossDb >= r.lossDb - 1e-12 && r.etalonMinLossDb === 0)) throw new Error(`etalon range ${r.etalonMinLossDb}…${r.etalonMaxLossDb} dB around ${r.lossDb} dB`);
  });
  fuzz(M, 'mfdMismatchLossDb', physics.mfdMismatchLossDb, mixValid(fc.tuple(okMfd, okMfd), fc.tuple(mfd, mfd)), loss);
  fuzz(M, 'lateralOffsetLossDb', physics.lateralOffsetLossDb, mixValid(fc.tuple(okMfd, okMfd, okOffset), fc.tuple(mfd, mfd, offset)), loss);
  fuzz(M, 'tiltLossDb', physics.tiltLossDb, mixValid(fc.tuple(okMfd, okMfd, okTilt, okWavelength, maybe(okIndex)), fc.tuple(mfd, mfd, tilt, wavelength, maybe(index))), loss);
  fuzz(M, 'endGapLossDb', physics.endGapLossDb, mixValid(fc.tuple(okMfd, okMfd, okGap, okWavelength, maybe(okIndex)), fc.tuple(mfd, mfd, gap, wavelength, maybe(index))), loss);
  const tiltMedium = mixValid(
    fc.record({ gapUm: maybe(okGap), mediumIndex: maybe(okIndex), fiberIndex: maybe(okIndex) }),
    objectOr(fc.record({ gapUm: maybe(gap), mediumIndex: maybe(index), fiberIndex: maybe(index) })),
  );
  fuzz(M, 'tiltMediumIndex', physics.tiltMediumIndex, fc.tuple(tiltMedium), (r) => expectBetween(r, 1, 2, 'index the tilt happens in'));
  const record = (m: fc.Arbitrary<number>, w: fc.Arbitrary<number>, o: fc.Arbitrary<number>, t: fc.Arbitrary<number>, g: fc.Arbitrary<number>, n: fc.Arbitrary<number>) =>
    fc.record({ mfd1Um: m, mfd2Um: m, wavelengthNm: w, lateralOffsetUm: maybe(o), tiltDeg: maybe(t), gapUm: maybe(g), mediumIndex: maybe(n), fiberIndex: maybe(n) });
  const joint = mixValid(record(okMfd, okWavelength, okOffset, okTilt, okGap, okIndex), objectOr(record(mfd, wavelength, offset, tilt, gap, index))) as fc.Arbitrary<physics.GaussianJointInput>;
  fuzz(M, 'gaussianJointLoss', physics.gaussianJointLoss, fc.tuple(joint), (r) => {
    expectNonNegative(r.totalLossDb, 'total loss');
    expectNonNegative(r.couplingLossDb, 'coupling loss');
    if (r.totalLossDb < r.couplingLossDb) throw new Error('total below its coupling part');
    for (const [k, v] of Object.entries(r.contributions)) expectNonNegative(v, `${k} contribution`);
    if (!(r.spotRadius1Um > 0 && r.spotRadius2Um > 0)) throw new Error('spot radius not > 0');
  });
});
