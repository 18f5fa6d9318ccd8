// Check a label: the inspector's flow. The label's cutoff (cable or fiber) and mode field diameter,
// and the system wavelength, give a verdict with its reasons in plain words.
import { NumberField, OPERATING_WAVELENGTHS_NM } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult, cardError } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { HowComputed } from '../../ui/HowComputed';
import { formatNumber } from '../../ui/format';
import { reportText } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  CABLE_BELOW_FIBER_CUTOFF_NM,
  checkLabel,
  InputError,
  THEORETICAL_ABOVE_FIBER_CUTOFF_NM,
  type LabelVerdict,
} from '../../physics';


const VERDICT: Record<LabelVerdict, { words: string; css: string }> = {
  'single-mode': { words: 'Single-mode at this wavelength', css: 'verdict-ok' },
  'single-mode-in-practice': { words: 'Single-mode in practice (LP11 barely guided in theory)', css: 'verdict-ok' },
  'not-single-mode': { words: 'Not single-mode at this wavelength', css: 'verdict-bad' },
};

/** A field's own error is shown beside the field; the card then only points to it. */

export default function Screen() {
  const picker = useFiberPicker({ id: 'label-check', label: 'The label', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
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
  const calc = { error: state.error, errorArgument: state.errorArgument };
  const r = state.result;
  const cutoffWords = (kind: 'fiber' | 'cable') => (kind === 'cable' ? 'cable cutoff (λcc)' : 'fiber cutoff (λc)');

  const copy =
    r &&
    !state.stale &&
    reportText({
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
    });

  return (
    <>
      <h2>Label values and system wavelength</h2>
      <p class="note">Type the values printed on the label or data sheet under “A label” in the fiber choice, or pick a category to check its limits.</p>
      {picker.element}
      <div class="form">
        <NumberField q={wavelength} label="System wavelength" unit="nm" quickPicks={OPERATING_WAVELENGTHS_NM} calc={calc} />
      </div>

      <ResultCard title="Verdict" stale={state.stale} error={cardError(state, ['wavelengthNm'])} copyText={copy || undefined}>
        {r && (
          <>
            <p class={VERDICT[r.verdict].css}>{VERDICT[r.verdict].words}</p>
            <ol>
              {r.reasons.map((reason) => (
                <li key={reason}>{reason}</li>
              ))}
            </ol>
            <dl class="kv">
              <dt>V-number at {formatNumber(r.wavelengthNm, 6)} nm</dt>
              <dd>{formatNumber(r.check.v, 4)}</dd>
              <dt>Guided LP modes (theory)</dt>
              <dd>{r.check.modes.slice(0, 8).map((m) => `LP${m.l}${m.m}`).join(', ')}{r.check.lpModeCount > 8 ? ` and ${r.check.lpModeCount - 8} more` : ''}</dd>
              <dt>Mode field diameter here</dt>
              <dd>{formatNumber(r.mfdAtWavelengthUm, 4)} µm</dd>
            </dl>
          </>
        )}
      </ResultCard>

      <ResultCard title="The fiber behind the label" stale={state.stale}>
        {r && (
          <>
            <dl class="kv">
              <dt>Equivalent step-index core</dt>
              <dd>radius {formatNumber(r.fiber.coreRadiusUm, 4)} µm (diameter {formatNumber(2 * r.fiber.coreRadiusUm, 4)} µm)</dd>
              <dt>Equivalent NA</dt>
              <dd>{formatNumber(r.fiber.na, 4)}</dd>
              <dt>Theoretical LP11 cutoff</dt>
              <dd>{formatNumber(r.fiber.theoreticalCutoffWavelengthNm, 5)} nm</dd>
            </dl>
            <ul>
              {r.fiber.notes.map((n) => (
                <li key={n}>{n}</li>
              ))}
            </ul>
            {r.fiber.warnings.length > 0 && (
              <ul>
                {r.fiber.warnings.map((w) => (
                  <li key={w} class="verdict-warn">{w}</li>
                ))}
              </ul>
            )}
          </>
        )}
      </ResultCard>

      <HowComputed
        formula="Theoretical cutoff = label cutoff + offsets; V(λc,th) = 2.405 ties NA to the core radius a; a = MFD/(2 s(V_ref)) with s the Petermann II spot size of LP01 at the MFD wavelength"
        source="Gloge 1971 (LP modes, V = 2.405); ITU-T G.650.1 (Petermann II MFD, fiber and cable cutoff methods)"
        assumptions={[
          `A cable cutoff is taken ${CABLE_BELOW_FIBER_CUTOFF_NM} nm below the fiber cutoff of the same fiber (common practice, rough).`,
          `The theoretical step-index cutoff is taken ${THEORETICAL_ABOVE_FIBER_CUTOFF_NM} nm above a measured fiber cutoff (common practice, rough).`,
          'The real index profile is replaced by the step-index core that gives the same cutoff and MFD.',
        ]}
        validity="Single-mode fiber labels (cutoff and MFD). The verdict uses the label's measured cutoff; the mode count and MFD use the equivalent fiber."
      />
    </>
  );
}
