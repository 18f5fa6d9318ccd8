import { describe, expect, it } from 'vitest';
import { gaussianRadialField, InputError, modeConditioningOffset, multimodeModes, offsetLaunchSweep } from '../../src/physics';

function near(got: number, expected: number, tol: number, what: string): void {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got}, expected ${expected} ± ${tol}`);
}

const OM50 = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2 };
const at1300 = multimodeModes(OM50, 1300);
const at850 = multimodeModes(OM50, 850);

describe('power per mode group against offset', () => {
  // A Gaussian matched to the fundamental of a parabolic fiber (w = a√(2/V)) and displaced by d is a coherent state
  // of the 2-D oscillator: power in group g is Poisson, e^{−μ} μ^{g−1}/(g−1)!, μ = d²/w² (Glauber 1963).
  // Tolerance 5e-4: the profile is cut at r = a and the FD fields carry ~1e-4 error (as in coupling.test.ts).
  it.each([3, 6])('a matched spot offset by %d µm fills the groups as a Poisson law', (d) => {
    const w = 25 * Math.sqrt(2 / at850.v);
    const [point] = offsetLaunchSweep({ source: gaussianRadialField(2 * w, 850), modes: at850, coreRadiusUm: 25, offsetsUm: [d] });
    const mu = (d * d) / (w * w);
    let fact = 1;
    for (let g = 1; g <= 6; g++) {
      if (g > 1) fact *= g - 1;
      near(point.perGroup.find((x) => x.principal === g)?.fraction ?? 0, (Math.exp(-mu) * mu ** (g - 1)) / fact, 5e-4, `group ${g}`);
    }
  });

  it('a centred 9.2 µm spot at 1300 nm puts most of its power in the lowest group; the cord offsets move it to the middle groups', () => {
    // Why the offset cord exists (IEEE 802.3 clause 38.11.4): the centre launch lights the few groups that travel
    // along the axis, where an index defect does the most harm; 10–16 µm off the axis, groups 1–2 carry little.
    const [centre, ...cord] = offsetLaunchSweep({ source: gaussianRadialField(9.2, 1300), modes: at1300, coreRadiusUm: 25, offsetsUm: [0, 10, 13, 16] });
    const low = (p: typeof centre) => p.perGroup.filter((g) => g.principal <= 2).reduce((s, g) => s + g.fraction, 0);
    expect(low(centre)).toBeGreaterThan(0.8);
    for (const p of cord) expect(low(p)).toBeLessThan(0.3);
    expect(low(cord[2])).toBeLessThan(0.05);
  });

  it('the share of power near the axis falls steadily as the spot moves out', () => {
    const offsets = [0, 2, 4, 6, 8, 10, 12, 14, 16];
    const sweep = offsetLaunchSweep({ source: gaussianRadialField(9.2, 1300), modes: at1300, coreRadiusUm: 25, offsetsUm: offsets });
    for (let i = 1; i < sweep.length; i++) expect(sweep[i].centreShare).toBeLessThan(sweep[i - 1].centreShare);
  });

  it('inside the core the launch loses almost nothing; near the core edge it starts to lose (guided share < 1)', () => {
    const [inside, edge] = offsetLaunchSweep({ source: gaussianRadialField(9.2, 1300), modes: at1300, coreRadiusUm: 25, offsetsUm: [10, 24] });
    expect(inside.lossDb).toBeLessThan(0.05);
    expect(edge.lossDb).toBeGreaterThan(0.3);
  });
});

describe('mode-conditioning cord offsets', () => {
  it.each([
    { core: 62.5, min: 17, max: 23 },
    { core: 50, min: 10, max: 16 },
  ])('$core µm fiber: $min to $max µm (IEEE 802.3 clause 38.11.4, from memory; 802.3aq launch study notes)', ({ core, min, max }) => {
    const r = modeConditioningOffset({ coreDiameterUm: core });
    expect(r?.minUm).toBe(min);
    expect(r?.maxUm).toBe(max);
  });

  it('has no offset range for single-mode cores', () => {
    expect(modeConditioningOffset({ coreDiameterUm: 9 })).toBeUndefined();
  });

  it('an empty or overlong list of offsets is refused', () => {
    expect(() => offsetLaunchSweep({ source: gaussianRadialField(9.2, 1300), modes: at1300, coreRadiusUm: 25, offsetsUm: [] })).toThrow(InputError);
    expect(() => offsetLaunchSweep({ source: gaussianRadialField(9.2, 1300), modes: at1300, coreRadiusUm: 25, offsetsUm: new Array(65).fill(1) })).toThrow(InputError);
  });
});
