// Which Ethernet optical interfaces a link carries: length against each interface's reach on the fiber
// category, measured (or planned) loss against its channel insertion loss, with the margin of each.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatNumber, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { applicationsForLink, FIBER_CATEGORIES, InputError, MAX_APPLICATION_LINK_M, MAX_APPLICATION_LOSS_DB, MIN_APPLICATION_LOSS_DB, type ApplicationCheck, type FiberCategory, type LossWindow } from '../../physics';

const M_PER_KM = 1000;

function metres(m: number | undefined): string {
  if (m === undefined) return '—';
  return Math.abs(m) >= 1000 ? withUnit(formatNumber(m / M_PER_KM, 3), 'km') : withUnit(formatNumber(m, 3), 'm');
}

function margin(a: ApplicationCheck): string {
  const parts: string[] = [];
  if (a.reachMarginM !== undefined) parts.push(a.reachMarginM >= 0 ? `${metres(a.reachMarginM)} of reach to spare` : `${metres(-a.reachMarginM)} too long`);
  if (a.lossMarginDb !== undefined) parts.push(a.lossMarginDb >= 0 ? `${formatDb(a.lossMarginDb, 2)} of loss to spare` : `${formatDb(-a.lossMarginDb, 2)} too much loss`);
  return parts.join(', ') || '—';
}

const VERDICT_MARK: Record<ApplicationCheck['verdict'], string> = {
  carried: '✓ carried',
  'length fits, loss not given': '✓ length fits',
  'too long': '✗ too long',
  'too much loss': '✗ loss over',
  'too long and too much loss': '✗ both over',
  'not on this fiber': '— other fiber',
};

export default function Screen() {
  const [category, setCategory] = useState<FiberCategory>('OM3');
  const length = useQuantity('lengthM', 'length', '0.3');
  const [withLoss, setWithLoss] = useState(false);
  const multimode = category.startsWith('OM');
  const windows: [LossWindow, LossWindow] = multimode ? [850, 1300] : [1310, 1550];
  const loss1 = useQuantity(multimode ? 'loss850' : 'loss1310', 'plain', '');
  const loss2 = useQuantity(multimode ? 'loss1300' : 'loss1550', 'plain', '');

  // Only a loss actually typed is checked; an empty field means "not measured at this window".
  const given = (q: typeof loss1) => (q.text.trim() === '' ? undefined : need(q));
  const state = useResult(() => {
    const lengthKm = need(length);
    const lossDbByWindow: Partial<Record<LossWindow, number>> = {};
    if (withLoss) {
      const a = given(loss1);
      const b = given(loss2);
      if (a !== undefined) lossDbByWindow[windows[0]] = a;
      if (b !== undefined) lossDbByWindow[windows[1]] = b;
    }
    try {
      return applicationsForLink({ category, lengthM: lengthKm * M_PER_KM, lossDbByWindow });
    } catch (e) {
      // Say a refused value in the words and unit of the field it came from.
      if (e instanceof InputError && e.argument === 'lengthM') throw new InputError(length.argument, lengthKm, `a number from 0 to ${MAX_APPLICATION_LINK_M / M_PER_KM} km`);
      if (e instanceof InputError && e.argument.startsWith('lossDbByWindow[')) {
        const q = e.argument.includes(String(windows[0])) ? loss1 : loss2;
        throw new InputError(q.argument, e.value, `a number from ${MIN_APPLICATION_LOSS_DB} to ${MAX_APPLICATION_LOSS_DB} dB`);
      }
      throw e;
    }
  }, [category, length.value, length.failure, withLoss, loss1.text, loss1.value, loss2.text, loss2.value, multimode]);
  const rows = state.result;
  const lossFieldError = (q: typeof loss1) => (withLoss && q.text.trim() !== '' ? q.error : undefined);
  const fieldArgs = [length.argument, loss1.argument, loss2.argument];

  const applicable = rows?.filter((a) => a.verdict !== 'not on this fiber') ?? [];
  const carried = applicable.filter((a) => a.verdict === 'carried' || a.verdict === 'length fits, loss not given');
  const fastest = carried[carried.length - 1];
  const headline: Headline | undefined = rows && {
    label: `${category}, ${length.value !== undefined ? metres(length.value * M_PER_KM) : ''}`,
    value: `${carried.length} of ${applicable.length}`,
    verdict: carried.length === 0 ? 'No listed interface is carried' : `Carries up to ${fastest.name}${fastest.verdict === 'length fits, loss not given' ? ' by length (loss not checked)' : `, ${margin(fastest)}`}`,
    tone: carried.length === 0 ? 'bad' : 'ok',
  };

  const report: ReportSpec | undefined = rows && {
    title: 'Ethernet interfaces a link carries',
    inputs: [
      ['Fiber category', category],
      ['Length', shownValue(length, 'km')],
      ...(withLoss ? windows.map((w, i): [string, string] => [`Loss at ${w} nm`, (i === 0 ? loss1 : loss2).text.trim() === '' ? 'not given' : withUnit((i === 0 ? loss1 : loss2).text.trim(), 'dB')]) : [['Loss', 'not given (length only)'] as [string, string]]),
    ],
    outputs: applicable.map((a): [string, string] => [a.name, `${a.verdict}; reach ${metres(a.maxReachM)}, channel insertion loss ${formatDb(a.channelInsertionLossDb, 2)}; ${margin(a)}${a.condition ? `; ${a.condition}` : ''}`]),
    assumptions: ['Limits from IEEE 802.3 per interface and fiber category; which were checked and which are from memory is listed per interface on the screen.', 'A link within both limits is carried by any compliant pair of transceivers.'],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, fieldArgs) }}
      report={report}
      inputsTitle="The link"
      inputs={
        <div class="form">
          <div class="field">
            <label for="apps-category">Fiber category</label>
            <select id="apps-category" value={category} onChange={(e) => setCategory((e.currentTarget as HTMLSelectElement).value as FiberCategory)}>
              {FIBER_CATEGORIES.map((c) => (
                <option key={c} value={c}>
                  {c}
                </option>
              ))}
            </select>
          </div>
          <NumberField q={length} label="Link length" unit="km" quickPicks={[0.1, 0.3, 0.55, 10]} calc={state} help="Type 300 m or 0.3 km." />
          <div class="field">
            <label for="apps-loss">What you know about the loss</label>
            <select id="apps-loss" value={withLoss ? 'yes' : 'no'} onChange={(e) => setWithLoss((e.currentTarget as HTMLSelectElement).value === 'yes')}>
              <option value="no">Nothing yet: check the length only</option>
              <option value="yes">The measured or planned loss</option>
            </select>
          </div>
          {withLoss && (
            <>
              <NumberField q={{ ...loss1, error: lossFieldError(loss1), failure: withLoss && loss1.text.trim() !== '' ? loss1.failure : undefined }} label={`Loss at ${windows[0]} nm`} unit="dB" signed example="such as 1.8 (leave empty if not measured)" calc={state} />
              <NumberField q={{ ...loss2, error: lossFieldError(loss2), failure: withLoss && loss2.text.trim() !== '' ? loss2.failure : undefined }} label={`Loss at ${windows[1]} nm`} unit="dB" signed example="such as 1.2 (leave empty if not measured)" calc={state} />
            </>
          )}
        </div>
      }
      how={{
        formula: 'Carried when the length is within the interface’s operating range on this fiber category and the loss at its window is within its channel insertion loss. Margin = limit − link value.',
        source: 'IEEE 802.3 clauses 38, 52, 68, 86, 87, 88, 95, 112 (per-interface source and what was checked listed below)',
        assumptions: ['The loss is the end-to-end insertion loss at the interface’s window (the 1300 nm reading stands for 1310 nm interfaces on multimode fiber).', 'No other impairment than the standard’s own link model allows for (the channel insertion loss already includes the fiber and connections of the standard’s link).'],
        validity: 'The interfaces listed; engineered links beyond the standard’s reach are not judged.',
      }}
    >
      {rows && (
        <ResultCard title="Each interface" stale={state.stale}>
          <DataTable
            caption={`Ethernet interfaces on ${category}`}
            rows={applicable}
            rowKey={(a) => a.name}
            rowClass={(a) => (a.verdict === 'carried' || a.verdict === 'length fits, loss not given' ? undefined : 'row-bad')}
            columns={[
              { label: 'Interface', cell: (a) => a.name },
              { label: 'Verdict', cell: (a) => VERDICT_MARK[a.verdict] },
              { label: 'Reach', cell: (a) => metres(a.maxReachM), num: true },
              { label: 'Channel loss', cell: (a) => formatDb(a.channelInsertionLossDb, 2), num: true },
              { label: 'Reach to spare', cell: (a) => metres(a.reachMarginM), num: true },
              { label: 'Loss to spare', cell: (a) => (a.lossMarginDb === undefined ? 'not checked' : formatDb(a.lossMarginDb, 2)), num: true },
            ]}
          />
          {applicable.some((a) => a.condition) && <ShortProse text={`1000BASE-LX on multimode fiber: ${applicable.find((a) => a.condition)!.condition}. The offset-launch screen shows why.`} />}
        </ResultCard>
      )}
      {rows && (
        <ResultCard title="Where each limit comes from">
          <ul class="source-list">
            {applicable.map((a) => (
              <li key={a.name}>
                <strong>{a.name}</strong>: {a.clause}. {a.source}
                {a.note ? `. ${a.note}` : ''}.
              </li>
            ))}
          </ul>
        </ResultCard>
      )}
    </CalcScreen>
  );
}
