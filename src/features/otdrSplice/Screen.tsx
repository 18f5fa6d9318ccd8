// OTDR splice reading: what each direction shows at a splice between unlike fibers, and the true loss.
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { HowComputed } from '../../ui/HowComputed';
import { LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber } from '../../ui/format';
import { reportText } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import type { ResolvedFiber } from '../../fibers/resolved';
import { ModelError, modeFieldDiameterUm, otdrSpliceReading, otdrTwoWayAverage } from '../../physics';

/** Length drawn on each side of the splice in the sketch of the traces (km). Illustration only. */
const SKETCH_SECTION_KM = 2;
/** Attenuation used in the sketch when the fiber gives none near the wavelength: typical 1550 nm value, common practice. */
const SKETCH_FALLBACK_DB_PER_KM = 0.2;

function attenuationNear(fiber: ResolvedFiber, wavelengthNm: number): number {
  let best: { d: number; v: number } | undefined;
  for (const a of fiber.attenuationDbPerKm) {
    const d = Math.abs(a.wavelengthNm - wavelengthNm);
    if (!best || d < best.d) best = { d, v: a.dbPerKm };
  }
  return best && best.d <= 100 ? best.v : SKETCH_FALLBACK_DB_PER_KM;
}

function mfdAt(fiber: ResolvedFiber | undefined, wavelengthNm: number, argument: string, pickerError: string | undefined): number {
  if (!fiber) throw new ModelError(pickerError ?? `Choose ${argument} above.`, 'fiber choice');
  return modeFieldDiameterUm({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm, definition: 'petermann2' }).mfdUm;
}

function gainWords(db: number): string {
  return db < 0 ? `${formatDb(db, 3)} (shows as a gain)` : formatDb(db, 3);
}

export default function Screen() {
  const pickA = useFiberPicker({ id: 'otdr-a', label: 'Fiber at the OTDR end (A)', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const pickB = useFiberPicker({ id: 'otdr-b', label: 'Fiber beyond the splice (B)', kinds: ['single-mode'], defaultCategory: 'G.657.A2' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1310');
  const extra = useQuantity('extraLossDb', 'plain', '0.03');
  const fromA = useQuantity('fromADb', 'plain', '-0.05');
  const fromB = useQuantity('fromBDb', 'plain', '0.21');

  const predicted = useResult(() => {
    const w = need(wavelength);
    const mfdAUm = mfdAt(pickA.fiber, w, 'fiber A', pickA.error);
    const mfdBUm = mfdAt(pickB.fiber, w, 'fiber B', pickB.error);
    const reading = otdrSpliceReading({ mfdAUm, mfdBUm, extraLossDb: need(extra) });
    return { mfdAUm, mfdBUm, reading, attA: pickA.fiber ? attenuationNear(pickA.fiber, w) : 0, attB: pickB.fiber ? attenuationNear(pickB.fiber, w) : 0 };
  }, [pickA.fiber, pickA.error, pickB.fiber, pickB.error, wavelength.value, wavelength.failure, extra.value, extra.failure]);
  const calc = { error: predicted.error, errorArgument: predicted.errorArgument };

  const measured = useResult(() => otdrTwoWayAverage(need(fromA), need(fromB)), [fromA.value, fromA.failure, fromB.value, fromB.failure]);
  const calc2 = { error: measured.error, errorArgument: measured.errorArgument };

  const p = predicted.result;
  // Sketch of the two traces (one-way dB scale, as an OTDR shows them). The level after the splice jumps by
  // the apparent loss: down for a loss, up for a gainer.
  const traces = p && {
    fromA: [
      [0, 0],
      [SKETCH_SECTION_KM, -p.attA * SKETCH_SECTION_KM],
      [SKETCH_SECTION_KM, -p.attA * SKETCH_SECTION_KM - p.reading.apparentFromADb],
      [2 * SKETCH_SECTION_KM, -p.attA * SKETCH_SECTION_KM - p.reading.apparentFromADb - p.attB * SKETCH_SECTION_KM],
    ] as [number, number][],
    fromB: [
      [2 * SKETCH_SECTION_KM, 0],
      [SKETCH_SECTION_KM, -p.attB * SKETCH_SECTION_KM],
      [SKETCH_SECTION_KM, -p.attB * SKETCH_SECTION_KM - p.reading.apparentFromBDb],
      [0, -p.attB * SKETCH_SECTION_KM - p.reading.apparentFromBDb - p.attA * SKETCH_SECTION_KM],
    ] as [number, number][],
  };

  const copy =
    p &&
    reportText({
      title: 'OTDR reading of a splice between unlike fibers',
      inputs: [
        ['Fiber A', pickA.fiber?.name ?? ''],
        ['Fiber B', pickB.fiber?.name ?? ''],
        ['Wavelength', `${wavelength.text} nm`],
        ['Other splice loss', `${extra.text} dB`],
      ],
      outputs: [
        ['MFD A / B', `${formatNumber(p.mfdAUm, 3)} µm / ${formatNumber(p.mfdBUm, 3)} µm`],
        ['True splice loss', formatDb(p.reading.trueLossDb, 3)],
        ['OTDR reading from A', gainWords(p.reading.apparentFromADb)],
        ['OTDR reading from B', gainWords(p.reading.apparentFromBDb)],
      ],
      assumptions: ['Backscatter capture fraction ∝ 1/MFD² (Brinkmeyer 1980); same Rayleigh scattering in both fibers.', 'True loss = average of both directions.'],
    });

  const copy2 =
    measured.result &&
    reportText({
      title: 'Splice loss from two OTDR directions',
      inputs: [
        ['Reading from A', `${fromA.text} dB`],
        ['Reading from B', `${fromB.text} dB`],
      ],
      outputs: [
        ['True splice loss', formatDb(measured.result.trueLossDb, 3)],
        ['Backscatter step seen from A', formatDb(measured.result.backscatterStepDb, 3)],
        ['MFD ratio B/A implied', formatNumber(measured.result.impliedMfdRatioBA, 4)],
      ],
      assumptions: ['Average of both directions (bidirectional OTDR measurement, ITU-T G.650.3).'],
    });

  return (
    <>
      <h2>The two fibers at the splice</h2>
      {pickA.element}
      {pickB.element}
      <div class="form">
        <NumberField q={wavelength} label="OTDR wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={calc} />
        <NumberField q={extra} label="Other splice loss (offset, angle)" unit="dB" calc={calc} help="The loss the splice has besides the MFD difference. 0 for a perfect fusion." />
      </div>

      <ResultCard title="What the OTDR will show" stale={predicted.stale} error={predicted.error} copyText={copy}>
        {p && (
          <>
            <dl class="kv">
              <dt>Mode field diameter A / B</dt>
              <dd>
                {formatNumber(p.mfdAUm, 3)} µm / {formatNumber(p.mfdBUm, 3)} µm
              </dd>
              <dt>True splice loss</dt>
              <dd>{formatDb(p.reading.trueLossDb, 3)}</dd>
              <dt>Reading from A</dt>
              <dd class={p.reading.apparentFromADb < 0 ? 'verdict-warn' : undefined}>{gainWords(p.reading.apparentFromADb)}</dd>
              <dt>Reading from B</dt>
              <dd class={p.reading.apparentFromBDb < 0 ? 'verdict-warn' : undefined}>{gainWords(p.reading.apparentFromBDb)}</dd>
              <dt>Backscatter step (added from A, taken off from B)</dt>
              <dd>{formatDb(p.reading.backscatterStepDb, 3)}</dd>
            </dl>
            <p class="note">
              Why a gainer appears: the OTDR does not see the light that crosses the splice. It sees light scattered back from each
              metre of fiber and caught again by the fiber’s own mode. A fiber with a smaller mode field diameter catches more of its
              backscatter (the share goes as 1/MFD²). So the trace level jumps where the fiber changes, even with no loss at all. Going
              into the smaller-MFD fiber the jump is upward and can outweigh the real loss: a “gain”. From the other end the same jump
              adds to the loss. Measure from both ends and take the average: the jump cancels and the true loss remains.
            </p>
            {traces && (
              <LinePlot
                title="Sketch of the two OTDR traces (one-way dB, 2 km each side)"
                xLabel="Distance from the A end (km)"
                yLabel="Backscatter level (dB, relative)"
                series={[
                  { name: 'Measured from A', points: traces.fromA },
                  { name: 'Measured from B', points: traces.fromB, dashed: true },
                ]}
                markers={[{ x: SKETCH_SECTION_KM, label: 'splice' }]}
              />
            )}
          </>
        )}
      </ResultCard>

      <h2>From two measured readings to the true loss</h2>
      <div class="form">
        <NumberField q={fromA} label="Splice reading measured from A" unit="dB" calc={calc2} help="A gain is entered as a negative number." />
        <NumberField q={fromB} label="Splice reading measured from B" unit="dB" calc={calc2} />
      </div>
      <ResultCard title="True splice loss" stale={measured.stale} error={measured.error} copyText={copy2}>
        {measured.result && (
          <>
            <dl class="kv">
              <dt>True splice loss (average)</dt>
              <dd>{formatDb(measured.result.trueLossDb, 3)}</dd>
              <dt>Backscatter step seen from A</dt>
              <dd>{formatDb(measured.result.backscatterStepDb, 3)}</dd>
              <dt>MFD ratio B / A this implies</dt>
              <dd>{formatNumber(measured.result.impliedMfdRatioBA, 4)}</dd>
            </dl>
            {!measured.result.consistent && (
              <p class="verdict-bad">
                The average is below zero. A splice cannot gain light: check that both readings are of the same splice, at the same wavelength and pulse width.
              </p>
            )}
            {measured.result.consistent && measured.result.hadGainer && (
              <p class="verdict-ok">One direction showed a gain: normal for unlike fibers. The average above is the loss to record.</p>
            )}
          </>
        )}
      </ResultCard>

      <HowComputed
        formula="Reading from A = L + 10·log10(MFD_B / MFD_A); reading from B = L − 10·log10(MFD_B / MFD_A); L = average of the two. L itself from the Gaussian MFD mismatch, −20·log10(2 w_A w_B / (w_A² + w_B²)), plus the other loss you enter."
        source="Brinkmeyer 1980, JOSA 70(8); Hartog & Gold 1984, JLT 2(2); Marcuse 1977, BSTJ 56(5); bidirectional averaging as in ITU-T G.650.3"
        assumptions={[
          'Both fibers have the same Rayleigh scattering coefficient and group index (same glass, same OTDR index setting).',
          'MFD by Petermann II at the OTDR wavelength, from the fibers chosen above.',
          'The sketch uses the fiber attenuation nearest the wavelength, or 0.2 dB/km when none is known.',
        ]}
        validity="Single-mode fibers, splice events well separated from other events and from the OTDR dead zone."
      />
    </>
  );
}
