// Mode-filter mandrel: which mode groups N turns on a mandrel strip from an overfilled launch, what that does to
// the encircled flux and the reading, and what the table's mandrel would have done instead.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError } from '../../ui/useResult';
import { useComputed } from '../../ui/useComputed';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { BarChart, LinePlot } from '../../ui/Plot';
import { formatDb, formatNumber, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { MANDREL_TABLE, MANDREL_TABLE_SOURCE, type GroupTransmission } from '../../physics';
import type { MandrelTaskInput, MandrelTaskOutput } from '../encircledFlux/tasks';
import { ControlTable, EfPlot, efVerdictLine, efVerdictText, fiberSpec, templateSource } from '../encircledFlux/parts';

const CORD_DIAMETERS_MM = [...new Set(MANDREL_TABLE.map((r) => r.cordDiameterMm))];
/** One function for the chart's values, not one per render: a new one would make the card draw again on every key. */
const twoDigits = (v: number) => formatNumber(v, 2);

function groupRange(groups: GroupTransmission[], fate: GroupTransmission['fate']): string {
  const list = groups.filter((g) => g.fate === fate).map((g) => g.principal);
  if (list.length === 0) return 'none';
  return list.length === 1 ? `group ${list[0]}` : `groups ${list[0]}–${list[list.length - 1]}`;
}

export default function Screen() {
  const pick = useFiberPicker({ id: 'mandrel-mm', label: 'Multimode fiber of the launch cord', shortLabel: 'Launch cord fiber', kinds: ['multimode'], defaultCategory: 'OM3' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '850');
  const [cordMm, setCordMm] = useState(3);
  const mandrel = useQuantity('mandrelDiameterMm', 'radius', '22');
  const turns = useQuantity('turns', 'plain', '5');

  const fieldError = [wavelength, mandrel, turns].map((q) => q.error).find(Boolean);
  const input: MandrelTaskInput | undefined =
    pick.fiber && wavelength.value !== undefined && mandrel.value !== undefined && turns.value !== undefined
      ? { fiber: fiberSpec(pick.fiber), wavelengthNm: wavelength.value, mandrelDiameterMm: mandrel.value, cordDiameterMm: cordMm, turns: turns.value }
      : undefined;
  const res = useComputed<MandrelTaskInput, MandrelTaskOutput>('encircledFlux.mandrel', input, fieldError ?? pick.error);
  const r = res.result;
  const fieldArgs = [wavelength.argument, mandrel.argument, turns.argument];

  const stripped = r ? groupRange(r.perGroup, 'stripped') : '';
  const ef = r && efVerdictLine(r.chosen.check, r.chosen.curve);
  const headline: Headline | undefined = r &&
    ef && {
      label: 'Loss in the wrap',
      value: formatDb(r.chosen.lossDb, 2),
      verdict: r.chosen.groupsStripped === 0 ? 'Strips no mode group' : `Strips ${stripped} of ${r.highestGroup}`,
      tone: 'info',
      more: [ef],
      note: 'For an overfilled launch into the cord (equal power in every mode).',
    };

  const table = r?.table;
  const sameAsTable = table !== undefined && Math.abs(table.mandrelDiameterMm - (mandrel.value ?? 0)) < 1e-9 && Math.abs((turns.value ?? 0) - table.turns) < 1e-9;

  const report: ReportSpec | undefined = r && {
    title: 'Mode-filter mandrel',
    inputs: [
      ['Fiber of the cord', pick.fiber?.name ?? ''],
      ['Wavelength', shownValue(wavelength, 'nm')],
      ['Cord outer diameter', formatQuantity(cordMm, 'mm')],
      ['Mandrel diameter', shownValue(mandrel, 'mm')],
      ['Turns', shownValue(turns, '')],
    ],
    outputs: [
      ['Loss in the wrap (overfilled launch)', formatDb(r.chosen.lossDb, 2)],
      ['Mode groups stripped', `${stripped} of ${r.highestGroup}`],
      ['Mode groups partly stripped', groupRange(r.perGroup, 'partly')],
      ['Encircled flux after the wrap', efVerdictText(r.chosen.check)],
      ...(table && !sameAsTable ? [[`The table’s mandrel (${formatQuantity(table.mandrelDiameterMm, 'mm')}, ${table.turns} turns)`, `${formatDb(table.lossDb, 2)}, ${efVerdictText(table.check)}`] as [string, string]] : []),
    ],
    assumptions: [
      'WKB tunnelling through the bend barrier of the tilted index, stress-corrected bend radius (Schermer & Cole 2007); one encounter per ray period.',
      'Power within a mode group shared among its modes; modes add in power.',
      `Mandrel table: ${MANDREL_TABLE_SOURCE}. Template: ${templateSource(r.chosen.check)}.`,
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: res.stale, error: cardError(res, fieldArgs), busy: res.busy }}
      report={report}
      inputsTitle="The cord and the mandrel"
      inputs={
        <>
          {pick.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[850, 1300]} calc={res} />
            <div class="field">
              <label for="mandrel-cord">Outer diameter of the wrapped cord</label>
              <select id="mandrel-cord" value={String(cordMm)} onChange={(e) => setCordMm(Number((e.currentTarget as HTMLSelectElement).value))}>
                {CORD_DIAMETERS_MM.map((d) => (
                  <option key={d} value={String(d)}>
                    {formatQuantity(d, 'mm')}
                  </option>
                ))}
              </select>
            </div>
            <NumberField q={mandrel} label="Mandrel diameter" unit="mm" quickPicks={[17, 20, 22, 25]} calc={res} help="The fiber’s own bend radius is half the mandrel plus half the cord." />
            <NumberField q={turns} label="Turns on the mandrel" unit="" quickPicks={[1, 3, 5]} calc={res} />
          </div>
        </>
      }
      how={{
        formula:
          'Each mode of the straight fiber, with n_eff from the mode solver, meets the bend as the tilted index n²(x)(1 + 2x/R). Barrier Φ = k∫√(n_eff² − n²(x)(1 + 2x/R)) dx from the mode’s outer turning point to where the tilted cladding reaches n_eff; a mode with no barrier is refracted out at once. Power left: exp(−e^{−2Φ} L / z_p), L the wrapped length, z_p the ray period (2πa n_eff/NA for α = 2).',
        source: 'Heiblum & Harris 1975 (bend as tilted index); Snyder & Love 1983 (tunnelling rays); Schermer & Cole 2007 (stress-corrected radius); Gloge 1972 (modes left in a bend, as a cross-check)',
        assumptions: [
          'Each mode treated as a ray in the plane of the bend; power within a group shared among its modes.',
          'Overfilled launch into the cord; leaky modes already gone.',
          'The bend is uniform; the short transitions into and out of it are ignored.',
        ],
        validity: 'Bend radius much larger than the core; weakly guiding graded or step profiles.',
      }}
    >
      {r && (
        <ResultCard title="What the wrap leaves in each mode group" stale={res.stale}>
          <BarChart
            title="Power left in each mode group after the wrap"
            xLabel="Mode group (higher groups travel nearer the core edge)"
            yLabel="Power left (%)"
            bars={r.perGroup.map((g) => ({ label: String(g.principal), value: g.transmission * 100 }))}
            formatValue={twoDigits}
          />
          <dl class="kv">
            <dt>Stripped (under 10 % left)</dt>
            <dd>{stripped}</dd>
            <dt>Partly stripped</dt>
            <dd>{groupRange(r.perGroup, 'partly')}</dd>
            <dt>Fiber bend radius</dt>
            <dd class="num">{formatQuantity(r.fiberBendRadiusMm, 'mm')}</dd>
            <dt>Modes Gloge 1972 counts as still guided</dt>
            <dd class="num">{formatNumber(r.glogeGuidedModeShare * 100, 3)}{'\u00a0'}%</dd>
          </dl>
        </ResultCard>
      )}
      {r && (
        <ResultCard title="Encircled flux after the wrap" stale={res.stale}>
          <EfPlot
            curves={[
              { name: 'After this wrap', curve: r.chosen.curve },
              { name: 'No wrap (overfilled)', curve: r.unwrapped.curve, dashed: true },
              ...(table && !sameAsTable ? [{ name: `The table’s ${formatNumber(table.mandrelDiameterMm, 3)} mm mandrel`, curve: table.curve }] : []),
            ]}
            check={r.chosen.check}
          />
          {r.chosen.check && <ControlTable check={r.chosen.check} />}
        </ResultCard>
      )}
      {r && (
        <ResultCard title="A different mandrel, a different reading" stale={res.stale}>
          <LinePlot
            title={`Loss in the wrap against mandrel diameter (${shownValue(turns, '')} turns)`}
            xLabel="Mandrel diameter (mm)"
            yLabel="Loss of an overfilled launch (dB)"
            series={[{ name: 'Loss in the wrap', points: r.sweep }]}
            markers={[
              ...(mandrel.value !== undefined ? [{ x: mandrel.value, label: 'yours' }] : []),
              ...(table && !sameAsTable ? [{ x: table.mandrelDiameterMm, label: 'table' }] : []),
            ]}
          />
          {table && !sameAsTable && (
            <p class="note">
              The table’s mandrel for this core and cord is <span class="num">{formatQuantity(table.mandrelDiameterMm, 'mm')}</span> with {table.turns} turns: it would lose{' '}
              <span class="num">{formatDb(table.lossDb, 2)}</span> here, against <span class="num">{formatDb(r.chosen.lossDb, 2)}</span> with yours, and read {efVerdictText(table.check)}.
            </p>
          )}
          {!table && <p class="note">The table has no mandrel for this core and cord.</p>}
          <ShortProse text="The loss falls in steps as the mandrel grows: each step is one more mode group that survives the bend. A mandrel smaller than the one specified strips groups the launch should keep, so the light reaching the link is concentrated near the axis and every link reads lower loss than it should. A larger one, or the mandrel for a 62.5 µm core used on a 50 µm cord, leaves high groups that the first connector strips, so links read higher loss. Either way two testers stop agreeing. The model treats each mode as a ray in the bend plane; treat its step positions as a teaching picture, and the template, checked with a meter, as the arbiter." />
        </ResultCard>
      )}
      <ResultCard title="Mandrels in common use">
        <DataTable
          caption={`Five turns, by core and cord (${MANDREL_TABLE_SOURCE})`}
          rows={MANDREL_TABLE}
          rowKey={(row) => `${row.coreDiameterUm}-${row.cordDiameterMm}`}
          columns={[
            { label: 'Core', cell: (row) => formatQuantity(row.coreDiameterUm, 'µm'), num: true },
            { label: 'Cord', cell: (row) => formatQuantity(row.cordDiameterMm, 'mm'), num: true },
            { label: 'Mandrel', cell: (row) => formatQuantity(row.mandrelDiameterMm, 'mm'), num: true },
            { label: 'Turns', cell: (row) => String(row.turns), num: true },
          ]}
        />
      </ResultCard>
    </CalcScreen>
  );
}
