// Bend or splice? One event's loss at two or three wavelengths, fitted by the joint-loss model (nearly flat with
// wavelength) and by the bend-loss model (rising steeply), with the verdict in words.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, SEE_MARKED_FIELD } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatNumber, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  BEND_INSENSITIVE_NOTE,
  BEND_SEARCH_MAX_MM,
  BEND_SEARCH_MIN_MM,
  DEFAULT_BEND_RADIUS_MODEL,
  KINK_ARC_MM,
  type BendOrSpliceInput,
  type BendOrSpliceResult,
  type BendRadiusModel,
  type EventVerdict,
} from '../../physics';

const MODEL_WORDS: Record<BendRadiusModel, string> = {
  'stress-corrected': 'Stress-corrected radius (silica, default)',
  geometric: 'Geometric radius (no stress correction)',
};

/** The verdict in the words a technician uses; each names only the one cause it means. */
const VERDICT_WORDS: Record<EventVerdict, { value: string; verdict: string; tone: 'ok' | 'warn' | 'bad' | 'info' }> = {
  splice: { value: 'Splice or connector', verdict: 'loss nearly flat with wavelength', tone: 'ok' },
  bend: { value: 'Bend', verdict: 'loss rises steeply with wavelength', tone: 'warn' },
  either: { value: 'Cannot tell', verdict: 'fits a splice and a bend alike; add a 1625 nm reading', tone: 'info' },
  neither: { value: 'Fits neither model', verdict: 'check the readings', tone: 'bad' },
  'no-loss': { value: 'No event', verdict: 'every loss is within the reading uncertainty', tone: 'info' },
};

function turnsWords(turns: number): string {
  return turns >= 0.95 ? `${formatNumber(turns, 2)}\u00a0turns` : `${formatNumber(turns, 2)} of a turn`;
}

export default function Screen() {
  const picker = useFiberPicker({ id: 'event-fiber', label: 'Fiber at the event', shortLabel: 'Fiber', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const loss1310 = useQuantity('loss1310Db', 'plain', '0.05');
  const loss1550 = useQuantity('loss1550Db', 'plain', '0.40');
  const loss1625 = useQuantity('loss1625Db', 'plain', '');
  const [use1625, setUse1625] = useState(false);
  const tolerance = useQuantity('toleranceDb', 'plain', '0.03');
  const [model, setModel] = useState<BendRadiusModel>(DEFAULT_BEND_RADIUS_MODEL);
  const fiber = picker.fiber;

  const fields = use1625 ? [loss1310, loss1550, loss1625] : [loss1310, loss1550];
  const wavelengths = [1310, 1550, 1625];
  const parseError = fields.find((q) => q.error)?.error ?? tolerance.error;
  const input: BendOrSpliceInput | undefined =
    fiber && fields.every((q) => q.value !== undefined) && tolerance.value !== undefined
      ? {
          fiber: { coreRadiusUm: fiber.coreRadiusUm, na: fiber.na },
          readings: fields.map((q, i) => ({ wavelengthNm: wavelengths[i]!, lossDb: q.value! })),
          toleranceDb: tolerance.value,
          radiusModel: model,
        }
      : undefined;
  const state = useComputed<BendOrSpliceInput, BendOrSpliceResult>('bendOrSplice.classify', input, parseError ?? picker.error);
  // Physics names a reading by its place in the list; the field for that place explains it.
  const calcFor = (i: number, argument: string) => ({
    errorArgument: state.errorArgument === `readings[${i}].lossDb` ? argument : state.errorArgument,
    fault: state.fault,
  });
  const fieldArgs = ['readings[0].lossDb', 'readings[1].lossDb', 'readings[2].lossDb', tolerance.argument];
  const r = state.result;
  const isBendInsensitive = fiber?.category?.startsWith('G.657') ?? false;

  // Each number keeps its unit; the words between may wrap (a long unbreakable run would be split by the browser).
  const rangeWords = (lo: number, hi: number) => `${formatQuantity(lo, 'mm', 2)} to ${formatQuantity(hi, 'mm', 2)}`;
  const bendLine =
    r?.bend.fits && r.bend.bendRadiusMm !== undefined
      ? `about ${formatQuantity(r.bend.bendRadiusMm, 'mm', 2)} radius (${rangeWords(r.bend.radiusRangeMm![0], r.bend.radiusRangeMm![1])}), ${turnsWords(r.bend.turns!)}`
      : undefined;
  const spliceLine = r?.splice.fits
    ? `${formatQuantity(r.splice.offsetUm, 'µm', 2)} core offset and an MFD ratio of ${formatNumber(r.splice.mfdRatio, 3)} would give it`
    : undefined;

  const headline: Headline | undefined = r && {
    label: 'This event',
    value: VERDICT_WORDS[r.verdict].value,
    verdict: VERDICT_WORDS[r.verdict].verdict,
    tone: VERDICT_WORDS[r.verdict].tone,
    more: [
      ...(r.verdict === 'bend' && r.bend.bendRadiusMm !== undefined
        ? [{ label: 'Radius', verdict: `${formatQuantity(r.bend.bendRadiusMm, 'mm', 2)} (${rangeWords(r.bend.radiusRangeMm![0], r.bend.radiusRangeMm![1])}), ${turnsWords(r.bend.turns!)}` }]
        : []),
      ...(r.verdict === 'splice' ? [{ label: 'As an offset', verdict: `${formatQuantity(r.splice.offsetUm, 'µm', 2)}, with MFD ratio ${formatNumber(r.splice.mfdRatio, 3)}` }] : []),
    ],
  };

  const report: ReportSpec | undefined = r && {
    title: 'Bend or splice? One event at several wavelengths',
    inputs: [
      ['Fiber', fiber?.name ?? ''],
      ...fields.map((q, i): [string, string] => [`Loss at ${wavelengths[i]} nm`, shownValue(q, 'dB')]),
      ['Reading uncertainty', shownValue(tolerance, 'dB')],
      ['Bend radius model', MODEL_WORDS[model]],
    ],
    outputs: [
      ['Verdict', `${VERDICT_WORDS[r.verdict].value}: ${VERDICT_WORDS[r.verdict].verdict}`],
      ['Splice model', r.splice.fits ? `fits (${spliceLine})` : `does not fit (misses by ${formatDb(r.splice.worstResidualDb, 3)})`],
      ['Bend model', r.bend.fits ? `fits (${bendLine})` : `does not fit (misses by ${formatDb(r.bend.worstResidualDb, 3)})`],
    ],
    assumptions: [
      'Splice: offset loss 4.34·(d/w)² with w from the Petermann II MFD at each wavelength, plus a flat part (MFD mismatch, connector) (Marcuse 1977).',
      `Bend: Marcuse 1976 curvature loss of the (equivalent) step-index fiber, radii ${BEND_SEARCH_MIN_MM}–${BEND_SEARCH_MAX_MM} mm, turns fitted.`,
      'A model fits when it reproduces every reading within the reading uncertainty.',
      ...(isBendInsensitive ? [BEND_INSENSITIVE_NOTE] : []),
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, busy: state.busy, error: parseError ? SEE_MARKED_FIELD : cardError(state, fieldArgs) }}
      report={report}
      inputsTitle="The event’s loss at each wavelength"
      inputs={
        <>
          {picker.element}
          <div class="form">
            <NumberField q={loss1310} label="Event loss at 1310 nm" unit="dB" signed example="such as 0.05 (a gain as −0.05)" calc={calcFor(0, loss1310.argument)} />
            <NumberField q={loss1550} label="Event loss at 1550 nm" unit="dB" signed example="such as 0.40 (a gain as −0.05)" calc={calcFor(1, loss1550.argument)} />
            <div class="field">
              <label>
                <input type="checkbox" checked={use1625} onChange={(e) => setUse1625((e.currentTarget as HTMLInputElement).checked)} /> I also have a reading at 1625 nm
              </label>
            </div>
            {use1625 && <NumberField q={loss1625} label="Event loss at 1625 nm" unit="dB" signed example="such as 0.9" calc={calcFor(2, loss1625.argument)} />}
            <NumberField
              q={tolerance}
              label="Uncertainty of each reading"
              unit="dB"
              quickPicks={[0.01, 0.03, 0.05]}
              calc={state}
              help="How far a reading may be off. Average both directions first; one-way readings at a joint of unlike fibers carry a gainer error."
            />
            <div class="field">
              <label for="event-model">Bend radius model</label>
              <select id="event-model" value={model} onChange={(e) => setModel((e.currentTarget as HTMLSelectElement).value as BendRadiusModel)}>
                <option value="stress-corrected">{MODEL_WORDS['stress-corrected']}</option>
                <option value="geometric">{MODEL_WORDS.geometric}</option>
              </select>
            </div>
          </div>
        </>
      }
      how={{
        formula:
          'Splice: L(λ) = a·(w(λ₀)/w(λ))² + b, a ≥ 0 the offset part, b ≥ 0 a flat part, w = MFD/2 at each wavelength; fitted by least squares. Bend: L(λ) = N·P(λ, R), P the loss per turn at radius R, N the turns; every radius from 2 to 60 mm tried, N fitted at each. A model fits when every reading is within the uncertainty; the radius range is where the bend model fits.',
        source: 'Marcuse 1976, JOSA 66(3) (bend); Schermer & Cole 2007 (stress correction); Marcuse 1977, BSTJ 56(5) (offset and mismatch); MFD per ITU-T G.650.1 (Petermann II)',
        assumptions: [
          'Readings are the event’s loss, best the average of both directions (a one-way reading at a joint of unlike fibers carries the gainer error).',
          'The fiber is treated as its equivalent step-index fiber.',
          `A fitted bend shorter than ${KINK_ARC_MM} mm of fiber is a kink or point pressure (crush, tight tie), not a loop.`,
        ],
        validity: 'Single-mode fibers, events well apart on the trace. Bend-insensitive (trench-assisted) fibers bend far better than this model: their radii here are not real radii.',
      }}
    >
      {isBendInsensitive && <p class="note verdict-warn">{BEND_INSENSITIVE_NOTE}</p>}
      {r && (
        <ResultCard title="Each model against the readings" stale={state.stale}>
          <DataTable
            caption="Readings and what each model gives"
            rows={r.readings.map((x, i) => ({ ...x, i }))}
            rowKey={(x) => x.wavelengthNm}
            columns={[
              { label: 'Wavelength', cell: (x) => formatQuantity(x.wavelengthNm, 'nm'), num: true },
              { label: 'Reading', cell: (x) => formatDb(x.lossDb, 3), num: true },
              { label: 'Splice model', cell: (x) => formatDb(r.splice.predictedDb[x.i], 3), num: true },
              { label: 'Bend model', cell: (x) => formatDb(r.bend.predictedDb[x.i], 3), num: true },
            ]}
          />
          <dl class="kv">
            <dt>Splice model</dt>
            <dd>{r.splice.fits ? `Fits: ${spliceLine}.` : `Does not fit: misses a reading by ${formatDb(r.splice.worstResidualDb, 3)}.`}</dd>
            <dt>Bend model</dt>
            <dd>{r.bend.fits ? `Fits: ${bendLine}.` : `Does not fit: misses a reading by ${formatDb(r.bend.worstResidualDb, 3)}.`}</dd>
            {r.lossRatio !== undefined && (
              <>
                <dt>Loss at the longest wavelength over the shortest</dt>
                <dd class="num">{formatNumber(r.lossRatio, 3)}</dd>
              </>
            )}
          </dl>
          {r.bend.fits && r.bend.kinkLike && (
            <ShortProse text={`The bend model puts this loss in less than ${KINK_ARC_MM} mm of bent fiber: look for a kink, a crushed spot or a tight cable tie rather than a loop.`} />
          )}
          {r.hasGain && (
            <ShortProse text="A reading below zero is a gainer: the fibers on either side of a joint scatter back differently. Measure from both ends and average before asking this question." />
          )}
          <ShortProse text="A joint loses about the same at every wavelength; a bend loses much more at longer wavelengths, because the mode spreads further into the cladding. That difference is what decides the verdict." />
        </ResultCard>
      )}
    </CalcScreen>
  );
}
