import { describe, expect, it } from 'vitest';
import { CATEGORY_PRESETS, findPreset, presetsOfKinds, type CategoryPreset, type Sourced } from '../../src/fibers/presets';
import { resolveLabel, resolvePreset, resolveSaved, resolveTyped } from '../../src/fibers/resolve';
import { modeFieldDiameterUm } from '../../src/physics';
import { InputError } from '../../src/physics/errors';
import { record, stepInput } from './helpers';

/** A source must name a standard with its edition, or say "typical, common practice", or "from memory". */
const HONEST_SOURCE = /(ITU-T G\.65\d|IEC 60793|ISO\/IEC 11801)[^,]*\(\d{2}\/\d{4}\)|\(\d{4}\)|typical, common practice|from memory|common practice/;

function sourcedValues(p: CategoryPreset): [string, Sourced<unknown>][] {
  const out: [string, Sourced<unknown>][] = [];
  for (const k of ['profile', 'gradedAlpha', 'coreDiameterUm', 'na', 'claddingDiameterUm', 'cutoffWavelengthNm', 'mfdUm'] as const) {
    const v = p[k];
    if (v) out.push([k, v]);
  }
  p.attenuationDbPerKm.forEach((a, i) => out.push([`attenuation[${i}]`, a]));
  return out;
}

describe('standard category presets', () => {
  it('offer the ITU-T single-mode categories and the OM1–OM5 classes', () => {
    expect(CATEGORY_PRESETS.map((p) => p.category)).toEqual([
      'G.652.D', 'G.654.E', 'G.655.D', 'G.657.A1', 'G.657.A2', 'G.657.B2', 'G.657.B3', 'OM1', 'OM2', 'OM3', 'OM4', 'OM5',
    ]);
  });

  it.each(CATEGORY_PRESETS.map((p) => [p.category, p] as const))('%s: every value says where it comes from', (_c, p) => {
    for (const [field, v] of sourcedValues(p)) expect(v.source, `${p.category}.${field}`).toMatch(HONEST_SOURCE);
    for (const f of p.facts) expect(f.source, `${p.category}: ${f.label}`).toMatch(HONEST_SOURCE);
  });

  it('presets are read-only', () => {
    expect(Object.isFrozen(CATEGORY_PRESETS)).toBe(true);
  });

  // IEC 60793-2-10 nominal values (from memory, also the brief): 50 µm / NA 0.200 for OM2–OM5, 62.5 µm / NA 0.275 for OM1.
  it.each([
    ['OM1', 31.25, 0.275],
    ['OM2', 25, 0.2],
    ['OM3', 25, 0.2],
    ['OM4', 25, 0.2],
    ['OM5', 25, 0.2],
  ])('%s resolves to a graded-index fiber, core radius %s µm, NA %s, α = 2', (cat, radius, na) => {
    const f = resolvePreset(findPreset(cat)!);
    expect(f).toMatchObject({ origin: 'category', category: cat, profile: 'graded', gradedAlpha: 2, coreRadiusUm: radius, na, claddingDiameterUm: 125 });
    expect(f.attenuationDbPerKm.find((a) => a.wavelengthNm === 850)).toBeDefined();
  });

  it.each(['G.652.D', 'G.657.A1', 'G.657.A2', 'G.657.B2', 'G.657.B3'])('%s has the 1260 nm cable cutoff limit and an MFD at 1310 nm', (cat) => {
    const p = findPreset(cat)!;
    expect(p.cutoffWavelengthNm?.value).toBe(1260); // ITU-T G.652 / G.657: λcc ≤ 1260 nm (from memory)
    expect(p.cutoffKind).toBe('cable');
    expect(p.mfdWavelengthNm).toBe(1310);
    expect(p.mfdUm!.value).toBeGreaterThanOrEqual(8.6); // inside the nominal 8.6–9.2 µm range (from memory)
    expect(p.mfdUm!.value).toBeLessThanOrEqual(9.2);
  });

  it('a multimode-only picker offers only the OM classes', () => {
    expect(presetsOfKinds(['multimode']).map((p) => p.kind)).toEqual(Array(5).fill('multimode'));
  });
});

describe('typed and saved fibers', () => {
  it('typed core diameter and NA become a step-index fiber of half that radius', () => {
    expect(resolveTyped({ profile: 'step', coreDiameterUm: 8.2, na: 0.14 })).toMatchObject({ origin: 'typed', coreRadiusUm: 4.1, na: 0.14, claddingDiameterUm: 125 });
  });

  it.each([
    [{ coreDiameterUm: 8.2, na: 1.4 }, 'na'],
    [{ coreDiameterUm: 0, na: 0.14 }, 'coreDiameterUm'],
    [{ coreDiameterUm: Number.NaN, na: 0.14 }, 'coreDiameterUm'],
    [{ coreDiameterUm: 8.2, na: 0.14, claddingDiameterUm: 8 }, 'claddingDiameterUm'],
  ])('bad typed values %j are refused naming %s', (v, arg) => {
    let err: unknown;
    try {
      resolveTyped({ profile: 'step', ...v }, 'p-');
    } catch (e) {
      err = e;
    }
    expect(err).toBeInstanceOf(InputError);
    expect((err as InputError).argument).toBe(`p-${arg}`);
  });

  it('a saved type given by indices gets NA = √(n1² − n2²)', () => {
    const f = resolveSaved(record({ id: 'ft_i' }, stepInput({ na: undefined, coreIndex: 1.4504, claddingIndex: 1.4447 })));
    // python3 3.x: math.sqrt(1.4504**2 - 1.4447**2) = 0.1284603829980245
    expect(f.na).toBeCloseTo(0.1284603829980245, 12);
    expect(f.origin).toBe('saved');
    expect(f.notes[0]).toMatch(/from the saved indices/);
  });

  it('a saved type keeps its name, attenuation and category', () => {
    const f = resolveSaved(record({ id: 'ft_s' }, stepInput({ name: 'Yard 4', category: 'G.652.D' })));
    expect(f).toMatchObject({ name: 'Yard 4', category: 'G.652.D', attenuationDbPerKm: [{ wavelengthNm: 1310, dbPerKm: 0.35 }, { wavelengthNm: 1550, dbPerKm: 0.21 }] });
  });
});

describe('single-mode categories and labels through the mode engine', () => {
  it.each(['G.652.D', 'G.654.E', 'G.655.D', 'G.657.A1', 'G.657.A2', 'G.657.B2', 'G.657.B3'])(
    '%s resolves to an equivalent step-index fiber whose Petermann II MFD is the category MFD',
    (cat) => {
      const p = findPreset(cat)!;
      const f = resolvePreset(p);
      expect(f).toMatchObject({ origin: 'category', profile: 'step', category: cat, cutoffKind: 'cable', cutoffWavelengthNm: p.cutoffWavelengthNm!.value });
      // Independent check through the mode engine's exact-field MFD (ITU-T G.650.1 Petermann II); 1e-3 relative covers its quadrature.
      const mfd = modeFieldDiameterUm({ coreRadiusUm: f.coreRadiusUm, na: f.na, wavelengthNm: p.mfdWavelengthNm!, definition: 'petermann2' }).mfdUm;
      expect(Math.abs(mfd / p.mfdUm!.value - 1), `${cat}: MFD ${mfd} vs ${p.mfdUm!.value}`).toBeLessThan(1e-3);
      // Plausible single-mode geometry (common practice): NA 0.08–0.3, core diameter 5–14 µm.
      expect(f.na).toBeGreaterThan(0.08);
      expect(f.na).toBeLessThan(0.3);
      expect(2 * f.coreRadiusUm).toBeGreaterThan(5);
      expect(2 * f.coreRadiusUm).toBeLessThan(14);
    },
  );

  it('label values that do not sit together give a warning in the notes', () => {
    // MFD quoted at 1200 nm, below the 1260 nm cutoff: not single-mode there.
    const f = resolveLabel({ cutoffWavelengthNm: 1260, cutoffKind: 'cable', mfdUm: 9.2, mfdWavelengthNm: 1200 });
    expect(f.notes.some((n) => n.startsWith('Warning:'))).toBe(true);
  });

  it('impossible label values are refused with a reason, not a number', () => {
    expect(() => resolveLabel({ cutoffWavelengthNm: 1260, cutoffKind: 'cable', mfdUm: 1.2, mfdWavelengthNm: 1550 })).toThrow(/step-index|NA/);
  });
});
