// Optical power: dBm ⇄ mW ⇄ µW, and the power along a chain of losses (and gains).
import { useState } from 'preact/hooks';
import { NumberField, NumberInput } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatFixed, formatQuantity, withUnit } from '../../ui/format';
import { sentence } from '../../ui/errorText';
import type { ReportSpec } from '../../ui/copyText';
import { dbmToMw, dbmToUw, InputError, ModelError, parseQuantity, powerChain, STEP_DB_LIMIT, type ChainResult } from '../../physics';

interface StepRow {
  id: number;
  label: string;
  lossText: string;
}

// Opens on a worked example: a −3 dBm source through a patch cord, a 1×8 splitter and a 10 km span.
const DEFAULT_STEPS: StepRow[] = [
  { id: 1, label: 'Patch cord and connectors', lossText: '0.6' },
  { id: 2, label: 'Splitter 1×8', lossText: '10.5' },
  { id: 3, label: 'Fiber span 10 km', lossText: '3.5' },
];

const LOSS_EXAMPLE = 'a loss in dB such as 0.5, or a gain as a negative loss such as −3';

function readLoss(row: StepRow): number {
  const argument = `step-${row.id}`;
  const text = row.lossText.trim().replace(/\s*db$/i, '');
  let v: number;
  try {
    v = parseQuantity(argument, text, 'plain').value;
  } catch (e) {
    if (e instanceof InputError) throw new InputError(argument, row.lossText, LOSS_EXAMPLE, e.hint);
    throw e;
  }
  if (Math.abs(v) > STEP_DB_LIMIT) throw new InputError(argument, row.lossText, `a loss from −${STEP_DB_LIMIT} to ${STEP_DB_LIMIT} dB`);
  return v;
}

/** dBm with a typographic minus, the way a meter shows it. */
function dbm(v: number, decimals = 2): string {
  return withUnit(formatFixed(v, decimals).replace(/^-/, '−'), 'dBm');
}

export default function Screen() {
  const power = useQuantity('powerDbm', 'power', '-3 dBm');
  const [steps, setSteps] = useState<StepRow[]>(DEFAULT_STEPS);
  const [nextId, setNextId] = useState(DEFAULT_STEPS.length + 1);

  const conversion = useResult(() => {
    const p = need(power);
    return { dbm: p, mw: dbmToMw(p), uw: dbmToUw(p) };
  }, [power.value, power.failure]);

  const chain = useResult((): ChainResult => {
    const start = need(power);
    const list = steps.map((s, i) => ({ label: s.label.trim() || `Step ${i + 1}`, lossDb: readLoss(s) }));
    try {
      return powerChain(start, list);
    } catch (e) {
      // The running power leaves the handled range: not a field's fault, said in words.
      if (e instanceof InputError && /^(power after|end power)/.test(e.argument)) {
        throw new ModelError('Along this chain the power leaves the range this calculator handles (−150 to +90 dBm). Check the losses and gains.', 'power chain');
      }
      throw e;
    }
  }, [power.value, power.failure, steps]);

  const update = (id: number, patch: Partial<StepRow>) => setSteps(steps.map((s) => (s.id === id ? { ...s, ...patch } : s)));
  const remove = (id: number) => setSteps(steps.filter((s) => s.id !== id));
  const add = () => {
    setSteps([...steps, { id: nextId, label: '', lossText: '0.5' }]);
    setNextId(nextId + 1);
  };

  const c = conversion.result;
  const ch = chain.result;
  // Typed in mW, µW or W (a conversion note is shown): the answer is the dBm; typed in dBm: the milliwatts.
  const typedLinear = power.conversion !== '';
  const headline: Headline | undefined = c && {
    label: typedLinear ? 'In dBm' : 'In milliwatts',
    value: typedLinear ? dbm(c.dbm, 3) : formatQuantity(c.mw, 'mW', 5),
    // The chain's last good answer stays while the power is being retyped: the headline marks it not current.
    more: ch ? [{ label: 'At the end of the chain', value: dbm(ch.endDbm) }] : [],
  };

  const report: ReportSpec | undefined = c && {
    title: 'Optical power',
    inputs: [
      ['Power', dbm(c.dbm, 3)],
      ...steps.map((s, i): [string, string] => [`Step ${i + 1}${s.label.trim() ? ` (${s.label.trim()})` : ''}`, `${s.lossText.trim()} dB`]),
    ],
    outputs: [
      ['In milliwatts', formatQuantity(c.mw, 'mW', 5)],
      ['In microwatts', formatQuantity(c.uw, 'µW', 5)],
      ...(ch && !chain.stale
        ? [
            ...ch.points.map((p): [string, string] => [`After ${p.label}`, `${dbm(p.powerDbm)} (${formatQuantity(p.powerMw, 'mW')})`]),
            ['Total loss', formatDb(ch.totalLossDb)] as [string, string],
            ['End power', `${dbm(ch.endDbm)} (${formatQuantity(ch.endMw, 'mW')})`] as [string, string],
          ]
        : []),
    ],
    assumptions: ['P[dBm] = 10·log10(P / 1 mW) (definition of dBm).', 'Losses in series add in dB; a gain is entered as a negative loss.'],
  };

  const stepArgs = steps.map((s) => `step-${s.id}`);
  const rows = ch ? [{ label: 'Start', lossDb: undefined, powerDbm: ch.startDbm, powerMw: ch.startMw }, ...ch.points] : [];


  return (
    <CalcScreen
      headline={headline}
      status={{ stale: conversion.stale || chain.stale, error: cardError(conversion, [power.argument]) }}
      report={report}
      powerCaution
      inputsTitle="Power and units"
      inputs={
        <>
          <div class="form">
            <NumberField
              q={power}
              label="Optical power"
              unit="dBm"
              signed
              example="such as −3 (or 0.5 mW)"
              help="Type dBm, or a value with mW, µW or nW, such as 0.5 mW."
              quickPicks={[-10, -3, 0, 3]}
              calc={conversion}
            />
          </div>
          <h3>Power after a chain of losses</h3>
          <p class="note">Starts from the power above. Enter each loss in dB; enter a gain (an amplifier) as a negative loss.</p>
          <div class="chain-steps">
            {steps.map((s, i) => {
              const argument = `step-${s.id}`;
              const label = `Step ${i + 1} loss`;
              const err = chain.errorArgument === argument && chain.fault ? sentence(label, chain.fault.allowed, chain.fault.hint) : undefined;
              return (
                <fieldset key={s.id} class="row">
                  <legend>Step {i + 1}</legend>
                  <div class="field">
                    <label for={`${argument}-label`}>Step {i + 1} name</label>
                    <input id={`${argument}-label`} type="text" class="user-text" value={s.label} maxLength={60} onInput={(e) => update(s.id, { label: (e.currentTarget as HTMLInputElement).value })} />
                  </div>
                  <NumberInput id={`${argument}-loss`} label={label} unit="dB" signed text={s.lossText} onText={(t) => update(s.id, { lossText: t })} error={err} />
                  <button type="button" onClick={() => remove(s.id)} aria-label={`Remove step ${i + 1}`}>
                    Remove
                  </button>
                </fieldset>
              );
            })}
            <button type="button" onClick={add}>
              Add a step
            </button>
          </div>
        </>
      }
      how={{
        formula: 'P[dBm] = 10·log10(P / 1 mW); P_out[dBm] = P_in[dBm] − Σ loss[dB]',
        source: 'Definition of dBm and of the decibel (common practice)',
        assumptions: ['Losses of elements in series multiply as ratios, so they add in dB.', 'Powers are average optical powers.'],
        validity: '−150 to +90 dBm; each step within ±300 dB.',
      }}
    >
      {c && (
        <ResultCard title="The same power in each unit" stale={conversion.stale}>
          <dl class="kv">
            <dt>dBm</dt>
            <dd class="num">{dbm(c.dbm, 3)}</dd>
            <dt>milliwatts</dt>
            <dd class="num">{formatQuantity(c.mw, 'mW', 5)}</dd>
            <dt>microwatts</dt>
            <dd class="num">{formatQuantity(c.uw, 'µW', 5)}</dd>
          </dl>
        </ResultCard>
      )}
      <ResultCard title="Power along the chain" stale={chain.stale} error={chain.errorArgument && stepArgs.includes(chain.errorArgument) ? undefined : cardError(chain, [power.argument])}>
        {ch && (
          <>
            <DataTable
              caption="Power after each step"
              rows={rows}
              rowKey={(_r, i) => i}
              columns={[
                { label: 'After', cell: (r) => <span class="user-text">{r.label}</span> },
                { label: 'Loss', cell: (r) => (r.lossDb === undefined ? '—' : formatDb(r.lossDb)), num: true },
                { label: 'Power (dBm)', cell: (r) => dbm(r.powerDbm), num: true },
                { label: 'Power (mW)', cell: (r) => formatQuantity(r.powerMw, 'mW', 4), num: true },
              ]}
            />
            <dl class="kv">
              <dt>Total loss</dt>
              <dd class="num">{formatDb(ch.totalLossDb)}</dd>
              <dt>End power</dt>
              <dd>
                <span class="num">{dbm(ch.endDbm)}</span> (<span class="num">{formatQuantity(ch.endMw, 'mW', 4)}</span>)
              </dd>
            </dl>
          </>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
