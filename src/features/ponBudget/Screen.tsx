// PON budget: is a split at a distance inside the loss class of the equipment, in both directions, and is
// the nearest home too close? All arithmetic is in src/physics/ponBudget.ts; this screen reads fields and renders.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, shownValue, useQuantity, type QuantityState } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline, type Tone } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatQuantity, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  InputError,
  PON_LOSS_CLASSES,
  PON_WAVELENGTHS,
  ponBudget,
  TYPICAL_SPLITTERS,
  TYPICAL_VALUES,
  VIDEO_OVERLAY_NM,
  type DirectionCheck,
  type PonGeneration,
  type PonPlanResult,
  type PonVerdict,
  type SplitterStage,
} from '../../physics';

const GENERATIONS: PonGeneration[] = ['G-PON', 'XG-PON', 'XGS-PON'];
const DEFAULT_CLASS: Record<PonGeneration, string> = { 'G-PON': 'B+', 'XG-PON': 'N1', 'XGS-PON': 'N1' };
const RATIOS = TYPICAL_SPLITTERS.map((t) => t.ways);

const VERDICT_TONE: Record<PonVerdict, Tone> = { fits: 'ok', 'too-much-loss': 'bad', overload: 'bad', 'too-much-loss-and-overload': 'bad' };

function count(q: QuantityState): number {
  const v = need(q);
  if (!Number.isInteger(v) || v < 0) throw new InputError(q.argument, q.text, 'a whole number, 0 or more');
  return v;
}

function directionLabel(d: DirectionCheck): string {
  return `${d.direction === 'downstream' ? 'Down' : 'Up'} ${d.wavelengthNm}\u00a0nm`;
}

function marginWords(db: number): string {
  return db >= 0 ? `${formatDb(db)} to spare` : `${formatDb(-db)} over`;
}

interface StageUi {
  ratio: number;
  setRatio: (n: number) => void;
  own: boolean;
  setOwn: (b: boolean) => void;
  il: QuantityState;
  uniformity: QuantityState;
}

function useStage(index: number, defaultRatio: number): StageUi {
  const [ratio, setRatio] = useState(defaultRatio);
  const [own, setOwn] = useState(false);
  const typical = TYPICAL_SPLITTERS.find((t) => t.ways === (ratio || 32)) ?? TYPICAL_SPLITTERS[4]!;
  const il = useQuantity(`splitters[${index}].maxInsertionLossDb`, 'plain', String(typical.maxInsertionLossDb));
  const uniformity = useQuantity(`splitters[${index}].uniformityDb`, 'plain', String(typical.uniformityDb));
  return { ratio, setRatio, own, setOwn, il, uniformity };
}

function stageInput(s: StageUi): SplitterStage {
  return s.own ? { ways: s.ratio, maxInsertionLossDb: need(s.il), uniformityDb: need(s.uniformity) } : { ways: s.ratio };
}

function StageFields({ s, n, optional }: { s: StageUi; n: number; optional?: boolean }) {
  const id = `pon-stage-${n}`;
  return (
    <fieldset class="form">
      <legend>{optional ? `Splitter stage ${n} (cascade)` : `Splitter stage ${n}`}</legend>
      <div class="field">
        <label for={`${id}-ratio`}>Split ratio</label>
        <select id={`${id}-ratio`} value={String(s.ratio)} onChange={(e) => s.setRatio(Number((e.currentTarget as HTMLSelectElement).value))}>
          {optional && <option value="0">No second stage</option>}
          {RATIOS.map((r) => (
            <option key={r} value={String(r)}>
              1×{r}
            </option>
          ))}
        </select>
      </div>
      {s.ratio > 0 && (
        <div class="field">
          <label for={`${id}-values`}>Splitter loss from</label>
          <select id={`${id}-values`} value={s.own ? 'own' : 'typical'} onChange={(e) => s.setOwn((e.currentTarget as HTMLSelectElement).value === 'own')}>
            <option value="typical">Typical table (common practice)</option>
            <option value="own">The splitter’s data sheet</option>
          </select>
        </div>
      )}
      {s.ratio > 0 && s.own && (
        <>
          <NumberField q={s.il} label={`Stage ${n}: highest insertion loss`} unit="dB" example="such as 17.2" />
          <NumberField q={s.uniformity} label={`Stage ${n}: uniformity`} unit="dB" example="such as 1.5" help="Highest minus lowest output loss; it sets the best output for the overload check." />
        </>
      )}
    </fieldset>
  );
}

export default function Screen() {
  const picker = useFiberPicker({ id: 'pon-budget', label: 'Fiber type', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const [generation, setGeneration] = useState<PonGeneration>('G-PON');
  const [className, setClassName] = useState('B+');
  const feeder = useQuantity('feederKm', 'length', '15');
  const farthest = useQuantity('farthestDropKm', 'length', '2');
  const nearest = useQuantity('nearestDropKm', 'length', '0.2');
  const stage1 = useStage(0, 32);
  const stage2 = useStage(1, 0);
  const connectors = useQuantity('connectorPairs', 'plain', '4');
  const splices = useQuantity('splices', 'plain', '6');
  const extra = useQuantity('extraLossDb', 'plain', '0');
  const reserve = useQuantity('reserveDb', 'plain', '0');
  const [overlay, setOverlay] = useState(false);
  const overlayNm = useQuantity('overlayWavelengthNm', 'wavelength', String(VIDEO_OVERLAY_NM));
  const fiber = picker.fiber;

  const state = useResult(() => {
    if (!fiber) throw new InputError('fiber', undefined, 'a fiber type', picker.error ?? 'pick a fiber type');
    const extraDb = need(extra);
    if (extraDb < 0) throw new InputError('extraLossDb', extraDb, 'a loss of 0 dB or more');
    return ponBudget({
      generation,
      className,
      feederKm: need(feeder),
      farthestDropKm: need(farthest),
      nearestDropKm: need(nearest),
      splitters: [stageInput(stage1), ...(stage2.ratio > 0 ? [stageInput(stage2)] : [])],
      connectorPairs: count(connectors),
      splices: count(splices),
      extras: extraDb > 0 ? [{ label: 'WDM coupler or other element', lossDb: extraDb }] : [],
      reserveDb: need(reserve),
      attenuationDbPerKm: fiber.attenuationDbPerKm,
      broadcastOverlay: overlay,
      overlayWavelengthNm: need(overlayNm),
    });
  }, [
    fiber,
    picker.error,
    generation,
    className,
    ...[feeder, farthest, nearest, connectors, splices, extra, reserve, overlayNm, stage1.il, stage1.uniformity, stage2.il, stage2.uniformity].flatMap((q) => [q.value, q.failure]),
    stage1.ratio,
    stage1.own,
    stage2.ratio,
    stage2.own,
    overlay,
  ]);

  const fields = [feeder, farthest, nearest, connectors, splices, extra, reserve, overlayNm, stage1.il, stage1.uniformity, stage2.il, stage2.uniformity];
  const r: PonPlanResult | undefined = state.result;

  const headline: Headline | undefined = r && {
    label: `${r.lossClass.generation} 1:${r.totalSplit}`,
    value: formatDb(r.tightest.maxLossDb),
    verdict: r.headline,
    tone: VERDICT_TONE[r.verdict],
    more: [
      {
        label: 'Nearest home',
        value: formatDb(Math.min(...r.directions.map((d) => d.minLossDb))),
        verdict: r.directions.every((d) => d.overloadMarginDb >= 0)
          ? `${formatDb(Math.min(...r.directions.map((d) => d.overloadMarginDb)))} above the ${formatDb(r.lossClass.minDb, 0)} minimum`
          : 'Below the class minimum: overload',
        tone: r.directions.every((d) => d.overloadMarginDb >= 0) ? 'ok' : 'bad',
      },
    ],
    note: (reserve.value ?? 0) > 0 ? `Includes your ${formatDb(reserve.value)} reserve.` : undefined,
  };

  const report: ReportSpec | undefined = r && {
    title: `PON budget: ${r.lossClass.generation} class ${r.lossClass.name}, 1:${r.totalSplit}`,
    inputs: [
      ['Generation and class', `${r.lossClass.generation} class ${r.lossClass.name} (${r.lossClass.minDb}–${r.lossClass.maxDb} dB)`],
      ['Fiber type', fiber?.name ?? ''],
      ['Feeder', shownValue(feeder, 'km')],
      ['Distribution and drop, farthest home', shownValue(farthest, 'km')],
      ['Distribution and drop, nearest home', shownValue(nearest, 'km')],
      ['Splitters', r.splitters.map((s) => `1×${s.ways}`).join(' then ')],
      ['Connector pairs', shownValue(connectors, '')],
      ['Splices', shownValue(splices, '')],
      ['Extra element', shownValue(extra, 'dB')],
      ['Reserve', shownValue(reserve, 'dB')],
      ['RF broadcast overlay', overlay ? `yes (${shownValue(overlayNm, 'nm')})` : 'no'],
    ],
    outputs: [
      ['Verdict', r.headline],
      ...r.directions.map((d): [string, string] => [
        `${d.direction} ${d.wavelengthNm} nm`,
        `farthest ${formatDb(d.maxLossDb)} (${marginWords(d.marginDb)}), nearest ${formatDb(d.minLossDb)} (${d.overloadMarginDb >= 0 ? `${formatDb(d.overloadMarginDb)} above the minimum` : `${formatDb(-d.overloadMarginDb)} below the minimum`})`,
      ]),
      ['Costs most', r.costliest ? `${r.costliest.label}, ${formatDb(r.costliest.maxDb)}` : '—'],
      ['Longest feeder that fits', r.longestFeederKm === undefined ? 'none' : formatQuantity(r.longestFeederKm, 'km', 3)],
      ['Largest split that fits', r.largestSplit === undefined ? 'none' : `1:${r.largestSplit}`],
      ['Classes it fits', r.classFits.filter((f) => f.fits).map((f) => f.lossClass.name).join(', ') || 'none'],
    ],
    assumptions: [...r.findings.slice(1), ...r.notes],
  };

  const classes = PON_LOSS_CLASSES.filter((k) => k.generation === generation);
  const setGen = (g: PonGeneration) => {
    setGeneration(g);
    setClassName(DEFAULT_CLASS[g]);
  };
  const wl = PON_WAVELENGTHS[generation];

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, fields.map((q) => q.argument)) }}
      report={report}
      inputsTitle="The network"
      inputs={
        <>
          <div class="form">
            <div class="field">
              <label for="pon-generation">Equipment generation</label>
              <select id="pon-generation" value={generation} onChange={(e) => setGen((e.currentTarget as HTMLSelectElement).value as PonGeneration)}>
                {GENERATIONS.map((g) => (
                  <option key={g} value={g}>
                    {g} (down {PON_WAVELENGTHS[g].downstreamNm} nm, up {PON_WAVELENGTHS[g].upstreamNm} nm)
                  </option>
                ))}
              </select>
            </div>
            <div class="field">
              <label for="pon-class">Loss class of the optics</label>
              <select id="pon-class" value={className} onChange={(e) => setClassName((e.currentTarget as HTMLSelectElement).value)}>
                {classes.map((k) => (
                  <option key={k.id} value={k.name}>
                    Class {k.name}: {k.minDb} to {k.maxDb} dB
                  </option>
                ))}
              </select>
            </div>
          </div>
          {picker.element}
          <div class="form">
            <NumberField q={feeder} label="Feeder fiber" unit="km" quickPicks={[5, 10, 20]} calc={state} />
            <NumberField q={farthest} label="Distribution and drop, farthest home" unit="km" quickPicks={[0.5, 1, 2]} calc={state} />
            <NumberField q={nearest} label="Distribution and drop, nearest home" unit="km" quickPicks={[0, 0.1, 0.5]} calc={state} help="Checked against the class minimum: a home too close can overload its receiver." />
          </div>
          <StageFields s={stage1} n={1} />
          <StageFields s={stage2} n={2} optional />
          <div class="form">
            <NumberField q={connectors} label="Connector pairs on the path" unit="" quickPicks={[2, 4, 6]} calc={state} example="such as 4" />
            <NumberField q={splices} label="Splices on the path" unit="" quickPicks={[2, 6, 10]} calc={state} example="such as 6" />
            <NumberField q={extra} label="Extra element (WDM coupler, attenuator)" unit="dB" quickPicks={[0, 0.8]} calc={state} example="such as 0.8" />
            <NumberField q={reserve} label="Reserve for repairs and ageing" unit="dB" quickPicks={[0, 1, 2]} calc={state} example="such as 1" />
            <div class="field">
              <label>
                <input type="checkbox" checked={overlay} onChange={(e) => setOverlay((e.currentTarget as HTMLInputElement).checked)} /> Check an RF broadcast overlay downstream too
              </label>
            </div>
            <NumberField q={overlayNm} label="RF broadcast overlay wavelength" unit="nm" quickPicks={[1550, 1555]} calc={state} example="such as 1550" help="Used when the box above is ticked." />
          </div>
        </>
      }
      how={{
        formula:
          'Path loss = Σ fiber length × attenuation at the wavelength + Σ splitter insertion loss + connector pairs × allowance + splices × allowance + extra elements (losses in series add in dB). A 1×N splitter ideally costs 10·log10 N; a real one adds excess and uniformity. Farthest home: highest values plus the reserve ≤ class maximum. Nearest home: lowest values ≥ class minimum.',
        source: 'ITU-T G.984.2 (08/2019) clause 8.2.7.1; G.987.2 (02/2023) clause 6.1; G.9807.1 (02/2023) Annex B — class limits from memory; attenuation from the fiber type',
        assumptions: [
          `Wavelengths: ${wl.source}.`,
          'Fiber attenuation between listed wavelengths: linear; below the shortest listed: scaled as λ⁻⁴ (Rayleigh scattering).',
          `Connector pairs at most ${TYPICAL_VALUES.connectorPairDb.maxDb} dB each and splices at most ${TYPICAL_VALUES.spliceDb.maxDb} dB each: typical installed values, common practice.`,
          'Splitter table: typical, common practice; a data-sheet value replaces it.',
          'Loss budget only: reach and fiber-distance limits of the equipment apply as well.',
        ],
        validity: 'Passive paths, single-mode fiber; class limits as recalled, check the edition in force.',
      }}
    >
      {r && (
        <ResultCard title="Both directions" stale={state.stale}>
          <DataTable
            caption={`Against class ${r.lossClass.name} (${r.lossClass.minDb} to ${r.lossClass.maxDb} dB)`}
            rows={r.directions}
            rowKey={(d) => d.wavelengthNm}
            columns={[
              { label: 'Direction', cell: directionLabel },
              { label: 'Farthest home', cell: (d) => formatDb(d.maxLossDb), num: true },
              { label: 'To the maximum', cell: (d) => marginWords(d.marginDb), num: true },
              { label: 'Nearest home', cell: (d) => formatDb(d.minLossDb), num: true },
              { label: 'Above the minimum', cell: (d) => (d.overloadMarginDb >= 0 ? formatDb(d.overloadMarginDb) : `${formatDb(-d.overloadMarginDb)} below`), num: true },
            ]}
          />
          <ShortProse text={r.findings.slice(1).join(' ')} />
        </ResultCard>
      )}
      {r && (
        <ResultCard title="What still fits" stale={state.stale}>
          <dl class="kv">
            <dt>Longest feeder for class {r.lossClass.name}</dt>
            <dd class="num">{r.longestFeederKm === undefined ? 'none: the rest already exceeds the maximum' : formatQuantity(r.longestFeederKm, 'km', 3)}</dd>
            <dt>Largest split for class {r.lossClass.name}</dt>
            <dd class="num">{r.largestSplit === undefined ? 'none' : `1:${r.largestSplit}`}</dd>
            <dt>Costs most ({directionLabel(r.tightest)})</dt>
            <dd>{r.costliest ? <>{r.costliest.label}, <span class="num">{formatDb(r.costliest.maxDb)}</span></> : '—'}</dd>
          </dl>
          <DataTable
            caption={`Every ${generation} class`}
            rows={r.classFits}
            rowKey={(f) => f.lossClass.id}
            columns={[
              { label: 'Class', cell: (f) => f.lossClass.name },
              { label: 'Range', cell: (f) => withUnit(`${f.lossClass.minDb}–${f.lossClass.maxDb}`, 'dB'), num: true },
              { label: 'Fits', cell: (f) => (f.fits ? 'yes' : 'no') },
              { label: 'Margin to the nearer limit', cell: (f) => `${f.worstMarginDb >= 0 ? '+' : '−'}${formatDb(Math.abs(f.worstMarginDb))}`, num: true },
            ]}
          />
          <p class="note">Class limits: {r.lossClass.source}.</p>
        </ResultCard>
      )}
      {r && (
        <ResultCard title={`Where the loss goes (${directionLabel(r.tightest)}, farthest home)`} stale={state.stale}>
          <DataTable
            caption="Each element (lowest and highest to expect)"
            rows={r.tightest.farthest.elements}
            rowKey={(e) => e.index}
            columns={[
              { label: 'Element', cell: (e) => `${e.label}${r.costliest && e.index === r.costliest.index ? ' (costs most)' : ''}` },
              { label: 'Lowest', cell: (e) => formatDb(e.minDb), num: true },
              { label: 'Highest', cell: (e) => formatDb(e.maxDb), num: true },
              { label: 'How', cell: (e) => e.basis },
            ]}
          />
          <ul class="note">
            {r.directions.map((d) => (
              <li key={d.wavelengthNm}>
                Fiber at <span class="num">{withUnit(String(d.wavelengthNm), 'nm')}</span>: <span class="num">{withUnit(d.attenuation.dbPerKm.toFixed(3), 'dB/km')}</span>, {d.attenuation.how}.
              </li>
            ))}
          </ul>
        </ResultCard>
      )}
    </CalcScreen>
  );
}
