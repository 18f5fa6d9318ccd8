// Offset launch: a single-mode spot moved off the axis of a multimode core, as a mode-conditioning cord does for a
// long-wavelength laser on multimode fiber. Power per mode group against offset, and why the centre is avoided.
import { NumberField } from '../../ui/NumberField';
import { useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline, type Tone } from '../../ui/CalcScreen';
import { LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber, formatPercent, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { CENTRE_RADIUS_UM, modeConditioningOffset } from '../../physics';
import type { OffsetTaskInput, OffsetTaskOutput } from '../encircledFlux/tasks';
import { ControlTable, EfPlot, efVerdictText, fiberSpec, GroupBars, shareUpTo, templateSource } from '../encircledFlux/parts';

/** The lowest groups, where a centre launch puts its power (groups 1–2: LP01 and LP11). */
const LOW_GROUPS = 2;

export default function Screen() {
  const pick = useFiberPicker({ id: 'offset-mm', label: 'Multimode fiber', kinds: ['multimode'], defaultCategory: 'OM3' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1310');
  const mfd = useQuantity('mfdUm', 'size', '9.2');
  const offset = useQuantity('offsetUm', 'size', '0');

  const fieldError = [wavelength, mfd, offset].map((q) => q.error).find(Boolean);
  const input: OffsetTaskInput | undefined =
    pick.fiber && wavelength.value !== undefined && mfd.value !== undefined && offset.value !== undefined
      ? { fiber: fiberSpec(pick.fiber), wavelengthNm: wavelength.value, mfdUm: mfd.value, offsetUm: offset.value }
      : undefined;
  const res = useComputed<OffsetTaskInput, OffsetTaskOutput>('encircledFlux.offset', input, fieldError ?? pick.error);
  const r = res.result;
  const fieldArgs = [wavelength.argument, mfd.argument, offset.argument];
  const coreDiameterUm = pick.fiber ? 2 * pick.fiber.coreRadiusUm : undefined;
  const cord = coreDiameterUm !== undefined ? modeConditioningOffset({ coreDiameterUm }) : undefined;

  let verdict = '';
  let tone: Tone = 'info';
  if (r) {
    const low = shareUpTo(r.at.perGroup, LOW_GROUPS);
    const d = r.at.offsetUm;
    if (cord && d >= cord.minUm && d <= cord.maxUm) {
      verdict = `Inside the cord range for this core (${cord.minUm}–${cord.maxUm} µm): ${formatPercent(low, 0)} in groups 1–2`;
      tone = 'ok';
    } else if (cord && d < cord.minUm) {
      verdict = `Centre-heavy: ${formatPercent(low, 0)} in groups 1–2, the groups a centre defect delays`;
      tone = 'warn';
    } else if (cord) {
      verdict = `Beyond the cord range: the power moves to the core edge (launch loss ${formatDb(r.at.lossDb, 2)})`;
      tone = 'warn';
    } else {
      verdict = `${formatPercent(low, 0)} in groups 1–2; no cord range is listed for this core`;
    }
  }
  const headline: Headline | undefined = r && {
    label: `Within ${formatQuantity(CENTRE_RADIUS_UM, 'µm')} of the axis`,
    value: formatPercent(r.at.centreShare, 0),
    verdict,
    tone,
  };

  const report: ReportSpec | undefined = r && {
    title: 'Offset launch into multimode fiber',
    inputs: [
      ['Multimode fiber', pick.fiber?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
      ['Single-mode spot (MFD)', shownValue(mfd, 'µm')],
      ['Offset from the core centre', shownValue(offset, 'µm')],
    ],
    outputs: [
      [`Power within ${CENTRE_RADIUS_UM} µm of the axis`, formatPercent(r.at.centreShare, 1)],
      ['Power in groups 1–2', formatPercent(shareUpTo(r.at.perGroup, LOW_GROUPS), 1)],
      ['Launch loss', formatDb(r.at.lossDb, 2)],
      ['Encircled flux', efVerdictText(r.at.check)],
      ...(cord ? [['Offset of mode-conditioning cords', `${cord.minUm} to ${cord.maxUm} µm (${cord.source})`] as [string, string]] : []),
    ],
    assumptions: ['Gaussian single-mode spot; overlap with every guided mode; modes add in power downstream.', `Template: ${templateSource(r.at.check)}.`],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: res.stale, error: cardError(res, fieldArgs), busy: res.busy }}
      report={report}
      inputsTitle="The fibers and the offset"
      inputs={
        <>
          {pick.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[850, 1300, 1310]} calc={res} />
            <NumberField q={mfd} label="Mode field diameter of the single-mode fiber" unit="µm" quickPicks={[5.5, 9.2]} calc={res} help="9.2 µm for a standard single-mode fiber at 1310 nm (common practice)." />
            <NumberField q={offset} label="Offset from the core centre" unit="µm" quickPicks={[0, 13, 20]} calc={res} />
          </div>
          {cord && (
            <p>
              <button type="button" onClick={() => offset.setText(String((cord.minUm + cord.maxUm) / 2))}>
                Example: a mode-conditioning cord for this core ({cord.minUm}–{cord.maxUm} µm)
              </button>
            </p>
          )}
        </>
      }
      how={{
        formula: 'Power into each guided mode from the overlap integral of the offset spot with the mode (azimuthal Fourier coefficients of the shifted spot), summed by principal group g = 2m + l − 1; EF(r) from those powers.',
        source: 'Snyder & Love 1983 (overlap integrals); Gloge & Marcatili 1973 (mode groups); IEEE 802.3 clause 38.11.4 (cord offsets, from memory)',
        assumptions: ['Butt joint, no gap or angle; Gaussian spot of the given MFD.', 'Ideal α-profile: the centre defect that makes centre launches risky is described, not modelled.'],
        validity: 'Weakly guiding fibers; offsets up to the core edge.',
      }}
    >
      {r && (
        <ResultCard title="Power against offset" stale={res.stale}>
          <LinePlot
            title="Where the power goes as the spot moves out"
            xLabel="Offset from the core centre (µm)"
            yLabel="Share of the power (%)"
            series={[
              { name: 'In groups 1–2', points: r.sweep.map((p) => [p.offsetUm, 100 * shareUpTo(p.perGroup, LOW_GROUPS)]) },
              { name: `Near the axis (inside ${CENTRE_RADIUS_UM} µm)`, points: r.sweep.map((p) => [p.offsetUm, 100 * p.centreShare]), dashed: true },
              { name: 'Guided at all', points: r.sweep.map((p) => [p.offsetUm, 100 * p.coupledFraction]) },
            ]}
            markers={[
              ...(cord ? [{ x: cord.minUm, label: 'cord min' }, { x: cord.maxUm, label: 'cord max' }] : []),
              { x: r.at.offsetUm, label: 'yours' },
            ]}
            yRange={[0, 100]}
          />
          <ShortProse text="A centred spot excites only the few lowest groups, which travel along the axis. Many multimode fibers have an index dip or spike on the axis from manufacture; there those groups arrive early or late, and a laser launched at the centre can close the eye of a link that a full launch would carry. Moving the spot off the axis shares the power over the middle groups and away from the defect, which is why 1000BASE-LX on multimode fiber uses an offset-launch cord." />
          {cord && (
            <p class="note">
              Offset of mode-conditioning cords for a <span class="num">{formatQuantity(coreDiameterUm, 'µm')}</span> core: <span class="num">{formatQuantity(cord.minUm, 'µm')}</span> to <span class="num">{formatQuantity(cord.maxUm, 'µm')}</span> ({cord.source}).
            </p>
          )}
        </ResultCard>
      )}
      {r && (
        <ResultCard title={`At ${formatQuantity(r.at.offsetUm, 'µm')} offset`} stale={res.stale}>
          <GroupBars groups={r.at.perGroup} />
          <dl class="kv">
            <dt>Launch loss</dt>
            <dd class="num">{formatDb(r.at.lossDb, 2)}</dd>
            <dt>Highest group carrying 1 % or more</dt>
            <dd class="num">{formatNumber(Math.max(0, ...r.at.perGroup.filter((g) => g.fraction >= 0.01).map((g) => g.principal)), 3)} of {r.highestGroup}</dd>
          </dl>
          <EfPlot curves={[{ name: 'This launch', curve: r.at.curve }]} check={r.at.check} />
          {r.at.check && <ControlTable check={r.at.check} />}
        </ResultCard>
      )}
    </CalcScreen>
  );
}
