// Bend loss: what a tight loop costs. For a bend-insensitive (G.657) category the headline is the
// category's specified limit at this bend (the step-index model is shown below only as a comparison,
// since it does not describe a trench-assisted profile); for a step-index fiber the model leads.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber, formatQuantity, NOT_A_NUMBER_TEXT, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  BEND_INSENSITIVE_NOTE,
  bendLoss,
  CRITICAL_LOSS_DB_PER_TURN,
  criticalBendRadius,
  DEFAULT_BEND_RADIUS_MODEL,
  ModelError,
  LP11_CUTOFF_V,
  macNumber,
  MACROBEND_LIMITS,
  MACROBEND_LIMITS_EDITION,
  modeFieldDiameterUm,
  SILICA_P11,
  SILICA_P12,
  SILICA_POISSON_RATIO,
  STRESS_RADIUS_FACTOR_SILICA,
  type BendRadiusModel,
  type MacrobendLimit,
} from '../../physics';
import type { BendSweepInput, BendSweepOutput } from './tasks';
import { chooseBendHeadline, type BendHeadlineChoice, type SpecifiedBend } from './headline';

const MODEL_WORDS: Record<BendRadiusModel, string> = {
  'stress-corrected': 'Stress-corrected radius (silica, default)',
  geometric: 'Geometric radius (no stress correction)',
};

/** Losses below this are written with an exponent rather than as 0.000 dB. */
const SMALL_LOSS_DB = 0.001;
/** Lowest loss drawn on the plot (dB/turn): below it the curve says nothing a technician can use. */
const PLOT_FLOOR_DB = 1e-6;

function lossText(db: number): string {
  return db >= SMALL_LOSS_DB || db === 0 ? formatDb(db, 3) : withUnit(formatNumber(db, 2), 'dB');
}

const turnsWords = (n: number) => `${n}${'\u00a0'}turn${n === 1 ? '' : 's'}`;
const bendWords = (b: { turns: number; bendRadiusMm: number }) => `${turnsWords(b.turns)} at ${formatQuantity(b.bendRadiusMm, 'mm')}`;

/** Radii of the loss-versus-radius plot (mm). */
const SWEEP = { minRadiusMm: 3, maxRadiusMm: 40, count: 200 };

/** The headline for a category limit, in words a technician reads at a glance. */
function categoryHeadline(c: BendHeadlineChoice, turns: number, wavelengthNm: number): Headline | undefined {
  if (c.lead === 'category') {
    const [a, b] = c.from as [SpecifiedBend, SpecifiedBend | undefined];
    const verdict =
      c.basis === 'specified'
        ? `${c.category} limit for this bend`
        : c.basis === 'between'
          ? `Estimate between the ${c.category} limits at ${formatQuantity(a.bendRadiusMm, 'mm')} and ${formatQuantity(b!.bendRadiusMm, 'mm')}`
          : `At most: the ${c.category} limit at ${formatQuantity(a.bendRadiusMm, 'mm')} also covers this gentler bend`;
    const notes = [
      c.scaledTurns ? `Limit${c.from.length > 1 ? 's' : ''} per turn (${c.from.map(bendWords).join('; ')}) × ${turnsWords(turns)}.` : '',
      c.shorterWavelength ? `Limit at ${formatQuantity(c.limitWavelengthNm, 'nm')}; at ${formatQuantity(wavelengthNm, 'nm')} a bend loses less.` : '',
    ].filter(Boolean);
    return {
      label: `Bend loss, ${turnsWords(turns)} (maximum)`,
      value: `≤${'\u00a0'}${lossText(c.totalDb)}`,
      verdict,
      tone: 'info',
      note: notes.length ? notes.join(' ') : undefined,
    };
  }
  if (c.lead === 'category-silent') {
    return {
      label: `Bend loss, ${c.category}`,
      verdict:
        c.why === 'tighter-than-specified'
          ? `Tighter than any radius ${c.category} specifies (smallest ${formatQuantity(c.limitValue, 'mm')}): no category figure; ask for the fiber’s bend data`
          : `${c.category} limits stop at ${formatQuantity(c.limitValue, 'nm')}: no category figure at this wavelength`,
      tone: 'warn',
    };
  }
  return undefined;
}

export default function Screen() {
  const picker = useFiberPicker({ id: 'bend-fiber', label: 'Fiber', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const radius = useQuantity('bendRadiusMm', 'radius', '15');
  const turns = useQuantity('turns', 'plain', '10');
  const [model, setModel] = useState<BendRadiusModel>(DEFAULT_BEND_RADIUS_MODEL);
  const fiber = picker.fiber;

  const res = useResult(() => {
    if (!fiber) throw new ModelError(picker.error ?? 'Choose a fiber above.', 'fiber choice');
    const f = { coreRadiusUm: fiber.coreRadiusUm, na: fiber.na };
    const wavelengthNm = need(wavelength);
    const bendRadiusMm = need(radius);
    const loss = bendLoss({ ...f, wavelengthNm, bendRadiusMm, turns: need(turns), radiusModel: model });
    const critical = criticalBendRadius({ ...f, wavelengthNm, radiusModel: model });
    const mfd = modeFieldDiameterUm({ ...f, wavelengthNm, definition: 'petermann2' });
    // Cutoff from the fiber's data where known, else the theoretical LP11 cutoff of the step model.
    const cutoffNm = fiber.cutoffWavelengthNm ?? (2 * Math.PI * fiber.coreRadiusUm * fiber.na * 1000) / LP11_CUTOFF_V;
    const mac = macNumber(mfd.mfdUm, cutoffNm);
    const limits = MACROBEND_LIMITS.map((lim) => {
      const at = (w: number) => bendLoss({ ...f, wavelengthNm: w, bendRadiusMm: lim.bendRadiusMm, turns: lim.turns, radiusModel: model }).totalLossDb;
      return { ...lim, model1550: at(1550), model1625: at(1625) };
    });
    const choice = chooseBendHeadline({ category: fiber.category, wavelengthNm, bendRadiusMm, turns: loss.turns });
    return { loss, critical, mfdUm: mfd.mfdUm, cutoffNm, mac, limits, choice, wavelengthNm };
  }, [fiber, picker.error, wavelength.value, wavelength.failure, radius.value, radius.failure, turns.value, turns.failure, model]);
  const fieldArgs = [wavelength.argument, radius.argument, turns.argument];

  const sweepInput: BendSweepInput | undefined =
    fiber && wavelength.value !== undefined ? { fiber: { coreRadiusUm: fiber.coreRadiusUm, na: fiber.na }, wavelengthNm: wavelength.value, ...SWEEP } : undefined;
  const sweep = useComputed<BendSweepInput, BendSweepOutput>('bendLoss.sweep', sweepInput, wavelength.error ?? picker.error);

  const r = res.result;
  const modelLeads = r?.choice.lead === 'model';
  const criticalText = r && (r.critical.status === 'found' ? formatQuantity(r.critical.bendRadiusMm, 'mm', 3) : 'below 1\u00a0mm');

  const headline: Headline | undefined =
    r &&
    (modelLeads
      ? {
          label: `Bend loss, ${turnsWords(r.loss.turns)}`,
          value: lossText(r.loss.totalLossDb),
          verdict: r.loss.multimodeWarning ? 'LP01 only: the fiber is not single-mode here' : `${lossText(r.loss.lossDbPerTurn)} per turn, step-index model`,
          tone: r.loss.multimodeWarning ? 'warn' : 'info',
          note: model === 'geometric' ? 'Geometric radius: no stress correction (about 10× more loss at 15 mm).' : undefined,
        }
      : categoryHeadline(r.choice, r.loss.turns, r.wavelengthNm));

  const categoryOutputs = (): [string, string][] => {
    if (!r || !headline) return [];
    if (r.choice.lead === 'model') return [];
    return [[headline.label ?? 'Category limit', [headline.value, headline.verdict].filter(Boolean).join(', ')]];
  };

  const report: ReportSpec | undefined = r && {
    title: 'Bend loss',
    inputs: [
      ['Fiber', fiber?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
      ['Bend radius', shownValue(radius, 'mm')],
      ['Turns', shownValue(turns, '')],
      ['Radius model', MODEL_WORDS[model]],
    ],
    outputs: [
      ...categoryOutputs(),
      [modelLeads ? 'Loss per turn' : 'Step-index estimate per turn (comparison only)', lossText(r.loss.lossDbPerTurn)],
      [modelLeads ? `Loss for ${turnsWords(r.loss.turns)}` : `Step-index estimate for ${turnsWords(r.loss.turns)} (comparison only)`, lossText(r.loss.totalLossDb)],
      [`Radius for ${CRITICAL_LOSS_DB_PER_TURN} dB per turn (step-index model)`, criticalText ?? ''],
      ['MAC number', formatNumber(r.mac, 3)],
    ],
    assumptions: [
      modelLeads ? 'Marcuse 1976 curvature-loss formula for LP01 of the step-index fiber.' : `Headline: ${MACROBEND_LIMITS_EDITION}; a limit is a maximum, not a typical loss.`,
      model === 'stress-corrected' ? `Effective bend radius ${formatNumber(r.loss.radiusFactor, 3)} × R for silica (Schermer & Cole 2007).` : 'Geometric bend radius, no stress correction.',
      BEND_INSENSITIVE_NOTE,
    ],
  };

  const sweepSeries = sweep.result
    ? [
        { name: MODEL_WORDS['stress-corrected'], points: sweep.result.stressCorrected.filter((p) => p[1] >= PLOT_FLOOR_DB) },
        { name: MODEL_WORDS.geometric, points: sweep.result.geometric.filter((p) => p[1] >= PLOT_FLOOR_DB), dashed: true },
      ]
    : [];

  type LimitRow = MacrobendLimit & { model1550: number; model1625: number };
  const chosenCategory = fiber?.category;

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: res.stale, error: cardError(res, fieldArgs) }}
      report={report}
      inputsTitle="Fiber and bend"
      inputs={
        <>
          {picker.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={res} />
            <NumberField q={radius} label="Bend radius" unit="mm" quickPicks={[5, 7.5, 10, 15, 30]} calc={res} help="Radius, not diameter: half the loop’s width." />
            <NumberField q={turns} label="Number of turns" unit="turns" quickPicks={[1, 10, 100]} quickPickLabel={(n) => turnsWords(n)} calc={res} />
            <div class="field">
              <label for="bend-model">Bend radius model</label>
              <select id="bend-model" value={model} onChange={(e) => setModel((e.currentTarget as HTMLSelectElement).value as BendRadiusModel)}>
                <option value="stress-corrected">{MODEL_WORDS['stress-corrected']}</option>
                <option value="geometric">{MODEL_WORDS.geometric}</option>
              </select>
            </div>
          </div>
        </>
      }
      how={{
        formula:
          'Step-index model: Marcuse’s curvature-loss formula for LP01, 2α = √π κ² exp(−2γ³R/3β²) / (2 γ^3/2 V² √R K₁²(γa)); loss per turn = 4.343 · 2α · 2πR. G.657 categories: the specified maximum per turn × turns; between two specified radii the logarithm of the per-turn limit is interpolated linearly in the radius.',
        source: 'Marcuse 1976, JOSA 66(3); stress correction Schermer & Cole 2007, IEEE JQE 43(10); limits ITU-T G.657 and G.652 (11/2016)',
        assumptions: [
          'The fiber is treated as a step-index fiber (for a category or a label: the equivalent step-index fiber).',
          `Stress correction: R_eff = R / (1 − (n²/2)(p12 − ν(p11 + p12))) with p11 = ${SILICA_P11}, p12 = ${SILICA_P12}, ν = ${SILICA_POISSON_RATIO} for silica; ${STRESS_RADIUS_FACTOR_SILICA} R for a core index of 1.449.`,
          'Uniform bend, infinite cladding, no coating effects and no whispering-gallery reflections from the cladding edge.',
          'MFD by Petermann II at the chosen wavelength; cutoff from the fiber data, or the theoretical LP11 cutoff.',
          'Category limits: loss adds per turn; the 1550 nm limit bounds shorter wavelengths and the 1625 nm limit those up to 1625 nm, since a bend loses more at longer wavelengths.',
        ],
        validity: 'Bend radius well above the core radius and LP01 well guided. Trench-assisted (bend-insensitive) designs are not described by the step-index model: their headline is the category limit.',
      }}
    >
      <ResultCard title={modelLeads ? 'Macrobend loss, step-index model' : 'Step-index estimate, for comparison only'} stale={res.stale}>
        {r && (
          <>
            {!modelLeads && <ShortProse text={BEND_INSENSITIVE_NOTE} />}
            <dl class="kv">
              <dt>Loss per turn</dt>
              <dd class="num">{lossText(r.loss.lossDbPerTurn)}</dd>
              <dt>Loss for {turnsWords(r.loss.turns)}</dt>
              <dd class="num">{lossText(r.loss.totalLossDb)}</dd>
              <dt>Loss per metre of bent fiber</dt>
              <dd class="num">{withUnit(formatNumber(r.loss.lossDbPerM, 3), 'dB/m')}</dd>
              <dt>Radius where a turn costs {withUnit(String(CRITICAL_LOSS_DB_PER_TURN), 'dB')}</dt>
              <dd class="num">{criticalText}</dd>
              <dt>MAC number (MFD at this wavelength / cutoff)</dt>
              <dd>
                <span class="num">{formatNumber(r.mac, 3)}</span> (<span class="num">{formatQuantity(r.mfdUm, 'µm', 3)}</span> /{' '}
                <span class="num">{formatQuantity(r.cutoffNm / 1000, 'µm', 4)}</span>)
              </dd>
              <dt>Radius used in the formula</dt>
              <dd class="num">{formatQuantity(r.loss.effectiveRadiusMm, 'mm', 4)}</dd>
            </dl>
            {modelLeads && <ShortProse text="A higher MAC number means a more bend-sensitive fiber. Below the radius above, loss climbs steeply: each millimetre tighter multiplies it." />}
            {r.loss.multimodeWarning && (
              <p class="verdict-warn">The fiber is not single-mode at this wavelength: only the LP01 loss is shown; higher modes radiate far sooner.</p>
            )}
          </>
        )}
      </ResultCard>

      <ResultCard title="ITU-T macrobend limits beside the step-index estimate" stale={res.stale}>
        {r && (
          <>
            <p class="note">{MACROBEND_LIMITS_EDITION}. The estimate is for the fiber chosen above, with the radius model chosen above.</p>
            {modelLeads && <ShortProse text={BEND_INSENSITIVE_NOTE} />}
            <DataTable<LimitRow>
              caption="Specified maximum loss for N turns at radius R, and the step-index estimate for the same bend"
              rows={r.limits}
              rowKey={(l) => `${l.category}-${l.bendRadiusMm}`}
              rowClass={(l) => (l.category === chosenCategory ? 'row-chosen' : undefined)}
              columns={[
                { label: 'Category', cell: (l) => <span class="num">{l.category}</span> },
                { label: 'Bend', cell: (l) => `${l.turns} × ${formatQuantity(l.bendRadiusMm, 'mm')}`, num: true },
                { label: 'Limit at 1550 nm', cell: (l) => (l.maxLossDb1550 === undefined ? NOT_A_NUMBER_TEXT : formatDb(l.maxLossDb1550)), num: true },
                { label: 'Estimate at 1550 nm', cell: (l) => lossText(l.model1550), num: true },
                { label: 'Limit at 1625 nm', cell: (l) => formatDb(l.maxLossDb1625), num: true },
                { label: 'Estimate at 1625 nm', cell: (l) => lossText(l.model1625), num: true },
              ]}
            />
          </>
        )}
      </ResultCard>

      <ResultCard title="Loss versus bend radius (step-index model)" stale={sweep.stale} error={sweep.error} busy={sweep.busy}>
        {sweep.result && (
          <LinePlot
            title={`Loss per turn at ${shownValue(wavelength, 'nm')}`}
            xLabel="Bend radius (mm)"
            yLabel="Loss per turn (dB)"
            logY
            series={sweepSeries}
            markers={[
              ...(radius.value !== undefined ? [{ x: radius.value, label: 'your radius' }] : []),
              ...(r && r.critical.status === 'found' ? [{ x: r.critical.bendRadiusMm, label: `${CRITICAL_LOSS_DB_PER_TURN} dB/turn` }] : []),
            ]}
          />
        )}
      </ResultCard>
    </CalcScreen>
  );
}
