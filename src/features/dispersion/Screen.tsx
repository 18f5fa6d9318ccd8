// Chromatic dispersion of a single-mode fiber type: D at the wavelength and over the link (the
// headline: the link's dispersion and whether it stays within the dispersion-limited reach), then
// D(λ) over 1200–1650 nm with its material and waveguide parts and the zero-dispersion wavelength.
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { DISPERSION_SWEEP as SWEEP, type DispersionCurveInput, type DispersionCurveOutput } from './tasks';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { LinePlot } from '../../ui/Plot';
import { formatFixed, formatNumber, formatQuantity, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  chromaticDispersion,
  DISPERSION_CRITERION,
  dispersionLimitedReach,
  InputError,
  linkDispersionPsPerNm,
} from '../../physics';

const D_UNIT = 'ps/(nm·km)';
const dText = (v: number) => withUnit(formatFixed(v, 2), D_UNIT);

export default function Screen() {
  const picker = useFiberPicker({ id: 'dispersion', label: 'Single-mode fiber type', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const length = useQuantity('lengthKm', 'length', '40');
  const bitRate = useQuantity('bitRateGbps', 'plain', '10');
  const width = useQuantity('spectralWidthNm', 'plain', '0.1');
  const fiber = picker.fiber;

  // The curve depends on the fiber only and runs in the compute worker; the link figures on the rest.
  const curveInput: DispersionCurveInput | undefined = fiber
    ? { coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, referenceWavelengthNm: fiber.mfdWavelengthNm ?? 1310 }
    : undefined;
  const curve = useComputed<DispersionCurveInput, DispersionCurveOutput>('dispersion.curve', curveInput, fiber ? undefined : (picker.error ?? 'Pick a single-mode fiber type.'));

  const link = useResult(() => {
    if (!curve.result || curve.stale) throw new InputError('fiber', undefined, 'a fiber type that gives a dispersion curve');
    const at = chromaticDispersion(curve.result.model, need(wavelength));
    const totalPsPerNm = linkDispersionPsPerNm(at.totalPsPerNmKm, need(length));
    const reach = dispersionLimitedReach({ dispersionPsPerNmKm: at.totalPsPerNmKm, bitRateGbps: need(bitRate), spectralWidthNm: need(width) });
    return { at, totalPsPerNm, reach, lengthKm: need(length) };
  }, [curve.result, curve.stale, wavelength.text, length.text, bitRate.text, width.text]);
  const fieldArgs = [wavelength.argument, length.argument, bitRate.argument, width.argument];

  const c = curve.result;
  const l = link.result;
  const withinReach = l && (l.reach.reachKm === undefined || l.lengthKm <= l.reach.reachKm);
  // Before the curve arrives the link has no answer: that is "working", not an error of the person's.
  const waitingForCurve = link.errorArgument === 'fiber' && (curve.busy || (!curve.error && !c));
  const headlineError = curve.error ?? (waitingForCurve ? undefined : cardError(link, fieldArgs));

  const headline: Headline | undefined = l && {
    label: `Over ${formatQuantity(l.lengthKm, 'km', 5)}`,
    value: withUnit(formatFixed(l.totalPsPerNm, 1), 'ps/nm'),
    verdict:
      l.reach.reachKm === undefined
        ? 'No first-order dispersion limit at zero dispersion'
        : withinReach
          ? `Within the dispersion-limited reach, ${formatQuantity(l.reach.reachKm, 'km', 4)}`
          : `Beyond the dispersion-limited reach, ${formatQuantity(l.reach.reachKm, 'km', 4)}`,
    tone: withinReach ? 'ok' : 'bad',
    more: [{ label: `D at ${formatQuantity(l.at.wavelengthNm, 'nm')}`, value: dText(l.at.totalPsPerNmKm) }],
  };

  const report: ReportSpec | undefined = c &&
    l && {
      title: 'Chromatic dispersion',
      inputs: [
        ['Fiber type', fiber?.name ?? '—'],
        ['Model', `step index, core radius ${formatQuantity(c.model.coreRadiusUm, 'µm', 4)}, ${formatNumber(c.model.germaniaFraction * 100, 3)} mol % GeO₂ core, silica cladding`],
        ['Wavelength', formatQuantity(l.at.wavelengthNm, 'nm')],
        ['Link length', formatQuantity(l.lengthKm, 'km', 5)],
        ['Bit rate', shownValue(bitRate, 'Gbit/s')],
        ['Source spectral width (RMS)', shownValue(width, 'nm')],
      ],
      outputs: [
        ['D', `${dText(l.at.totalPsPerNmKm)} (material ${formatFixed(l.at.materialPsPerNmKm, 2)}, waveguide ${formatFixed(l.at.waveguidePsPerNmKm, 2)}, profile ${formatFixed(l.at.profilePsPerNmKm, 2)})`],
        ['Zero-dispersion wavelength', c.zero ? `${withUnit(formatFixed(c.zero.wavelengthNm, 1), 'nm')}, slope ${withUnit(formatFixed(c.zero.slopePsPerNm2Km, 4), 'ps/(nm²·km)')}` : 'none in 1200–1700 nm'],
        ['Link dispersion', withUnit(formatFixed(l.totalPsPerNm, 1), 'ps/nm')],
        ['Dispersion-limited reach', l.reach.reachKm === undefined ? 'no first-order limit at zero dispersion' : formatQuantity(l.reach.reachKm, 'km', 4)],
      ],
      assumptions: [`Criterion: ${l.reach.criterion}.`, 'Weakly guiding step-index model of the fiber type; Sellmeier: Malitson 1965 (silica), Fleming 1984 (GeO₂).'],
    };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: link.stale || curve.stale, error: headlineError, busy: curve.busy }}
      report={report}
      inputsTitle="Fiber, wavelength and link"
      inputs={
        <>
          {picker.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[1310, 1490, 1550, 1625]} calc={link} />
            <NumberField q={length} label="Link length" unit="km" calc={link} />
            <NumberField q={bitRate} label="Bit rate" unit="Gbit/s" quickPicks={[1, 2.5, 10]} calc={link} />
            <NumberField
              q={width}
              label="Source spectral width (RMS)"
              unit="nm"
              help="RMS width of the source spectrum; a DFB laser is far below 0.1 nm, a Fabry–Perot laser about 1–3 nm."
              calc={link}
            />
          </div>
        </>
      }
      how={{
        formula: 'n_eff² = n₂² + b(V)(n₁² − n₂²); D = −(λ/c) d²n_eff/dλ², differentiated analytically with d(Vb)/dV and V d²(Vb)/dV² of LP01',
        source: 'Gloge 1971 (weakly guiding LP modes); Malitson 1965 and Fleming 1984 (Sellmeier); reach criterion Agrawal §2.4',
        assumptions: [
          'The fiber type is represented by its equivalent step-index core (radius and NA) with a GeO₂-doped core over pure silica.',
          `Reach criterion: ${DISPERSION_CRITERION}.`,
        ],
        validity: '600–1800 nm; single-mode operation; real fibers with shaped profiles (G.655, G.657) differ from the step-index model.',
      }}
    >
      <ResultCard title="At this wavelength and over the link" stale={link.stale}>
        {l && (
          <dl class="kv">
            <dt>Dispersion D</dt>
            <dd class="num">{dText(l.at.totalPsPerNmKm)}</dd>
            <dt>Parts</dt>
            <dd>
              material <span class="num">{formatFixed(l.at.materialPsPerNmKm, 2)}</span>, waveguide <span class="num">{formatFixed(l.at.waveguidePsPerNmKm, 2)}</span>, profile{' '}
              <span class="num">{dText(l.at.profilePsPerNmKm)}</span>
            </dd>
            <dt>V-number</dt>
            <dd class="num">{formatNumber(l.at.v, 4)}</dd>
            <dt>Group index</dt>
            <dd class="num">{formatNumber(l.at.groupIndex, 6)}</dd>
            <dt>Link dispersion</dt>
            <dd class="num">{withUnit(formatFixed(l.totalPsPerNm, 1), 'ps/nm')}</dd>
            <dt>Dispersion-limited reach</dt>
            <dd class={withinReach ? 'verdict-ok' : 'verdict-bad'}>
              {l.reach.reachKm === undefined ? (
                'No first-order limit at zero dispersion (slope and polarization-mode dispersion then set the limit).'
              ) : (
                <>
                  <span class="num">{formatQuantity(l.reach.reachKm, 'km', 4)}</span>: the <span class="num">{formatQuantity(l.lengthKm, 'km', 5)}</span> link is{' '}
                  {withinReach ? 'within' : 'beyond'} it.
                </>
              )}
            </dd>
          </dl>
        )}
      </ResultCard>

      <ResultCard title="Dispersion curve" stale={curve.stale} busy={curve.busy}>
        {c && (
          <>
            <LinePlot
              title="Chromatic dispersion D(λ)"
              xLabel="Wavelength (nm)"
              yLabel={`D (${D_UNIT})`}
              xRange={[SWEEP.fromNm, SWEEP.toNm]}
              series={[
                { name: 'Total', points: c.sweep.map((p) => [p.wavelengthNm, p.totalPsPerNmKm]) },
                { name: 'Material', points: c.sweep.map((p) => [p.wavelengthNm, p.materialPsPerNmKm]), dashed: true },
                { name: 'Waveguide', points: c.sweep.map((p) => [p.wavelengthNm, p.waveguidePsPerNmKm]), dashed: true },
              ]}
              markers={c.zero ? [{ x: c.zero.wavelengthNm, label: `λ₀ ${withUnit(formatFixed(c.zero.wavelengthNm, 1), 'nm')}` }] : []}
            />
            <dl class="kv">
              <dt>Zero-dispersion wavelength</dt>
              <dd class="num">{c.zero ? withUnit(formatFixed(c.zero.wavelengthNm, 1), 'nm') : 'None between 1200 and 1700 nm'}</dd>
              {c.zero && (
                <>
                  <dt>Slope at the zero</dt>
                  <dd class="num">{withUnit(formatFixed(c.zero.slopePsPerNm2Km, 4), 'ps/(nm²·km)')}</dd>
                </>
              )}
              <dt>Core model</dt>
              <dd>
                Step index, core radius <span class="num">{formatQuantity(c.model.coreRadiusUm, 'µm', 4)}</span>,{' '}
                <span class="num">{withUnit(formatNumber(c.model.germaniaFraction * 100, 3), 'mol\u00a0%')}</span> GeO₂ over pure silica (from the fiber type’s NA)
              </dd>
            </dl>
            <ShortProse text="Material dispersion of the glass and waveguide dispersion of the core add up; where they cancel is the zero-dispersion wavelength." />
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
