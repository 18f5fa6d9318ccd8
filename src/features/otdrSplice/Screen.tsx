// OTDR splice reading: the true loss from the two directions read at the trace (the headline), and
// what each direction shows at a splice between unlike fibers (why one of them can be a "gain").
import { NumberField } from '../../ui/NumberField';
import { need, shownValue, useQuantity } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
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
  // Worked readings of a G.652 → G.657 splice at 1310 nm (an example pair, shown as typed values).
  const fromA = useQuantity('fromADb', 'plain', '-0.05');
  const fromB = useQuantity('fromBDb', 'plain', '0.21');

  const predicted = useResult(() => {
    const w = need(wavelength);
    const mfdAUm = mfdAt(pickA.fiber, w, 'fiber A', pickA.error);
    const mfdBUm = mfdAt(pickB.fiber, w, 'fiber B', pickB.error);
    const reading = otdrSpliceReading({ mfdAUm, mfdBUm, extraLossDb: need(extra) });
    return { mfdAUm, mfdBUm, reading, attA: pickA.fiber ? attenuationNear(pickA.fiber, w) : 0, attB: pickB.fiber ? attenuationNear(pickB.fiber, w) : 0 };
  }, [pickA.fiber, pickA.error, pickB.fiber, pickB.error, wavelength.value, wavelength.failure, extra.value, extra.failure]);

  const measured = useResult(() => otdrTwoWayAverage(need(fromA), need(fromB)), [fromA.value, fromA.failure, fromB.value, fromB.failure]);

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

  const m = measured.result;
  const headline: Headline | undefined = m && {
    label: 'True splice loss',
    value: formatDb(m.trueLossDb, 3),
    verdict: !m.consistent ? 'Average below zero: check the readings' : m.hadGainer ? 'A gain one way is normal here' : 'Average of both directions',
    tone: !m.consistent ? 'bad' : 'ok',
  };

  const report: ReportSpec | undefined = m && {
    title: 'Splice loss from two OTDR directions',
    inputs: [
      ['Reading from A', shownValue(fromA, 'dB')],
      ['Reading from B', shownValue(fromB, 'dB')],
      ['Fiber A', pickA.fiber?.name ?? ''],
      ['Fiber B', pickB.fiber?.name ?? ''],
      ['OTDR wavelength', shownValue(wavelength, 'nm')],
      ['Other splice loss', shownValue(extra, 'dB')],
    ],
    outputs: [
      ['True splice loss', formatDb(m.trueLossDb, 3)],
      ['Backscatter step seen from A', formatDb(m.backscatterStepDb, 3)],
      ['MFD ratio B/A implied', formatNumber(m.impliedMfdRatioBA, 4)],
      ...(p && !predicted.stale
        ? ([
            ['MFD A / B at the OTDR wavelength', `${formatQuantity(p.mfdAUm, 'µm', 3)} / ${formatQuantity(p.mfdBUm, 'µm', 3)}`],
            ['Predicted reading from A', gainWords(p.reading.apparentFromADb)],
            ['Predicted reading from B', gainWords(p.reading.apparentFromBDb)],
          ] as [string, string][])
        : []),
    ],
    assumptions: [
      'True loss = average of both directions (bidirectional OTDR measurement, ITU-T G.650.3).',
      'Backscatter capture fraction ∝ 1/MFD² (Brinkmeyer 1980); same Rayleigh scattering in both fibers.',
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: measured.stale, error: cardError(measured, [fromA.argument, fromB.argument]) }}
      report={report}
      inputsTitle="The two readings of the splice"
      inputs={
        <div class="form">
          <NumberField q={fromA} label="Splice reading measured from A" unit="dB" signed example="such as −0.05" calc={measured} help="A gain is entered as a negative number." />
          <NumberField q={fromB} label="Splice reading measured from B" unit="dB" signed example="such as 0.21" calc={measured} />
        </div>
      }
      how={{
        formula:
          'Reading from A = L + 10·log10(MFD_B / MFD_A); reading from B = L − 10·log10(MFD_B / MFD_A); L = average of the two. L itself from the Gaussian MFD mismatch, −20·log10(2 w_A w_B / (w_A² + w_B²)), plus the other loss you enter.',
        source: 'Brinkmeyer 1980, JOSA 70(8); Hartog & Gold 1984, JLT 2(2); Marcuse 1977, BSTJ 56(5); bidirectional averaging as in ITU-T G.650.3',
        assumptions: [
          'Both fibers have the same Rayleigh scattering coefficient and group index (same glass, same OTDR index setting).',
          'MFD by Petermann II at the OTDR wavelength, from the fibers chosen above.',
          'The sketch uses the fiber attenuation nearest the wavelength, or 0.2 dB/km when none is known.',
        ],
        validity: 'Single-mode fibers, splice events well separated from other events and from the OTDR dead zone.',
      }}
    >
      {m && (
        <ResultCard title="What the two readings say" stale={measured.stale}>
          <dl class="kv">
            <dt>Backscatter step seen from A</dt>
            <dd class="num">{formatDb(m.backscatterStepDb, 3)}</dd>
            <dt>MFD ratio B / A this implies</dt>
            <dd class="num">{formatNumber(m.impliedMfdRatioBA, 4)}</dd>
          </dl>
          {!m.consistent && (
            <p class="verdict-bad">
              A splice cannot gain light: check that both readings are of the same splice, at the same wavelength and pulse width.
            </p>
          )}
        </ResultCard>
      )}

      <h2>What each direction will show for two fibers</h2>
      {pickA.element}
      {pickB.element}
      <div class="form">
        <NumberField q={wavelength} label="OTDR wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={predicted} />
        <NumberField q={extra} label="Other splice loss (offset, angle)" unit="dB" calc={predicted} help="The loss the splice has besides the MFD difference. 0 for a perfect fusion." />
      </div>
      <ResultCard title="Predicted readings" stale={predicted.stale} error={cardError(predicted, [wavelength.argument, extra.argument])}>
        {p && (
          <>
            <dl class="kv">
              <dt>Mode field diameter A / B</dt>
              <dd>
                <span class="num">{formatQuantity(p.mfdAUm, 'µm', 3)}</span> / <span class="num">{formatQuantity(p.mfdBUm, 'µm', 3)}</span>
              </dd>
              <dt>Splice loss (true)</dt>
              <dd class="num">{formatDb(p.reading.trueLossDb, 3)}</dd>
              <dt>Reading from A</dt>
              <dd class={p.reading.apparentFromADb < 0 ? 'verdict-warn' : undefined}>{gainWords(p.reading.apparentFromADb)}</dd>
              <dt>Reading from B</dt>
              <dd class={p.reading.apparentFromBDb < 0 ? 'verdict-warn' : undefined}>{gainWords(p.reading.apparentFromBDb)}</dd>
              <dt>Backscatter step (added from A, taken off from B)</dt>
              <dd class="num">{formatDb(p.reading.backscatterStepDb, 3)}</dd>
            </dl>
            <ShortProse text="Why a gainer appears: the OTDR does not see the light that crosses the splice, only light scattered back from each metre of fiber and caught again by the fiber’s own mode. A fiber with a smaller mode field diameter catches more of its backscatter (the share goes as 1/MFD²). So the trace level jumps where the fiber changes, even with no loss at all. Going into the smaller-MFD fiber the jump is upward and can outweigh the real loss: a “gain”. From the other end the same jump adds to the loss. Measure from both ends and take the average: the jump cancels and the true loss remains." />
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
    </CalcScreen>
  );
}
