// Launch between single-mode and multimode: power into each mode, and the loss each way.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { useQuantity, shownValue } from '../../ui/useQuantity';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { HowComputed } from '../../ui/HowComputed';
import { BarChart } from '../../ui/Plot';
import { formatDb, formatNumber, formatPercent } from '../../ui/format';
import { reportText } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { POWER_SHARE_FOR_MODE_COUNT, type LaunchResult, type ModePowerDistribution } from '../../physics';
import type { LaunchInput, LaunchOutput } from './tasks';

type Fill = 'uniform' | 'restricted';
/** Share of the mode groups lit by the "restricted" choice. An illustration of a centre-weighted launch. */
const RESTRICTED_GROUP_FRACTION = 0.3;

function groupBars(r: LaunchResult) {
  return r.perGroup.map((g) => ({ label: String(g.principal), value: g.fraction * 100 }));
}

function ResultLines({ r, what }: { r: LaunchResult; what: string }) {
  return (
    <dl class="kv">
      <dt>{what}</dt>
      <dd>{formatPercent(r.coupledFraction, 2)}</dd>
      <dt>Loss</dt>
      <dd>
        <strong>{formatDb(r.lossDb, 2)}</strong>
      </dd>
      <dt>Modes that carry {POWER_SHARE_FOR_MODE_COUNT * 100} % of it</dt>
      <dd>
        {r.modesFor90Percent} of {r.perMode.length} LP modes
      </dd>
    </dl>
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
  const calc = { error: res.error, errorArgument: res.errorArgument };
  const r = res.result;

  const copy =
    r &&
    reportText({
      title: 'Launch between single-mode and multimode',
      inputs: [
        ['Single-mode fiber', sm?.name ?? ''],
        ['Multimode fiber', mm?.name ?? ''],
        ['Wavelength', shownValue(wavelength, 'nm')],
        ['Offset of the cores', shownValue(offset, 'µm')],
        ['Single-mode field', fieldModel === 'exact' ? 'exact LP01' : 'Gaussian'],
        ['Multimode power', fill === 'uniform' ? 'uniform over all modes' : `lowest ${RESTRICTED_GROUP_FRACTION * 100} % of the mode groups`],
      ],
      outputs: [
        ['Single-mode → multimode loss', formatDb(r.forward.lossDb, 2)],
        ['Multimode → single-mode loss', formatDb(r.backward.lossDb, 2)],
        ['Guided multimode modes', String(r.forward.multimodeModeCount)],
        [`LP modes carrying ${POWER_SHARE_FOR_MODE_COUNT * 100} % (SM → MM)`, String(r.forward.modesFor90Percent)],
      ],
      assumptions: ['Scalar mode fields, overlap integrals; modes of the multimode fiber mutually incoherent.'],
    });

  return (
    <>
      <h2>The two fibers</h2>
      {pickSm.element}
      {pickMm.element}
      <div class="form">
        <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[850, 1310]} calc={calc} />
        <NumberField
          q={offset}
          label="Offset between the cores"
          unit="µm"
          quickPicks={[0, 5, 10, 20]}
          calc={calc}
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

      <ResultCard title="Single-mode into multimode" stale={res.stale} error={res.error} busy={res.busy} copyText={copy}>
        {r && (
          <>
            <ResultLines r={r.forward} what="Power guided in the multimode fiber" />
            <p class="note">
              The multimode fiber guides {r.forward.multimodeModeCount} modes (V = {formatNumber(r.forward.multimodeV, 3)}).{' '}
              {r.forward.lossDb < 0.5
                ? `The single-mode field (MFD ${formatNumber(r.singleModeMfdUm, 3)} µm) lies well inside its core, so nearly all of it is caught.`
                : `Part of the single-mode field (MFD ${formatNumber(r.singleModeMfdUm, 3)} µm) falls outside what the core can guide at this offset.`}
            </p>
            <BarChart title="Power launched into each mode group" xLabel="Principal mode number (mode group)" yLabel="Share of the launched power (%)" bars={groupBars(r.forward)} formatValue={(v) => `${formatNumber(v, 2)}`} />
          </>
        )}
      </ResultCard>

      <ResultCard title="Multimode into single-mode" stale={res.stale} error={res.error} busy={res.busy}>
        {r && (
          <>
            <ResultLines r={r.backward} what="Power that reaches the single-mode fiber" />
            <p class="note">
              Going back, the light is spread over many modes that do not keep step with each other, and the single-mode fiber accepts only
              what matches its one mode.{' '}
              {fill === 'uniform'
                ? `With even spreading that is about 1 part in ${formatNumber(r.backward.multimodeModeCount / 2, 3)} (the number of modes per polarisation), 10·log10 of which is ${formatDb(10 * Math.log10(r.backward.multimodeModeCount / 2), 1)}.`
                : 'With only the lowest mode groups lit, the power sits in fewer modes that resemble the single-mode field, so more of it gets through.'}
            </p>
            <BarChart title="Where the power reaching the single-mode fiber comes from" xLabel="Principal mode number (mode group)" yLabel="Share of the multimode power (%)" bars={groupBars(r.backward)} formatValue={(v) => `${formatNumber(v, 2)}`} />
          </>
        )}
      </ResultCard>

      <HowComputed
        formula="η = |∫∫ E_SM E_mode dA|² / (∫∫|E_SM|² dA ∫∫|E_mode|² dA) for each guided mode; SM → MM: sum over modes; MM → SM: Σ (power in the mode) × η."
        source="Snyder & Love 1983; Gloge 1971 (step LP modes); Gloge & Marcatili 1973 (graded profiles); Marcuse 1977 (Gaussian field)"
        assumptions={[
          'Scalar, weakly guiding fibers; the single-mode fiber is its (equivalent) step-index fiber.',
          'Graded-index modes from our finite-difference solver for the α-profile; step-index modes from the Bessel-function solution.',
          'Multimode → single-mode: modes mutually incoherent, each with its share of the power; both polarisations counted.',
          'No gap, no angle; the offset is between the two fiber axes.',
        ]}
        validity="Guided modes only; power in cladding or leaky modes is counted as lost. Mode groups by principal number 2m + l − 1."
      />
    </>
  );
}
