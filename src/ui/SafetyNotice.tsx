// Laser and fiber-handling cautions. The short reminder stands on every screen; the full
// cautions stand wherever optical power is entered. Nothing here, or anywhere in the app,
// may suggest that a power level is safe to look at.

export function SafetyReminder() {
  return (
    <aside class="safety-reminder" aria-label="Laser safety reminder">
      <strong>Laser safety:</strong> never look into a fiber end or connector; treat every fiber as live; follow your site’s laser-safety rules and local codes.
    </aside>
  );
}

/** The usual cautions, common practice in fiber work; the site's program and local codes govern. */
export const USUAL_CAUTIONS: readonly string[] = [
  'Never look into a fiber end, a connector or an adapter, with or without magnification. Invisible infrared light can injure the eye without any warning sign.',
  'Inspect end faces only with a fiber inspection scope that has a safety filter, or with a video (camera) probe.',
  'Treat every fiber as live until it has been proven dark at both ends, and cap unused connectors and adapters.',
  'Fiber shards pierce skin and eyes: wear safety glasses, work over a dark mat, put offcuts in a marked shard container, never on the floor or clothing, and do not eat or drink at the work area.',
  'Cleavers and strippers are sharp: keep blades covered when not in use.',
];

export function SafetyCautions({ children }: { children?: preact.ComponentChildren }) {
  return (
    <section class="safety-cautions" aria-labelledby="safety-cautions-title">
      <h2 id="safety-cautions-title">Laser and fiber safety</h2>
      <ul>
        {USUAL_CAUTIONS.map((c) => <li key={c}>{c}</li>)}
      </ul>
      {children}
      <p class="note">
        Your site’s laser-safety program, IEC 60825-1 and IEC 60825-2 as adopted locally, and local codes govern. This app gives
        context only; it never tells you that a level is safe to look at.
      </p>
    </section>
  );
}
