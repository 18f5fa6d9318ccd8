// Link loss budget: fiber sections, connector pairs, splices, splitter, patch cords and other losses,
// under a named rule set, with the equipment check. All arithmetic is in src/physics/linkBudget.ts.
import { useState } from 'preact/hooks';
import { NumberField, NumberInput } from '../../ui/NumberField';
import { need, useQuantity, type QuantityState } from '../../ui/useQuantity';
import { useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { HowComputed } from '../../ui/HowComputed';
import { BarChart } from '../../ui/Plot';
import { formatFixed } from '../../ui/format';
import { reportText } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { findPreset } from '../../fibers/presets';
import type { ResolvedFiber } from '../../fibers/resolved';
import {
  InputError,
  parseQuantity,
  linkBudget,
  linkBudgetReport,
  ownRuleSet,
  TIA_568_3_D,
  TIA_568_C_3,
  TYPICAL_VALUES,
  type EquipmentVerdict,
  type FiberClass,
  type LinkElement,
  type LinkRuleSet,
  type PlantKind,
} from '../../physics';
import { HazardContextCautions } from '../safety/HazardContext';

type RuleChoice = 'tia' | 'tia-c3' | 'typical' | 'own';

/** Core diameter from which a fiber counts as multimode when its category does not say (common practice). */
const MULTIMODE_MIN_CORE_DIAMETER_UM = 20;

function fiberClassOf(f: ResolvedFiber): FiberClass {
  const kind = f.category ? findPreset(f.category)?.kind : undefined;
  if (kind) return kind;
  return f.profile === 'graded' || 2 * f.coreRadiusUm >= MULTIMODE_MIN_CORE_DIAMETER_UM ? 'multimode' : 'single-mode';
}

const VERDICT_CLASS: Record<EquipmentVerdict, string> = {
  pass: 'verdict-ok',
  'no-margin': 'verdict-warn',
  'too-little-power': 'verdict-bad',
  overload: 'verdict-bad',
};

const VERDICT_WORDS: Record<EquipmentVerdict, string> = {
  pass: 'Passes',
  'no-margin': 'Works, short of margin',
  'too-little-power': 'Fails: too little power',
  overload: 'Fails: receiver overload',
};

interface SectionRow {
  id: number;
  lengthText: string;
}

function count(q: QuantityState): number {
  const v = need(q);
  if (!Number.isInteger(v) || v < 0) throw new InputError(q.argument, q.text, 'a whole number, 0 or more');
  return v;
}

function SpreadFields({ prefix, label, qs }: { prefix: string; label: string; qs: [QuantityState, QuantityState, QuantityState] }) {
  return (
    <fieldset class="form" aria-label={label}>
      <legend>{label}</legend>
      <NumberField q={qs[0]} label="Lowest" unit="dB" />
      <NumberField q={qs[1]} label="Typical" unit="dB" />
      <NumberField q={qs[2]} label="Highest" unit="dB" help={prefix === 'conn' ? 'The highest value is the acceptance allowance.' : undefined} />
    </fieldset>
  );
}

export default function Screen() {
  const picker = useFiberPicker({ id: 'link-budget', label: 'Fiber type', kinds: ['single-mode', 'multimode'], defaultCategory: 'G.652.D' });
  const [rules, setRules] = useState<RuleChoice>('tia');
  const [plant, setPlant] = useState<PlantKind>('outside');
  const [sections, setSections] = useState<SectionRow[]>([
    { id: 1, lengthText: '12.4' },
    { id: 2, lengthText: '6.1' },
  ]);
  const [nextId, setNextId] = useState(3);
  const connectors = useQuantity('connectorPairs', 'plain', '4');
  const splices = useQuantity('splices', 'plain', '6');
  const splitWays = useQuantity('splitterWays', 'plain', '0');
  const cords = useQuantity('patchCords', 'plain', '2');
  const cordLength = useQuantity('patchCordLengthKm', 'length', '3 m');
  const otherLoss = useQuantity('otherLossDb', 'plain', '0');
  const margin = useQuantity('designMarginDb', 'plain', '3');
  const own = {
    conn: [useQuantity('ownConnMin', 'plain', '0.1'), useQuantity('ownConnTyp', 'plain', '0.3'), useQuantity('ownConnMax', 'plain', '0.5')] as [QuantityState, QuantityState, QuantityState],
    splice: [useQuantity('ownSpliceMin', 'plain', '0.02'), useQuantity('ownSpliceTyp', 'plain', '0.05'), useQuantity('ownSpliceMax', 'plain', '0.15')] as [QuantityState, QuantityState, QuantityState],
  };
  const [checkEquipment, setCheckEquipment] = useState(true);
  const eqWavelength = useQuantity('equipmentWavelengthNm', 'wavelength', '1310');
  const txMin = useQuantity('txMinDbm', 'power', '-5');
  const txMax = useQuantity('txMaxDbm', 'power', '0');
  const rxSens = useQuantity('rxSensitivityDbm', 'power', '-23');
  const rxOver = useQuantity('rxOverloadDbm', 'power', '-3');

  const fiber = picker.fiber;
  const allQs = [connectors, splices, splitWays, cords, cordLength, otherLoss, margin, ...own.conn, ...own.splice, eqWavelength, txMin, txMax, rxSens, rxOver];

  const budget = useResult(() => {
    if (!fiber) throw new InputError('fiber', undefined, 'a fiber type', picker.error ?? 'pick a fiber type');
    const fiberClass = fiberClassOf(fiber);
    const ruleSet: LinkRuleSet =
      rules === 'tia'
        ? TIA_568_3_D
        : rules === 'tia-c3'
          ? TIA_568_C_3
          : rules === 'typical'
          ? TYPICAL_VALUES
          : ownRuleSet({
              connectorPairDb: { minDb: need(own.conn[0]), typicalDb: need(own.conn[1]), maxDb: need(own.conn[2]) },
              spliceDb: { minDb: need(own.splice[0]), typicalDb: need(own.splice[1]), maxDb: need(own.splice[2]) },
            });
    const atten = fiber.attenuationDbPerKm;
    const elements: LinkElement[] = sections.map((s, i) => {
      const argument = `section-${s.id}`;
      let km: number;
      try {
        km = parseQuantity(argument, s.lengthText, 'length').value;
      } catch (e) {
        if (e instanceof InputError) throw new InputError(argument, s.lengthText, 'a length such as 2.5 km or 350 m', `fiber section ${i + 1}`);
        throw e;
      }
      return { kind: 'fiber', label: `Fiber section ${i + 1}`, lengthKm: km, fiberClass, plant, attenuationDbPerKm: atten };
    });
    elements.push({ kind: 'connectorPair', label: 'Connector pairs', count: count(connectors) });
    elements.push({ kind: 'splice', label: 'Splices', count: count(splices) });
    const ways = count(splitWays);
    if (ways >= 2) elements.push({ kind: 'splitter', label: `Splitter 1×${ways}`, ways });
    else if (ways === 1) throw new InputError('splitterWays', splitWays.text, '0 for none, or 2 or more outputs');
    const nCords = count(cords);
    if (nCords > 0) elements.push({ kind: 'patchCord', label: 'Patch cords', count: nCords, lengthM: need(cordLength) * 1000, fiberClass, attenuationDbPerKm: atten });
    const other = need(otherLoss);
    if (other > 0) elements.push({ kind: 'other', label: 'Other losses', lossDb: { minDb: other, typicalDb: other, maxDb: other } });
    else if (other < 0) throw new InputError('otherLossDb', otherLoss.text, 'a loss of 0 dB or more');
    const wavelengthsNm = [...new Set(atten.map((a) => a.wavelengthNm))].sort((a, b) => a - b);
    const equipment = checkEquipment
      ? [{ wavelengthNm: need(eqWavelength), txMinDbm: need(txMin), txMaxDbm: need(txMax), rxSensitivityDbm: need(rxSens), rxOverloadDbm: need(rxOver) }]
      : [];
    if (checkEquipment && !wavelengthsNm.some((w) => Math.abs(w - need(eqWavelength)) <= 30)) {
      throw new InputError('equipmentWavelengthNm', eqWavelength.text, `one of the fiber type’s wavelengths (${wavelengthsNm.join(', ')} nm)`);
    }
    return linkBudget({ elements, wavelengthsNm, ruleSet, designMarginDb: need(margin), equipment });
  }, [fiber, picker.error, rules, plant, sections, checkEquipment, ...allQs.map((q) => q.text)]);

  const calc = { error: budget.error, errorArgument: budget.errorArgument };
  const r = budget.result;
  const fieldNamed = budget.errorArgument !== undefined && (allQs.some((q) => q.argument === budget.errorArgument) || budget.errorArgument.startsWith('section-'));

  const copy =
    r &&
    reportText({
      title: 'Link loss budget',
      inputs: [
        ['Fiber type', fiber?.name ?? '—'],
        ['Rule set', r.ruleSet.name],
        ['Fiber sections', sections.map((s) => `${s.lengthText} km`).join(' + ')],
        ['Connector pairs', connectors.text],
        ['Splices', splices.text],
        ['Splitter outputs', splitWays.text],
        ['Patch cords', `${cords.text} × ${cordLength.text}`],
        ['Other losses', `${otherLoss.text} dB`],
        ['Design margin', `${margin.text} dB`],
      ],
      outputs: r.wavelengths.map((w): [string, string] => [
        `${w.wavelengthNm} nm`,
        `${formatFixed(w.minDb, 2)} / ${formatFixed(w.typicalDb, 2)} / ${formatFixed(w.maxDb, 2)} dB (lowest / typical / highest); acceptance ${formatFixed(w.acceptanceDb, 2)} dB` +
          (w.equipment ? `; ${w.equipment.findings.join(' ')}` : ''),
      ]),
      assumptions: [...r.notes, '', linkBudgetReport(r)],
    });

  return (
    <>
      <h2>The link</h2>
      {picker.element}
      <div class="form">
        <div class="field">
          <label for="lb-rules">Loss allowances</label>
          <select id="lb-rules" value={rules} onChange={(e) => setRules((e.currentTarget as HTMLSelectElement).value as RuleChoice)}>
            <option value="tia">{TIA_568_3_D.name}</option>
            <option value="tia-c3">{TIA_568_C_3.name}</option>
            <option value="typical">{TYPICAL_VALUES.name} (common practice)</option>
            <option value="own">Your own values</option>
          </select>
        </div>
        <div class="field">
          <label for="lb-plant">Cable</label>
          <select id="lb-plant" value={plant} onChange={(e) => setPlant((e.currentTarget as HTMLSelectElement).value as PlantKind)}>
            <option value="outside">Outside plant</option>
            <option value="inside">Inside plant (premises)</option>
          </select>
        </div>
      </div>
      {rules === 'own' && (
        <>
          <SpreadFields prefix="conn" label="Per mated connector pair" qs={own.conn} />
          <SpreadFields prefix="splice" label="Per splice" qs={own.splice} />
        </>
      )}

      <fieldset>
        <legend>Fiber sections (the fiber type above)</legend>
        {sections.map((s, i) => {
          const argument = `section-${s.id}`;
          const err = budget.errorArgument === argument ? budget.error : undefined;
          return (
            <div key={s.id} class="row section-row">
              <NumberInput id={argument} label={`Section ${i + 1} length`} unit="km" text={s.lengthText} onText={(t) => setSections(sections.map((x) => (x.id === s.id ? { ...x, lengthText: t } : x)))} error={err} />
              {sections.length > 1 && (
                <button type="button" onClick={() => setSections(sections.filter((x) => x.id !== s.id))} aria-label={`Remove section ${i + 1}`}>
                  Remove
                </button>
              )}
            </div>
          );
        })}
        <button
          type="button"
          onClick={() => {
            setSections([...sections, { id: nextId, lengthText: '1' }]);
            setNextId(nextId + 1);
          }}
        >
          Add a fiber section
        </button>
      </fieldset>

      <div class="form">
        <NumberField q={connectors} label="Mated connector pairs" unit="pairs" calc={calc} />
        <NumberField q={splices} label="Splices" unit="splices" calc={calc} />
        <NumberField q={splitWays} label="Splitter outputs (0 = none)" unit="outputs" quickPicks={[0, 8, 32]} calc={calc} />
        <NumberField q={cords} label="Patch cords" unit="cords" calc={calc} />
        <NumberField q={cordLength} label="Patch cord length" unit="km" help="Type 3 m for three metres." calc={calc} />
        <NumberField q={otherLoss} label="Other losses" unit="dB" calc={calc} />
        <NumberField q={margin} label="Design margin" unit="dB" help="Kept in hand for repairs and ageing." calc={calc} />
      </div>

      <fieldset>
        <legend>Equipment check</legend>
        <label>
          <input type="checkbox" checked={checkEquipment} onChange={(e) => setCheckEquipment((e.currentTarget as HTMLInputElement).checked)} /> Check
          transmitter and receiver limits
        </label>
        {checkEquipment && (
          <div class="form">
            <NumberField q={eqWavelength} label="Equipment wavelength" unit="nm" quickPicks={[850, 1300, 1310, 1550]} calc={calc} />
            <NumberField q={txMin} label="Transmitter power, lowest" unit="dBm" calc={calc} />
            <NumberField q={txMax} label="Transmitter power, highest" unit="dBm" calc={calc} />
            <NumberField q={rxSens} label="Receiver sensitivity" unit="dBm" calc={calc} />
            <NumberField q={rxOver} label="Receiver overload" unit="dBm" calc={calc} />
          </div>
        )}
      </fieldset>

      <ResultCard title="Loss budget" stale={budget.stale} error={fieldNamed ? undefined : budget.error} copyText={copy}>
        {r && (
          <>
            {r.wavelengths.map((w) => (
              <section key={w.wavelengthNm} class="results">
                <h3>At {w.wavelengthNm} nm</h3>
                <table>
                  <thead>
                    <tr>
                      <th scope="col">Element</th>
                      <th scope="col">Lowest (dB)</th>
                      <th scope="col">Typical (dB)</th>
                      <th scope="col">Highest (dB)</th>
                    </tr>
                  </thead>
                  <tbody>
                    {w.elements.map((e) => (
                      <tr key={e.index}>
                        <td title={e.basis}>{e.label}</td>
                        <td>{formatFixed(e.minDb, 2)}</td>
                        <td>{formatFixed(e.typicalDb, 2)}</td>
                        <td>{formatFixed(e.maxDb, 2)}</td>
                      </tr>
                    ))}
                    <tr>
                      <th scope="row">Total</th>
                      <td>{formatFixed(w.minDb, 2)}</td>
                      <td>{formatFixed(w.typicalDb, 2)}</td>
                      <td>{formatFixed(w.maxDb, 2)}</td>
                    </tr>
                  </tbody>
                </table>
                <dl class="kv">
                  <dt>Acceptance value</dt>
                  <dd>{formatFixed(w.acceptanceDb, 2)} dB (a measured loss above this fails)</dd>
                  <dt>With design margin</dt>
                  <dd>{formatFixed(w.withMarginDb, 2)} dB</dd>
                  {w.costliest && (
                    <>
                      <dt>Costs most</dt>
                      <dd>
                        {w.costliest.label}: {formatFixed(w.costliest.maxDb, 2)} dB at most
                      </dd>
                    </>
                  )}
                  {w.equipment && (
                    <>
                      <dt>Equipment</dt>
                      <dd class={VERDICT_CLASS[w.equipment.verdict]}>
                        <strong>{VERDICT_WORDS[w.equipment.verdict]}.</strong> {w.equipment.findings.join(' ')} Weakest signal at the receiver{' '}
                        {formatFixed(w.equipment.worstCaseRxDbm, 2)} dBm, strongest {formatFixed(w.equipment.bestCaseRxDbm, 2)} dBm.
                      </dd>
                    </>
                  )}
                </dl>
                {w.equipment && (
                  <BarChart
                    title={`Highest loss of each element at ${w.wavelengthNm} nm`}
                    xLabel="Element"
                    yLabel="Loss (dB)"
                    bars={w.elements.map((e) => ({ label: e.label, value: e.maxDb }))}
                    formatValue={(v) => formatFixed(v, 2)}
                  />
                )}
              </section>
            ))}
            <ul class="note">
              {r.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
          </>
        )}
      </ResultCard>

      <HowComputed
        formula="Loss = Σ sections (length × dB/km) + pairs × allowance + splices × allowance + 10·log10 N + excess + cords + other; margin = (Tx lowest − loss highest) − Rx sensitivity − design margin"
        source="TIA-568.3-D allowance method; definition of the decibel; typical values common practice"
        assumptions={[
          'Losses of elements in series add in dB.',
          'Each fiber section uses the fiber type’s attenuation at the listed wavelength nearest (within 30 nm).',
          'Lowest and typical joint values are common practice; only the highest TIA values are from the standard.',
        ]}
        validity="Passive links; multimode budgets assume a launch condition like the one the allowances were set for."
      />

      {checkEquipment && <HazardContextCautions wavelengthNm={eqWavelength.value} powerDbm={txMax.value} what="Transmitter, highest power" />}
    </>
  );
}
