// Fuzzing of src/physics/power.ts: dBm ⇄ mW ⇄ µW, dB ratios and chains. All cheap: full 10,000 runs,
// in-range share drawn from the accepted range (−150…+90 dBm, ±300 dB) and a little beyond.
import fc from 'fast-check';
import { describe } from 'vitest';
import * as physics from '../../src/physics';
import { POWER_DBM_MAX, POWER_DBM_MIN, STEP_DB_LIMIT } from '../../src/physics';
import { expectBetween, expectClose, expectFinitePositive, fuzz, notANumber, num, objectOr, reportAfterAll } from './fuzzKit';

const M = 'power';
const dbm = num(POWER_DBM_MIN - 10, POWER_DBM_MAX + 10);
const db = num(-STEP_DB_LIMIT - 10, STEP_DB_LIMIT + 10);
const mw = num(1e-18, 1e12);
const step = objectOr(fc.record({ label: fc.oneof(fc.string(), notANumber) as fc.Arbitrary<string>, lossDb: num(-40, 60) }));
const steps = fc.oneof({ arbitrary: fc.array(step, { maxLength: 12 }), weight: 8 }, { arbitrary: notANumber, weight: 1 }) as fc.Arbitrary<physics.ChainStep[]>;

describe('power: every input gives a finite power or a typed error', () => {
  reportAfterAll(M);
  fuzz(M, 'dbmToMw', physics.dbmToMw, fc.tuple(dbm), (r) => expectFinitePositive(r, 'power in mW'));
  // In range: the powers whose dBm value lies in POWER_DBM_MIN..MAX (the generator above reaches beyond on purpose).
  const inDbmRange = (mwPerUnit: number) => fc.tuple(fc.double({ min: POWER_DBM_MIN, max: POWER_DBM_MAX, noNaN: true }).map((d) => 10 ** (d / 10) / mwPerUnit));
  fuzz(M, 'mwToDbm', physics.mwToDbm, fc.tuple(mw), (r) => expectBetween(r, POWER_DBM_MIN, POWER_DBM_MAX, 'power in dBm'), { inRange: inDbmRange(1) });
  fuzz(M, 'dbmToUw', physics.dbmToUw, fc.tuple(dbm), (r) => expectFinitePositive(r, 'power in µW'));
  fuzz(M, 'uwToDbm', physics.uwToDbm, fc.tuple(num(1e-15, 1e15)), (r) => expectBetween(r, POWER_DBM_MIN, POWER_DBM_MAX, 'power in dBm'), { inRange: inDbmRange(1e-3) });
  fuzz(M, 'dbToRatio', physics.dbToRatio, fc.tuple(db), (r) => expectFinitePositive(r, 'power ratio'));
  fuzz(M, 'ratioToDb', physics.ratioToDb, fc.tuple(num(1e-35, 1e35)), (r) => expectBetween(r, -STEP_DB_LIMIT, STEP_DB_LIMIT, 'ratio in dB'), {
    inRange: fc.tuple(fc.double({ min: -STEP_DB_LIMIT, max: STEP_DB_LIMIT, noNaN: true }).map((d) => 10 ** (d / 10))),
  });
  fuzz(M, 'powerAfterLossDbm', physics.powerAfterLossDbm, fc.tuple(dbm, db), (r, [p, l]) => expectClose(r, p - l, 1e-12, 'power after loss'));
  fuzz(M, 'powerChain', physics.powerChain, fc.tuple(dbm, steps), (r) => {
    expectFinitePositive(r.startMw, 'start power mW');
    expectFinitePositive(r.endMw, 'end power mW');
    expectFinitePositive(r.overallRatio, 'overall ratio');
    for (const p of r.points) {
      expectFinitePositive(p.powerMw, `power after ${p.label}`);
      expectBetween(p.powerDbm, POWER_DBM_MIN, POWER_DBM_MAX, `power after ${p.label} in dBm`);
    }
  });
  fuzz(M, 'sumDb', physics.sumDb, fc.tuple(fc.oneof({ arbitrary: fc.array(db, { maxLength: 20 }), weight: 8 }, { arbitrary: notANumber as fc.Arbitrary<number[]>, weight: 1 })));
});
