// Laser and fiber-handling cautions. A one-line reminder stands on every screen; a compact caution
// line stands wherever optical power is entered; the full list stands once, on the laser-safety
// screen. Nothing here, or anywhere in the app, may suggest that a power level is safe to look at.
// The words come from src/physics/laserSafety.ts, the one list of cautions and the statement of who governs.
import type { ComponentChildren } from 'preact';
import { GOVERNING_STATEMENT, USUAL_LASER_CAUTIONS } from '../physics/laserSafety';
import { hrefFor } from '../app/route';

const SAFETY_ROUTE = 'laser-safety';

/** One line under the top bar of every screen. */
export function SafetyReminder() {
  return (
    <p class="safety-reminder" role="note" aria-label="Laser safety reminder">
      <span aria-hidden="true">⚠</span> Never look into a fiber.{' '}
      <a href={hrefFor(SAFETY_ROUTE)}>Laser safety</a>
    </p>
  );
}

/** Where optical power is typed: treat the light as live, and where the full list is. */
export function CautionLine() {
  return (
    <p class="caution-line">
      <strong>Power on this screen is invisible light.</strong> Keep ends capped and pointed away from eyes while it is live;{' '}
      <a href={hrefFor(SAFETY_ROUTE)}>the full cautions</a>.
    </p>
  );
}

/** The full list of cautions, with what the hazard context adds; on the laser-safety screen. */
export function SafetyCautions({ children }: { children?: ComponentChildren }) {
  return (
    <section class="safety-cautions" aria-labelledby="safety-cautions-title">
      <h2 id="safety-cautions-title">Laser and fiber safety</h2>
      <ul>
        {USUAL_LASER_CAUTIONS.map((c) => <li key={c}>{c}</li>)}
      </ul>
      {children}
      <p class="note">{GOVERNING_STATEMENT} This app never tells you that a level is safe to look at.</p>
    </section>
  );
}
