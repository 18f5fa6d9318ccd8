// The laser-hazard context for a wavelength and power, inside the full cautions block. Used wherever an
// optical power is entered (power, link budget, laser safety screens). Thin: the words come from physics.
import { SafetyCautions } from '../../ui/SafetyNotice';
import { errorText } from '../../ui/errorText';
import { laserHazardContext, USUAL_LASER_CAUTIONS, type HazardContext } from '../../physics';

/** The context, or undefined (with the reason) when the wavelength or power is not usable yet. */
export function hazardContextOrError(wavelengthNm: number | undefined, powerDbm: number | undefined): { context?: HazardContext; error?: string } {
  if (wavelengthNm === undefined || powerDbm === undefined) return { error: 'Enter a wavelength and a power to see the hazard context.' };
  try {
    return { context: laserHazardContext({ wavelengthNm, powerDbm }) };
  } catch (e) {
    return { error: errorText(e) };
  }
}

export function HazardContextCautions({ wavelengthNm, powerDbm, what }: { wavelengthNm: number | undefined; powerDbm: number | undefined; what?: string }) {
  const { context, error } = hazardContextOrError(wavelengthNm, powerDbm);
  // The usual cautions are listed by SafetyCautions itself; only what this context adds is listed here.
  const extra = context ? context.cautions.filter((c) => !USUAL_LASER_CAUTIONS.includes(c)) : [];
  return (
    <SafetyCautions>
      <div class="hazard-context" aria-live="polite">
        {context ? (
          <>
            <p>
              <strong>{what ? `${what}: ` : ''}hazard context at {context.wavelengthNm} nm.</strong> {context.wavelengthNote}
            </p>
            <p class={context.indicativeLevel ? 'verdict-bad' : undefined}>{context.levelStatement}</p>
            {context.indicativeLevel && <p class="note">Source: {context.indicativeLevel.source}.</p>}
            {extra.length > 0 && (
              <ul>
                {extra.map((c) => (
                  <li key={c}>{c}</li>
                ))}
              </ul>
            )}
          </>
        ) : (
          <p class="note">{error}</p>
        )}
      </div>
    </SafetyCautions>
  );
}
