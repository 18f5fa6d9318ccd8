// Encircled flux of a multimode launch against the 50 µm template: what a launch does to the modes, and whether
// a loss reading made with it can be compared with another tester's.
import { useMemo, useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { formatDb, formatNumber, formatPercent, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { MANDREL_TABLE, MANDREL_TABLE_SOURCE } from '../../physics';
import type { EfInput, EfOutput, LaunchSpec } from './tasks';
import { parseGroupPowers } from './groupText';
import { ControlTable, EfPlot, efVerdictLine, efVerdictText, fiberSpec, formatEf, formatLimit, GroupBars, shareUpTo, templateSource } from './parts';

type LaunchKind = LaunchSpec['kind'];

const LAUNCH_WORDS: Record<LaunchKind, string> = {
  overfilled: 'Overfilled: equal power in every mode (a source larger than the core and its NA)',
  'single-mode': 'A single-mode fiber butted on, centred or offset',
  mandrel: 'Overfilled, then wrapped on a mandrel',
  groups: 'Power per mode group, typed in',
};

const CORD_DIAMETERS_MM = [...new Set(MANDREL_TABLE.map((r) => r.cordDiameterMm))];

export default function Screen() {
  const pick = useFiberPicker({ id: 'ef-mm', label: 'Multimode fiber', kinds: ['multimode'], defaultCategory: 'OM3' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '850');
  const [kind, setKind] = useState<LaunchKind>('overfilled');
  const mfd = useQuantity('mfdUm', 'size', '5.5');
  const offset = useQuantity('offsetUm', 'size', '0');
  const mandrel = useQuantity('mandrelDiameterMm', 'radius', '22');
  const [cordMm, setCordMm] = useState(3);
  const turns = useQuantity('turns', 'plain', '5');
  const [groupText, setGroupText] = useState('1, 1, 1, 1, 1, 1, 1, 1');
  const groups = useMemo(() => parseGroupPowers(groupText), [groupText]);

  const fields = kind === 'single-mode' ? [mfd, offset] : kind === 'mandrel' ? [mandrel, turns] : [];
  const fieldError = [wavelength, ...fields].map((q) => q.error).find(Boolean) ?? (kind === 'groups' ? groups.error : undefined);
  let launch: LaunchSpec | undefined;
  if (kind === 'overfilled') launch = { kind };
  else if (kind === 'single-mode' && mfd.value !== undefined && offset.value !== undefined) launch = { kind, mfdUm: mfd.value, offsetUm: offset.value };
  else if (kind === 'mandrel' && mandrel.value !== undefined && turns.value !== undefined) launch = { kind, mandrelDiameterMm: mandrel.value, cordDiameterMm: cordMm, turns: turns.value };
  else if (kind === 'groups' && groups.groupPowers) launch = { kind, groupPowers: groups.groupPowers };
  const input: EfInput | undefined = pick.fiber && wavelength.value !== undefined && launch ? { fiber: fiberSpec(pick.fiber), wavelengthNm: wavelength.value, launch } : undefined;
  const res = useComputed<EfInput, EfOutput>('encircledFlux.ef', input, fieldError ?? pick.error);
  const r = res.result;
  const fieldArgs = [wavelength.argument, ...fields.map((q) => q.argument)];

  const headline: Headline | undefined = r && {
    ...efVerdictLine(r.check, r.curve),
    more: kind === 'single-mode' || kind === 'mandrel' ? [{ label: kind === 'mandrel' ? 'Loss in the wrap' : 'Launch loss', value: formatDb(r.lossDb, 2) }] : undefined,
  };

  const launchWords = (): string => {
    if (kind === 'single-mode') return `single-mode spot, MFD ${shownValue(mfd, 'µm')}, ${shownValue(offset, 'µm')} off the axis`;
    if (kind === 'mandrel') return `overfilled, then ${shownValue(turns, '')} turns of a ${formatNumber(cordMm, 3)} mm cord on a ${shownValue(mandrel, 'mm')} mandrel`;
    if (kind === 'groups') return `typed per group: ${groupText.slice(0, 80)}`;
    return 'overfilled (equal power in every mode)';
  };

  const report: ReportSpec | undefined = r && {
    title: 'Encircled flux of a multimode launch',
    inputs: [
      ['Multimode fiber', pick.fiber?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
      ['Launch', launchWords()],
    ],
    outputs: [
      ['Verdict', efVerdictText(r.check)],
      ...(r.check?.points.map((p): [string, string] => [`EF at ${formatQuantity(p.radiusUm, 'µm')}`, `${formatEf(p.ef)} (allowed ${formatLimit(p.lower)} to ${formatLimit(p.upper)})`]) ?? []),
      ['Power in groups 1–3', formatPercent(shareUpTo(r.curve.perGroup, 3), 1)],
      ['Guided modes', `${r.modeCount} in ${r.highestGroup} groups (V = ${formatNumber(r.v, 3)})`],
      ...(kind === 'single-mode' || kind === 'mandrel' ? [['Loss of the launch', formatDb(r.lossDb, 2)] as [string, string]] : []),
    ],
    assumptions: [
      'Modes add in power (incoherent): azimuthal integration cancels different orders, launch-cord length and source width scramble the rest.',
      `Template: ${templateSource(r.check)}.`,
      ...(kind === 'mandrel' ? [`Mandrel model: WKB tunnelling through the bend barrier, stress-corrected radius; Gloge 1972 cross-check. Table of mandrels: ${MANDREL_TABLE_SOURCE}.`] : []),
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: res.stale, error: cardError(res, fieldArgs), busy: res.busy }}
      report={report}
      inputsTitle="The fiber and the launch"
      inputs={
        <>
          {pick.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[850, 1300]} calc={res} />
            <div class="field">
              <label for="ef-launch">How the light is launched</label>
              <select id="ef-launch" value={kind} onChange={(e) => setKind((e.currentTarget as HTMLSelectElement).value as LaunchKind)}>
                {(Object.keys(LAUNCH_WORDS) as LaunchKind[]).map((k) => (
                  <option key={k} value={k}>
                    {LAUNCH_WORDS[k]}
                  </option>
                ))}
              </select>
            </div>
            {kind === 'single-mode' && (
              <>
                <NumberField q={mfd} label="Mode field diameter of the single-mode fiber" unit="µm" quickPicks={[5.5, 9.2]} calc={res} help="About 5.5 µm for a fiber single-mode at 850 nm, 9.2 µm for a standard fiber at 1310 nm (common practice)." />
                <NumberField q={offset} label="Offset from the core centre" unit="µm" quickPicks={[0, 13, 20]} calc={res} />
              </>
            )}
            {kind === 'mandrel' && (
              <>
                <NumberField q={mandrel} label="Mandrel diameter" unit="mm" quickPicks={[17, 22, 25]} calc={res} />
                <div class="field">
                  <label for="ef-cord">Outer diameter of the wrapped cord</label>
                  <select id="ef-cord" value={String(cordMm)} onChange={(e) => setCordMm(Number((e.currentTarget as HTMLSelectElement).value))}>
                    {CORD_DIAMETERS_MM.map((d) => (
                      <option key={d} value={String(d)}>
                        {formatQuantity(d, 'mm')}
                      </option>
                    ))}
                  </select>
                </div>
                <NumberField q={turns} label="Turns on the mandrel" unit="" quickPicks={[1, 3, 5]} calc={res} />
              </>
            )}
            {kind === 'groups' && (
              <div class={`field${groups.error ? ' field-invalid' : ''}`}>
                <label for="ef-groups">Power in each group, from group 1</label>
                <div class="field-input">
                  <input
                    id="ef-groups"
                    type="text"
                    inputMode="text"
                    autoComplete="off"
                    spellcheck={false}
                    value={groupText}
                    aria-invalid={groups.error ? 'true' : undefined}
                    aria-describedby={groups.error ? 'ef-groups-err' : 'ef-groups-help'}
                    onInput={(e) => setGroupText((e.currentTarget as HTMLInputElement).value)}
                  />
                </div>
                {groups.error && (
                  <p id="ef-groups-err" class="field-error" role="alert">
                    <span aria-hidden="true">⚠ </span>
                    {groups.error}
                  </p>
                )}
                <p id="ef-groups-help" class="field-help">
                  Relative powers separated by commas; each is shared by the modes of its group. Groups not listed are dark.
                </p>
              </div>
            )}
          </div>
        </>
      }
      how={{
        formula:
          'EF(r) = Σ pᵢ ∫₀ʳ ψᵢ² ρ dρ / Σ pᵢ over the guided LP modes, with pᵢ the power in mode i and ψᵢ its radial field (∫ψ² ρ dρ = 1). Overfilled: pᵢ ∝ the mode’s degeneracy. Single-mode: pᵢ from the overlap integral of a Gaussian spot with each mode. Mandrel: pᵢ times exp(−T L/z_p), T = exp(−2Φ) the WKB tunnelling through the bend barrier, z_p the ray period.',
        source: 'Gloge & Marcatili 1973 (modes of graded-core fibers); Snyder & Love 1983 (overlaps, tunnelling); Gloge 1972 (bend loss); IEC 61280-4-1 Ed. 2.0 (template, limits from memory)',
        assumptions: [
          'Modes add in power, not field: EF integrates over the azimuth, where different orders cancel, and the launch cord and the source width scramble the rest.',
          'Guided modes only: leaky modes are gone after the first metres of a launch cord.',
          'The fiber’s profile is the ideal α-profile of the chosen type (no centre dip, no core-edge ripple).',
        ],
        validity: 'Weakly guiding fibers; template verdicts only for 50 µm cores at 850 and 1300 nm.',
      }}
    >
      {r && (
        <ResultCard title="Encircled flux against the template" stale={res.stale}>
          <EfPlot curves={[{ name: 'This launch', curve: r.curve }]} check={r.check} />
          {r.check ? <ControlTable check={r.check} /> : <p class="note">No template applies to this core and wavelength; the curve is shown without a verdict.</p>}
          <ShortProse text="Too much power inside a control radius means the outer mode groups are dark: an underfilled launch, which reads a link’s loss low. Too little means the outer groups carry more than the template allows: overfilled, which reads loss high. Two testers whose launches both meet the template agree much more closely." />
        </ResultCard>
      )}
      {r && (
        <ResultCard title="Mode groups" stale={res.stale}>
          <GroupBars groups={r.curve.perGroup} />
          <dl class="kv">
            <dt>Guided modes</dt>
            <dd>
              <span class="num">{r.modeCount}</span> in <span class="num">{r.highestGroup}</span> groups, V = <span class="num">{formatNumber(r.v, 3)}</span>
            </dd>
            <dt>Power in groups 1–3</dt>
            <dd class="num">{formatPercent(shareUpTo(r.curve.perGroup, 3), 1)}</dd>
            {(kind === 'single-mode' || kind === 'mandrel') && (
              <>
                <dt>{kind === 'mandrel' ? 'Power left after the wrap' : 'Share of the spot guided'}</dt>
                <dd class="num">{formatPercent(r.guidedShare, 1)}</dd>
              </>
            )}
          </dl>
        </ResultCard>
      )}
    </CalcScreen>
  );
}
