// Fuzzing of src/physics/attenuationSpectrum.ts: attenuation lists of 0–5 points (often broken) at any wavelength.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { expectNonNegative, fuzz, inRange, maybe, mixValid, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'attenuationSpectrum';
const point = fc.record({ wavelengthNm: fc.oneof(fc.constantFrom(1310, 1383, 1550, 1625), num(100, 2600)), dbPerKm: fc.oneof(inRange(0.15, 1), num(0, 120)) });
const list = fc.oneof(
  { arbitrary: fc.array(point, { minLength: 1, maxLength: 5 }), weight: 8 },
  { arbitrary: fc.oneof(fc.constant([]), notANumber, fc.array(notANumber, { maxLength: 2 })), weight: 1 },
) as fc.Arbitrary<physics.AttenuationAt[]>;
const validList = fc.constant<physics.AttenuationAt[]>([
  { wavelengthNm: 1310, dbPerKm: 0.4 },
  { wavelengthNm: 1550, dbPerKm: 0.3 },
  { wavelengthNm: 1625, dbPerKm: 0.4 },
]);
const valid = fc.record({ attenuationDbPerKm: validList, wavelengthNm: inRange(1200, 1660), label: maybe(fc.string({ maxLength: 10 })) });
const hostile = objectOr(fc.record({ attenuationDbPerKm: list, wavelengthNm: num(100, 2600), label: maybe(fc.oneof(fc.string(), notANumber) as fc.Arbitrary<string>) }));

describe('attenuationSpectrum: any list and wavelength give a finite attenuation ≥ 0 or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'attenuationAtWavelength', physics.attenuationAtWavelength, fc.tuple(mixValid(valid, hostile) as fc.Arbitrary<Parameters<typeof physics.attenuationAtWavelength>[0]>), (r) => {
    expectNonNegative(r.dbPerKm, 'attenuation');
    if (r.waterPeakUnlisted && !r.inWaterPeakRegion) throw new Error('water peak flag outside the region');
  });
});
