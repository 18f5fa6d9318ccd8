// Optical power: dBm ⇄ mW ⇄ µW, and the power along a chain of losses (and gains).
import { useState } from 'preact/hooks';
import { NumberField, NumberInput } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { HowComputed } from '../../ui/HowComputed';
import { formatFixed, formatNumber } from '../../ui/format';
import { reportText } from '../../ui/copyText';
import { dbmToMw, dbmToUw, InputError, parseQuantity, powerChain } from '../../physics';
import { HazardContextCautions } from '../safety/HazardContext';

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

function readLoss(row: StepRow, i: number): number {
  const argument = `step-${row.id}`;
  const text = row.lossText.trim().replace(/\s*db$/i, '');
  try {
    return parseQuantity(argument, text, 'plain').value;
  } catch (e) {
    if (e instanceof InputError) throw new InputError(argument, row.lossText, 'a loss in dB such as 0.5 (a gain as a negative loss)', `step ${i + 1}`);
    throw e;
  }
}

export default function Screen() {
  const power = useQuantity('powerDbm', 'power', '-3 dBm');
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const [steps, setSteps] = useState<StepRow[]>(DEFAULT_STEPS);
  const [nextId, setNextId] = useState(DEFAULT_STEPS.length + 1);

  const conversion = useResult(() => {
    const dbm = need(power);
    return { dbm, mw: dbmToMw(dbm), uw: dbmToUw(dbm) };
  }, [power.value, power.failure]);

  const chain = useResult(
    () => powerChain(need(power), steps.map((s, i) => ({ label: s.label || `Step ${i + 1}`, lossDb: readLoss(s, i) }))),
    [power.value, power.failure, steps],
  );

  // The hazard context is for the highest power anywhere in the chain (an amplifier can raise it).
  const highestDbm = chain.result
    ? Math.max(chain.result.startDbm, ...chain.result.points.map((p) => p.powerDbm))
    : power.value;

  const update = (id: number, patch: Partial<StepRow>) => setSteps(steps.map((s) => (s.id === id ? { ...s, ...patch } : s)));
  const remove = (id: number) => setSteps(steps.filter((s) => s.id !== id));
  const add = () => {
    setSteps([...steps, { id: nextId, label: '', lossText: '0.5' }]);
    setNextId(nextId + 1);
  };

  const conversionText =
    conversion.result &&
    reportText({
      title: 'Optical power conversion',
      inputs: [['Power', power.text]],
      outputs: [
        ['dBm', `${formatFixed(conversion.result.dbm, 3)} dBm`],
        ['mW', `${formatNumber(conversion.result.mw, 5)} mW`],
        ['µW', `${formatNumber(conversion.result.uw, 5)} µW`],
      ],
      assumptions: ['P[dBm] = 10·log10(P / 1 mW) (definition of dBm).'],
    });

  const chainText =
    chain.result &&
    reportText({
      title: 'Power along a chain of losses',
      inputs: [['Start power', `${formatFixed(chain.result.startDbm, 2)} dBm`], ...chain.result.points.map((p): [string, string] => [p.label, `${formatFixed(p.lossDb, 2)} dB`])],
      outputs: [
        ...chain.result.points.map((p): [string, string] => [`After ${p.label}`, `${formatFixed(p.powerDbm, 2)} dBm (${formatNumber(p.powerMw, 4)} mW)`]),
        ['Total loss', `${formatFixed(chain.result.totalLossDb, 2)} dB`],
        ['End power', `${formatFixed(chain.result.endDbm, 2)} dBm (${formatNumber(chain.result.endMw, 4)} mW)`],
      ],
      assumptions: ['Losses in series add in dB; a gain is entered as a negative loss.'],
    });

  return (
    <>
      <h2>Power and units</h2>
      <div class="form">
        <NumberField q={power} label="Optical power" unit="dBm" help="Type dBm, or a value with mW, µW or nW, e.g. 0.5 mW." quickPicks={[-10, -3, 0, 3]} />
        <NumberField q={wavelength} label="Wavelength (for the hazard context)" unit="nm" quickPicks={[850, 1310, 1550]} />
      </div>

      <ResultCard title="The same power in each unit" stale={conversion.stale} error={conversion.error} copyText={conversionText}>
        {conversion.result && (
          <dl class="kv">
            <dt>dBm</dt>
            <dd>{formatFixed(conversion.result.dbm, 3)} dBm</dd>
            <dt>milliwatts</dt>
            <dd>{formatNumber(conversion.result.mw, 5)} mW</dd>
            <dt>microwatts</dt>
            <dd>{formatNumber(conversion.result.uw, 5)} µW</dd>
          </dl>
        )}
      </ResultCard>

      <h2>Power after a chain of losses</h2>
      <p class="note">Starts from the power above. Enter each loss in dB; enter a gain (an amplifier) as a negative loss.</p>
      <div class="chain-steps">
        {steps.map((s, i) => {
          const argument = `step-${s.id}`;
          const err = chain.errorArgument === argument ? chain.error : undefined;
          return (
            <fieldset key={s.id} class="row">
              <legend>Step {i + 1}</legend>
              <div class="field">
                <label for={`${argument}-label`}>Name</label>
                <input id={`${argument}-label`} type="text" value={s.label} maxLength={60} onInput={(e) => update(s.id, { label: (e.currentTarget as HTMLInputElement).value })} />
              </div>
              <NumberInput id={`${argument}-loss`} label="Loss" unit="dB" text={s.lossText} onText={(t) => update(s.id, { lossText: t })} error={err} />
              <button type="button" onClick={() => remove(s.id)} aria-label={`Remove step ${i + 1}`}>Remove</button>
            </fieldset>
          );
        })}
        <button type="button" onClick={add}>Add a step</button>
      </div>

      <ResultCard title="Power along the chain" stale={chain.stale} error={chain.errorArgument?.startsWith('step-') ? undefined : chain.error} copyText={chainText}>
        {chain.result && (
          <>
            <table>
              <thead>
                <tr>
                  <th scope="col">After</th>
                  <th scope="col">Loss (dB)</th>
                  <th scope="col">Power (dBm)</th>
                  <th scope="col">Power (mW)</th>
                </tr>
              </thead>
              <tbody>
                <tr>
                  <td>Start</td>
                  <td>—</td>
                  <td>{formatFixed(chain.result.startDbm, 2)}</td>
                  <td>{formatNumber(chain.result.startMw, 4)}</td>
                </tr>
                {chain.result.points.map((p, i) => (
                  <tr key={i}>
                    <td>{p.label}</td>
                    <td>{formatFixed(p.lossDb, 2)}</td>
                    <td>{formatFixed(p.powerDbm, 2)}</td>
                    <td>{formatNumber(p.powerMw, 4)}</td>
                  </tr>
                ))}
              </tbody>
            </table>
            <dl class="kv">
              <dt>Total loss</dt>
              <dd>{formatFixed(chain.result.totalLossDb, 2)} dB</dd>
              <dt>End power</dt>
              <dd>
                {formatFixed(chain.result.endDbm, 2)} dBm ({formatNumber(chain.result.endMw, 4)} mW)
              </dd>
            </dl>
          </>
        )}
      </ResultCard>

      <HowComputed
        formula="P[dBm] = 10·log10(P / 1 mW); P_out[dBm] = P_in[dBm] − Σ loss[dB]"
        source="Definition of dBm and of the decibel (common practice)"
        assumptions={['Losses of elements in series multiply as ratios, so they add in dB.', 'Powers are average optical powers.']}
        validity="−150 to +90 dBm; each step within ±300 dB."
      />

      <HazardContextCautions wavelengthNm={wavelength.value} powerDbm={highestDbm} what="Highest power entered" />
    </>
  );
}
