// Joint loss between two single-mode fibers: each imperfection, the total, which one dominates,
// and the exact LP01 overlap beside the Gaussian formulas. The worked example of the calculator
// frame (src/ui/CalcScreen.tsx): inputs, one headline answer, details below.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import type { ResolvedFiber } from '../../fibers/resolved';
import {
  fresnelLoss,
  gaussianJointLoss,
  INDEX_AIR,
  INDEX_MATCHING_GEL,
  ModelError,
  modeFieldDiameterUm,
  SILICA_INDEX_1550NM,
  type JointCause,
  type JointComparison,
} from '../../physics';
import type { JointExactInput } from './tasks';

const CAUSE_WORDS: Record<JointCause, string> = {
  mismatch: 'Mode field diameter mismatch',
  offset: 'Lateral offset of the cores',
  tilt: 'Angle between the fiber axes',
  gap: 'End gap (light spreading across it)',
  fresnel: 'Reflection at the two glass faces of the gap',
};
const CAUSE_ORDER: JointCause[] = ['mismatch', 'offset', 'tilt', 'gap', 'fresnel'];

type GapMedium = 'air' | 'gel';

function fiberOrThrow(f: ResolvedFiber | undefined, argument: string, error: string | undefined): ResolvedFiber {
  if (!f) throw new ModelError(error ?? `Choose ${argument} above.`, 'fiber choice');
  return f;
}

export default function Screen() {
  const pick1 = useFiberPicker({ id: 'joint-1', label: 'Fiber sending the light', shortLabel: 'Sending', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const pick2 = useFiberPicker({ id: 'joint-2', label: 'Fiber receiving the light', shortLabel: 'Receiving', kinds: ['single-mode'], defaultCategory: 'G.657.A1' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  // Neutral defaults: a perfect joint until the person adds an imperfection (or taps the example).
  const offset = useQuantity('lateralOffsetUm', 'size', '0');
  const tilt = useQuantity('tiltDeg', 'plain', '0');
  const gap = useQuantity('gapUm', 'size', '0');
  const [medium, setMedium] = useState<GapMedium>('air');
  const mediumIndex = medium === 'air' ? INDEX_AIR : INDEX_MATCHING_GEL;

  const gauss = useResult(() => {
    const w = need(wavelength);
    const f1 = fiberOrThrow(pick1.fiber, 'the sending fiber', pick1.error);
    const f2 = fiberOrThrow(pick2.fiber, 'the receiving fiber', pick2.error);
    const mfd1Um = modeFieldDiameterUm({ coreRadiusUm: f1.coreRadiusUm, na: f1.na, wavelengthNm: w, definition: 'petermann2' }).mfdUm;
    const mfd2Um = modeFieldDiameterUm({ coreRadiusUm: f2.coreRadiusUm, na: f2.na, wavelengthNm: w, definition: 'petermann2' }).mfdUm;
    const joint = gaussianJointLoss({
      mfd1Um,
      mfd2Um,
      wavelengthNm: w,
      lateralOffsetUm: need(offset),
      tiltDeg: need(tilt),
      gapUm: need(gap),
      mediumIndex,
      fiberIndex: SILICA_INDEX_1550NM,
    });
    return { mfd1Um, mfd2Um, joint, fresnel: fresnelLoss(SILICA_INDEX_1550NM, mediumIndex) };
  }, [pick1.fiber, pick1.error, pick2.fiber, pick2.error, wavelength.value, wavelength.failure, offset.value, offset.failure, tilt.value, tilt.failure, gap.value, gap.failure, mediumIndex]);

  const exactInput: JointExactInput | undefined =
    pick1.fiber && pick2.fiber && wavelength.value !== undefined && offset.value !== undefined
      ? {
          fiber1: { coreRadiusUm: pick1.fiber.coreRadiusUm, na: pick1.fiber.na },
          fiber2: { coreRadiusUm: pick2.fiber.coreRadiusUm, na: pick2.fiber.na },
          wavelengthNm: wavelength.value,
          lateralOffsetUm: offset.value,
        }
      : undefined;
  const exact = useComputed<JointExactInput, JointComparison>('jointLoss.exact', exactInput, wavelength.error ?? offset.error ?? pick1.error ?? pick2.error);

  const g = gauss.result;
  const x = exact.result;
  const fieldArgs = [wavelength.argument, offset.argument, tilt.argument, gap.argument];

  const headline: Headline | undefined = g && {
    label: 'Joint loss',
    value: formatDb(g.joint.totalLossDb, 3),
    verdict: g.joint.dominant === 'none' ? 'Every cause is below 0.001 dB' : `Mostly ${CAUSE_WORDS[g.joint.dominant].toLowerCase()}`,
    tone: 'info',
  };

  const report: ReportSpec | undefined = g && {
    title: 'Joint loss between two single-mode fibers',
    inputs: [
      ['Fiber sending', pick1.fiber?.name ?? ''],
      ['Fiber receiving', pick2.fiber?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
      ['Lateral offset', shownValue(offset, 'µm')],
      ['Angle', shownValue(tilt, '°')],
      ['End gap', `${shownValue(gap, 'µm')}, ${medium === 'air' ? 'air' : 'index-matching gel'}`],
    ],
    outputs: [
      ['Total loss (Gaussian fields)', formatDb(g.joint.totalLossDb, 3)],
      ...CAUSE_ORDER.map((c): [string, string] => [CAUSE_WORDS[c], formatDb(g.joint.contributions[c], 3)]),
      ['Largest cause', g.joint.dominant === 'none' ? 'none (all below 0.001 dB)' : CAUSE_WORDS[g.joint.dominant]],
      ...(x && !exact.stale ? [['Mismatch + offset, exact LP01 fields', formatDb(x.exactLossDb, 3)] as [string, string]] : []),
    ],
    assumptions: [
      'Gaussian mode fields with the Petermann II MFD at this wavelength (Marcuse 1977).',
      'Fresnel loss of an air gap: two faces, reflections not re-added; an etalon can swing it.',
    ],
  };

  const tryExample = () => {
    offset.setText('1');
    tilt.setText('0.3');
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: gauss.stale, error: cardError(gauss, fieldArgs) }}
      report={report}
      inputsTitle="The two fibers and the joint"
      inputs={
        <>
          {pick1.element}
          {pick2.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={gauss} />
            <NumberField q={offset} label="Lateral offset of the cores" unit="µm" quickPicks={[0, 0.5, 1, 2]} calc={gauss} />
            <NumberField q={tilt} label="Angle between the fibers" unit="°" quickPicks={[0, 0.5, 1]} calc={gauss} />
            <NumberField q={gap} label="End gap" unit="µm" quickPicks={[0, 5, 20]} calc={gauss} help="0 for a fusion splice or a physical-contact connector." />
            <div class="field">
              <label for="joint-medium">A gap is filled with</label>
              <select id="joint-medium" value={medium} onChange={(e) => setMedium((e.currentTarget as HTMLSelectElement).value as GapMedium)}>
                <option value="air">Air (n = 1.0)</option>
                <option value="gel">Index-matching gel (n ≈ 1.46)</option>
              </select>
            </div>
          </div>
          <p>
            <button type="button" onClick={tryExample}>
              Example: a worn connector (1 µm offset, 0.3°)
            </button>
          </p>
        </>
      }
      how={{
        formula:
          'Overlap of the two mode fields. Gaussian fields (spot radius w = MFD/2): mismatch (2w₁w₂/(w₁²+w₂²))², offset exp(−2d²/(w₁²+w₂²)), angle exp(−k²θ²w₁²w₂²/(2(w₁²+w₂²))) with k in the glass when the faces touch and in the gap medium across a gap, gap 1/(1+(λs/(πn(w₁²+w₂²)))²); all at once by the closed-form Gaussian overlap. Exact: numerical overlap of the LP01 fields J₀/K₀.',
        source: 'Marcuse 1977, BSTJ 56(5); Nemoto & Makimoto 1979; Kogelnik & Li 1966; Fresnel reflection, Born & Wolf 1999',
        assumptions: [
          'Both fibers single-mode at the wavelength; fields from the (equivalent) step-index fiber of each choice.',
          'MFD by Petermann II at the wavelength.',
          `Fresnel loss with a fiber index of ${SILICA_INDEX_1550NM} (fused silica at 1550 nm); two faces, reflections not re-added.`,
          'The exact comparison covers mismatch and offset; angle and gap use the Gaussian beam only.',
        ],
        validity: 'Small angles (a few degrees at most), paraxial gaps; weakly guiding fibers.',
      }}
    >
      {g && (
        <ResultCard title="Each cause" stale={gauss.stale}>
          <dl class="kv">
            <dt>Mode field diameters here</dt>
            <dd>
              <span class="num">{formatQuantity(g.mfd1Um, 'µm', 3)}</span> → <span class="num">{formatQuantity(g.mfd2Um, 'µm', 3)}</span>
            </dd>
          </dl>
          <DataTable
            caption="Each cause alone (the others set to zero)"
            rows={CAUSE_ORDER}
            rowKey={(c) => c}
            columns={[
              { label: 'Cause', cell: (c) => `${CAUSE_WORDS[c]}${c === g.joint.dominant ? ' (largest)' : ''}` },
              { label: 'Loss', cell: (c) => formatDb(g.joint.contributions[c], 3), num: true },
            ]}
          />
          {Math.abs(g.joint.sumOfSeparateDb - g.joint.totalLossDb) > 0.005 && (
            <p class="note">
              The causes interact (offset and angle across a gap): the total differs from their sum, <span class="num">{formatDb(g.joint.sumOfSeparateDb, 3)}</span>.
            </p>
          )}
          {(gap.value ?? 0) > 0 && medium === 'air' && (
            <ShortProse
              text={`Air gap: each glass face reflects ${formatNumber(g.fresnel.reflectancePerSurface * 100, 3)}\u00a0% of the light. Reflected light also goes back towards the source. With a laser and a very stable gap the two faces act as an etalon, and the loss can swing between ${formatDb(g.fresnel.etalonMinLossDb)} and ${formatDb(g.fresnel.etalonMaxLossDb)} as the gap changes by a quarter wavelength.`}
            />
          )}
        </ResultCard>
      )}

      <ResultCard title="Gaussian picture against the exact mode fields" stale={exact.stale} error={exact.error} busy={exact.busy}>
        {x && (
          <>
            <dl class="kv">
              <dt>Mismatch + offset, Gaussian fields</dt>
              <dd class="num">{formatDb(x.gaussianLossDb, 4)}</dd>
              <dt>Mismatch + offset, exact LP01 fields</dt>
              <dd class="num">{formatDb(x.exactLossDb, 4)}</dd>
              <dt>V-numbers</dt>
              <dd>
                <span class="num">{formatNumber(x.v1, 3)}</span> and <span class="num">{formatNumber(x.v2, 3)}</span>
              </dd>
            </dl>
            <ShortProse text="Near V ≈ 2.2 the LP01 field is very close to a Gaussian and the two columns agree. At lower V the real field has a wider tail than a Gaussian, and the Gaussian formulas start to misjudge large offsets." />
            <LinePlot
              title="Loss versus lateral offset (mismatch included)"
              xLabel="Lateral offset (µm)"
              yLabel="Loss (dB)"
              series={[
                { name: 'Exact LP01 fields', points: x.curve.map((p) => [p.offsetUm, p.exactDb]) },
                { name: 'Gaussian fields (Marcuse 1977)', points: x.curve.map((p) => [p.offsetUm, p.gaussianDb]), dashed: true },
              ]}
              markers={offset.value !== undefined ? [{ x: offset.value, label: 'your offset' }] : []}
            />
            <LinePlot
              title="The two mode fields across the joint"
              xLabel="Position across the joint (µm)"
              yLabel="Field amplitude (peak = 1)"
              series={[
                { name: 'Sending fiber, exact', points: x.fields.map((p) => [p.xUm, p.exact1]) },
                { name: 'Receiving fiber, exact (shifted by the offset)', points: x.fields.map((p) => [p.xUm, p.exact2]) },
                { name: 'Sending fiber, Gaussian', points: x.fields.map((p) => [p.xUm, p.gaussian1]), dashed: true },
                { name: 'Receiving fiber, Gaussian', points: x.fields.map((p) => [p.xUm, p.gaussian2]), dashed: true },
              ]}
            />
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
