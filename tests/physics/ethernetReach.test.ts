import { describe, expect, it } from 'vitest';
import { applicationsForLink, ETHERNET_INTERFACES, FIBER_CATEGORIES, InputError } from '../../src/physics';

const find = (list: ReturnType<typeof applicationsForLink>, name: string) => list.find((x) => x.name === name)!;

describe('which applications a link carries', () => {
  // Each expected limit is typed here from its outside source, not read from the code's table.
  it.each([
    // 10GBASE-SR on OM3: 300 m (802.3 Table 52-6; checked against a university reference chart), 2.6 dB (from memory).
    { category: 'OM3' as const, lengthM: 280, loss: { 850: 2.0 }, name: '10GBASE-SR', verdict: 'carried', reachMarginM: 20, lossMarginDb: 0.6 },
    { category: 'OM3' as const, lengthM: 310, loss: { 850: 2.0 }, name: '10GBASE-SR', verdict: 'too long', reachMarginM: -10, lossMarginDb: 0.6 },
    { category: 'OM3' as const, lengthM: 200, loss: { 850: 2.9 }, name: '10GBASE-SR', verdict: 'too much loss', reachMarginM: 100, lossMarginDb: -0.3 },
    // 1000BASE-SX on OM1 (62.5 µm, 200 MHz·km): 275 m (802.3z media table, checked in equipment guides), 2.6 dB (from memory).
    { category: 'OM1' as const, lengthM: 250, loss: { 850: 1.5 }, name: '1000BASE-SX', verdict: 'carried', reachMarginM: 25, lossMarginDb: 1.1 },
    // 10GBASE-LRM on OM1: 220 m, 1.9 dB (802.3aq table as reproduced in an equipment guide); the 1300 nm reading counts.
    { category: 'OM1' as const, lengthM: 220, loss: { 1300: 1.0 }, name: '10GBASE-LRM', verdict: 'carried', reachMarginM: 0, lossMarginDb: 0.9 },
    // 10GBASE-ER: 11 dB maximum channel insertion loss (Table 52-24, checked via the IEEE 802.3 reflector), 30 km (from memory).
    { category: 'OS2' as const, lengthM: 35_000, loss: { 1550: 10 }, name: '10GBASE-ER', verdict: 'too long', reachMarginM: -5000, lossMarginDb: 1 },
    // 10GBASE-LR: 10 km (checked in equipment data), 6.2 dB (from memory).
    { category: 'OS2' as const, lengthM: 8000, loss: { 1310: 4.0 }, name: '10GBASE-LR', verdict: 'carried', reachMarginM: 2000, lossMarginDb: 2.2 },
  ])('$lengthM m of $category with $loss dB: $name is $verdict', ({ category, lengthM, loss, name, verdict, reachMarginM, lossMarginDb }) => {
    const r = find(applicationsForLink({ category, lengthM, lossDbByWindow: loss }), name);
    expect(r.verdict).toBe(verdict);
    expect(r.reachMarginM).toBeCloseTo(reachMarginM, 9);
    expect(r.lossMarginDb).toBeCloseTo(lossMarginDb, 9);
  });

  it('a multimode interface is "not on this fiber" for single-mode fiber, and the other way round', () => {
    expect(find(applicationsForLink({ category: 'OS2', lengthM: 100 }), '10GBASE-SR').verdict).toBe('not on this fiber');
    expect(find(applicationsForLink({ category: 'OM4', lengthM: 100 }), '10GBASE-LR').verdict).toBe('not on this fiber');
  });

  it('without a loss reading the length alone is checked, and the answer says so', () => {
    expect(find(applicationsForLink({ category: 'OM4', lengthM: 90 }), '100GBASE-SR4').verdict).toBe('length fits, loss not given');
  });

  it('1000BASE-LX on multimode fiber carries the condition of an offset-launch cord (IEEE 802.3 clause 38.11.4)', () => {
    const r = find(applicationsForLink({ category: 'OM2', lengthM: 500, lossDbByWindow: { 1300: 1.2 } }), '1000BASE-LX');
    expect(r.verdict).toBe('carried');
    expect(r.condition).toMatch(/offset-launch/);
    expect(find(applicationsForLink({ category: 'OS2', lengthM: 500 }), '1000BASE-LX').condition).toBeUndefined();
  });

  it('a longer-reach category never carries an interface less far than OM3 does (OM4 ≥ OM3 ≥ OM2 ≥ OM1)', () => {
    const order = ['OM1', 'OM2', 'OM3', 'OM4'] as const;
    for (const itf of ETHERNET_INTERFACES) {
      const reach = order.map((c) => itf.reaches.find((r) => r.category === c)?.maxReachM ?? 0);
      for (let i = 1; i < reach.length; i++) if (reach[i - 1] > 0) expect(reach[i], itf.name).toBeGreaterThanOrEqual(reach[i - 1]);
    }
  });

  it('every row names its clause and its source, and says "from memory" or "checked"', () => {
    for (const itf of ETHERNET_INTERFACES) {
      expect(itf.clause).toMatch(/^IEEE 802\.3 clause \d+/);
      expect(itf.source).toMatch(/from memory|checked/);
    }
    expect(FIBER_CATEGORIES).toHaveLength(7);
  });

  it.each([
    { what: 'an unknown category', call: () => applicationsForLink({ category: 'OM9' as never, lengthM: 10 }) },
    { what: 'a 1550 nm loss on multimode fiber', call: () => applicationsForLink({ category: 'OM3', lengthM: 10, lossDbByWindow: { 1550: 1 } }) },
    { what: 'a negative length', call: () => applicationsForLink({ category: 'OM3', lengthM: -1 }) },
    { what: 'a loss of 1000 dB', call: () => applicationsForLink({ category: 'OS2', lengthM: 10, lossDbByWindow: { 1310: 1000 } }) },
  ])('$what is an InputError', ({ call }) => {
    expect(call).toThrow(InputError);
  });
});
