// Laser and fiber-handling cautions. The short reminder stands on every screen; the full
// cautions stand wherever optical power is entered. Nothing here, or anywhere in the app,
// may suggest that a power level is safe to look at. The words come from src/physics/laserSafety.ts,
// the one list of cautions and the statement of who governs.
import { GOVERNING_STATEMENT, USUAL_LASER_CAUTIONS } from '../physics/laserSafety';

export function SafetyReminder() {
  return (
    <aside class="safety-reminder" aria-label="Laser safety reminder">
      <strong>Laser safety:</strong> never look into a fiber end or connector; treat every fiber as live; follow your site’s laser-safety rules and local codes.
    </aside>
  );
}

export function SafetyCautions({ children }: { children?: preact.ComponentChildren }) {
  return (
    <section class="safety-cautions" aria-labelledby="safety-cautions-title">
      <h2 id="safety-cautions-title">Laser and fiber safety</h2>
      <ul>
        {USUAL_LASER_CAUTIONS.map((c) => <li key={c}>{c}</li>)}
      </ul>
      {children}
      <p class="note">{GOVERNING_STATEMENT} It never tells you that a level is safe to look at.</p>
    </section>
  );
}
