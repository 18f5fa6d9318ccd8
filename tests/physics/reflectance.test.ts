// Reflectance (negative dB) and return loss (positive dB) of faces, gaps, connectors and whole links.
import { describe, expect, it } from 'vitest';
import { faceReflection, gapReflection, INDEX_MATCHING_GEL, linkReturnLoss, POLISH_TYPICAL, reflectionFromDb, typicalReflections } from '../../src/physics';

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

describe('a glass face (Fresnel, Born & Wolf 1999 §1.5)', () => {
  it('a flat cleave of n = 1.468 glass in air reflects −14.4 dB (issue 15; ((n − 1)/(n + 1))² = 0.03596)', () => {
    const r = faceReflection({ fiberIndex: 1.468 });
    near(r.fraction, 0.035958, 1e-6, 'fraction');
    near(r.reflectanceDb, -14.44, 0.005, 'reflectance');
  });

  it('reflectance and return loss are the same number with opposite signs (IEC 61300-3-6: return loss is positive)', () => {
    const r = faceReflection({ fiberIndex: 1.468 });
    expect(r.reflectanceDb).toBeLessThan(0);
    expect(r.returnLossDb).toBe(-r.reflectanceDb);
  });

  it('a reading typed as 45 or −45 means the same reflection', () => {
    expect(reflectionFromDb(45)).toEqual(reflectionFromDb(-45));
    near(reflectionFromDb(45).fraction, 10 ** -4.5, 1e-18, 'fraction');
  });
});

describe('an air gap between two faces is an etalon (Airy, Born & Wolf 1999 §7.6.1)', () => {
  const n = 1.468;
  const r = 0.035958;

  it('worst case 4R/(1 + R)² = 0.134: −8.7 dB, about 5.7 dB worse than one face', () => {
    near(gapReflection({ fiberIndex: n }).maximum.reflectanceDb, 10 * Math.log10((4 * r) / (1 + r) ** 2), 1e-4, 'maximum');
    near(gapReflection({ fiberIndex: n }).maximum.reflectanceDb, -8.728, 1e-3, 'maximum (worked by hand)');
  });

  it.each([1310, 1550])('at %s nm a quarter-wave gap gives the maximum and a half-wave gap no reflection', (wavelengthNm) => {
    const quarter = (wavelengthNm / 1000) / 4;
    const g = gapReflection({ fiberIndex: n, gapUm: quarter, wavelengthNm });
    near(g.atGap!.fraction, g.maximum.fraction, 1e-12, 'quarter wave');
    expect(gapReflection({ fiberIndex: n, gapUm: 2 * quarter, wavelengthNm }).atGap!.fraction).toBeLessThan(1e-20);
  });

  it('averaged over gap width the two faces add incoherently, 2R/(1 + R) (Airy average)', () => {
    // Mean of the Airy reflectance over one period, by the midpoint rule.
    const steps = 4000;
    let sum = 0;
    for (let i = 0; i < steps; i++) sum += gapReflection({ fiberIndex: n, gapUm: ((i + 0.5) / steps) * (1.55 / 2), wavelengthNm: 1550 }).atGap!.fraction;
    near(sum / steps, gapReflection({ fiberIndex: n }).average.fraction, 1e-9, 'average');
  });

  it('index-matching gel (n = 1.46) brings one face down to −51.3 dB and the worst gap to −45.2 dB', () => {
    const g = gapReflection({ fiberIndex: n, mediumIndex: INDEX_MATCHING_GEL });
    near(g.face.reflectanceDb, -51.27, 0.01, 'face');
    near(g.maximum.reflectanceDb, -45.25, 0.01, 'maximum');
  });

  it('the table of typical reflections lists the polishes with their source, PC worse than UPC worse than APC', () => {
    expect(POLISH_TYPICAL.map((p) => p.polish)).toEqual(['PC', 'UPC', 'APC']);
    for (const p of POLISH_TYPICAL) expect(p.source).toMatch(/typical|from memory|IEC|ITU/);
    const db = POLISH_TYPICAL.map((p) => p.reflectanceDb);
    expect(db[0]!).toBeGreaterThan(db[1]!);
    expect(db[1]!).toBeGreaterThan(db[2]!);
    expect(typicalReflections().length).toBe(3 + POLISH_TYPICAL.length);
  });
});

describe('optical return loss of a link (powers add; each reflection pays the round trip)', () => {
  it('two −50 dB connectors at the source: 3 dB worse than one, ORL 47.0 dB', () => {
    near(linkReturnLoss({ events: [{ reflectanceDb: -50, lossBeforeDb: 0 }, { reflectanceDb: -50, lossBeforeDb: 0 }] }).orlDb, 46.99, 0.005, 'ORL');
  });

  it('an open end (−14.4 dB) behind 10 dB of one-way loss returns at −34.4 dB', () => {
    near(linkReturnLoss({ events: [{ reflectanceDb: -14.44, lossBeforeDb: 10 }] }).orlDb, 34.44, 1e-9, 'ORL');
  });

  it('with 32 dB of backscatter the backscatter dominates: ORL 31.86 dB (worked by hand)', () => {
    const r = linkReturnLoss({ events: [{ reflectanceDb: -50, lossBeforeDb: 0 }, { reflectanceDb: -50, lossBeforeDb: 0 }], backscatterReturnLossDb: 32 });
    near(r.orlDb, 31.864, 1e-3, 'ORL');
    near(r.shares.reduce((s, x) => s + x, 0) + r.backscatterShare, 1, 1e-12, 'shares');
    expect(r.backscatterShare).toBeGreaterThan(0.9);
  });

  it('a link with nothing to reflect is refused in words', () => {
    expect(() => linkReturnLoss({ events: [] })).toThrow(/at least one reflection/);
  });
});
