// OTDR set-up and distances: pulse width ⇄ resolution, trace ⇄ cable-jacket distance, the effect of a wrong group
// index, the ghost check, the fiber's backscatter level and the gainer error at a joint (see the OTDR splice screen).
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatNumber, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import type { ResolvedFiber } from '../../fibers/resolved';
import {
  backscatterLevel,
  CABLE_LAY_TYPICAL,
  cableDistanceFromTrace,
  chromaticDispersion,
  dispersionFiberFromNa,
  gainerError,
  ghostCheck,
  groupIndexEffect,
  ModelError,
  modeFieldDiameterUm,
  pulseSpatialExtent,
  rayleighScatteringDbPerKm,
  TYPICAL_GROUP_INDEX_1310,
  TYPICAL_GROUP_INDEX_1550,
  TYPICAL_RAYLEIGH_DB_UM4_PER_KM,
} from '../../physics';

function fiberOrThrow(f: ResolvedFiber | undefined, words: string, error: string | undefined): ResolvedFiber {
  if (!f) throw new ModelError(error ?? `Choose ${words} above.`, 'fiber choice');
  return f;
}

const mfdOf = (f: ResolvedFiber, wavelengthNm: number) => modeFieldDiameterUm({ coreRadiusUm: f.coreRadiusUm, na: f.na, wavelengthNm, definition: 'petermann2' }).mfdUm;

/** The model's group index of LP01 (material and waveguide parts), or undefined where the model does not reach. */
function modelGroupIndex(f: ResolvedFiber | undefined, wavelengthNm: number | undefined): number | undefined {
  if (!f || wavelengthNm === undefined) return undefined;
  try {
    return chromaticDispersion(dispersionFiberFromNa({ coreRadiusUm: f.coreRadiusUm, na: f.na }), wavelengthNm).groupIndex;
  } catch {
    return undefined;
  }
}

export default function Screen() {
  const picker = useFiberPicker({ id: 'otdr-setup-fiber', label: 'Fiber under test', shortLabel: 'Fiber', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const pickerB = useFiberPicker({ id: 'otdr-setup-beyond', label: 'Fiber beyond a joint (for the gainer error)', shortLabel: 'Beyond a joint', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const groupIndex = useQuantity('groupIndex', 'plain', String(TYPICAL_GROUP_INDEX_1550));
  const pulse = useQuantity('pulseWidthNs', 'plain', '10');
  const trace = useQuantity('traceKm', 'length', '10');
  const excess = useQuantity('excessPercent', 'plain', '0');
  const groupIndexTrue = useQuantity('groupIndexTrue', 'plain', String(TYPICAL_GROUP_INDEX_1550));
  const eventKm = useQuantity('eventKm', 'length', '2');
  const reflectorKm = useQuantity('reflectorKm', 'length', '1');
  const launchKm = useQuantity('launchCordKm', 'length', '0.5');

  const state = useResult(() => {
    const ng = need(groupIndex);
    const extent = pulseSpatialExtent({ pulseWidthNs: need(pulse), groupIndex: ng });
    const cable = cableDistanceFromTrace({ traceKm: need(trace), excessPercent: need(excess) });
    const index = groupIndexEffect({ shownKm: need(trace), groupIndexSet: ng, groupIndexTrue: need(groupIndexTrue) });
    const ghost = ghostCheck({ eventKm: need(eventKm), reflectiveEventsKm: [need(reflectorKm)], launchCordKm: need(launchKm), toleranceM: extent.twoPointResolutionM });
    return { extent, cable, index, ghost };
  }, [groupIndex.value, groupIndex.failure, pulse.value, pulse.failure, trace.value, trace.failure, excess.value, excess.failure, groupIndexTrue.value, groupIndexTrue.failure, eventKm.value, eventKm.failure, reflectorKm.value, reflectorKm.failure, launchKm.value, launchKm.failure]);

  const scatter = useResult(() => {
    const f = fiberOrThrow(picker.fiber, 'the fiber under test', picker.error);
    const fb = fiberOrThrow(pickerB.fiber, 'the fiber beyond a joint', pickerB.error);
    const w = need(wavelength);
    const mfdUm = mfdOf(f, w);
    const mfdBUm = mfdOf(fb, w);
    const level = backscatterLevel({ mfdUm, wavelengthNm: w, scatteringDbPerKm: rayleighScatteringDbPerKm({ wavelengthNm: w }), pulseWidthNs: need(pulse), groupIndex: need(groupIndex) });
    return { mfdUm, mfdBUm, level, gainer: gainerError({ mfdAUm: mfdUm, mfdBUm, wavelengthNm: w }) };
  }, [picker.fiber, picker.error, pickerB.fiber, pickerB.error, wavelength.value, wavelength.failure, pulse.value, pulse.failure, groupIndex.value, groupIndex.failure]);

  const fieldArgs = [groupIndex.argument, pulse.argument, trace.argument, excess.argument, groupIndexTrue.argument, eventKm.argument, wavelength.argument, 'shownKm', 'groupIndexSet', 'reflectiveEventsKm[0]', 'launchCordKm'];
  const argumentFor: Record<string, string> = { shownKm: trace.argument, groupIndexSet: groupIndex.argument, 'reflectiveEventsKm[0]': reflectorKm.argument };
  const calc = { errorArgument: state.errorArgument === undefined ? undefined : argumentFor[state.errorArgument] ?? state.errorArgument, fault: state.fault };
  const s = state.result;
  const b = scatter.result;
  const fiberIndex = modelGroupIndex(picker.fiber, wavelength.value);
  const ghostWords = s
    ? s.ghost.possibleGhost
      ? `the event at ${formatQuantity(s.ghost.eventKm, 'km', 4)} may be a ghost`
      : `the event at ${formatQuantity(s.ghost.eventKm, 'km', 4)} is at no multiple of a reflection`
    : '';

  const headline: Headline | undefined = s && {
    label: 'Resolution',
    value: formatQuantity(s.extent.twoPointResolutionM, 'm', 3),
    verdict: `with a ${formatQuantity(pulse.value, 'ns', 6)} pulse`,
    tone: 'info',
    more: [
      { label: 'Along the jacket', value: formatQuantity(s.cable.cableKm, 'km', 5), verdict: `for ${formatQuantity(s.cable.fiberKm, 'km', 5)} on the trace` },
      { label: 'Ghost check', verdict: ghostWords, tone: s.ghost.possibleGhost ? 'warn' : 'ok' },
    ],
  };

  const report: ReportSpec | undefined = s && {
    title: 'OTDR set-up and distances',
    inputs: [
      ['Group index set on the OTDR', shownValue(groupIndex, '')],
      ['Pulse width', shownValue(pulse, 'ns')],
      ['Distance on the trace', shownValue(trace, 'km')],
      ['Excess fiber length in the cable', shownValue(excess, '%')],
      ['Group index of the fiber', shownValue(groupIndexTrue, '')],
      ['Event checked for a ghost', shownValue(eventKm, 'km')],
      ['Strong reflection at', shownValue(reflectorKm, 'km')],
      ['Launch cord', shownValue(launchKm, 'km')],
      ['Fiber', picker.fiber?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
    ],
    outputs: [
      ['Two-point resolution', formatQuantity(s.extent.twoPointResolutionM, 'm', 3)],
      ['Pulse length in the fiber', formatQuantity(s.extent.pulseLengthM, 'm', 3)],
      ['Distance along the jacket', formatQuantity(s.cable.cableKm, 'km', 5)],
      ['Error from the group index', formatQuantity(s.index.errorM, 'm', 3)],
      ['Ghost check', ghostWords],
      ...(b
        ? ([
            ['Backscatter coefficient (1 ns)', formatDb(b.level.coefficientDb1ns, 1)],
            ['Backscatter level for this pulse', formatDb(b.level.levelDb, 1)],
            ['Gainer error at a joint, from this side', formatDb(b.gainer.errorFromADb, 3)],
          ] as [string, string][])
        : []),
    ],
    assumptions: [
      'Δz = c·τ/(2·n_g) (definition).',
      'Jacket distance = trace distance / (1 + excess length).',
      `Backscatter: Gaussian-mode capture fraction (Brinkmeyer 1980), Rayleigh coefficient ${TYPICAL_RAYLEIGH_DB_UM4_PER_KM} dB·µm⁴/km (typical).`,
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, fieldArgs) }}
      report={report}
      inputsTitle="The OTDR settings and the trace"
      inputs={
        <>
          <div class="form">
            <NumberField q={pulse} label="Pulse width" unit="ns" quickPicks={[3, 10, 30, 100, 1000]} calc={calc} />
            <NumberField
              q={groupIndex}
              label="Group index set on the OTDR"
              unit=""
              quickPicks={[TYPICAL_GROUP_INDEX_1310, TYPICAL_GROUP_INDEX_1550]}
              calc={calc}
              help="Typical for standard single-mode fiber: 1.4677 at 1310 nm, 1.4682 at 1550 nm. The fiber maker's figure is better."
            />
            <NumberField q={trace} label="Distance on the trace" unit="km" calc={calc} />
            <NumberField
              q={excess}
              label="Excess fiber length in the cable (helix factor)"
              unit="%"
              quickPicks={CABLE_LAY_TYPICAL.map((c) => c.excessPercent)}
              calc={calc}
              help={`Typical: ${CABLE_LAY_TYPICAL.map((c) => `${c.name.toLowerCase()} ${c.excessPercent}\u00a0%`).join('; ')}. The cable's data sheet gives the real figure.`}
            />
            <NumberField q={groupIndexTrue} label="Group index of the fiber (maker's figure)" unit="" calc={calc} help="Different from the OTDR setting? The error shows below." />
            <NumberField q={eventKm} label="Event to check for a ghost" unit="km" calc={calc} />
            <NumberField q={reflectorKm} label="Strong reflection before it, at" unit="km" calc={calc} />
            <NumberField q={launchKm} label="Launch cord length" unit="km" quickPicks={[0, 0.15, 0.5, 1]} calc={calc} />
          </div>
          {picker.element}
          {pickerB.element}
          <div class="form">
            <NumberField q={wavelength} label="OTDR wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={scatter} />
          </div>
          {fiberIndex !== undefined && (
            <p>
              <button type="button" onClick={() => groupIndexTrue.setText(fiberIndex.toFixed(4))}>
                Use the model’s group index of this fiber ({formatNumber(fiberIndex, 5)})
              </button>
            </p>
          )}
        </>
      }
      how={{
        formula:
          'Δz = c·τ/(2·n_g). Jacket = trace/(1 + ε). Index error: z·(n_true − n_set)/n_true. Ghost: an event at k·d (k ≥ 2) of a reflection at d, or at d₁ + k·(d₂ − d₁) between two reflections, within Δz. Backscatter: 10·log10(S·α_s·Δz), S = 3/(2(n·k·w)²). Gainer error from A: 5·log10(S_A/S_B).',
        source: 'Personick 1977, BSTJ 56(3); Brinkmeyer 1980, JOSA 70(8); Hartog & Gold 1984, JLT 2(2); ITU-T G.650.3 (OTDR terms)',
        assumptions: [
          `Excess fiber length by construction: ${CABLE_LAY_TYPICAL.map((c) => `${c.name} ${c.excessPercent} % (${c.source})`).join('; ')}.`,
          'Group index of the model: LP01 of the equivalent step-index fiber with GeO₂-doped silica core (Sellmeier); the maker’s figure is better.',
          'The backscatter check value of practice is about −82 dB for 1 ns at 1550 nm on standard fiber.',
        ],
        validity: 'Single-mode fibers; the resolution is the ideal one of a rectangular pulse (receiver bandwidth and the dead zone after a strong reflection add to it).',
      }}
    >
      {s && (
        <ResultCard title="Distances" stale={state.stale}>
          <dl class="kv">
            <dt>Pulse length in the fiber</dt>
            <dd class="num">{formatQuantity(s.extent.pulseLengthM, 'm', 3)}</dd>
            <dt>Trace minus jacket</dt>
            <dd class="num">{formatQuantity(s.cable.differenceM, 'm', 3)}</dd>
            <dt>Error from the group index setting at this distance</dt>
            <dd class="num">{formatQuantity(s.index.errorM, 'm', 3)}</dd>
            <dt>Per 10 km for an index off by 0.001</dt>
            <dd class="num">{formatQuantity(s.index.errorPer10KmPerMilliIndexM, 'm', 3)}</dd>
          </dl>
          {s.ghost.candidates.length > 0 && (
            <DataTable
              caption="Where a ghost of each reflection would sit"
              rows={s.ghost.candidates}
              rowKey={(c, i) => `${c.path}-${c.nearKm}-${c.reflectorKm}-${c.multiple}-${i}`}
              columns={[
                { label: 'Echo between', cell: (c) => (c.path === 'front-and-event' ? `OTDR and ${formatQuantity(c.reflectorKm, 'km', 4)}` : `${formatQuantity(c.nearKm, 'km', 4)} and ${formatQuantity(c.reflectorKm, 'km', 4)}`) },
                { label: 'Ghost at', cell: (c) => formatQuantity(c.expectedKm, 'km', 5), num: true },
                { label: 'Event off by', cell: (c) => formatQuantity(c.offsetM, 'm', 3), num: true },
              ]}
            />
          )}
          <ShortProse text="A ghost is light that bounced between two reflections before coming back, so it shows at a whole multiple of the gap. It has no loss step after it: if the trace level is the same on both sides, suspect a ghost. Gel or an angled connector at the strong reflection removes it." />
        </ResultCard>
      )}
      <ResultCard title="Backscatter of the fiber" stale={scatter.stale} error={cardError(scatter, fieldArgs)}>
        {b && (
          <>
            <dl class="kv">
              <dt>Mode field diameter here</dt>
              <dd class="num">{formatQuantity(b.mfdUm, 'µm', 3)}</dd>
              <dt>Capture fraction of the mode</dt>
              <dd class="num">{formatDb(b.level.captureFractionDb, 1)}</dd>
              <dt>Backscatter coefficient (1 ns pulse)</dt>
              <dd class="num">{formatDb(b.level.coefficientDb1ns, 1)}</dd>
              <dt>Backscatter level for this pulse</dt>
              <dd class="num">{formatDb(b.level.levelDb, 1)}</dd>
              <dt>Gainer error at a joint into the second fiber, from this side</dt>
              <dd class="num">{formatDb(b.gainer.errorFromADb, 3)}</dd>
              <dt>From the other side</dt>
              <dd class="num">{formatDb(b.gainer.errorFromBDb, 3)}</dd>
            </dl>
            <ShortProse text="The fiber’s own mode catches back only a small share of the light it scatters; a narrower mode catches more. Where two fibers of different mode field meet, the trace steps by half the difference, which one direction shows as a gain. The OTDR splice reading screen takes this further." />
            <p>
              <button type="button" onClick={() => (location.hash = '#/otdr-splice')}>
                Open the OTDR splice reading
              </button>
            </p>
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
