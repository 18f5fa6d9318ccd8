// Mode field diameter at any wavelength: the Petermann II MFD (the one G.650.1 measures) leads,
// the three definitions side by side below, and the exact LP01 field against its best-fit Gaussian.
import { Fragment } from 'preact';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult, cardError } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { LinePlot } from '../../ui/Plot';
import { formatNumber, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { InputError, lp01Field, MARCUSE_MAX_V, MARCUSE_MIN_V, modeFieldDiameterUm, type ModeFieldDiameter } from '../../physics';

const QUICK_WAVELENGTHS_NM = [1310, 1490, 1550, 1625];
/** The profile plot runs to this many core radii. */
const PLOT_R_MAX_OVER_A = 3;

const WORDS: Record<ModeFieldDiameter['definition'], { title: string; what: string }> = {
  petermann2: { title: 'Petermann II', what: 'From the exact field: the definition ITU-T G.650.1 uses for measured MFDs.' },
  gaussian: { title: 'Best-fit Gaussian', what: 'The Gaussian that overlaps the exact field best: what splice-loss formulas assume.' },
  marcuse: { title: 'Marcuse formula', what: `Marcuse 1977 closed form of the Gaussian fit, within 1\u00a0% for ${MARCUSE_MIN_V} < V < ${MARCUSE_MAX_V}.` },
};

export default function Screen() {
  const picker = useFiberPicker({ id: 'mode-field', label: 'Single-mode fiber type', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1310');
  const fiber = picker.fiber;

  const state = useResult(() => {
    if (!fiber) throw new InputError('fiber', undefined, 'a single-mode fiber type', picker.error ?? 'pick a fiber type');
    const wavelengthNm = need(wavelength);
    const base = { coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm };
    const petermann2 = modeFieldDiameterUm({ ...base, definition: 'petermann2' });
    const gaussian = modeFieldDiameterUm({ ...base, definition: 'gaussian' });
    const marcuse = modeFieldDiameterUm({ ...base, definition: 'marcuse' });
    const profile = lp01Field(petermann2.v, { samples: 151, rMaxOverA: PLOT_R_MAX_OVER_A });
    return { wavelengthNm, coreRadiusUm: fiber.coreRadiusUm, results: [petermann2, gaussian, marcuse], profile };
  }, [fiber, picker.error, wavelength.text]);
  const fieldArgs = [wavelength.argument];
  const r = state.result;
  const gaussian = r?.results[1];
  const spotUm = gaussian ? gaussian.mfdUm / 2 : undefined;
  // Petermann II carries only the common not-single-mode note; show it once, and per definition only what is its own.
  const vNote = r?.results[0].validity;
  const extraNote = (m: ModeFieldDiameter) => (m.validity ?? '').replace(vNote ?? '', '').trim();
  const practicallySingleMode = r !== undefined && fiber?.cutoffWavelengthNm !== undefined && r.wavelengthNm > fiber.cutoffWavelengthNm;

  const headline: Headline | undefined = r && {
    label: `MFD at ${formatQuantity(r.wavelengthNm, 'nm', 6)}`,
    value: formatQuantity(r.results[0].mfdUm, 'µm', 4),
    verdict: `Petermann II; V = ${formatNumber(r.results[0].v, 4)}`,
    tone: vNote && !practicallySingleMode ? 'warn' : 'info',
    more: [{ label: 'Best-fit Gaussian', value: formatQuantity(r.results[1].mfdUm, 'µm', 4) }],
  };

  const report: ReportSpec | undefined = r &&
    fiber && {
      title: 'Mode field diameter',
      inputs: [
        ['Fiber type', fiber.name],
        ['Core radius (equivalent step index)', formatQuantity(r.coreRadiusUm, 'µm', 4)],
        ['NA', formatNumber(fiber.na, 4)],
        ['Wavelength', formatQuantity(r.wavelengthNm, 'nm', 6)],
      ],
      outputs: [
        ['V-number', formatNumber(r.results[0].v, 4)],
        ...r.results.map((m): [string, string] => [`MFD, ${WORDS[m.definition].title}`, `${formatQuantity(m.mfdUm, 'µm', 4)}${m.validity ? ` (${m.validity})` : ''}`]),
      ],
      assumptions: ['LP01 of the weakly guiding step-index fiber (Gloge 1971).', ...fiber.notes],
    };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, fieldArgs) }}
      report={report}
      inputsTitle="Fiber and wavelength"
      inputs={
        <>
          {picker.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={QUICK_WAVELENGTHS_NM} calc={state} />
          </div>
        </>
      }
      how={{
        formula:
          'Petermann II: MFD = 2√(2∫E² r dr / ∫(dE/dr)² r dr), in closed form; Gaussian: w₀ maximizing the overlap with the exact LP01 field; Marcuse: w/a = 0.65 + 1.619 V^−1.5 + 2.879 V^−6',
        source: 'ITU-T G.650.1 (Petermann II); Petermann 1983; Marcuse 1977, BSTJ 56(5); Gloge 1971 (LP01 field)',
        assumptions: ['Step-index core (a fiber type from its label is replaced by its equivalent step-index core).', 'Weak guidance: the scalar LP01 field.'],
        validity: `Marcuse's formula: ${MARCUSE_MIN_V} < V < ${MARCUSE_MAX_V} (stated accuracy 1\u00a0%). Above V = 2.405 the fiber is no longer single-mode and the MFD describes LP01 only.`,
      }}
    >
      <ResultCard title="Mode field diameter, three ways" stale={state.stale}>
        {r && (
          <>
            {vNote && (
              <p class={practicallySingleMode ? 'note' : 'verdict-warn'}>
                {practicallySingleMode
                  ? `V = ${formatNumber(r.results[0].v, 3)} is just above 2.405, so in theory LP11 is weakly guided; but the label's cutoff (${formatQuantity(fiber?.cutoffWavelengthNm, 'nm')}) is below this wavelength, so in practice only LP01 arrives and these MFDs are its MFDs.`
                  : vNote}
              </p>
            )}
            <dl class="kv">
              <dt>V-number</dt>
              <dd class="num">{formatNumber(r.results[0].v, 4)}</dd>
              {r.results.map((m) => (
                <Fragment key={m.definition}>
                  <dt>{WORDS[m.definition].title}</dt>
                  <dd>
                    <span class="big num">{formatQuantity(m.mfdUm, 'µm', 4)}</span>
                    <ShortProse text={`${WORDS[m.definition].what}${m.overlap !== undefined ? ` Overlap with the exact field: ${formatQuantity(m.overlap * 100, '%', 4)}.` : ''}`} />
                    {extraNote(m) && <p class="verdict-warn">{extraNote(m)}</p>}
                  </dd>
                </Fragment>
              ))}
            </dl>
          </>
        )}
      </ResultCard>

      <ResultCard title="The exact field and its Gaussian" stale={state.stale}>
        {r && spotUm !== undefined && (
          <>
            <LinePlot
              title="LP01 field amplitude across the fiber, exact and best-fit Gaussian"
              xLabel="Distance from the fiber axis (µm)"
              yLabel="Field amplitude (1 on the axis)"
              yRange={[0, 1]}
              series={[
                { name: 'Exact LP01 field (Bessel J₀ in the core, K₀ outside)', points: r.profile.rOverA.map((x, i) => [x * r.coreRadiusUm, r.profile.field[i]]) },
                {
                  name: `Best-fit Gaussian, MFD ${formatQuantity(2 * spotUm, 'µm', 4)}`,
                  points: r.profile.rOverA.map((x) => [x * r.coreRadiusUm, Math.exp(-((x * r.coreRadiusUm) ** 2) / (spotUm * spotUm))]),
                  dashed: true,
                },
              ]}
              markers={[
                { x: r.coreRadiusUm, label: `core edge ${formatQuantity(r.coreRadiusUm, 'µm', 3)}` },
                { x: r.results[0].mfdUm / 2, label: 'Petermann II radius' },
              ]}
            />
            <ShortProse text="The Gaussian falls faster than the exact field far from the core: the exact field decays like e^(−w r/a), the Gaussian like e^(−r²/w₀²)." />
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
