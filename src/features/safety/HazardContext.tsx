// The laser-hazard context for a wavelength and power, in plain sentences: what the wavelength means
// for the eye, where the hazard level comes from, and any caution this context adds to the usual ones.
// Thin: the words come from physics. The usual cautions are listed once, by the laser-safety screen.
import { USUAL_LASER_CAUTIONS, type HazardContext } from '../../physics';

/** The cautions this context adds to the usual list (high power, invisible light). */
export function addedCautions(context: HazardContext): string[] {
  return context.cautions.filter((c) => !USUAL_LASER_CAUTIONS.includes(c));
}

export function HazardContextDetails({ context }: { context: HazardContext }) {
  const extra = addedCautions(context);
  return (
    <div class="hazard-context">
      <p>{context.wavelengthNote}</p>
      <p class={context.indicativeLevel ? 'verdict-bad' : undefined}>{context.levelStatement}</p>
      {context.indicativeLevel && <p class="note">Source: {context.indicativeLevel.source}.</p>}
      {extra.length > 0 && (
        <ul>
          {extra.map((c) => (
            <li key={c}>{c}</li>
          ))}
        </ul>
      )}
    </div>
  );
}
