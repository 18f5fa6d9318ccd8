// The library form: typed text (with units) → a validated fiber type, and back.
import { describe, expect, it } from 'vitest';
import { draftFromInput, draftFromPreset, draftToInput, emptyDraft } from '../../src/features/library/draft';
import { filterAndSort } from '../../src/features/library/query';
import { findPreset } from '../../src/fibers/presets';
import { gradedInput, labelInput, record, stepInput } from './helpers';

describe('the add/edit form', () => {
  it.each([
    ['step-index', stepInput()],
    ['graded-index', gradedInput()],
    ['from label', labelInput({ coreDiameterUm: 8.3 })],
    ['by indices', stepInput({ na: undefined, coreIndex: 1.4504, claddingIndex: 1.4447 })],
  ])('a %s type survives form text and back unchanged', (_w, input) => {
    expect(draftToInput(draftFromInput(input))).toEqual({ input, errors: {} });
  });

  it('units typed in the fields are converted: "0,05 mm" core and "1.31 µm" MFD wavelength', () => {
    const d = { ...draftFromInput(labelInput({ coreDiameterUm: 8.3 })), coreDiameter: '0,0083 mm', mfdWavelength: '1.31 µm' };
    const r = draftToInput(d);
    expect(r.input?.coreDiameterUm).toBeCloseTo(8.3, 12);
    expect(r.input?.mfdWavelengthNm).toBeCloseTo(1310, 9);
  });

  it('an empty form says which fields are needed', () => {
    const r = draftToInput(emptyDraft('step'));
    expect(r.input).toBeUndefined();
    expect(Object.keys(r.errors).sort()).toEqual(['coreDiameterUm', 'na', 'name']);
  });

  it('text that is not a number is named on its field', () => {
    const r = draftToInput({ ...draftFromInput(stepInput()), na: 'about 0.14' });
    expect(r.errors.na).toMatch(/Expected/);
  });

  it('a half-filled attenuation row is reported, a blank one ignored', () => {
    const base = draftFromInput(stepInput({ attenuation: [] }));
    expect(draftToInput({ ...base, attenuation: [{ wavelength: '', dbPerKm: '' }] }).input?.attenuation).toEqual([]);
    expect(draftToInput({ ...base, attenuation: [{ wavelength: '1310', dbPerKm: '' }] }).errors.attenuation).toMatch(/row 1/);
  });

  it('a cloned G.652.D preset is an editable label type with the category values', () => {
    const r = draftToInput(draftFromPreset(findPreset('G.652.D')!));
    expect(r.input).toMatchObject({ name: 'My G.652.D', profile: 'label', cutoffWavelengthNm: 1260, cutoffKind: 'cable', mfdUm: 9.2, mfdWavelengthNm: 1310, category: 'G.652.D' });
  });

  it('a cloned OM4 preset is a graded-index 50 µm type', () => {
    const r = draftToInput(draftFromPreset(findPreset('OM4')!));
    expect(r.input).toMatchObject({ profile: 'graded', gradedAlpha: 2, coreDiameterUm: 50, na: 0.2, category: 'OM4' });
  });
});

describe('search and order', () => {
  const recs = [
    record({ id: 'a', nameKey: 'tray b riser', updatedAt: 10, createdAt: 1 }, stepInput({ name: 'Tray B riser' })),
    record({ id: 'b', nameKey: 'alpha drum', updatedAt: 9, createdAt: 1, category: 'OM3' }, gradedInput({ name: 'Alpha drum' })),
    record({ id: 'c', nameKey: 'cable 7', updatedAt: 5, createdAt: 1 }, stepInput({ name: 'Cable 7', notes: 'north yard' })),
  ];
  it('all words must match name, category or notes, whatever the case', () => {
    expect(filterAndSort(recs, 'NORTH').map((r) => r.id)).toEqual(['c']);
    expect(filterAndSort(recs, 'om3 alpha').map((r) => r.id)).toEqual(['b']);
    expect(filterAndSort(recs, 'riser x')).toEqual([]);
  });
  it('by name, or most recently changed first', () => {
    expect(filterAndSort(recs, '').map((r) => r.id)).toEqual(['b', 'c', 'a']);
    expect(filterAndSort(recs, '', 'recent').map((r) => r.id)).toEqual(['a', 'b', 'c']); // changed at 10, 9, 5
  });
});
