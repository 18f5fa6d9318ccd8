// The launch-condition screens' pure parts: the typed group powers, the verdict words and the worker tasks
// (the physics itself is checked against its sources in tests/physics/).
import { describe, expect, it } from 'vitest';
import { parseGroupPowers } from '../../src/features/encircledFlux/groupText';
import { efVerdictLine } from '../../src/features/encircledFlux/parts';
import { efTask, mandrelTask, offsetTask } from '../../src/features/encircledFlux/tasks';

const OM3 = { profile: 'graded' as const, coreRadiusUm: 25, na: 0.2, alpha: 2 };

describe('power per group as typed', () => {
  it.each([
    { text: '1, 1, 0.5', powers: [1, 1, 0.5] },
    { text: ' 2;3 4 ', powers: [2, 3, 4] },
    { text: '0, .5', powers: [0, 0.5] },
  ])('"$text" reads as $powers for groups 1, 2, …', ({ text, powers }) => {
    expect(parseGroupPowers(text).groupPowers?.map((g) => g.power)).toEqual(powers);
    expect(parseGroupPowers(text).groupPowers?.map((g) => g.principal)).toEqual(powers.map((_, i) => i + 1));
  });

  it.each([
    { text: '', says: /type one number per group/ },
    { text: '1, -1', says: /“-1” \(group 2\) is not a number ≥ 0/ },
    { text: '1e400', says: /is not a number ≥ 0/ },
    { text: '0, 0', says: /at least one group needs some power/ },
    { text: '1,'.repeat(400), says: /at most 100 numbers/ },
  ])('"$text" is explained in the field’s own words', ({ text, says }) => {
    const r = parseGroupPowers(text);
    expect(r.groupPowers).toBeUndefined();
    expect(r.error).toMatch(/^Power in each group: /);
    expect(r.error).toMatch(says);
  });
});

describe('the worker tasks behind the screens', () => {
  it('an overfilled launch into OM3 at 850 nm: headline "Overfilled" at an outer radius', () => {
    const r = efTask({ fiber: OM3, wavelengthNm: 850, launch: { kind: 'overfilled' } });
    const line = efVerdictLine(r.check, r.curve);
    expect(line.verdict).toMatch(/^Overfilled: below 0\.\d{4}, reads loss high$/);
    expect(line.label).toMatch(/EF at (15|20|22)\u00a0µm/);
    expect(line.tone).toBe('bad');
  });

  it('a 62.5 µm core gets EF without a verdict, said in words', () => {
    const r = efTask({ fiber: { profile: 'graded', coreRadiusUm: 31.25, na: 0.275 }, wavelengthNm: 1300, launch: { kind: 'overfilled' } });
    expect(r.check).toBeUndefined();
    expect(efVerdictLine(r.check, r.curve).verdict).toMatch(/No template here/);
  });

  it('the mandrel task puts the table’s mandrel beside the chosen one and a loss-versus-diameter sweep that never rises', () => {
    const r = mandrelTask({ fiber: OM3, wavelengthNm: 850, mandrelDiameterMm: 15, cordDiameterMm: 3, turns: 5 });
    expect(r.table?.mandrelDiameterMm).toBe(22);
    expect(r.chosen.lossDb).toBeGreaterThan(r.table!.lossDb);
    for (let i = 1; i < r.sweep.length; i++) expect(r.sweep[i][1]).toBeLessThanOrEqual(r.sweep[i - 1][1] + 1e-12);
  });

  it('the offset task sweeps from the axis to the core edge and reports the chosen offset', () => {
    const r = offsetTask({ fiber: OM3, wavelengthNm: 1310, mfdUm: 9.2, offsetUm: 13 });
    expect(r.sweep[0].offsetUm).toBe(0);
    expect(r.sweep[r.sweep.length - 1].offsetUm).toBe(25);
    expect(r.at.offsetUm).toBe(13);
    expect(r.at.check?.template.wavelengthNm).toBe(1300);
  });
});
