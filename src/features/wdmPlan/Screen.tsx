// WDM channel plan: which grid channel a laser is on (G.694.1 dense grids, flexible grid, G.694.2 coarse grid),
// the channel list of a band, and the loss of each coarse WDM channel over a fiber. All arithmetic is in
// src/physics/wdmGrid.ts and src/physics/cwdmBudget.ts; this screen reads fields and renders.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, shownValue, useQuantity, type QuantityState } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatFixed, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  cwdmChannels,
  cwdmPlan,
  dwdmChannelsInBand,
  InputError,
  nearestCwdmChannel,
  nearestDwdmChannel,
  nearestFlexCentre,
  OPTICAL_BANDS,
  type CwdmChannelBudget,
  type DwdmSpacingGHz,
  type OpticalBand,
} from '../../physics';

type GridChoice = '100' | '50' | '25' | '12.5' | 'flex' | 'cwdm';
const GRID_WORDS: Record<GridChoice, string> = {
  '100': 'Dense grid, 100 GHz (G.694.1)',
  '50': 'Dense grid, 50 GHz (G.694.1)',
  '25': 'Dense grid, 25 GHz (G.694.1)',
  '12.5': 'Dense grid, 12.5 GHz (G.694.1)',
  flex: 'Flexible grid, 6.25 GHz centres (G.694.1)',
  cwdm: 'Coarse grid, 20 nm (G.694.2)',
};

interface ListRow {
  key: string;
  name: string;
  thz: number;
  nm: number;
}

function thzText(v: number, decimals = 4): string {
  return withUnit(formatFixed(v, decimals), 'THz');
}
function nmText(v: number, decimals = 2): string {
  return withUnit(formatFixed(v, decimals), 'nm');
}

function count(q: QuantityState): number {
  const v = need(q);
  if (!Number.isInteger(v) || v < 0) throw new InputError(q.argument, q.text, 'a whole number, 0 or more');
  return v;
}

export default function Screen() {
  const [known, setKnown] = useState<'wavelength' | 'frequency'>('wavelength');
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550.12');
  const frequency = useQuantity('frequencyThz', 'plain', '193.4');
  const [grid, setGrid] = useState<GridChoice>('100');
  const [band, setBand] = useState<OpticalBand>('C');

  const channel = useResult(() => {
    const point = known === 'wavelength' ? { wavelengthNm: need(wavelength) } : { frequencyThz: need(frequency) };
    if (grid === 'cwdm') {
      const c = nearestCwdmChannel(point);
      return { kind: 'cwdm' as const, cwdm: c, list: cwdmChannels().filter((x) => x.band === band).map((x): ListRow => ({ key: String(x.number), name: `Channel ${x.number}`, thz: x.frequencyThz, nm: x.wavelengthNm })) };
    }
    const near = grid === 'flex' ? nearestFlexCentre(point) : nearestDwdmChannel({ ...point, spacingGHz: Number(grid) as DwdmSpacingGHz });
    const list = grid === 'flex' ? [] : dwdmChannelsInBand({ band, spacingGHz: Number(grid) as DwdmSpacingGHz }).map((x): ListRow => ({ key: String(x.n), name: `n = ${x.n}`, thz: x.frequencyThz, nm: x.wavelengthNm }));
    return { kind: 'dense' as const, near, list };
  }, [known, wavelength.value, wavelength.failure, frequency.value, frequency.failure, grid, band]);

  // The coarse WDM plan on a fiber.
  const picker = useFiberPicker({ id: 'wdm-plan', label: 'Fiber type', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const length = useQuantity('lengthKm', 'length', '20');
  const connectors = useQuantity('connectorPairs', 'plain', '2');
  const splices = useQuantity('splices', 'plain', '2');
  const mux = useQuantity('muxDemuxLossDb', 'plain', '0');
  const reserve = useQuantity('reserveDb', 'plain', '0');
  const [withBudget, setWithBudget] = useState(false);
  const budget = useQuantity('powerBudgetDb', 'plain', '18');
  const [inUse, setInUse] = useState<number[]>([]);
  const fiber = picker.fiber;

  const plan = useResult(() => {
    if (!fiber) throw new InputError('fiber', undefined, 'a fiber type', picker.error ?? 'pick a fiber type');
    return cwdmPlan({
      attenuationDbPerKm: fiber.attenuationDbPerKm,
      lengthKm: need(length),
      connectorPairs: count(connectors),
      splices: count(splices),
      muxDemuxLossDb: need(mux),
      reserveDb: need(reserve),
      ...(withBudget ? { powerBudgetDb: need(budget) } : {}),
    });
  }, [fiber, picker.error, ...[length, connectors, splices, mux, reserve, budget].flatMap((q) => [q.value, q.failure]), withBudget]);

  const c = channel.result;
  const p = plan.result;
  const channelArgs = [wavelength.argument, frequency.argument];
  const planArgs = [length, connectors, splices, mux, reserve, budget].map((q) => q.argument);
  const free = cwdmChannels().filter((x) => !inUse.includes(x.number));

  let headline: Headline | undefined;
  if (c?.kind === 'cwdm') {
    const off = c.cwdm.offsetNm;
    headline = {
      label: 'Coarse grid',
      value: nmText(c.cwdm.channel.wavelengthNm, 0),
      verdict: `Channel ${c.cwdm.channel.number}; ${Math.abs(off) < 0.005 ? 'on the grid point' : `${formatFixed(Math.abs(off), 2)}\u00a0nm ${off > 0 ? 'above' : 'below'} it`}`,
      tone: 'info',
    };
  } else if (c?.kind === 'dense') {
    const off = c.near.offsetGHz;
    headline = {
      label: grid === 'flex' ? 'Flexible grid' : `${grid}\u00a0GHz grid`,
      value: thzText(c.near.channel.frequencyThz, grid === 'flex' || grid === '12.5' ? 5 : 4),
      verdict: `n = ${c.near.channel.n}, ${nmText(c.near.channel.wavelengthNm)}; ${Math.abs(off) < 0.0005 ? 'on the grid point' : `${formatFixed(Math.abs(off), 3)}\u00a0GHz ${off > 0 ? 'above' : 'below'} it (${formatFixed(c.near.offsetShareOfSpacing * 100, 1)}\u00a0% of the spacing)`}`,
      tone: 'info',
    };
  }
  if (headline && p?.worst?.maxLossDb !== undefined) {
    headline.more = [
      {
        label: 'CWDM, costs most',
        value: formatDb(p.worst.maxLossDb),
        verdict:
          p.worst.marginDb === undefined
            ? `${p.worst.channel.wavelengthNm}\u00a0nm over ${shownValue(length, 'km')}`
            : p.shortChannels.length === 0
              ? `every channel fits, ${formatDb(Math.min(...p.channels.filter((x) => x.marginDb !== undefined).map((x) => x.marginDb!)))} to spare`
              : `${p.shortChannels.length} channel(s) short of the budget`,
        tone: p.worst.marginDb === undefined ? 'info' : p.shortChannels.length === 0 ? 'ok' : 'bad',
      },
    ];
  }

  const listText = (c?.list ?? []).map((x) => `${x.name}: ${formatFixed(x.thz, 5)} THz, ${formatFixed(x.nm, 3)} nm`);
  const report: ReportSpec | undefined = c && {
    title: 'WDM channel plan',
    inputs: [
      [known === 'wavelength' ? 'Laser wavelength' : 'Laser frequency', known === 'wavelength' ? shownValue(wavelength, 'nm') : shownValue(frequency, 'THz')],
      ['Grid', GRID_WORDS[grid]],
      ['Band listed', band],
      ['Fiber type (coarse plan)', fiber?.name ?? ''],
      ['Fiber length', shownValue(length, 'km')],
      ['Connector pairs, splices', `${shownValue(connectors, '')}, ${shownValue(splices, '')}`],
      ['Multiplexer + demultiplexer', shownValue(mux, 'dB')],
      ['Reserve', shownValue(reserve, 'dB')],
      ['Power budget', withBudget ? shownValue(budget, 'dB') : 'not given'],
    ],
    outputs: [
      ['Nearest channel', headline ? `${headline.value} — ${headline.verdict}` : '—'],
      ...(listText.length ? [[`Channels in band ${band}`, `${listText.length}`] as [string, string], ...listText.map((t): [string, string] => ['  ', t])] : []),
      ...(p
        ? p.channels.map((x): [string, string] => [
            `CWDM ${x.channel.number} (${x.channel.wavelengthNm} nm)${inUse.includes(x.channel.number) ? ', in use' : ', free'}`,
            x.unavailable ?? `${formatFixed(x.attenuation!.dbPerKm, 3)} dB/km, loss ${formatDb(x.maxLossDb)}${x.marginDb !== undefined ? `, margin ${formatDb(x.marginDb)}` : ''}${x.attenuation!.waterPeakUnlisted ? ' (water-peak region, no listed value)' : ''}`,
          ])
        : []),
      ['Free CWDM channels', free.map((x) => `${x.number} (${x.wavelengthNm} nm)`).join(', ') || 'none'],
    ],
    assumptions: ['Frequency ⇄ vacuum wavelength with c = 299 792 458 m/s (exact).', ...(p?.notes ?? [])],
  };

  const toggleUse = (n: number) => setInUse((s) => (s.includes(n) ? s.filter((x) => x !== n) : [...s, n].sort((a, b) => a - b)));

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: channel.stale, error: cardError(channel, channelArgs) }}
      report={report}
      inputsTitle="The laser and the grid"
      inputs={
        <>
          <div class="form">
            <div class="field">
              <label for="wdm-known">I know the laser’s</label>
              <select id="wdm-known" value={known} onChange={(e) => setKnown((e.currentTarget as HTMLSelectElement).value as 'wavelength' | 'frequency')}>
                <option value="wavelength">Wavelength (nm)</option>
                <option value="frequency">Frequency (THz)</option>
              </select>
            </div>
            {known === 'wavelength' ? (
              <NumberField q={wavelength} label="Laser wavelength (vacuum)" unit="nm" quickPicks={[1310, 1550.12, 1551]} calc={channel} example="such as 1550.12" />
            ) : (
              <NumberField q={frequency} label="Laser frequency" unit="THz" quickPicks={[193.1, 193.4, 196.1]} calc={channel} example="such as 193.4" />
            )}
            <div class="field">
              <label for="wdm-grid">Grid</label>
              <select id="wdm-grid" value={grid} onChange={(e) => setGrid((e.currentTarget as HTMLSelectElement).value as GridChoice)}>
                {(Object.keys(GRID_WORDS) as GridChoice[]).map((g) => (
                  <option key={g} value={g}>
                    {GRID_WORDS[g]}
                  </option>
                ))}
              </select>
            </div>
            <div class="field">
              <label for="wdm-band">Band to list</label>
              <select id="wdm-band" value={band} onChange={(e) => setBand((e.currentTarget as HTMLSelectElement).value as OpticalBand)}>
                {OPTICAL_BANDS.map((b) => (
                  <option key={b.band} value={b.band}>
                    {b.band} band, {b.fromNm}–{b.toNm} nm
                  </option>
                ))}
              </select>
            </div>
          </div>
          <h3>Coarse WDM plan on a fiber</h3>
          {picker.element}
          <div class="form">
            <NumberField q={length} label="Fiber length" unit="km" quickPicks={[10, 20, 40]} calc={plan} />
            <NumberField q={connectors} label="Connector pairs" unit="" quickPicks={[0, 2, 4]} calc={plan} example="such as 2" />
            <NumberField q={splices} label="Splices" unit="" quickPicks={[0, 2, 6]} calc={plan} example="such as 2" />
            <NumberField q={mux} label="Multiplexer + demultiplexer loss per channel" unit="dB" quickPicks={[0, 3, 5]} calc={plan} example="such as 3 (from the data sheets)" />
            <NumberField q={reserve} label="Reserve for repairs and ageing" unit="dB" quickPicks={[0, 1, 3]} calc={plan} example="such as 1" />
            <div class="field">
              <label>
                <input type="checkbox" checked={withBudget} onChange={(e) => setWithBudget((e.currentTarget as HTMLInputElement).checked)} /> Compare with a power budget
              </label>
            </div>
            {withBudget && <NumberField q={budget} label="Power budget (weakest transmitter − receiver sensitivity)" unit="dB" quickPicks={[14, 18, 24]} calc={plan} example="such as 18" />}
          </div>
          <fieldset class="form">
            <legend>CWDM channels already in use</legend>
            <div class="quick-picks" role="group" aria-label="CWDM channels in use">
              {cwdmChannels().map((x) => (
                <button type="button" key={x.number} aria-pressed={inUse.includes(x.number)} onClick={() => toggleUse(x.number)}>
                  {x.number}: {x.wavelengthNm}&nbsp;nm
                </button>
              ))}
            </div>
          </fieldset>
        </>
      }
      how={{
        formula:
          'λ = c / f with c = 299 792 458 m/s (exact). Dense grid: f = 193.1 THz + n × spacing; flexible grid: centre 193.1 THz + n × 6.25 GHz, width m × 12.5 GHz. Coarse grid: 1271 + 20 k nm, k = 0 … 17. Nearest channel: n rounded from the offset to the anchor. CWDM loss per channel: length × attenuation at the channel + mux/demux + connectors + splices (+ reserve).',
        source: 'ITU-T G.694.1 (10/2020); ITU-T G.694.2 (12/2003); BIPM SI Brochure (2019) for c; band edges ITU-T G-series Supplement 39 (from memory)',
        assumptions: [
          'Wavelengths are vacuum wavelengths, as the grids define them.',
          'Fiber attenuation between listed wavelengths: linear; below the shortest listed: λ⁻⁴ (Rayleigh scattering); no estimate far beyond the longest listed.',
          'Water peak near 1383 nm: only as the fiber type lists it; without a listed value there the estimate assumes a low-water-peak fiber.',
        ],
        validity: '1260–1675 nm (179–238 THz).',
      }}
    >
      {c && c.list.length > 0 && (
        <ResultCard title={`${grid === 'cwdm' ? 'Coarse' : `${grid}\u00a0GHz`} channels in the ${band} band (${c.list.length})`} stale={channel.stale}>
          <details>
            <summary>Show the {c.list.length} channels</summary>
            <DataTable
              caption={`${GRID_WORDS[grid]}, ${band} band`}
              rows={c.list}
              rowKey={(x) => x.key}
              columns={[
                { label: 'Channel', cell: (x) => x.name },
                { label: 'Frequency', cell: (x) => thzText(x.thz, 5), num: true },
                { label: 'Wavelength', cell: (x) => nmText(x.nm, 3), num: true },
              ]}
            />
          </details>
        </ResultCard>
      )}
      {c && c.kind === 'dense' && grid === 'flex' && (
        <ResultCard title="Flexible grid" stale={channel.stale}>
          <ShortProse text="On the flexible grid a channel is a slot: its centre is 193.1 THz + n × 6.25 GHz and its width m × 12.5 GHz, so there is no fixed channel list. The centre shown above is the nearest allowed one." />
        </ResultCard>
      )}
      <ResultCard title="Coarse WDM channels on this fiber" stale={plan.stale} error={cardError(plan, planArgs)}>
        {p && (
          <>
            <DataTable
              caption={`${shownValue(length, 'km')} of ${fiber?.name ?? 'fiber'}`}
              rows={p.channels}
              rowKey={(x: CwdmChannelBudget) => x.channel.number}
              columns={[
                { label: 'Channel', cell: (x) => `${x.channel.number}: ${x.channel.wavelengthNm}\u00a0nm` },
                { label: 'Use', cell: (x) => (inUse.includes(x.channel.number) ? 'in use' : 'free') },
                { label: 'Fiber', cell: (x) => (x.attenuation ? `${withUnit(formatFixed(x.attenuation.dbPerKm, 3), 'dB/km')}${x.attenuation.waterPeakUnlisted ? ' ⚠ water peak' : ''}` : 'no estimate'), num: true },
                { label: 'Loss', cell: (x) => (x.maxLossDb === undefined ? '—' : formatDb(x.maxLossDb)), num: true },
                ...(withBudget ? [{ label: 'Margin', cell: (x: CwdmChannelBudget) => (x.marginDb === undefined ? '—' : formatDb(x.marginDb)), num: true }] : []),
              ]}
            />
            <p>
              Free channels: {free.length === 0 ? 'none' : free.map((x) => `${x.wavelengthNm}\u00a0nm`).join(', ')}.
            </p>
            {p.waterPeakUnlisted.length > 0 && <ShortProse text={p.notes[p.notes.length - 1]!} />}
            {p.channels.some((x) => x.unavailable) && <p class="note">{p.channels.find((x) => x.unavailable)!.unavailable}</p>}
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
