// Bend loss: what a tight loop costs, per turn and for N turns, and how it compares with the ITU-T limits.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { useResult } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { HowComputed } from '../../ui/HowComputed';
import { LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber } from '../../ui/format';
import { reportText } from '../../ui/copyText';
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
} from '../../physics';
import type { BendSweepInput, BendSweepOutput } from './tasks';

const MODEL_WORDS: Record<BendRadiusModel, string> = {
  'stress-corrected': 'Stress-corrected radius (silica, default)',
  geometric: 'Geometric radius (no stress correction)',
};

/** Losses below this are written with an exponent rather than as 0.000 dB. */
const SMALL_LOSS_DB = 0.001;
/** Lowest loss drawn on the plot (dB/turn): below it the curve says nothing a technician can use. */
const PLOT_FLOOR_DB = 1e-6;

function lossText(db: number): string {
  return db >= SMALL_LOSS_DB || db === 0 ? formatDb(db, 3) : `${formatNumber(db, 2)} dB`;
}

/** Radii of the loss-versus-radius plot (mm). */
const SWEEP = { minRadiusMm: 3, maxRadiusMm: 40, count: 200 };

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
    const loss = bendLoss({ ...f, wavelengthNm, bendRadiusMm: need(radius), turns: need(turns), radiusModel: model });
    const critical = criticalBendRadius({ ...f, wavelengthNm, radiusModel: model });
    const mfd = modeFieldDiameterUm({ ...f, wavelengthNm, definition: 'petermann2' });
    // Cutoff from the fiber's data where known, else the theoretical LP11 cutoff of the step model.
    const cutoffNm = fiber.cutoffWavelengthNm ?? (2 * Math.PI * fiber.coreRadiusUm * fiber.na * 1000) / LP11_CUTOFF_V;
    const mac = macNumber(mfd.mfdUm, cutoffNm);
    const limits = MACROBEND_LIMITS.map((lim) => {
      const at = (w: number) => bendLoss({ ...f, wavelengthNm: w, bendRadiusMm: lim.bendRadiusMm, turns: lim.turns, radiusModel: model }).totalLossDb;
      return { ...lim, model1550: at(1550), model1625: at(1625) };
    });
    return { loss, critical, mfdUm: mfd.mfdUm, cutoffNm, mac, limits };
  }, [fiber, picker.error, wavelength.value, wavelength.failure, radius.value, radius.failure, turns.value, turns.failure, model]);
  const calc = { error: res.error, errorArgument: res.errorArgument };

  const sweepInput: BendSweepInput | undefined =
    fiber && wavelength.value !== undefined ? { fiber: { coreRadiusUm: fiber.coreRadiusUm, na: fiber.na }, wavelengthNm: wavelength.value, ...SWEEP } : undefined;
  const sweep = useComputed<BendSweepInput, BendSweepOutput>('bendLoss.sweep', sweepInput, wavelength.error ?? picker.error);

  const r = res.result;
  const isBendInsensitive = fiber?.category?.startsWith('G.657') ?? false;
  const copy =
    r &&
    reportText({
      title: 'Bend loss',
      inputs: [
        ['Fiber', fiber?.name ?? ''],
        ['Wavelength', shownValue(wavelength, 'nm')],
        ['Bend radius', shownValue(radius, 'mm')],
        ['Turns', shownValue(turns, '')],
        ['Radius model', MODEL_WORDS[model]],
      ],
      outputs: [
        ['Loss per turn', lossText(r.loss.lossDbPerTurn)],
        [`Loss for ${r.loss.turns} turn${r.loss.turns === 1 ? "" : "s"}`, lossText(r.loss.totalLossDb)],
        [`Radius for ${CRITICAL_LOSS_DB_PER_TURN} dB per turn`, r.critical.status === 'found' ? `${formatNumber(r.critical.bendRadiusMm, 3)} mm` : 'below 1 mm'],
        ['MAC number', formatNumber(r.mac, 3)],
      ],
      assumptions: [
        'Marcuse 1976 curvature-loss formula for LP01 of the (equivalent) step-index fiber.',
        model === 'stress-corrected' ? `Effective bend radius ${formatNumber(r.loss.radiusFactor, 3)} × R for silica (Schermer & Cole 2007).` : 'Geometric bend radius, no stress correction.',
        BEND_INSENSITIVE_NOTE,
      ],
    });

  const sweepSeries = sweep.result
    ? [
        { name: MODEL_WORDS['stress-corrected'], points: sweep.result.stressCorrected.filter((p) => p[1] >= PLOT_FLOOR_DB) },
        { name: MODEL_WORDS.geometric, points: sweep.result.geometric.filter((p) => p[1] >= PLOT_FLOOR_DB), dashed: true },
      ]
    : [];

  return (
    <>
      <h2>Fiber and bend</h2>
      {picker.element}
      <div class="form">
        <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={calc} />
        <NumberField q={radius} label="Bend radius" unit="mm" quickPicks={[5, 7.5, 10, 15, 30]} calc={calc} help="Radius, not diameter: half the loop’s width." />
        <NumberField q={turns} label="Number of turns" unit="turns" quickPicks={[1, 10, 100]} quickPickLabel={(n) => (n === 1 ? "1 turn" : `${n} turns`)} calc={calc} />
        <div class="field">
          <label for="bend-model">Bend radius model</label>
          <select id="bend-model" value={model} onChange={(e) => setModel((e.currentTarget as HTMLSelectElement).value as BendRadiusModel)}>
            <option value="stress-corrected">{MODEL_WORDS['stress-corrected']}</option>
            <option value="geometric">{MODEL_WORDS.geometric}</option>
          </select>
        </div>
      </div>

      {isBendInsensitive && (
        <p class="note verdict-warn">
          <strong>Bend-insensitive fiber:</strong> {BEND_INSENSITIVE_NOTE}
        </p>
      )}

      <ResultCard title="Macrobend loss" stale={res.stale} error={res.error} copyText={copy}>
        {r && (
          <>
            <dl class="kv">
              <dt>Loss per turn</dt>
              <dd>{lossText(r.loss.lossDbPerTurn)}</dd>
              <dt>Loss for {r.loss.turns} turn{r.loss.turns === 1 ? "" : "s"}</dt>
              <dd>{lossText(r.loss.totalLossDb)}</dd>
              <dt>Loss per metre of bent fiber</dt>
              <dd>{formatNumber(r.loss.lossDbPerM, 3)} dB/m</dd>
              <dt>Radius where a turn costs {CRITICAL_LOSS_DB_PER_TURN} dB</dt>
              <dd>{r.critical.status === 'found' ? `${formatNumber(r.critical.bendRadiusMm, 3)} mm` : 'below 1 mm'}</dd>
              <dt>MAC number (MFD at this wavelength / cutoff)</dt>
              <dd>
                {formatNumber(r.mac, 3)} ({formatNumber(r.mfdUm, 3)} µm / {formatNumber(r.cutoffNm / 1000, 4)} µm)
              </dd>
              <dt>Radius used in the formula</dt>
              <dd>{formatNumber(r.loss.effectiveRadiusMm, 4)} mm</dd>
            </dl>
            <p class="note">
              A higher MAC number means a more bend-sensitive fiber. Below the radius above, loss climbs steeply: each millimetre tighter multiplies it.
            </p>
            {r.loss.multimodeWarning && (
              <p class="verdict-warn">The fiber is not single-mode at this wavelength: only the LP01 loss is shown; higher modes radiate far sooner.</p>
            )}
          </>
        )}
      </ResultCard>

      <ResultCard title="Loss versus bend radius" stale={sweep.stale} error={sweep.error} busy={sweep.busy}>
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

      <ResultCard title="ITU-T macrobend limits beside the step-index estimate" stale={res.stale} error={res.error}>
        {r && (
          <>
            <p class="note">{MACROBEND_LIMITS_EDITION}. The estimate is for the fiber chosen above, with the radius model chosen above.</p>
            <div class="table-wrap">
              <table>
                <thead>
                  <tr>
                    <th scope="col">Category</th>
                    <th scope="col">Bend</th>
                    <th scope="col">Limit at 1550 nm</th>
                    <th scope="col">Estimate at 1550 nm</th>
                    <th scope="col">Limit at 1625 nm</th>
                    <th scope="col">Estimate at 1625 nm</th>
                  </tr>
                </thead>
                <tbody>
                  {r.limits.map((l) => (
                    <tr key={`${l.category}-${l.bendRadiusMm}`}>
                      <th scope="row">{l.category}</th>
                      <td>
                        {l.turns} × {formatNumber(l.bendRadiusMm)} mm
                      </td>
                      <td>{l.maxLossDb1550 === undefined ? '—' : formatDb(l.maxLossDb1550)}</td>
                      <td>{lossText(l.model1550)}</td>
                      <td>{formatDb(l.maxLossDb1625)}</td>
                      <td>{lossText(l.model1625)}</td>
                    </tr>
                  ))}
                </tbody>
              </table>
            </div>
            <p class="note">{BEND_INSENSITIVE_NOTE}</p>
          </>
        )}
      </ResultCard>

      <HowComputed
        formula="Marcuse’s curvature-loss formula for LP01: 2α = √π κ² exp(−2γ³R/3β²) / (2 γ^3/2 V² √R K₁²(γa)); loss per turn = 4.343 · 2α · 2πR."
        source="Marcuse 1976, JOSA 66(3); stress correction Schermer & Cole 2007, IEEE JQE 43(10)"
        assumptions={[
          'The fiber is treated as a step-index fiber (for a category or a label: the equivalent step-index fiber).',
          `Stress correction: R_eff = R / (1 − (n²/2)(p12 − ν(p11 + p12))) with p11 = ${SILICA_P11}, p12 = ${SILICA_P12}, ν = ${SILICA_POISSON_RATIO} for silica; ${STRESS_RADIUS_FACTOR_SILICA} R for a core index of 1.449.`,
          'Uniform bend, infinite cladding, no coating effects and no whispering-gallery reflections from the cladding edge.',
          'MFD by Petermann II at the chosen wavelength; cutoff from the fiber data, or the theoretical LP11 cutoff.',
        ]}
        validity="Bend radius well above the core radius and LP01 well guided. Trench-assisted (bend-insensitive) designs are not described by this model."
      />
    </>
  );
}
