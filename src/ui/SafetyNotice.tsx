// The short laser-safety reminder shown on every screen. The full cautions live in
// SafetyCautions (used on every screen where optical power is entered).
export function SafetyReminder() {
  return (
    <aside class="safety-reminder" aria-label="Laser safety reminder">
      <strong>Laser safety:</strong> never look into a fiber end or connector; treat every fiber as live; follow your site’s laser-safety rules and local codes.
    </aside>
  );
}
