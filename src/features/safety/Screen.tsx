// Laser safety: the usual cautions first, then the hazard context for a wavelength and a power.
// Context only: nothing here says a level is all right to look at; the site's rules and local codes govern.
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, type Headline } from '../../ui/CalcScreen';
import { formatFixed, formatQuantity, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { GOVERNING_STATEMENT, HAZARD_LEVELS, IEC_60825_2_EDITION, laserHazardContext, LEVELS_ALLOWED_BY_LOCATION, USUAL_LASER_CAUTIONS } from '../../physics';
import { addedCautions, HazardContextDetails } from './HazardContext';

const LOCATION_WORDS: Record<keyof typeof LEVELS_ALLOWED_BY_LOCATION, string> = {
  unrestricted: 'Unrestricted (open to anyone)',
  restricted: 'Restricted (not open to the public)',
  controlled: 'Controlled (trained, authorised staff only)',
};

const BAND_WORDS = { infrared: 'Infrared, invisible', visible: 'Visible light', ultraviolet: 'Ultraviolet, invisible' } as const;

export default function Screen() {
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const power = useQuantity('powerDbm', 'power', '10 dBm');

  const ctx = useResult(() => laserHazardContext({ wavelengthNm: need(wavelength), powerDbm: need(power) }), [
    wavelength.value,
    wavelength.failure,
    power.value,
    power.failure,
  ]);
  const c = ctx.result;
  const mw = c && (c.powerMw >= 1 ? formatQuantity(c.powerMw, 'mW') : formatQuantity(c.powerMw * 1000, 'µW'));

  // The indicative context in words; never a statement that a level is all right.
  const headline: Headline | undefined = c && {
    label: `${mw} at ${withUnit(String(c.wavelengthNm), 'nm')}`,
    verdict: c.indicativeLevel
      ? `Indicative hazard level ${c.indicativeLevel.level}: at or above the class 3B limit`
      : 'Hazard level not stated here: look it up in IEC 60825-2 as adopted locally',
    tone: c.indicativeLevel ? 'bad' : 'warn',
    note: `${BAND_WORDS[c.band]}. Context only: your site’s rules and local codes govern.`,
  };

  const report: ReportSpec | undefined = c && {
    title: 'Laser hazard context',
    inputs: [
      ['Wavelength', withUnit(String(c.wavelengthNm), 'nm')],
      ['Power', `${withUnit(formatFixed(c.powerDbm, 2), 'dBm')} (${mw})`],
    ],
    outputs: [
      ['Wavelength', c.wavelengthNote],
      ['Hazard level', c.levelStatement],
      ...(c.indicativeLevel ? [['Source', c.indicativeLevel.source] as [string, string]] : []),
    ],
    assumptions: [...USUAL_LASER_CAUTIONS, ...addedCautions(c), GOVERNING_STATEMENT],
  };


  return (
    <CalcScreen
      headline={headline}
      status={{ stale: ctx.stale, error: cardError(ctx, [wavelength.argument, power.argument]) }}
      report={report}
      inputsTitle="Laser and fiber safety"
      inputs={
        <>
          <section class="safety-cautions" aria-label="The usual cautions">
            <ul>
              {USUAL_LASER_CAUTIONS.map((x) => (
                <li key={x}>{x}</li>
              ))}
            </ul>
          </section>
          <h3>The light that could come out</h3>
          <p class="note">Enter the power that could come out of an open fiber end or port here: the transmitter or amplifier output, not the received power.</p>
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[650, 850, 1310, 1490, 1550]} calc={ctx} />
            <NumberField q={power} label="Optical power" unit="dBm" signed example="such as 10 (or 20 mW)" help="Type dBm, or a value with mW or µW." quickPicks={[0, 10, 20, 27]} calc={ctx} />
          </div>
        </>
      }
    >
      {c && (
        <ResultCard title="Hazard context" stale={ctx.stale}>
          <HazardContextDetails context={c} />
          <p class="note">
            {GOVERNING_STATEMENT} This app never tells you that a level is safe to look at.
          </p>
        </ResultCard>
      )}
      <ResultCard title="Hazard levels and locations">
        <p>
          {IEC_60825_2_EDITION} assesses a hazard level at each place where light could come out of a fiber system, such as a broken cable or an open
          connector. The levels are {HAZARD_LEVELS.join(', ')}, in rising order of hazard. The limit for each level depends on the wavelength and the
          exposure conditions: look up the limit in the standard as adopted locally.
        </p>
        <table>
          <caption>Highest hazard level allowed by kind of location (IEC 60825-2, as summarised by the Finnish radiation safety authority STUK)</caption>
          <thead>
            <tr>
              <th scope="col">Location</th>
              <th scope="col">Hazard levels allowed</th>
            </tr>
          </thead>
          <tbody>
            {(Object.keys(LEVELS_ALLOWED_BY_LOCATION) as (keyof typeof LEVELS_ALLOWED_BY_LOCATION)[]).map((k) => (
              <tr key={k}>
                <td>{LOCATION_WORDS[k]}</td>
                <td>{LEVELS_ALLOWED_BY_LOCATION[k].join(', ')}</td>
              </tr>
            ))}
          </tbody>
        </table>
        <p class="note">No kind of location allows level 4.</p>
      </ResultCard>
    </CalcScreen>
  );
}
