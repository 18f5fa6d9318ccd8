import { describe, expect, it } from 'vitest';
import fc from 'fast-check';
import {
  idealSplitLossDb,
  InputError,
  linkBudget,
  linkBudgetReport,
  ModelError,
  ownRuleSet,
  RULE_SETS,
  TIA_568_3_D,
  TIA_568_C_3,
  TYPICAL_VALUES,
  type LinkElement,
  type LinkRuleSet,
} from '../../src/physics';

// Budgets are sums of a few products: exact to a few ulps. 1e-12 dB leaves room for summation order.
const TOL_DB = 1e-12;

function expectDb(got: number, expected: number, what: string, tol = TOL_DB) {
  if (!(Math.abs(got - expected) <= tol)) throw new Error(`${what}: got ${got} dB, expected ${expected} dB, tolerance ${tol} dB`);
}

// Multimode fiber type with its own attenuation (typical cabled OM-class values, common practice).
const MM_ATTEN = [
  { wavelengthNm: 850, dbPerKm: 3.0 },
  { wavelengthNm: 1300, dbPerKm: 1.0 },
];
const SM_ATTEN = [
  { wavelengthNm: 1310, dbPerKm: 0.35 },
  { wavelengthNm: 1550, dbPerKm: 0.22 },
];

describe('worked link budgets reproduced exactly', () => {
  // Allowance method (TIA-568.3-D and 568-C.3): cable length × maximum cable attenuation + pairs × 0.75 dB + splices × 0.3 dB.
  // 2 km multimode backbone, 2 mated pairs, 1 splice. The editions differ at 850 nm only:
  //   568-C.3 (2008): 2 × 3.5 + 2 × 0.75 + 0.3 = 8.8 dB; 568.3-D (2016): 2 × 3.0 + 1.5 + 0.3 = 7.8 dB (3.0 and 3.5 from memory);
  //   1300 nm, both: 2 × 1.5 + 1.5 + 0.3 = 4.8 dB.
  it.each([
    [TIA_568_C_3.name, 850, 8.8, TIA_568_C_3],
    [TIA_568_C_3.name, 1300, 4.8, TIA_568_C_3],
    [TIA_568_3_D.name, 850, 7.8, TIA_568_3_D],
    [TIA_568_3_D.name, 1300, 4.8, TIA_568_3_D],
  ] as const)('a 2 km multimode backbone with 2 connector pairs and 1 splice: %s at %s nm allows %s dB', (_name, w, expected, rules) => {
    const r = linkBudget({
      elements: [
        { kind: 'fiber', label: 'backbone', lengthKm: 2, fiberClass: 'multimode', attenuationDbPerKm: MM_ATTEN },
        { kind: 'connectorPair', label: 'panels', count: 2 },
        { kind: 'splice', label: 'splice', count: 1 },
      ],
      wavelengthsNm: [w],
      ruleSet: rules,
      designMarginDb: 0,
    });
    expectDb(r.wavelengths[0]!.acceptanceDb, expected, `acceptance at ${w} nm`);
  });

  // Single-mode, outside plant: 10 km of outside-plant cable, 2 mated pairs (patch panels at each end), 4 fusion splices.
  // TIA-568.3-D: 10 km × 0.5 dB/km (single-mode outside plant, from memory; "0.5 dB/km outside plant per TIA 568" in
  // published summaries) + 2 × 0.75 dB (mated pair, TIA-568.3-D per a tester maker's note) + 4 × 0.3 dB (splice, from
  // memory) = 5 + 1.5 + 1.2 = 7.7 dB at both 1310 and 1550 nm. The fiber type's own 0.35 / 0.22 dB/km give the lowest
  // and typical columns: 3.5 / 2.2 dB of fiber.
  it.each([
    [1310, 7.7, 3.5 + 2 * 0.1 + 4 * 0.01],
    [1550, 7.7, 2.2 + 2 * 0.1 + 4 * 0.01],
  ])('a 10 km outside-plant single-mode span with 2 pairs and 4 splices allows %s nm: %s dB (TIA-568.3-D)', (w, expected, lowest) => {
    const r = linkBudget({
      elements: [
        { kind: 'fiber', label: 'span', lengthKm: 10, fiberClass: 'single-mode', plant: 'outside', attenuationDbPerKm: SM_ATTEN },
        { kind: 'connectorPair', label: 'panels', count: 2 },
        { kind: 'splice', label: 'splices', count: 4 },
      ],
      wavelengthsNm: [w],
      ruleSet: TIA_568_3_D,
      designMarginDb: 0,
    });
    expectDb(r.wavelengths[0]!.acceptanceDb, expected, `acceptance at ${w} nm`, 1e-9);
    expectDb(r.wavelengths[0]!.minDb, lowest, `lowest at ${w} nm`, 1e-9);
  });

  // Single-mode, inside plant: a 300 m premises backbone with 2 mated pairs. TIA-568.3-D: 0.3 km × 1.0 dB/km (single-mode
  // inside plant, from memory) + 2 × 0.75 dB = 0.3 + 1.5 = 1.8 dB at 1310 and 1550 nm. The same run counted as outside
  // plant allows 0.15 + 1.5 = 1.65 dB: the plant kind changes the answer, so both allowances are defended.
  it.each([
    ['inside', 1310, 1.8],
    ['inside', 1550, 1.8],
    ['outside', 1310, 1.65],
    ['outside', 1550, 1.65],
  ] as const)('a 300 m %s-plant single-mode backbone with 2 pairs allows %s nm: %s dB (TIA-568.3-D)', (plant, w, expected) => {
    const r = linkBudget({
      elements: [
        { kind: 'fiber', label: 'backbone', lengthKm: 0.3, fiberClass: 'single-mode', plant, attenuationDbPerKm: SM_ATTEN },
        { kind: 'connectorPair', label: 'panels', count: 2 },
      ],
      wavelengthsNm: [w],
      ruleSet: TIA_568_3_D,
      designMarginDb: 0,
    });
    expectDb(r.wavelengths[0]!.acceptanceDb, expected, `acceptance at ${w} nm`, 1e-9);
  });

  // Issue 12: where the two editions differ, both are offered, and whatever was not checked against the text says so.
  it('offers both TIA editions as named rule sets, and says on the budget which values are from memory', () => {
    expect(RULE_SETS).toContain(TIA_568_3_D);
    expect(RULE_SETS).toContain(TIA_568_C_3);
    expect(TIA_568_3_D.name).toMatch(/568\.3-D \(2016\)/);
    expect(TIA_568_C_3.name).toMatch(/568-C\.3 \(2008\)/);
    for (const rules of [TIA_568_3_D, TIA_568_C_3]) {
      const r = linkBudget({ elements: [], wavelengthsNm: [850], ruleSet: rules, designMarginDb: 0 });
      const fiberNote = r.notes.find((n) => n.startsWith('Fiber:'));
      expect(fiberNote).toMatch(/multimode .*from memory/);
    }
  });

  // Margin = power budget − link loss: 8 km single-mode at 0.5 dB/km (4 dB) + 7 connections × 0.5 dB (3.5 dB)
  // = 7.5 dB; with a 13 dB power budget the margin is 5.5 dB. A worked example reproduced widely in equipment
  // installation guides (common practice).
  it('an 8 km single-mode link with 7 connections leaves 5.5 dB of a 13 dB power budget', () => {
    const rules = ownRuleSet({ connectorPairDb: { minDb: 0.5, typicalDb: 0.5, maxDb: 0.5 }, spliceDb: { minDb: 0, typicalDb: 0, maxDb: 0 } });
    const r = linkBudget({
      elements: [
        { kind: 'fiber', label: 'span', lengthKm: 8, fiberClass: 'single-mode', attenuationDbPerKm: [{ wavelengthNm: 1310, dbPerKm: 0.5 }] },
        { kind: 'connectorPair', label: 'connections', count: 7 },
      ],
      wavelengthsNm: [1310],
      ruleSet: rules,
      designMarginDb: 0,
      equipment: [{ wavelengthNm: 1310, txMinDbm: -3, txMaxDbm: -3, rxSensitivityDbm: -16, rxOverloadDbm: 0 }],
    });
    const w = r.wavelengths[0]!;
    expectDb(w.maxDb, 7.5, 'link loss');
    expectDb(w.equipment!.powerBudgetDb, 13, 'power budget');
    expectDb(w.equipment!.remainingMarginDb, 5.5, 'margin');
    expect(w.equipment!.verdict).toBe('pass');
  });

  it.each([
    [2, 3.010299956639812],
    [8, 9.030899869919435],
    [32, 15.05149978319906],
  ])('a 1×%s splitter ideally costs %s dB (10·log10 N, power shared equally)', (n, expected) => {
    expectDb(idealSplitLossDb(n), expected, `1×${n}`);
  });
});

describe('the equipment check', () => {
  const shortLink: LinkElement[] = [
    { kind: 'fiber', label: 'short run', lengthKm: 0.5, fiberClass: 'single-mode', plant: 'inside', attenuationDbPerKm: SM_ATTEN },
    { kind: 'connectorPair', label: 'patch panels', count: 2 },
  ];

  it('a strong transmitter on a short link overloads the receiver and names the attenuator needed', () => {
    const r = linkBudget({
      elements: shortLink,
      wavelengthsNm: [1310],
      ruleSet: TIA_568_3_D,
      designMarginDb: 3,
      equipment: [{ wavelengthNm: 1310, txMinDbm: 0, txMaxDbm: 5, rxSensitivityDbm: -28, rxOverloadDbm: -8 }],
    });
    const q = r.wavelengths[0]!.equipment!;
    // lowest loss 0.5 × 0.35 + 2 × 0.1 = 0.375 dB → strongest arrival 4.625 dBm, 12.625 dB over −8 dBm.
    expectDb(q.bestCaseRxDbm, 4.625, 'strongest arrival');
    expectDb(q.overloadHeadroomDb, -12.625, 'overload headroom');
    expect(q.verdict).toBe('overload');
    expect(q.findings.join(' ')).toMatch(/attenuator of at least 12\.63 dB/);
  });

  it('a weak transmitter on a long link fails for too little power', () => {
    const r = linkBudget({
      elements: [{ kind: 'fiber', label: 'long span', lengthKm: 100, fiberClass: 'single-mode', attenuationDbPerKm: SM_ATTEN }],
      wavelengthsNm: [1550],
      ruleSet: TYPICAL_VALUES,
      designMarginDb: 3,
      equipment: [{ wavelengthNm: 1550, txMinDbm: -5, txMaxDbm: 0, rxSensitivityDbm: -24, rxOverloadDbm: -3 }],
    });
    const q = r.wavelengths[0]!.equipment!;
    expectDb(q.worstCaseRxDbm, -27, 'weakest arrival');
    expect(q.verdict).toBe('too-little-power');
  });

  it('a link that works but eats into the design margin is marked as short of margin', () => {
    const r = linkBudget({
      elements: [{ kind: 'fiber', label: 'span', lengthKm: 80, fiberClass: 'single-mode', attenuationDbPerKm: SM_ATTEN }],
      wavelengthsNm: [1550],
      ruleSet: TYPICAL_VALUES,
      designMarginDb: 3,
      equipment: [{ wavelengthNm: 1550, txMinDbm: -2, txMaxDbm: 0, rxSensitivityDbm: -21, rxOverloadDbm: -3 }],
    });
    const q = r.wavelengths[0]!.equipment!;
    // 80 km × 0.22 dB/km = 17.6 dB → weakest −19.6 dBm, 1.4 dB above −21 dBm: 1.6 dB short of the 3 dB margin.
    expectDb(q.remainingMarginDb, -1.6, 'remaining margin', 1e-9);
    expect(q.verdict).toBe('no-margin');
  });

  it('names the element that costs most', () => {
    const r = linkBudget({
      elements: [...shortLink, { kind: 'splitter', label: 'splitter 1×16', ways: 16 }],
      wavelengthsNm: [1310, 1550],
      ruleSet: TIA_568_3_D,
      designMarginDb: 0,
    });
    for (const w of r.wavelengths) expect(w.costliest?.label).toBe('splitter 1×16');
  });
});

describe('the report', () => {
  it('is plain text with the totals, the acceptance value and the sources', () => {
    const r = linkBudget({
      elements: [{ kind: 'fiber', label: 'backbone', lengthKm: 2, fiberClass: 'multimode', attenuationDbPerKm: MM_ATTEN }],
      wavelengthsNm: [850],
      ruleSet: TIA_568_3_D,
      designMarginDb: 1.5,
    });
    const text = linkBudgetReport(r);
    // 2 km × 3.0 dB/km (TIA-568.3-D multimode 850 nm, from memory) = 6.00 dB; + 1.5 dB margin = 7.50 dB.
    expect(text).toContain('Acceptance value: 6.00 dB');
    expect(text).toContain('With design margin: 7.50 dB');
    expect(text).toContain('TIA-568.3-D');
    expect(text).not.toMatch(/NaN|Infinity|undefined/);
  });
});

// --- properties: budgets add and grow with every element ---------------------------------------------------

const arbSpread = fc
  .tuple(fc.double({ min: 0, max: 5, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }), fc.double({ min: 0, max: 5, noNaN: true }))
  .map(([a, b, c]) => {
    const [minDb, typicalDb, maxDb] = [a, b, c].sort((x, y) => x - y) as [number, number, number];
    return { minDb, typicalDb, maxDb };
  });

const arbElement: fc.Arbitrary<LinkElement> = fc.oneof(
  fc.record({
    kind: fc.constant('fiber' as const),
    label: fc.constant('fiber'),
    lengthKm: fc.double({ min: 0, max: 100, noNaN: true }),
    fiberClass: fc.constant('single-mode' as const),
    plant: fc.constantFrom('inside' as const, 'outside' as const),
    attenuationDbPerKm: fc.constant(SM_ATTEN),
  }),
  fc.record({ kind: fc.constant('connectorPair' as const), label: fc.constant('pairs'), count: fc.integer({ min: 0, max: 20 }) }),
  fc.record({ kind: fc.constant('splice' as const), label: fc.constant('splices'), count: fc.integer({ min: 0, max: 50 }) }),
  fc.record({ kind: fc.constant('splitter' as const), label: fc.constant('splitter'), ways: fc.integer({ min: 2, max: 128 }) }),
  fc.record({
    kind: fc.constant('patchCord' as const),
    label: fc.constant('cords'),
    count: fc.integer({ min: 0, max: 4 }),
    lengthM: fc.double({ min: 0, max: 30, noNaN: true }),
    fiberClass: fc.constant('single-mode' as const),
    attenuationDbPerKm: fc.constant(SM_ATTEN),
  }),
  fc.record({ kind: fc.constant('other' as const), label: fc.constant('other'), lossDb: arbSpread }),
);

const arbRules: fc.Arbitrary<LinkRuleSet> = fc.constantFrom(TIA_568_3_D, TIA_568_C_3, TYPICAL_VALUES);

function totals(elements: LinkElement[], rules: LinkRuleSet) {
  return linkBudget({ elements, wavelengthsNm: [1310, 1550], ruleSet: rules, designMarginDb: 0 }).wavelengths;
}

describe('budget laws (property tests)', () => {
  it('the budget of two links joined end to end is the sum of their budgets', () => {
    fc.assert(
      fc.property(fc.array(arbElement, { maxLength: 12 }), fc.array(arbElement, { maxLength: 12 }), arbRules, (a, b, rules) => {
        const ta = totals(a, rules);
        const tb = totals(b, rules);
        const tab = totals([...a, ...b], rules);
        tab.forEach((w, i) => {
          for (const k of ['minDb', 'typicalDb', 'maxDb'] as const) {
            expectDb(w[k], ta[i]![k] + tb[i]![k], `${k} at ${w.wavelengthNm} nm`, 1e-9);
          }
        });
      }),
    );
  });

  it('lowest ≤ typical ≤ highest for every link', () => {
    fc.assert(
      fc.property(fc.array(arbElement, { maxLength: 20 }), arbRules, (els, rules) => {
        for (const w of totals(els, rules)) {
          if (!(w.minDb <= w.typicalDb + 1e-12 && w.typicalDb <= w.maxDb + 1e-12)) throw new Error(`out of order: ${JSON.stringify(w)}`);
        }
      }),
    );
  });

  // Growing one element (longer fiber, one more pair or splice, more ways, more cords, more loss) never lowers a total.
  function grow(e: LinkElement): LinkElement {
    switch (e.kind) {
      case 'fiber':
        return { ...e, lengthKm: e.lengthKm + 1 };
      case 'connectorPair':
      case 'splice':
        return { ...e, count: e.count + 1 };
      case 'splitter':
        return { ...e, ways: e.ways + 1 };
      case 'patchCord':
        return { ...e, count: e.count + 1, lengthM: e.lengthM + 1 };
      case 'other':
        return { ...e, lossDb: { minDb: e.lossDb.minDb + 0.1, typicalDb: e.lossDb.typicalDb + 0.1, maxDb: e.lossDb.maxDb + 0.1 } };
    }
  }

  it('making any one element bigger never lowers the budget', () => {
    fc.assert(
      fc.property(fc.array(arbElement, { minLength: 1, maxLength: 12 }), fc.nat(), arbRules, (els, pick, rules) => {
        const i = pick % els.length;
        const before = totals(els, rules);
        const grown = els.map((e, j) => (j === i ? grow(e) : e));
        const after = totals(grown, rules);
        after.forEach((w, wi) => {
          for (const k of ['minDb', 'typicalDb', 'maxDb'] as const) {
            if (!(w[k] >= before[wi]![k] - 1e-12)) throw new Error(`element ${i} (${els[i]!.kind}) grew but ${k} fell: ${before[wi]![k]} → ${w[k]}`);
          }
        });
      }),
    );
  });
});

describe('bad input is refused in plain words', () => {
  const fiber: LinkElement = { kind: 'fiber', label: 'span', lengthKm: 1, fiberClass: 'single-mode', attenuationDbPerKm: SM_ATTEN };
  it('a wavelength the fiber type has no attenuation for is a model error naming the wavelength', () => {
    expect(() => linkBudget({ elements: [fiber], wavelengthsNm: [850], ruleSet: TYPICAL_VALUES, designMarginDb: 0 })).toThrow(ModelError);
    expect(() => linkBudget({ elements: [fiber], wavelengthsNm: [850], ruleSet: TYPICAL_VALUES, designMarginDb: 0 })).toThrow(/850 nm/);
  });
  it.each([
    ['a negative length', { ...fiber, lengthKm: -1 } as LinkElement],
    ['a fractional connector count', { kind: 'connectorPair', label: 'x', count: 1.5 } as LinkElement],
    ['a 1×1 splitter', { kind: 'splitter', label: 'x', ways: 1 } as LinkElement],
    ['a loss spread out of order', { kind: 'other', label: 'x', lossDb: { minDb: 2, typicalDb: 1, maxDb: 3 } } as LinkElement],
    ['a NaN loss', { kind: 'other', label: 'x', lossDb: { minDb: Number.NaN, typicalDb: 1, maxDb: 3 } } as LinkElement],
  ])('%s', (_name, el) => {
    expect(() => linkBudget({ elements: [el], wavelengthsNm: [1310], ruleSet: TYPICAL_VALUES, designMarginDb: 0 })).toThrow(InputError);
  });
  it('swapped receiver sensitivity and overload', () => {
    expect(() =>
      linkBudget({
        elements: [fiber],
        wavelengthsNm: [1310],
        ruleSet: TYPICAL_VALUES,
        designMarginDb: 0,
        equipment: [{ wavelengthNm: 1310, txMinDbm: -3, txMaxDbm: 0, rxSensitivityDbm: -3, rxOverloadDbm: -20 }],
      }),
    ).toThrow(InputError);
  });
});
