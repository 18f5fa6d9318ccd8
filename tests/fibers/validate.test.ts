import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import { validateInput, validateRecord, NAME_MAX_CHARS, NOTES_MAX_CHARS } from '../../src/fibers/validate';
import type { FiberTypeInput } from '../../src/fibers/model';
import { gradedInput, labelInput, record, stepInput, T0 } from './helpers';

describe('good records pass', () => {
  it.each([
    ['step-index with NA', stepInput()],
    ['step-index with indices instead of NA', stepInput({ na: undefined, coreIndex: 1.4504, claddingIndex: 1.4447 })],
    ['graded-index OM3', gradedInput()],
    ['from label', labelInput()],
    ['from label with a core diameter', labelInput({ coreDiameterUm: 8.3 })],
    ['step-index with cutoff and MFD', stepInput({ cutoffWavelengthNm: 1260, cutoffKind: 'cable', mfdUm: 9.2, mfdWavelengthNm: 1310 })],
    ['a name with symbols that are not markup', stepInput({ name: 'Tray <3> & “east” riser' })],
  ])('%s', (_what, input) => {
    const v = validateInput(input);
    expect(v.ok ? 'ok' : v.errors).toBe('ok');
  });

  it('names are trimmed and attenuation is sorted by wavelength', () => {
    const v = validateInput(stepInput({ name: '  Spool 9 ', attenuation: [{ wavelengthNm: 1550, dbPerKm: 0.2 }, { wavelengthNm: 1310, dbPerKm: 0.33 }] }));
    expect(v.ok && v.value.name).toBe('Spool 9');
    expect(v.ok && v.value.attenuation.map((a) => a.wavelengthNm)).toEqual([1310, 1550]);
  });

  it('fields outside the model are not carried into the record', () => {
    const v = validateInput({ ...stepInput(), sneaky: '<script>' } as FiberTypeInput);
    expect(v.ok && 'sneaky' in v.value).toBe(false);
  });
});

// Each kind of bad record, and the one field whose error the form shows.
const BAD: [string, Partial<FiberTypeInput> | Record<string, unknown>, string, FiberTypeInput?][] = [
  ['no name', { name: '' }, 'name'],
  ['a name of spaces only', { name: '   ' }, 'name'],
  ['a name that is not text', { name: 42 }, 'name'],
  ['a name too long', { name: 'x'.repeat(NAME_MAX_CHARS + 1) }, 'name'],
  ['a name with a line break', { name: 'Spool\n9' }, 'name'],
  ['a name with a script tag', { name: '<script>alert(1)</script>' }, 'name'],
  ['a name with an image tag', { name: 'Drum <img src=x onerror=alert(1)>' }, 'name'],
  ['a name with a script address', { name: 'javascript:alert(1)' }, 'name'],
  ['an unknown profile', { profile: 'w-profile' }, 'profile'],
  ['no core diameter on a step-index type', { coreDiameterUm: undefined }, 'coreDiameterUm'],
  ['a zero core diameter', { coreDiameterUm: 0 }, 'coreDiameterUm'],
  ['a negative core diameter', { coreDiameterUm: -8 }, 'coreDiameterUm'],
  ['a core diameter given as text', { coreDiameterUm: '8.2' }, 'coreDiameterUm'],
  ['a core diameter of NaN', { coreDiameterUm: Number.NaN }, 'coreDiameterUm'],
  ['a core diameter of Infinity', { coreDiameterUm: Number.POSITIVE_INFINITY }, 'coreDiameterUm'],
  ['a core diameter in mm by mistake (8200)', { coreDiameterUm: 8200 }, 'coreDiameterUm'],
  ['a cladding smaller than the core', { claddingDiameterUm: 5 }, 'claddingDiameterUm'],
  ['no cladding diameter', { claddingDiameterUm: undefined }, 'claddingDiameterUm'],
  ['an NA of 1 or more', { na: 1 }, 'na'],
  ['an NA of 0', { na: 0 }, 'na'],
  ['neither NA nor indices', { na: undefined }, 'na'],
  ['both NA and indices', { coreIndex: 1.45, claddingIndex: 1.44 }, 'na'],
  ['a core index below the cladding index', { na: undefined, coreIndex: 1.44, claddingIndex: 1.45 }, 'coreIndex'],
  ['a cladding index missing', { na: undefined, coreIndex: 1.45 }, 'claddingIndex'],
  ['an index below 1', { na: undefined, coreIndex: 1.45, claddingIndex: 0.9 }, 'claddingIndex'],
  ['indices giving an NA of 1 or more', { na: undefined, coreIndex: 1.8, claddingIndex: 1.4 }, 'coreIndex'],
  ['an α on a step-index type', { gradedAlpha: 2 }, 'gradedAlpha'],
  ['a cutoff without saying fiber or cable', { cutoffWavelengthNm: 1260 }, 'cutoffKind'],
  ['a cutoff kind that is neither', { cutoffWavelengthNm: 1260, cutoffKind: 'jumper' }, 'cutoffKind'],
  ['a cutoff kind without a cutoff', { cutoffKind: 'cable' }, 'cutoffWavelengthNm'],
  ['a cutoff in µm by mistake', { cutoffWavelengthNm: 1.26, cutoffKind: 'cable' }, 'cutoffWavelengthNm'],
  ['an MFD without its wavelength', { mfdUm: 9.2 }, 'mfdWavelengthNm'],
  ['an MFD wavelength without an MFD', { mfdWavelengthNm: 1310 }, 'mfdUm'],
  ['attenuation that is not a list', { attenuation: 0.3 }, 'attenuation'],
  ['a negative attenuation', { attenuation: [{ wavelengthNm: 1310, dbPerKm: -0.1 }] }, 'attenuation'],
  ['attenuation at a wavelength outside 200–2500 nm', { attenuation: [{ wavelengthNm: 13100, dbPerKm: 0.3 }] }, 'attenuation'],
  ['the same wavelength twice in attenuation', { attenuation: [{ wavelengthNm: 1310, dbPerKm: 0.3 }, { wavelengthNm: 1310, dbPerKm: 0.4 }] }, 'attenuation'],
  ['an unknown category', { category: 'G.999' }, 'category'],
  ['notes too long', { notes: 'n'.repeat(NOTES_MAX_CHARS + 1) }, 'notes'],
  ['notes that are not text', { notes: ['a'] }, 'notes'],
  ['a graded type without α', { gradedAlpha: undefined }, 'gradedAlpha', gradedInput()],
  ['a graded type with α of 50', { gradedAlpha: 50 }, 'gradedAlpha', gradedInput()],
  ['a label type without cutoff', { cutoffWavelengthNm: undefined }, 'cutoffWavelengthNm', labelInput()],
  ['a label type without cutoff kind', { cutoffKind: undefined }, 'cutoffKind', labelInput()],
  ['a label type without MFD', { mfdUm: undefined }, 'mfdUm', labelInput()],
  ['a label type with an NA', { na: 0.14 }, 'na', labelInput()],
];

describe('validation rejects each kind of bad record, naming the field', () => {
  it.each(BAD)('%s → %s', (_what, change, field) => {
    const base = BAD.find((b) => b[0] === _what)![3] ?? stepInput();
    const v = validateInput({ ...base, ...change });
    expect(v.ok).toBe(false);
    if (!v.ok) {
      expect(Object.keys(v.errors), JSON.stringify(v.errors)).toContain(field);
      expect(v.errors[field as keyof typeof v.errors]).toMatch(/\w{3,}/);
    }
  });

  it.each([null, 'a string', 42, [stepInput()]])('a value that is not a record (%j) is refused', (raw) => {
    expect(validateInput(raw).ok).toBe(false);
  });
});

describe('stored records', () => {
  it.each([
    ['a missing id', { id: undefined }, 'id'],
    ['an id with markup', { id: '<b>' }, 'id'],
    ['no creation time', { createdAt: undefined }, 'createdAt'],
    ['a change time before creation', { updatedAt: T0 - 1 }, 'updatedAt'],
    ['a time far in the future', { updatedAt: Date.UTC(2300, 0, 1) }, 'updatedAt'],
    ['a time as text', { createdAt: '2026-06-01' }, 'createdAt'],
  ])('%s is refused', (_what, change, field) => {
    const v = validateRecord({ ...record({ id: 'ft_1' }), ...change });
    expect(v.ok).toBe(false);
    if (!v.ok) expect(Object.keys(v.errors)).toContain(field);
  });

  it('the name key is always derived from the name, never taken from the record', () => {
    const v = validateRecord({ ...record({ id: 'ft_1' }, stepInput({ name: 'Spool  NINE' })), nameKey: 'forged' });
    expect(v.ok && v.value.nameKey).toBe('spool nine');
  });
});

describe('properties', () => {
  it('any core diameter and NA in range with a larger cladding gives a valid step-index record', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 0.5, max: 1000, noNaN: true }),
        fc.double({ min: 0.001, max: 0.999, noNaN: true }),
        fc.double({ min: 1.001, max: 2.9, noNaN: true }),
        (core, na, ratio) => validateInput(stepInput({ coreDiameterUm: core, na, claddingDiameterUm: Math.min(3000, core * ratio) })).ok,
      ),
    );
  });

  it('validation never throws, whatever the value', () => {
    fc.assert(fc.property(fc.anything(), (x) => typeof validateRecord(x).ok === 'boolean'));
    fc.assert(fc.property(fc.dictionary(fc.string(), fc.anything()), (x) => typeof validateInput({ ...stepInput(), ...x }).ok === 'boolean'));
  });
});
