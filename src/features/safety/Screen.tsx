// Laser safety: the cautions and the hazard context for a wavelength and a power. Context only.
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { formatNumber } from '../../ui/format';
import { reportText } from '../../ui/copyText';
import { HAZARD_LEVELS, hazardContextText, IEC_60825_2_EDITION, laserHazardContext, LEVELS_ALLOWED_BY_LOCATION } from '../../physics';
import { HazardContextCautions } from './HazardContext';

const LOCATION_WORDS: Record<keyof typeof LEVELS_ALLOWED_BY_LOCATION, string> = {
  unrestricted: 'Unrestricted (open to anyone)',
  restricted: 'Restricted (not open to the public)',
  controlled: 'Controlled (trained, authorised staff only)',
};

export default function Screen() {
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const power = useQuantity('powerDbm', 'power', '10 dBm');

  const ctx = useResult(() => laserHazardContext({ wavelengthNm: need(wavelength), powerDbm: need(power) }), [
    wavelength.value,
    wavelength.failure,
    power.value,
    power.failure,
  ]);
  const calc = { error: ctx.error, errorArgument: ctx.errorArgument };

  const copy =
    ctx.result &&
    reportText({
      title: 'Laser hazard context',
      inputs: [
        ['Wavelength', `${ctx.result.wavelengthNm} nm`],
        ['Power', `${formatNumber(ctx.result.powerDbm, 4)} dBm (${formatNumber(ctx.result.powerMw, 4)} mW)`],
      ],
      outputs: [['Context', hazardContextText(ctx.result)]],
      assumptions: ['Context only; the site’s laser-safety program and local codes govern.'],
    });

  return (
    <>
      <h2>Wavelength and power</h2>
      <p class="note">Enter the power that could come out of an open fiber end or port here: the transmitter or amplifier output, not the received power.</p>
      <div class="form">
        <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[650, 850, 1310, 1490, 1550]} calc={calc} />
        <NumberField q={power} label="Optical power" unit="dBm" help="Type dBm, or a value with mW or µW." quickPicks={[0, 10, 20, 27]} calc={calc} />
      </div>

      <ResultCard title="Hazard context" stale={ctx.stale} error={ctx.errorArgument ? undefined : ctx.error} copyText={copy}>
        {ctx.result && (
          <dl class="kv">
            <dt>Power</dt>
            <dd>
              {formatNumber(ctx.result.powerDbm, 4)} dBm = {formatNumber(ctx.result.powerMw, 4)} mW
            </dd>
            <dt>Wavelength</dt>
            <dd>{ctx.result.wavelengthNote}</dd>
            <dt>Hazard level</dt>
            <dd class={ctx.result.indicativeLevel ? 'verdict-bad' : undefined}>{ctx.result.levelStatement}</dd>
          </dl>
        )}
      </ResultCard>

      <HazardContextCautions wavelengthNm={wavelength.value} powerDbm={power.value} />

      <h2>Hazard levels and locations</h2>
      <p>
        {IEC_60825_2_EDITION} assesses a hazard level at each place where light could come out of a fiber system (a broken cable, an
        open connector): levels {HAZARD_LEVELS.join(', ')}, in rising order of hazard. The limit for each level depends on wavelength and
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
      <p class="note">Level 4 is not allowed at any accessible location.</p>
    </>
  );
}
