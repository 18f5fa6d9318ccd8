// Check a label: the inspector's flow. The label's cutoff (cable or fiber) and mode field diameter,
// and the system wavelength, give a verdict with its reasons in plain words.
import { NumberField, OPERATING_WAVELENGTHS_NM } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult, cardError } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, type Headline, type Tone } from '../../ui/CalcScreen';
import { formatNumber, formatQuantity, lpName, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  CABLE_BELOW_FIBER_CUTOFF_NM,
  checkLabel,
  InputError,
  THEORETICAL_ABOVE_FIBER_CUTOFF_NM,
  type LabelVerdict,
} from '../../physics';


const VERDICT: Record<LabelVerdict, { words: string; tone: Tone }> = {
  'single-mode': { words: 'Single-mode here', tone: 'ok' },
  'single-mode-in-practice': { words: 'Single-mode in practice (LP11 barely guided in theory)', tone: 'ok' },
  'not-single-mode': { words: 'Not single-mode here', tone: 'bad' },
};

export default function Screen() {
  // Opens on label entry: the inspector has the label in hand.
  const picker = useFiberPicker({ id: 'label-check', label: 'The label', kinds: ['single-mode'], defaultCategory: 'G.652.D', defaultSource: 'label' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1310');
  const fiber = picker.fiber;

  const state = useResult(() => {
    if (!fiber) throw new InputError('fiber', undefined, 'label values', picker.error ?? 'choose "A label" above and type its values');
    const { cutoffWavelengthNm, cutoffKind, mfdUm, mfdWavelengthNm } = fiber;
    if (cutoffWavelengthNm === undefined || cutoffKind === undefined || mfdUm === undefined || mfdWavelengthNm === undefined) {
      throw new InputError('fiber', undefined, 'a cutoff wavelength and a mode field diameter', 'this fiber type has no label values: choose "A label" above and type them');
    }
    const label = { cutoffWavelengthNm, cutoffKind, mfdUm, mfdWavelengthNm };
    return { label, wavelengthNm: need(wavelength), ...checkLabel({ ...label, wavelengthNm: need(wavelength) }) };
  }, [fiber, picker.error, wavelength.text]);
  const r = state.result;
  const cutoffWords = (kind: 'fiber' | 'cable') => (kind === 'cable' ? 'cable cutoff (λcc)' : 'fiber cutoff (λc)');

  const headline: Headline | undefined = r && {
    label: `At ${withUnit(formatNumber(r.wavelengthNm, 6), 'nm')}`,
    verdict: VERDICT[r.verdict].words,
    tone: VERDICT[r.verdict].tone,
    more: [{ label: 'MFD here', value: formatQuantity(r.mfdAtWavelengthUm, 'µm', 3) }],
  };

  const report: ReportSpec | undefined = r && {
      title: 'Label check',
      inputs: [
        ['Label cutoff', `${r.label.cutoffWavelengthNm} nm, ${cutoffWords(r.label.cutoffKind)}`],
        ['Label MFD', `${r.label.mfdUm} µm at ${r.label.mfdWavelengthNm} nm`],
        ['System wavelength', `${formatNumber(r.wavelengthNm, 6)} nm`],
      ],
      outputs: [
        ['Verdict', VERDICT[r.verdict].words],
        ...r.reasons.map((reason, i): [string, string] => [`Reason ${i + 1}`, reason]),
        ['Equivalent step-index core radius', `${formatNumber(r.fiber.coreRadiusUm, 4)} µm`],
        ['Equivalent NA', formatNumber(r.fiber.na, 4)],
      ],
      assumptions: r.fiber.notes,
    };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, [wavelength.argument]) }}
      report={report}
      inputsTitle="Label values and system wavelength"
      inputs={
        <>
          {picker.element}
          <div class="form">
            <NumberField q={wavelength} label="System wavelength" unit="nm" quickPicks={OPERATING_WAVELENGTHS_NM} calc={state} />
          </div>
        </>
      }
      how={{
        formula: 'Theoretical cutoff = label cutoff + offsets; V(λc,th) = 2.405 ties NA to the core radius a; a = MFD/(2 s(V_ref)) with s the Petermann II spot size of LP01 at the MFD wavelength',
        source: 'Gloge 1971 (LP modes, V = 2.405); ITU-T G.650.1 (Petermann II MFD, fiber and cable cutoff methods)',
        assumptions: [
          `A cable cutoff is taken ${CABLE_BELOW_FIBER_CUTOFF_NM} nm below the fiber cutoff of the same fiber (common practice, rough).`,
          `The theoretical step-index cutoff is taken ${THEORETICAL_ABOVE_FIBER_CUTOFF_NM} nm above a measured fiber cutoff (common practice, rough).`,
          'The real index profile is replaced by the step-index core that gives the same cutoff and MFD.',
        ],
        validity: "Single-mode fiber labels (cutoff and MFD). The verdict uses the label's measured cutoff; the mode count and MFD use the equivalent fiber.",
      }}
    >
      <ResultCard title="Why" stale={state.stale}>
        {r && (
          <>
            <ol>
              {r.reasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ol>
            <dl class="kv">
              <dt>V-number here</dt>
              <dd class="num">{formatNumber(r.check.v, 4)}</dd>
              <dt>Guided LP modes (theory)</dt>
              <dd>
                {r.check.modes
                  .slice(0, 8)
                  .map((m) => lpName(m.l, m.m))
                  .join(', ')}
                {r.check.lpModeCount > 8 ? ` and ${r.check.lpModeCount - 8} more` : ''}
              </dd>
            </dl>
          </>
        )}
      </ResultCard>

      <ResultCard title="The fiber behind the label" stale={state.stale}>
        {r && (
          <>
            <dl class="kv">
              <dt>Equivalent step-index core</dt>
              <dd>
                radius <span class="num">{formatQuantity(r.fiber.coreRadiusUm, 'µm')}</span> (diameter <span class="num">{formatQuantity(2 * r.fiber.coreRadiusUm, 'µm')}</span>)
              </dd>
              <dt>Equivalent NA</dt>
              <dd class="num">{formatNumber(r.fiber.na, 4)}</dd>
              <dt>Theoretical LP11 cutoff</dt>
              <dd class="num">{formatQuantity(r.fiber.theoreticalCutoffWavelengthNm, 'nm', 5)}</dd>
            </dl>
            <ul>
              {r.fiber.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
            {r.fiber.warnings.length > 0 && (
              <ul>
                {r.fiber.warnings.map((w) => (
                  <li key={w} class="verdict-warn">
                    {w}
                  </li>
                ))}
              </ul>
            )}
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
