// Fuzzing of src/physics/laserSafety.ts. Beyond finiteness, the wording guarantee: every context carries the
// usual cautions and no text suggests a level is safe to look at. Cheap: full runs.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { POWER_DBM_MAX, POWER_DBM_MIN, USUAL_LASER_CAUTIONS } from '../../src/physics';
import { expectFinitePositive, fuzz, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'laserSafety';
const SAFE_WORDING = /\b(safe to (look|view|stare)|eye[- ]safe|harmless|no hazard)\b/i;
const input = objectOr(fc.record({ wavelengthNm: num(150, 2600), powerDbm: num(POWER_DBM_MIN - 10, POWER_DBM_MAX + 10) }));

function noSafeWording(text: string): void {
  if (SAFE_WORDING.test(text)) throw new Error(`text suggests safety: ${JSON.stringify(text.match(SAFE_WORDING)![0])}`);
}

describe('laserSafety: every context is finite, carries the cautions and never calls a level safe', () => {
  reportAfterAll(M);
  fuzz(M, 'laserHazardContext', physics.laserHazardContext, fc.tuple(input), (r) => {
    expectFinitePositive(r.powerMw, 'power in mW');
    for (const c of USUAL_LASER_CAUTIONS) if (!r.cautions.includes(c)) throw new Error(`missing caution "${c.slice(0, 40)}…"`);
    noSafeWording([r.wavelengthNote, r.levelStatement, r.governing, ...r.cautions].join('\n'));
  });
  // The text of a real context, or something that is not a context at all.
  const context = fc.oneof(
    { arbitrary: input.map((i) => { try { return physics.laserHazardContext(i); } catch { return undefined; } }), weight: 8 },
    { arbitrary: notANumber, weight: 2 },
  ) as fc.Arbitrary<physics.HazardContext>;
  fuzz(M, 'hazardContextText', physics.hazardContextText, fc.tuple(context), (r) => noSafeWording(r));
});
