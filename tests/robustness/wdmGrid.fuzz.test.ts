// Fuzzing of src/physics/wdmGrid.ts: grid indices, spacings, frequencies and wavelengths, valid and hostile. Cheap:
// full 10,000 runs (a band list is at most a few thousand channels).
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { DWDM_SPACINGS_GHZ, GRID_MAX_NM, GRID_MIN_NM } from '../../src/physics';
import { expectBetween, expectCount, expectFinitePositive, fuzz, inRange, int, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'wdmGrid';
const thz = fc.oneof({ arbitrary: inRange(179, 238), weight: 6 }, { arbitrary: num(0, 2000), weight: 2 });
const nm = fc.oneof({ arbitrary: inRange(GRID_MIN_NM, GRID_MAX_NM), weight: 6 }, { arbitrary: num(0, 3000), weight: 2 });
const spacing = fc.oneof({ arbitrary: fc.constantFrom(...DWDM_SPACINGS_GHZ), weight: 8 }, { arbitrary: fc.oneof(num(0, 200), notANumber), weight: 1 }) as fc.Arbitrary<physics.DwdmSpacingGHz>;
const band = fc.oneof({ arbitrary: fc.constantFrom('O', 'E', 'S', 'C', 'L', 'U'), weight: 8 }, { arbitrary: fc.oneof(fc.constantFrom('X', '', 'c'), notANumber), weight: 1 }) as fc.Arbitrary<physics.OpticalBand>;
const point = objectOr(fc.oneof(fc.record({ frequencyThz: thz }), fc.record({ wavelengthNm: nm }), fc.record({})));

function checkChannel(c: physics.GridChannel): void {
  expectFinitePositive(c.frequencyThz, 'frequency');
  expectBetween(c.wavelengthNm, GRID_MIN_NM - 1, GRID_MAX_NM + 1, 'wavelength');
  if (!Number.isInteger(c.n)) throw new Error(`n = ${c.n} is not whole`);
}

function checkNearest(r: physics.NearestChannel): void {
  checkChannel(r.channel);
  expectBetween(Math.abs(r.offsetGHz), 0, r.spacingGHz / 2 + 1e-6, 'offset');
  expectBetween(r.offsetShareOfSpacing, 0, 0.5, 'offset share');
}

describe('wdmGrid: every input gives a grid point on the grid or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'frequencyThzToWavelengthNm', physics.frequencyThzToWavelengthNm, fc.tuple(objectOr(fc.record({ frequencyThz: thz }))), (r) => expectBetween(r, GRID_MIN_NM - 1e-9, GRID_MAX_NM + 1e-9, 'wavelength'));
  fuzz(M, 'wavelengthNmToFrequencyThz', physics.wavelengthNmToFrequencyThz, fc.tuple(objectOr(fc.record({ wavelengthNm: nm }))), (r) => expectBetween(r, 178.9, 238, 'frequency'));
  fuzz(M, 'bandOf', physics.bandOf, fc.tuple(objectOr(fc.record({ wavelengthNm: nm }))));
  fuzz(M, 'dwdmChannel', physics.dwdmChannel, fc.tuple(objectOr(fc.record({ n: int(-4000, 4000), spacingGHz: spacing }))), checkChannel, {
    // In range: any fixed spacing and n within ±100 (±1.25 to ±10 THz from 193.1 THz, inside 179–238 THz).
    inRange: fc.tuple(fc.record({ n: fc.integer({ min: -100, max: 100 }), spacingGHz: fc.constantFrom(...DWDM_SPACINGS_GHZ) })),
    minSuccessShare: 1,
  });
  fuzz(M, 'nearestDwdmChannel', physics.nearestDwdmChannel, fc.tuple(mixValid(fc.record({ frequencyThz: inRange(180, 237), spacingGHz: fc.constantFrom(...DWDM_SPACINGS_GHZ) }), point.map((p) => ({ ...(p as object), spacingGHz: 50 }) as { frequencyThz: number; spacingGHz: physics.DwdmSpacingGHz }))) as fc.Arbitrary<[Parameters<typeof physics.nearestDwdmChannel>[0]]>, checkNearest);
  fuzz(M, 'dwdmChannelsInBand', physics.dwdmChannelsInBand, fc.tuple(objectOr(fc.record({ band, spacingGHz: spacing }))), (r) => {
    expectCount(r.length, 'channel count');
    r.forEach(checkChannel);
  }, { inRange: fc.tuple(fc.record({ band: fc.constantFrom('O', 'E', 'S', 'C', 'L', 'U') as fc.Arbitrary<physics.OpticalBand>, spacingGHz: fc.constantFrom(...DWDM_SPACINGS_GHZ) })), minSuccessShare: 1 });
  fuzz(M, 'flexGridSlot', physics.flexGridSlot, fc.tuple(objectOr(fc.record({ n: int(-3000, 7000), m: int(0, 500) }))), (r) => {
    expectFinitePositive(r.widthGHz, 'slot width');
    if (!(r.lowerEdgeThz < r.centreThz && r.centreThz < r.upperEdgeThz)) throw new Error('edges out of order');
  });
  fuzz(M, 'nearestFlexCentre', physics.nearestFlexCentre, fc.tuple(point as fc.Arbitrary<Parameters<typeof physics.nearestFlexCentre>[0]>), checkNearest);
  fuzz(M, 'cwdmChannels', physics.cwdmChannels, fc.tuple(), (r) => {
    if (r.length !== 18) throw new Error(`${r.length} channels`);
  });
  fuzz(M, 'nearestCwdmChannel', physics.nearestCwdmChannel, fc.tuple(point as fc.Arbitrary<Parameters<typeof physics.nearestCwdmChannel>[0]>), (r) => {
    expectBetween(r.channel.wavelengthNm, 1271, 1611, 'channel');
    expectBetween(Math.abs(r.offsetNm), 0, 400, 'offset');
  });
});
