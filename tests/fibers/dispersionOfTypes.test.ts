// Issue 6 property: dispersion results are finite over 1200–1700 nm for every saved type.
// "Every saved type" here is every single-mode fiber the app ships or offers: each standard
// category preset and each single-mode type of the demo library, through the same resolution
// (equivalent step index from the label) and model construction the dispersion screen uses.
import { describe, expect, it } from 'vitest';
import { chromaticDispersion, dispersionFiberFromNa } from '../../src/physics/dispersion';
import { presetsOfKinds } from '../../src/fibers/presets';
import { kindOfSaved, resolvePreset, resolveSaved } from '../../src/fibers/resolve';
import { demoRecords } from '../../src/fibers/demo';
import type { ResolvedFiber } from '../../src/fibers/resolved';

const fibers: [string, ResolvedFiber][] = [
  ...presetsOfKinds(['single-mode']).map((p) => [`category ${p.category}`, resolvePreset(p)] as [string, ResolvedFiber]),
  ...demoRecords(Date.UTC(2026, 11, 1))
    .filter((r) => kindOfSaved(r) === 'single-mode')
    .map((r) => [`demo type "${r.name}"`, resolveSaved(r)] as [string, ResolvedFiber]),
];

// 1 nm steps: the sweep a person sees on the screen, extended to the 1700 nm.
const WAVELENGTHS_NM = Array.from({ length: 501 }, (_, i) => 1200 + i);

describe('chromatic dispersion of every single-mode type the app offers', () => {
  it('covers at least the seven single-mode categories', () => {
    expect(fibers.length).toBeGreaterThanOrEqual(7);
  });

  it.each(fibers)('%s has a finite D(λ), with finite parts, at every wavelength from 1200 to 1700 nm', (_name, fiber) => {
    const model = dispersionFiberFromNa({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, referenceWavelengthNm: fiber.mfdWavelengthNm ?? 1310 });
    const bad: string[] = [];
    for (const wl of WAVELENGTHS_NM) {
      const p = chromaticDispersion(model, wl);
      for (const [k, v] of Object.entries(p)) if (typeof v === 'number' && !Number.isFinite(v)) bad.push(`${wl} nm: ${k} = ${v}`);
    }
    expect(bad, `non-finite values for a = ${fiber.coreRadiusUm} µm, NA = ${fiber.na}`).toEqual([]);
  });
});
