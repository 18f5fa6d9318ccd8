// Launch between single-mode and multimode: power into each mode, and the loss each way.
// Every overlap runs in the compute worker (tasks.ts), which also prepares the bars and counts the
// screen draws, so typing only re-draws the inputs; the details re-draw once per new result.
import { useMemo, useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { BarChart } from '../../ui/Plot';
import { formatDb, formatNumber, formatPercent, formatQuantity, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { POWER_SHARE_FOR_MODE_COUNT, type ModePowerDistribution } from '../../physics';
import type { LaunchInput, LaunchOutput, LaunchSide } from './tasks';

type Fill = 'uniform' | 'restricted';
/** Share of the mode groups lit by the "restricted" choice. An illustration of a centre-weighted launch. */
const RESTRICTED_GROUP_FRACTION = 0.3;
const SHARE_PERCENT = withUnit(String(POWER_SHARE_FOR_MODE_COUNT * 100), '%');
const formatBar = (v: number) => formatNumber(v, 2);

function ResultLines({ r, what }: { r: LaunchSide; what: string }) {
  return (
    <dl class="kv">
      <dt>{what}</dt>
      <dd class="num">{formatPercent(r.coupledFraction, 2)}</dd>
      <dt>Loss</dt>
      <dd class="num">
        <strong>{formatDb(r.lossDb, 2)}</strong>
      </dd>
      <dt>Modes that carry {SHARE_PERCENT} of it</dt>
      <dd>
        <span class="num">{r.modesFor90Percent}</span> of <span class="num">{r.lpModeCount}</span> LP modes
      </dd>
    </dl>
  );
}

/** The details: drawn once per result (memoised), not on every key typed. */
function Details({ out, stale, fill }: { out: LaunchOutput | undefined; stale: boolean; fill: Fill }) {
  const mfd = out && formatQuantity(out.singleModeMfdUm, 'µm', 3);
  return (
    <>
      <ResultCard title="Single-mode into multimode" stale={stale}>
        {out && (
          <>
            <ResultLines r={out.forward} what="Power guided in the multimode fiber" />
            <ShortProse
              text={`The multimode fiber guides ${out.forward.multimodeModeCount} modes (V = ${formatNumber(out.forward.multimodeV, 3)}). ${
                out.forward.lossDb < 0.5
                  ? `The single-mode field (MFD ${mfd}) lies well inside its core, so nearly all of it is caught.`
                  : `Part of the single-mode field (MFD ${mfd}) falls outside what the core can guide at this offset.`
              }`}
            />
            <BarChart title="Power launched into each mode group" xLabel="Mode group (principal mode number)" yLabel="Share of launched power (%)" bars={out.forward.bars} formatValue={formatBar} />
          </>
        )}
      </ResultCard>

      <ResultCard title="Multimode into single-mode" stale={stale}>
        {out && (
          <>
            <ResultLines r={out.backward} what="Power that reaches the single-mode fiber" />
            <ShortProse
              text={`Going back, the light is spread over many modes that do not keep step with each other, and the single-mode fiber accepts only what matches its one mode. ${
                fill === 'uniform'
                  ? `With even spreading that is about 1 part in ${formatNumber(out.backward.multimodeModeCount / 2, 3)} (the number of modes per polarisation), 10·log10 of which is ${formatDb(10 * Math.log10(out.backward.multimodeModeCount / 2), 1)}.`
                  : 'With only the lowest mode groups lit, the power sits in fewer modes that resemble the single-mode field, so more of it gets through.'
              }`}
            />
            <BarChart title="Where the power reaching the single-mode fiber comes from" xLabel="Mode group (principal mode number)" yLabel="Share of multimode power (%)" bars={out.backward.bars} formatValue={formatBar} />
          </>
        )}
      </ResultCard>
    </>
  );
}

export default function Screen() {
  const pickSm = useFiberPicker({ id: 'launch-sm', label: 'Single-mode fiber', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const pickMm = useFiberPicker({ id: 'launch-mm', label: 'Multimode fiber', kinds: ['multimode'], defaultCategory: 'OM3' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1310');
  const offset = useQuantity('offsetUm', 'size', '0');
  const [fieldModel, setFieldModel] = useState<'exact' | 'gaussian'>('exact');
  const [fill, setFill] = useState<Fill>('uniform');

  const sm = pickSm.fiber;
  const mm = pickMm.fiber;
  const distribution: ModePowerDistribution = fill === 'uniform' ? { kind: 'uniform' } : { kind: 'restricted', groupFraction: RESTRICTED_GROUP_FRACTION };
  const input: LaunchInput | undefined =
    sm && mm && wavelength.value !== undefined && offset.value !== undefined
      ? {
          singleMode: { coreRadiusUm: sm.coreRadiusUm, na: sm.na },
          fieldModel,
          multimode: { profile: mm.profile, coreRadiusUm: mm.coreRadiusUm, na: mm.na, alpha: mm.gradedAlpha },
          wavelengthNm: wavelength.value,
          offsetUm: offset.value,
          distribution,
        }
      : undefined;
  const res = useComputed<LaunchInput, LaunchOutput>('launch.couple', input, wavelength.error ?? offset.error ?? pickSm.error ?? pickMm.error);
  const r = res.result;
  const fieldArgs = [wavelength.argument, offset.argument];
  const fillWords = fill === 'uniform' ? 'power spread evenly over all multimode modes' : `only the lowest ${RESTRICTED_GROUP_FRACTION * 100}\u00a0% of the mode groups lit`;

  const headline: Headline | undefined = r && {
    label: 'Single-mode → multimode',
    value: formatDb(r.forward.lossDb, 2),
    verdict: `${formatPercent(r.forward.coupledFraction, 1)} guided`,
    tone: 'info',
    more: [{ label: 'Multimode → single-mode', value: formatDb(r.backward.lossDb, 2), verdict: `${formatPercent(r.backward.coupledFraction, 2)} gets through`, tone: 'info' }],
    note: `Multimode → single-mode assumes ${fillWords}.`,
  };

  const report: ReportSpec | undefined = r && {
    title: 'Launch between single-mode and multimode',
    inputs: [
      ['Single-mode fiber', sm?.name ?? ''],
      ['Multimode fiber', mm?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
      ['Offset of the cores', shownValue(offset, 'µm')],
      ['Single-mode field', fieldModel === 'exact' ? 'exact LP01' : 'Gaussian'],
      ['Multimode power', fillWords],
    ],
    outputs: [
      ['Single-mode → multimode loss', formatDb(r.forward.lossDb, 2)],
      ['Multimode → single-mode loss', formatDb(r.backward.lossDb, 2)],
      ['Guided multimode modes', String(r.forward.multimodeModeCount)],
      [`LP modes carrying ${SHARE_PERCENT} (SM → MM)`, String(r.forward.modesFor90Percent)],
    ],
    assumptions: ['Scalar mode fields, overlap integrals; modes of the multimode fiber mutually incoherent.'],
  };

  // "Working…" is said once, in the headline (aria-busy); the details keep the last answer meanwhile,
  // so a key typed re-draws the inputs and the headline only.
  const details = useMemo(() => <Details out={r} stale={res.stale} fill={fill} />, [r, res.stale, fill]);

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: res.stale, error: cardError(res, fieldArgs), busy: res.busy }}
      report={report}
      inputsTitle="The two fibers"
      inputs={
        <>
          {pickSm.element}
          {pickMm.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[850, 1310]} calc={res} />
            <NumberField
              q={offset}
              label="Offset between the cores"
              unit="µm"
              quickPicks={[0, 5, 10, 20]}
              calc={res}
              help="An offset launch into a 50 µm core (mode-conditioning cords use about 17–23 µm, common practice) avoids the centre of the core."
            />
            <div class="field">
              <label for="launch-field">Single-mode field</label>
              <select id="launch-field" value={fieldModel} onChange={(e) => setFieldModel((e.currentTarget as HTMLSelectElement).value as 'exact' | 'gaussian')}>
                <option value="exact">Exact LP01 field</option>
                <option value="gaussian">Gaussian of the same MFD</option>
              </select>
            </div>
            <div class="field">
              <label for="launch-fill">Power in the multimode fiber (for multimode → single-mode)</label>
              <select id="launch-fill" value={fill} onChange={(e) => setFill((e.currentTarget as HTMLSelectElement).value as Fill)}>
                <option value="uniform">Spread evenly over all modes (long fiber, full launch)</option>
                <option value="restricted">Only the lowest {RESTRICTED_GROUP_FRACTION * 100} % of the mode groups (restricted launch)</option>
              </select>
            </div>
          </div>
        </>
      }
      how={{
        formula:
          'η = |∫∫ E_SM E_mode dA|² / (∫∫|E_SM|² dA ∫∫|E_mode|² dA) for each guided mode; SM → MM: sum over modes; MM → SM: Σ (power in the mode) × η.',
        source: 'Snyder & Love 1983; Gloge 1971 (step LP modes); Gloge & Marcatili 1973 (graded profiles); Marcuse 1977 (Gaussian field)',
        assumptions: [
          'Scalar, weakly guiding fibers; the single-mode fiber is its (equivalent) step-index fiber.',
          'Graded-index modes from our finite-difference solver for the α-profile; step-index modes from the Bessel-function solution.',
          'Multimode → single-mode: modes mutually incoherent, each with its share of the power; both polarisations counted.',
          'No gap, no angle; the offset is between the two fiber axes.',
        ],
        validity: 'Guided modes only; power in cladding or leaky modes is counted as lost. Mode groups by principal number 2m + l − 1.',
      }}
    >
      {details}
    </CalcScreen>
  );
}
