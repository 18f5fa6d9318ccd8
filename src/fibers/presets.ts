// Standard fiber categories as read-only presets. Every value carries its source in plain words:
// the standard and its edition, "typical, common practice", or "from memory" when it was recalled
// without the text at hand. These are category *limits and nominal values*, never a product's data.
//
// Single-mode categories are described the way a label describes a fiber (cutoff wavelength and
// mode field diameter at a reference wavelength); the picker turns those into an equivalent
// step-index core radius and NA through the mode engine (src/physics/equivalentStepIndex.ts).
// Multimode classes are described by their nominal core diameter, NA and graded profile.

export type FiberKind = 'single-mode' | 'multimode';

/** A value and where it comes from, shown together on every screen that shows the value. */
export interface Sourced<T> {
  value: T;
  source: string;
}

export interface AttenuationPoint {
  wavelengthNm: number;
  dbPerKm: number;
}

/** A further line of the category (macrobend limit, dispersion, bandwidth), shown as text. */
export interface PresetFact {
  label: string;
  value: string;
  source: string;
}

export interface CategoryPreset {
  /** Category code as the trade writes it: 'G.652.D', 'OM3'. Unique. */
  category: string;
  kind: FiberKind;
  /** Short title for lists, e.g. "G.652.D standard single-mode". */
  title: string;
  /** The standard (with edition) the category belongs to. */
  standard: string;
  profile: Sourced<'step' | 'graded'>;
  gradedAlpha?: Sourced<number>;
  /** Multimode: nominal core diameter. Single-mode: absent (derived from the label values). */
  coreDiameterUm?: Sourced<number>;
  /** Multimode: nominal NA. Single-mode: absent (derived). */
  na?: Sourced<number>;
  claddingDiameterUm: Sourced<number>;
  /** Single-mode: the cutoff value used to derive the equivalent step-index fiber. */
  cutoffWavelengthNm?: Sourced<number>;
  cutoffKind?: 'fiber' | 'cable';
  /** Single-mode: the MFD value used to derive the equivalent step-index fiber. */
  mfdUm?: Sourced<number>;
  mfdWavelengthNm?: number;
  /** Maximum attenuation (cabled fiber) at the wavelengths the category specifies. */
  attenuationDbPerKm: Sourced<AttenuationPoint>[];
  facts: PresetFact[];
  notes: string[];
}

// Source phrases. The standards were not at hand while these were written, so every standard value
// says "from memory": check against the current edition before relying on a limit.
const G652 = 'ITU-T G.652 (11/2016), from memory';
const G654 = 'ITU-T G.654 (03/2020), G.654.E attributes, from memory';
const G655 = 'ITU-T G.655 (11/2009), G.655.D attributes, from memory';
const G657 = 'ITU-T G.657 (11/2016), from memory';
const IEC_MM = 'IEC 60793-2-10 (2019), from memory';
const ISO_MM = 'ISO/IEC 11801-1 (2017), cabled fiber, from memory';
const TYPICAL = 'typical, common practice';
const AT_LIMIT = 'the category limit, used as the label value (a fiber at the limit) — from memory';

/** Cladding of every category here: 125 µm nominal. */
const CLADDING_125_SM: Sourced<number> = { value: 125, source: `${G652}: 125.0 ± 0.7 µm` };
const CLADDING_125_MM: Sourced<number> = { value: 125, source: `${IEC_MM}: 125 ± 2 µm` };

/** Single-mode cable attenuation limits for the G.652.D / G.657 family. */
function g652Attenuation(source: string): Sourced<AttenuationPoint>[] {
  return [
    { value: { wavelengthNm: 1310, dbPerKm: 0.4 }, source },
    { value: { wavelengthNm: 1550, dbPerKm: 0.3 }, source },
    { value: { wavelengthNm: 1625, dbPerKm: 0.4 }, source },
  ];
}

const G652_MFD_FACT: PresetFact = {
  label: 'Mode field diameter at 1310 nm',
  value: '8.6 to 9.2 µm nominal, tolerance ± 0.4 µm (the 2009 edition allowed 8.6 to 9.5 µm, ± 0.6 µm)',
  source: G652,
};

const SM_NOTE_EQUIVALENT =
  'Core radius and NA are not part of the category: they are the equivalent step-index fiber that reproduces the cutoff and mode field diameter below.';

function g657(sub: 'A1' | 'A2' | 'B2' | 'B3', bend: PresetFact[]): CategoryPreset {
  const mfdNote = sub.startsWith('B')
    ? 'category B allows a wider nominal range than category A, down to 6.3 µm in some editions (from memory, uncertain)'
    : 'the same range as G.652.D, so it splices to G.652.D with low loss';
  return {
    category: `G.657.${sub}`,
    kind: 'single-mode',
    title: `G.657.${sub} bend-insensitive single-mode`,
    standard: 'ITU-T G.657 (11/2016)',
    profile: { value: 'step', source: 'equivalent step-index, common practice (the real profile may be trench-assisted)' },
    claddingDiameterUm: { value: 125, source: `${G657}: 125.0 ± 0.7 µm` },
    cutoffWavelengthNm: { value: 1260, source: `${G657}: cable cutoff ≤ 1260 nm; ${AT_LIMIT}` },
    cutoffKind: 'cable',
    mfdUm: { value: sub.startsWith('B') ? 8.8 : 9.0, source: TYPICAL },
    mfdWavelengthNm: 1310,
    attenuationDbPerKm: g652Attenuation(`${G657}: cable attenuation maximum`),
    facts: [
      { label: 'Mode field diameter at 1310 nm', value: `8.6 to 9.2 µm nominal, tolerance ± 0.4 µm; ${mfdNote}`, source: G657 },
      { label: 'Cable cutoff wavelength', value: '≤ 1260 nm', source: G657 },
      ...bend,
    ],
    notes: [SM_NOTE_EQUIVALENT, 'Bend-insensitive fibers often use a trench around the core; the equivalent step-index fiber matches cutoff and MFD but not the bend loss of the real profile.'],
  };
}

function macrobend(radiusMm: number, turns: number, db1550: number, db1625: number): PresetFact {
  return {
    label: `Macrobend loss, ${turns} turn${turns === 1 ? '' : 's'} at ${radiusMm} mm radius`,
    value: `≤ ${db1550} dB at 1550 nm, ≤ ${db1625} dB at 1625 nm`,
    source: G657,
  };
}

function omClass(
  cat: 'OM1' | 'OM2' | 'OM3' | 'OM4' | 'OM5',
  iecType: string,
  coreDiameterUm: number,
  na: number,
  bandwidth: string,
  attenuation: AttenuationPoint[],
): CategoryPreset {
  const coreTol = coreDiameterUm === 62.5 ? '62.5 ± 2.5 µm' : '50 ± 2.5 µm';
  const naTol = `${na.toFixed(3)} ± 0.015`;
  return {
    category: cat,
    kind: 'multimode',
    title: `${cat} multimode, ${coreDiameterUm} µm core`,
    standard: `ISO/IEC 11801-1 (2017) class ${cat}; fiber type IEC 60793-2-10 ${iecType}`,
    profile: { value: 'graded', source: `${IEC_MM}: graded-index` },
    gradedAlpha: { value: 2, source: 'near-parabolic, α ≈ 2: typical, common practice (the standard sets bandwidth, not α)' },
    coreDiameterUm: { value: coreDiameterUm, source: `${IEC_MM}: ${coreTol}` },
    na: { value: na, source: `${IEC_MM}: ${naTol}` },
    claddingDiameterUm: CLADDING_125_MM,
    attenuationDbPerKm: attenuation.map((value) => ({ value, source: `${ISO_MM}: maximum` })),
    facts: [
      { label: 'Core diameter', value: coreTol, source: IEC_MM },
      { label: 'Numerical aperture', value: naTol, source: IEC_MM },
      { label: 'Modal bandwidth', value: bandwidth, source: ISO_MM },
    ],
    notes: ['Graded-index multimode: many modes are guided at every working wavelength; there is no single-mode cutoff.'],
  };
}

const MM_ATT_OM1_TO_OM4: AttenuationPoint[] = [
  { wavelengthNm: 850, dbPerKm: 3.5 },
  { wavelengthNm: 1300, dbPerKm: 1.5 },
];

export const CATEGORY_PRESETS: readonly CategoryPreset[] = Object.freeze([
  {
    category: 'G.652.D',
    kind: 'single-mode',
    title: 'G.652.D standard single-mode',
    standard: 'ITU-T G.652 (11/2016)',
    profile: { value: 'step', source: 'equivalent step-index (matched-cladding profile): common practice' },
    claddingDiameterUm: CLADDING_125_SM,
    cutoffWavelengthNm: { value: 1260, source: `${G652}: cable cutoff ≤ 1260 nm; ${AT_LIMIT}` },
    cutoffKind: 'cable',
    mfdUm: { value: 9.2, source: `${TYPICAL} (inside the nominal range of ${G652})` },
    mfdWavelengthNm: 1310,
    attenuationDbPerKm: g652Attenuation(`${G652}: cable attenuation maximum`),
    facts: [
      G652_MFD_FACT,
      { label: 'Cable cutoff wavelength', value: '≤ 1260 nm', source: G652 },
      { label: 'Zero-dispersion wavelength', value: '1300 to 1324 nm, slope ≤ 0.092 ps/(nm²·km)', source: G652 },
      { label: 'Macrobend loss, 100 turns at 30 mm radius', value: '≤ 0.1 dB at 1625 nm', source: G652 },
      { label: 'Core diameter (not specified by the category)', value: 'about 8.2 µm, NA about 0.14', source: TYPICAL },
    ],
    notes: [SM_NOTE_EQUIVALENT],
  },
  {
    category: 'G.654.E',
    kind: 'single-mode',
    title: 'G.654.E cutoff-shifted, large effective area',
    standard: 'ITU-T G.654 (03/2020), sub-category G.654.E',
    profile: { value: 'step', source: 'equivalent step-index: common practice' },
    claddingDiameterUm: { value: 125, source: `${G654}: 125.0 ± 0.7 µm` },
    cutoffWavelengthNm: { value: 1530, source: `${G654}: cable cutoff ≤ 1530 nm; ${AT_LIMIT}` },
    cutoffKind: 'cable',
    mfdUm: { value: 12.0, source: `${TYPICAL} (middle of the nominal range of ${G654})` },
    mfdWavelengthNm: 1550,
    attenuationDbPerKm: [{ value: { wavelengthNm: 1550, dbPerKm: 0.23 }, source: `${G654}: cable attenuation maximum` }],
    facts: [
      { label: 'Mode field diameter at 1550 nm', value: '11.5 to 12.5 µm nominal, tolerance ± 0.7 µm', source: G654 },
      { label: 'Cable cutoff wavelength', value: '≤ 1530 nm', source: G654 },
      { label: 'Chromatic dispersion at 1550 nm', value: '17 to 23 ps/(nm·km)', source: G654 },
    ],
    notes: [SM_NOTE_EQUIVALENT, 'Cutoff-shifted: not single-mode at 1310 nm; meant for the 1550 nm window.'],
  },
  {
    category: 'G.655.D',
    kind: 'single-mode',
    title: 'G.655.D non-zero dispersion-shifted single-mode',
    standard: 'ITU-T G.655 (11/2009), sub-category G.655.D',
    profile: { value: 'step', source: 'equivalent step-index only: the real profile is not a step (common practice)' },
    claddingDiameterUm: { value: 125, source: `${G655}: 125.0 ± 0.7 µm` },
    cutoffWavelengthNm: { value: 1450, source: `${G655}: cable cutoff ≤ 1450 nm; ${AT_LIMIT}` },
    cutoffKind: 'cable',
    mfdUm: { value: 9.6, source: TYPICAL },
    mfdWavelengthNm: 1550,
    attenuationDbPerKm: [
      { value: { wavelengthNm: 1550, dbPerKm: 0.35 }, source: `${G655}: cable attenuation maximum` },
      { value: { wavelengthNm: 1625, dbPerKm: 0.4 }, source: `${G655}: cable attenuation maximum` },
    ],
    facts: [
      { label: 'Mode field diameter at 1550 nm', value: '8 to 11 µm nominal, tolerance ± 0.6 µm', source: G655 },
      { label: 'Cable cutoff wavelength', value: '≤ 1450 nm', source: G655 },
      { label: 'Chromatic dispersion', value: 'small but not zero across 1530 to 1565 nm (a dispersion envelope, not one value)', source: G655 },
    ],
    notes: [
      SM_NOTE_EQUIVALENT,
      'A dispersion-shifted profile is far from a step: the equivalent step-index fiber is only good for cutoff and MFD estimates, not for dispersion.',
    ],
  },
  g657('A1', [macrobend(15, 10, 0.25, 1.0), macrobend(10, 1, 0.75, 1.5)]),
  g657('A2', [macrobend(15, 10, 0.03, 0.1), macrobend(10, 1, 0.1, 0.2), macrobend(7.5, 1, 0.5, 1.0)]),
  g657('B2', [macrobend(15, 10, 0.03, 0.1), macrobend(10, 1, 0.1, 0.2), macrobend(7.5, 1, 0.5, 1.0)]),
  g657('B3', [macrobend(10, 1, 0.03, 0.1), macrobend(7.5, 1, 0.08, 0.25), macrobend(5, 1, 0.15, 0.45)]),
  omClass('OM1', 'A1b', 62.5, 0.275, 'overfilled launch ≥ 200 MHz·km at 850 nm, ≥ 500 MHz·km at 1300 nm', MM_ATT_OM1_TO_OM4),
  omClass('OM2', 'A1a.1', 50, 0.2, 'overfilled launch ≥ 500 MHz·km at 850 nm and at 1300 nm', MM_ATT_OM1_TO_OM4),
  omClass('OM3', 'A1a.2', 50, 0.2, 'effective modal bandwidth ≥ 2000 MHz·km at 850 nm; overfilled ≥ 1500 / 500 MHz·km at 850 / 1300 nm', MM_ATT_OM1_TO_OM4),
  omClass('OM4', 'A1a.3', 50, 0.2, 'effective modal bandwidth ≥ 4700 MHz·km at 850 nm; overfilled ≥ 3500 / 500 MHz·km at 850 / 1300 nm', MM_ATT_OM1_TO_OM4),
  omClass('OM5', 'A1a.4', 50, 0.2, 'effective modal bandwidth ≥ 4700 MHz·km at 850 nm and ≥ 2470 MHz·km at 953 nm', [
    { wavelengthNm: 850, dbPerKm: 3.0 },
    { wavelengthNm: 953, dbPerKm: 2.3 },
    { wavelengthNm: 1300, dbPerKm: 1.5 },
  ]),
] satisfies CategoryPreset[]);

export function findPreset(category: string): CategoryPreset | undefined {
  return CATEGORY_PRESETS.find((p) => p.category === category);
}

export function presetsOfKinds(kinds: readonly FiberKind[]): CategoryPreset[] {
  return CATEGORY_PRESETS.filter((p) => kinds.includes(p.kind));
}
