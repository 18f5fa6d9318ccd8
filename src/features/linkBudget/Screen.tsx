// Link loss budget: fiber sections, connector pairs, splices, splitter, patch cords and other losses,
// under a named rule set, and whether the link fits the equipment at each wavelength it uses. The
// loss arithmetic is in src/physics/linkBudget.ts, the equipment check in src/physics/equipmentBudget.ts.
import { useState } from 'preact/hooks';
import { NumberField, NumberInput, type NumberFieldProps } from '../../ui/NumberField';
import { need, shownValue, useQuantity, type QuantityState } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, type Headline, type HeadlineLine } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { BarChart } from '../../ui/Plot';
import { formatDb, formatFixed, withUnit } from '../../ui/format';
import { sentence } from '../../ui/errorText';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { findPreset } from '../../fibers/presets';
import type { ResolvedFiber } from '../../fibers/resolved';
import {
  equipmentFit,
  InputError,
  linkBudget,
  MAX_ELEMENT_COUNT,
  MAX_ELEMENT_LOSS_DB,
  MAX_SPLITTER_WAYS,
  ModelError,
  ownRuleSet,
  parseQuantity,
  TIA_568_3_D,
  TIA_568_C_3,
  TYPICAL_VALUES,
  WINDOW_TOLERANCE_NM,
  type ElementLoss,
  type EquipmentFit,
  type EquipmentLimits,
  type FiberClass,
  type LinkElement,
  type LinkRuleSet,
  type PlantKind,
  type WavelengthBudget,
} from '../../physics';

type RuleChoice = 'tia' | 'tia-c3' | 'typical' | 'own';
type EquipmentMode = 'budget' | 'levels' | 'none';

/** Core diameter from which a fiber counts as multimode when its category does not say (common practice). */
const MULTIMODE_MIN_CORE_DIAMETER_UM = 20;

/** Wavelengths ticked until the person chooses: the usual data windows; 1490 and 1625 nm only when asked for. */
const USUAL_DATA_WAVELENGTHS_NM: readonly number[] = [850, 1300, 1310, 1550];

/** Longest patch cord accepted, in km (the link budget refuses cords over 10,000 m). */
const MAX_CORD_KM = 10;

/** One function for the chart's values, not one per render: a new one would make the card draw again on every key. */
const twoDecimals = (v: number) => formatFixed(v, 2);

function fiberClassOf(f: ResolvedFiber): FiberClass {
  const kind = f.category ? findPreset(f.category)?.kind : undefined;
  if (kind) return kind;
  return f.profile === 'graded' || 2 * f.coreRadiusUm >= MULTIMODE_MIN_CORE_DIAMETER_UM ? 'multimode' : 'single-mode';
}

interface SectionRow {
  id: number;
  lengthText: string;
}

function count(q: QuantityState, max: number): number {
  const v = need(q);
  if (!Number.isInteger(v) || v < 0 || v > max) throw new InputError(q.argument, q.text, `a whole number from 0 to ${max}`);
  return v;
}

function SpreadFields({ label, qs, calc, help }: { label: string; qs: [QuantityState, QuantityState, QuantityState]; calc: NumberFieldProps['calc']; help?: string }) {
  return (
    <fieldset class="form">
      <legend>{label}</legend>
      <NumberField q={qs[0]} label={`${label}, lowest`} unit="dB" calc={calc} />
      <NumberField q={qs[1]} label={`${label}, typical`} unit="dB" calc={calc} />
      <NumberField q={qs[2]} label={`${label}, highest`} unit="dB" help={help} calc={calc} />
    </fieldset>
  );
}

/** Where a rule set gives cable maxima for this fiber class but none at this wavelength: the value used instead, and why. */
function missingAllowance(rules: LinkRuleSet, fiberClass: FiberClass, plant: PlantKind, fiber: ResolvedFiber, wavelengthNm: number): string | undefined {
  const forClass = rules.fiberMaxima.filter((m) => m.fiberClass === fiberClass && (m.plant === undefined || m.plant === plant));
  if (forClass.length === 0) return undefined;
  if (forClass.some((m) => Math.abs(m.wavelengthNm - wavelengthNm) <= WINDOW_TOLERANCE_NM)) return undefined;
  const own = fiber.attenuationDbPerKm.find((a) => Math.abs(a.wavelengthNm - wavelengthNm) <= WINDOW_TOLERANCE_NM);
  const listed = [...new Set(forClass.map((m) => m.wavelengthNm))].map((w) => withUnit(String(w), 'nm')).join(' and ');
  return `${rules.name} gives a cable allowance only at ${listed}, so at ${withUnit(String(wavelengthNm), 'nm')} the fiber type’s own ${withUnit(String(own?.dbPerKm ?? '—'), 'dB/km')} is used for the highest loss.`;
}

interface WavelengthAnswer {
  budget: WavelengthBudget;
  fit?: EquipmentFit;
  /** Which value stood in for a missing allowance, in words. */
  allowanceNote?: string;
}

/** The verdict for one wavelength, in words with the margin in dB; the wavelength is named so no two lines read the same. */
function verdictLine(a: WavelengthAnswer, designMarginDb: number): HeadlineLine {
  const at = withUnit(String(a.budget.wavelengthNm), 'nm');
  const f = a.fit;
  if (!f) return { label: `Highest loss at ${at}`, value: formatDb(a.budget.maxDb) };
  switch (f.verdict) {
    case 'fits':
      return { verdict: `Fits at ${at}, ${formatDb(f.spareDb)} to spare`, tone: 'ok' };
    case 'no-margin':
      return { verdict: `Works at ${at}, but ${formatDb(-f.spareDb)} short of the ${formatDb(designMarginDb, 1)} design margin`, tone: 'warn' };
    case 'short':
      return { verdict: `Short at ${at} by ${formatDb(f.shortDb)}`, tone: 'bad' };
    case 'overload':
      return { verdict: `Overloads the receiver at ${at} by ${formatDb(f.overloadDb)}: add an attenuator`, tone: 'bad' };
  }
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
  const [picked, setPicked] = useState<Record<number, boolean>>({});
  const [mode, setMode] = useState<EquipmentMode>('budget');
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
  const powerBudget = useQuantity('powerBudgetDb', 'plain', '18');
  const txMin = useQuantity('txMinDbm', 'power', '-5');
  const txMax = useQuantity('txMaxDbm', 'power', '0');
  const rxSens = useQuantity('rxSensitivityDbm', 'power', '-23');
  const rxOver = useQuantity('rxOverloadDbm', 'power', '-3');

  const fiber = picker.fiber;
  const listedNm = fiber ? [...new Set(fiber.attenuationDbPerKm.map((a) => a.wavelengthNm))].sort((a, b) => a - b) : [];
  const usualTicked = listedNm.some((w) => USUAL_DATA_WAVELENGTHS_NM.includes(w));
  const isChosen = (w: number) => picked[w] ?? (usualTicked ? USUAL_DATA_WAVELENGTHS_NM.includes(w) : true);
  const chosenNm = listedNm.filter(isChosen);

  const ownQs = [...own.conn, ...own.splice];
  const levelQs = [txMin, txMax, rxSens, rxOver];
  const fieldQs = [connectors, splices, splitWays, cords, cordLength, otherLoss, margin, ...(rules === 'own' ? ownQs : []), ...(mode === 'budget' ? [powerBudget] : mode === 'levels' ? levelQs : [])];

  const budget = useResult(() => {
    if (!fiber) throw new ModelError(picker.error ?? 'Choose a fiber type above.', 'fiber choice');
    if (chosenNm.length === 0) throw new ModelError('Tick at least one wavelength the equipment uses.', 'wavelength choice');
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
        if (e instanceof InputError) throw new InputError(argument, s.lengthText, 'a length in km, such as 2.5 (or 350 m)', e.hint);
        throw e;
      }
      if (km < 0) throw new InputError(argument, s.lengthText, 'a length of 0 km or more', 'a section cannot be shorter than nothing');
      if (km > 20_000) throw new InputError(argument, s.lengthText, 'a length of at most 20000 km');
      return { kind: 'fiber', label: `Fiber section ${i + 1}`, lengthKm: km, fiberClass, plant, attenuationDbPerKm: atten };
    });
    elements.push({ kind: 'connectorPair', label: 'Connector pairs', count: count(connectors, MAX_ELEMENT_COUNT) });
    elements.push({ kind: 'splice', label: 'Splices', count: count(splices, MAX_ELEMENT_COUNT) });
    const ways = count(splitWays, MAX_SPLITTER_WAYS);
    if (ways >= 2) elements.push({ kind: 'splitter', label: `Splitter 1×${ways}`, ways });
    else if (ways === 1) throw new InputError(splitWays.argument, splitWays.text, '0 for none, or 2 or more outputs');
    const nCords = count(cords, MAX_ELEMENT_COUNT);
    const cordKm = need(cordLength);
    if (cordKm < 0 || cordKm > MAX_CORD_KM) throw new InputError(cordLength.argument, cordLength.text, `a length from 0 to ${MAX_CORD_KM} km (such as 3 m)`);
    if (nCords > 0) elements.push({ kind: 'patchCord', label: 'Patch cords', count: nCords, lengthM: cordKm * 1000, fiberClass, attenuationDbPerKm: atten });
    const other = need(otherLoss);
    if (other < 0 || other > MAX_ELEMENT_LOSS_DB) throw new InputError(otherLoss.argument, otherLoss.text, `a loss from 0 to ${MAX_ELEMENT_LOSS_DB} dB`);
    if (other > 0) elements.push({ kind: 'other', label: 'Other losses', lossDb: { minDb: other, typicalDb: other, maxDb: other } });
    const designMarginDb = need(margin);
    const limits: EquipmentLimits | undefined =
      mode === 'budget'
        ? { kind: 'budget', powerBudgetDb: need(powerBudget) }
        : mode === 'levels'
          ? { kind: 'levels', txMinDbm: need(txMin), txMaxDbm: need(txMax), rxSensitivityDbm: need(rxSens), rxOverloadDbm: need(rxOver) }
          : undefined;
    const result = linkBudget({ elements, wavelengthsNm: chosenNm, ruleSet, designMarginDb, equipment: [] });
    const answers: WavelengthAnswer[] = result.wavelengths.map((w) => ({
      budget: w,
      fit: limits && equipmentFit({ limits, lowestLossDb: w.minDb, highestLossDb: w.maxDb, designMarginDb }),
      allowanceNote: missingAllowance(ruleSet, fiberClass, plant, fiber, w.wavelengthNm),
    }));
    return { result, answers, designMarginDb, limits };
  }, [fiber, picker.error, rules, plant, sections, mode, chosenNm.join(','), ...fieldQs.map((q) => q.text), ...ownQs.map((q) => q.text)]);

  const b = budget.result;
  const fieldArgs = fieldQs.map((q) => q.argument);
  const rowFault = (argument: string, label: string) =>
    budget.errorArgument === argument && budget.fault ? sentence(label, budget.fault.allowed, budget.fault.hint) : undefined;
  const rowArgs = sections.map((s) => `section-${s.id}`);

  const equipmentWords =
    b?.limits?.kind === 'budget'
      ? `Equipment power budget ${formatDb(b.limits.powerBudgetDb, 1)}`
      : b?.limits?.kind === 'levels'
        ? `Equipment: transmitter ${withUnit(formatFixed(b.limits.txMinDbm, 1), 'dBm')} to ${withUnit(formatFixed(b.limits.txMaxDbm, 1), 'dBm')}, receiver ${withUnit(formatFixed(b.limits.rxSensitivityDbm, 1), 'dBm')} to ${withUnit(formatFixed(b.limits.rxOverloadDbm, 1), 'dBm')}`
        : undefined;
  const lines = b ? b.answers.map((a) => verdictLine(a, b.designMarginDb)) : [];
  const headline: Headline | undefined = b && {
    ...lines[0]!,
    more: lines.slice(1),
    note: equipmentWords
      ? `${equipmentWords}, ${formatDb(b.designMarginDb, 1)} design margin kept in hand; highest losses of the ${b.result.ruleSet.name}.`
      : `A measured loss above the highest fails acceptance (${b.result.ruleSet.name}).`,
  };

  const report: ReportSpec | undefined = b && {
    title: 'Link loss budget',
    inputs: [
      ['Fiber type', fiber?.name ?? '—'],
      ['Loss allowances', b.result.ruleSet.name],
      ['Cable', plant === 'outside' ? 'outside plant' : 'inside plant (premises)'],
      ['Fiber sections', sections.map((s) => s.lengthText.trim()).map((t) => (/[a-z]$/i.test(t) ? t : `${t} km`)).join(' + ')],
      ['Mated connector pairs', shownValue(connectors, '')],
      ['Splices', shownValue(splices, '')],
      ['Splitter outputs', shownValue(splitWays, '')],
      ['Patch cords', `${shownValue(cords, '')} × ${cordLength.text.trim()}`],
      ['Other losses', shownValue(otherLoss, 'dB')],
      ['Design margin', shownValue(margin, 'dB')],
      ['Wavelengths the equipment uses', chosenNm.map((w) => `${w} nm`).join(', ')],
      ['Equipment', equipmentWords?.replace(/^Equipment:? ?/, '') ?? 'not checked'],
    ],
    outputs: b.answers.flatMap((a): [string, string][] => {
      const w = a.budget;
      const at = `${w.wavelengthNm} nm`;
      return [
        [`Loss at ${at} (lowest / typical / highest)`, `${formatFixed(w.minDb, 2)} / ${formatFixed(w.typicalDb, 2)} / ${formatDb(w.maxDb)}`],
        ...(a.fit ? [[`Equipment at ${at}`, verdictLine(a, b.designMarginDb).verdict ?? ''] as [string, string]] : []),
        ...(a.allowanceNote ? [[`Allowance at ${at}`, a.allowanceNote] as [string, string]] : []),
      ];
    }),
    assumptions: [
      ...b.result.notes,
      ...(b.limits ? ['The same equipment values apply at each wavelength ticked; spare = power budget − highest loss − design margin.'] : []),
      ...(b.limits?.kind === 'budget' ? ['With a power budget alone the receiver overload cannot be checked; enter the levels for that.'] : []),
    ],
  };


  const toggleWavelength = (w: number, on: boolean) => setPicked({ ...picked, [w]: on });

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: budget.stale, error: cardError(budget, [...fieldArgs, ...rowArgs]) }}
      report={report}
      powerCaution
      inputsTitle="The link and the equipment"
      inputs={
        <>
          {picker.element}
          <fieldset class="choice-row">
            <legend>Wavelengths the equipment uses</legend>
            {listedNm.length === 0 && <p class="note">Choose a fiber type first: its listed wavelengths appear here.</p>}
            {listedNm.map((w) => (
              <label key={w}>
                <input type="checkbox" checked={isChosen(w)} onChange={(e) => toggleWavelength(w, (e.currentTarget as HTMLInputElement).checked)} />{' '}
                <span class="num">{withUnit(String(w), 'nm')}</span>
              </label>
            ))}
          </fieldset>
          <div class="form">
            <div class="field">
              <label for="lb-equipment">The equipment is given by</label>
              <select id="lb-equipment" value={mode} onChange={(e) => setMode((e.currentTarget as HTMLSelectElement).value as EquipmentMode)}>
                <option value="budget">Its power budget in dB</option>
                <option value="levels">Transmitter and receiver levels in dBm</option>
                <option value="none">No equipment: the loss only</option>
              </select>
            </div>
            {mode === 'budget' && (
              <NumberField q={powerBudget} label="Equipment power budget" unit="dB" quickPicks={[15, 18, 28]} calc={budget} example="such as 18" help="Weakest transmitter power minus receiver sensitivity, from the data sheet or the PON class." />
            )}
            {mode === 'levels' && (
              <>
                <NumberField q={txMin} label="Transmitter power, lowest" unit="dBm" signed example="such as −5 (or 0.3 mW)" calc={budget} />
                <NumberField q={txMax} label="Transmitter power, highest" unit="dBm" signed example="such as 0 (or 1 mW)" calc={budget} />
                <NumberField q={rxSens} label="Receiver sensitivity" unit="dBm" signed example="such as −23" calc={budget} />
                <NumberField q={rxOver} label="Receiver overload" unit="dBm" signed example="such as −3" calc={budget} />
              </>
            )}
            <NumberField q={margin} label="Design margin" unit="dB" quickPicks={[0, 3]} help="Kept in hand for repairs and ageing; 0 for none." calc={budget} example="such as 3" />
          </div>

          <fieldset>
            <legend>Fiber sections (the fiber type above)</legend>
            {sections.map((s, i) => {
              const argument = `section-${s.id}`;
              const label = `Section ${i + 1} length`;
              return (
                <div key={s.id} class="row section-row">
                  <NumberInput
                    id={argument}
                    label={label}
                    unit="km"
                    keypad="text"
                    text={s.lengthText}
                    onText={(t) => setSections(sections.map((x) => (x.id === s.id ? { ...x, lengthText: t } : x)))}
                    error={rowFault(argument, label)}
                  />
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
            <NumberField q={connectors} label="Mated connector pairs" unit="pairs" calc={budget} example="such as 4" />
            <NumberField q={splices} label="Splices" unit="splices" calc={budget} example="such as 6" />
            <NumberField q={splitWays} label="Splitter outputs (0 = none)" unit="outputs" quickPicks={[0, 8, 32]} calc={budget} example="such as 32" />
            <NumberField q={cords} label="Patch cords" unit="cords" calc={budget} example="such as 2" />
            <NumberField q={cordLength} label="Patch cord length" unit="km" help="Type 3 m for three metres." calc={budget} />
            <NumberField q={otherLoss} label="Other losses" unit="dB" calc={budget} example="such as 0.5" />
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
              <SpreadFields label="Per mated connector pair" qs={own.conn} calc={budget} help="The highest value is the acceptance allowance." />
              <SpreadFields label="Per splice" qs={own.splice} calc={budget} />
            </>
          )}
        </>
      }
      how={{
        formula:
          'Loss = Σ sections (length × dB/km) + pairs × allowance + splices × allowance + 10·log10 N + excess + cords + other. Spare = power budget − highest loss − design margin, where the power budget is the weakest transmitter power minus the receiver sensitivity.',
        source: 'TIA-568.3-D allowance method; definition of the decibel; typical values and the power budget are common practice',
        assumptions: [
          'Losses of elements in series add in dB.',
          'Each fiber section uses the fiber type’s attenuation at the listed wavelength nearest (within 30 nm).',
          'Lowest and typical joint values are common practice; only the highest TIA values are from the standard.',
        ],
        validity: 'Passive links; multimode budgets assume a launch condition like the one the allowances were set for.',
      }}
    >
      {b && (
        <ResultCard title="Loss at each wavelength" stale={budget.stale}>
          <div class="lb-details">
            <p class="print-only">
              {fiber?.name}; {report?.inputs.slice(1, 10).map(([k, v]) => `${k.toLowerCase()} ${v}`).join('; ')}.
            </p>
            <WavelengthTable answers={b.answers} />
            <ElementTable answers={b.answers} />
            {b.answers.map((a) => a.allowanceNote && <p class="note" key={a.budget.wavelengthNm}>{a.allowanceNote}</p>)}
            <p class="note">The highest loss is the acceptance value: a measured loss above it fails.</p>
            <ul class="note">
              {b.result.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
            {b.answers[0] && (
              <BarChart
                title={`Highest loss of each element at ${b.answers[0].budget.wavelengthNm} nm`}
                xLabel="Element"
                yLabel="Loss (dB)"
                bars={b.answers[0].budget.elements.map((e) => ({ label: e.label, value: e.maxDb }))}
                formatValue={twoDecimals}
              />
            )}
          </div>
        </ResultCard>
      )}
    </CalcScreen>
  );
}

/** One row per wavelength: the loss spread, the margin kept, and what the equipment leaves. */
function WavelengthTable({ answers }: { answers: WavelengthAnswer[] }) {
  const withFit = answers.some((a) => a.fit);
  const withLevels = answers.some((a) => a.fit?.weakestRxDbm !== undefined);
  return (
    <DataTable
      caption="The link at each wavelength"
      rows={answers}
      rowKey={(a) => a.budget.wavelengthNm}
      rowClass={(a) => (a.fit && a.fit.verdict !== 'fits' ? 'row-flag' : undefined)}
      columns={[
        { label: 'Wavelength', cell: (a) => withUnit(String(a.budget.wavelengthNm), 'nm'), num: true },
        { label: 'Lowest loss', cell: (a) => formatDb(a.budget.minDb), num: true },
        { label: 'Typical loss', cell: (a) => formatDb(a.budget.typicalDb), num: true },
        { label: 'Highest loss', cell: (a) => formatDb(a.budget.maxDb), num: true },
        { label: 'Highest with margin', cell: (a) => formatDb(a.budget.withMarginDb), num: true },
        ...(withFit ? [{ label: 'Left over', cell: (a: WavelengthAnswer) => formatDb(a.fit?.spareDb), num: true }] : []),
        ...(withLevels
          ? [
              { label: 'Weakest at receiver', cell: (a: WavelengthAnswer) => withUnit(formatFixed(a.fit?.weakestRxDbm, 2), 'dBm'), num: true },
              { label: 'Strongest at receiver', cell: (a: WavelengthAnswer) => withUnit(formatFixed(a.fit?.strongestRxDbm, 2), 'dBm'), num: true },
            ]
          : []),
      ]}
    />
  );
}

/** One row per element: its highest loss at each wavelength (how it was reached in the row's tooltip). */
function ElementTable({ answers }: { answers: WavelengthAnswer[] }) {
  const first = answers[0];
  if (!first) return null;
  const rows: { index: number; label: string; basis?: string }[] = [...first.budget.elements, { index: -1, label: 'Total' }];
  const at = (a: WavelengthAnswer, i: number): ElementLoss | undefined => a.budget.elements[i];
  return (
    <DataTable
      caption="Highest loss of each element"
      rows={rows}
      rowKey={(r) => r.index}
      rowClass={(r) => (r.index === -1 ? 'total-row' : undefined)}
      columns={[
        { label: 'Element', cell: (r) => (r.basis ? <span title={r.basis}>{r.label}</span> : <strong>{r.label}</strong>) },
        ...answers.map((a) => ({
          label: `At ${a.budget.wavelengthNm}\u00a0nm`,
          cell: (r: { index: number }) => formatDb(r.index === -1 ? a.budget.maxDb : at(a, r.index)?.maxDb),
          num: true,
        })),
      ]}
    />
  );
}
