// PMD: link PMD of a route (one or two sections and components), the odds of a large instantaneous DGD, and
// whether the route carries a signal.
import { Fragment } from 'preact';
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatNumber, formatPercent, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import {
  concatenatedPmd,
  maxwellDgdExceeded,
  maxwellExceedProbability,
  PMD_SIGNALS,
  PMDQ_BY_CATEGORY,
  PMDQ_PROBABILITY_Q,
  PMDQ_SECTIONS_M,
  pmdVerdict,
} from '../../physics';

const OWN = 'own';

function oddsWords(p: number): string {
  if (p <= 0) return 'practically never';
  if (p >= 0.01) return `${formatNumber(p * 100, 2)}\u00a0% of the time`;
  return `about one time in ${formatNumber(Math.round(1 / p), 2)}`;
}

export default function Screen() {
  const coef1 = useQuantity('coefficientPsPerSqrtKm', 'plain', '0.2');
  const len1 = useQuantity('lengthKm', 'length', '80');
  const coef2 = useQuantity('coefficient2PsPerSqrtKm', 'plain', '0.5');
  const len2 = useQuantity('length2Km', 'length', '0');
  const comp = useQuantity('componentsPs', 'plain', '0');
  const [signalId, setSignalId] = useState<string>('10g-nrz');
  const ownRate = useQuantity('symbolRateGbaud', 'plain', '25');
  const ownShare = useQuantity('periodShare', 'plain', '0.1');
  const dgd = useQuantity('dgdPs', 'plain', '10');

  const state = useResult(() => {
    const route = concatenatedPmd({
      sections: [
        { coefficientPsPerSqrtKm: need(coef1), lengthKm: need(len1) },
        { coefficientPsPerSqrtKm: need(coef2), lengthKm: need(len2) },
      ],
      componentsPs: [need(comp)],
    });
    const signal = PMD_SIGNALS.find((s) => s.id === signalId);
    const verdict = signal
      ? pmdVerdict({ linkPmdPs: route.totalPs, symbolRateGbaud: signal.symbolRateGbaud, periodShare: signal.periodShare, fixedMaxPmdPs: signal.fixedMaxPmdPs })
      : pmdVerdict({ linkPmdPs: route.totalPs, symbolRateGbaud: need(ownRate), periodShare: need(ownShare) });
    const mean = route.totalPs;
    const exceed = mean > 0 ? maxwellExceedProbability({ dgdPs: need(dgd), meanDgdPs: mean }) : 0;
    const levels = [1e-3, 1e-5, 1e-7].map((p) => ({ p, dgdPs: mean > 0 ? maxwellDgdExceeded({ probability: p, meanDgdPs: mean }) : 0 }));
    return { route, verdict, signal, exceed, levels };
  }, [coef1.value, coef1.failure, len1.value, len1.failure, coef2.value, coef2.failure, len2.value, len2.failure, comp.value, comp.failure, signalId, ownRate.value, ownRate.failure, ownShare.value, ownShare.failure, dgd.value, dgd.failure]);

  // Physics names sections by their place in the list; each field says its own fault.
  const argumentFor: Record<string, string> = {
    'sections[0].coefficientPsPerSqrtKm': coef1.argument,
    'sections[0].lengthKm': len1.argument,
    'sections[1].coefficientPsPerSqrtKm': coef2.argument,
    'sections[1].lengthKm': len2.argument,
    'componentsPs[0]': comp.argument,
  };
  const calc = { errorArgument: state.errorArgument === undefined ? undefined : argumentFor[state.errorArgument] ?? state.errorArgument, fault: state.fault };
  const fieldArgs = [...Object.keys(argumentFor), ownRate.argument, ownShare.argument, dgd.argument, 'linkPmdPs'];
  const r = state.result;
  const signalName = r?.signal?.name ?? `${formatQuantity(ownRate.value, 'GBd', 6)} signal`;

  const headline: Headline | undefined = r && {
    label: 'Link PMD',
    value: formatQuantity(r.route.totalPs, 'ps', 3),
    verdict: r.verdict.carries
      ? `Carries ${signalName}, ${formatQuantity(r.verdict.marginPs, 'ps', 2)} to spare`
      : `Does not carry ${signalName}: ${formatQuantity(-r.verdict.marginPs, 'ps', 2)} over`,
    tone: r.verdict.carries ? 'ok' : 'bad',
  };

  const report: ReportSpec | undefined = r && {
    title: 'PMD of a route',
    inputs: [
      ['Section 1', `${shownValue(coef1, 'ps/√km')} over ${shownValue(len1, 'km')}`],
      ['Section 2', `${shownValue(coef2, 'ps/√km')} over ${shownValue(len2, 'km')}`],
      ['Components', shownValue(comp, 'ps')],
      ['Signal', signalName],
    ],
    outputs: [
      ['Link PMD (mean DGD)', formatQuantity(r.route.totalPs, 'ps', 3)],
      ['Tolerated PMD', formatQuantity(r.verdict.maxPmdPs, 'ps', 3)],
      ['Verdict', r.verdict.carries ? 'carries it' : 'does not carry it'],
      [`DGD above ${shownValue(dgd, 'ps')}`, oddsWords(r.exceed)],
      ...r.levels.map((l): [string, string] => [`DGD exceeded with probability ${formatNumber(l.p, 1)}`, formatQuantity(l.dgdPs, 'ps', 3)]),
    ],
    assumptions: [
      'PMD = coefficient × √length; sections and components add as the root of the sum of squares (ITU-T G.650.2).',
      'Instantaneous DGD Maxwell-distributed with mean equal to the PMD.',
      r.signal?.source ?? 'Tolerance as the share of the symbol period typed.',
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError({ error: state.error, errorArgument: state.errorArgument }, fieldArgs) }}
      report={report}
      inputsTitle="The route and the signal"
      inputs={
        <div class="form">
          <NumberField q={coef1} label="PMD coefficient of the cable" unit="ps/√km" quickPicks={[0.04, 0.1, 0.2, 0.5]} calc={calc} help="From the cable's test sheet; 0.2 is the link design value of G.652.D." />
          <NumberField q={len1} label="Length of that cable" unit="km" quickPicks={[10, 40, 80]} calc={calc} />
          <NumberField q={coef2} label="PMD coefficient of a second, older section" unit="ps/√km" quickPicks={[0.5, 1, 2]} calc={calc} />
          <NumberField q={len2} label="Length of the second section" unit="km" quickPicks={[0, 20, 50]} calc={calc} help="0 when the route is one cable." />
          <NumberField q={comp} label="PMD of components on the route" unit="ps" quickPicks={[0, 0.5, 1]} calc={calc} help="Amplifiers, compensators and the like, added the same way." />
          <div class="field">
            <label for="pmd-signal">Signal to carry</label>
            <select id="pmd-signal" value={signalId} onChange={(e) => setSignalId((e.currentTarget as HTMLSelectElement).value)}>
              {PMD_SIGNALS.map((s) => (
                <option key={s.id} value={s.id}>
                  {s.name}
                </option>
              ))}
              <option value={OWN}>My own symbol rate and share</option>
            </select>
          </div>
          {signalId === OWN && (
            <>
              <NumberField q={ownRate} label="Symbol rate" unit="GBd" calc={calc} />
              <NumberField q={ownShare} label="Tolerated PMD as a share of the symbol period" unit="" quickPicks={[0.1, 0.15]} calc={calc} />
            </>
          )}
          <NumberField q={dgd} label="How often does the DGD exceed" unit="ps" calc={calc} />
        </div>
      }
      how={{
        formula:
          'PMD = coefficient·√L; route PMD = √(Σ PMD_i²). Instantaneous DGD: Maxwell distribution with mean PMD, P(DGD > x) = erfc(x/(a√2)) + √(2/π)(x/a)·exp(−x²/2a²), a = PMD·√(π/8). Verdict: route PMD against the tolerated PMD of the signal.',
        source: 'Poole & Wagner 1986, Electron. Lett. 22(19); ITU-T G.650.2 (PMD definitions, PMDQ); Maxwell values checked against scipy.stats.maxwell',
        assumptions: [
          'Long sections with random mode coupling (PMD grows with √length).',
          'On-off keyed signals tolerate a mean DGD of about 10 % of the bit period (common practice); coherent receivers undo PMD up to the equipment’s stated tolerance (value here from memory).',
        ],
        validity: 'Routes of a few km and longer; very short or strongly polarization-maintaining links do not follow Maxwell statistics.',
      }}
    >
      {r && (
        <ResultCard title="How large the DGD gets" stale={state.stale}>
          <dl class="kv">
            <dt>Tolerated PMD for {signalName}</dt>
            <dd class="num">{formatQuantity(r.verdict.maxPmdPs, 'ps', 3)}</dd>
            <dt>DGD above {formatQuantity(dgd.value, 'ps', 6)}</dt>
            <dd>{oddsWords(r.exceed)}</dd>
            {r.levels.map((l) => (
              <Fragment key={l.p}>
                <dt>DGD exceeded with probability {formatNumber(l.p, 1)}</dt>
                <dd class="num">{formatQuantity(l.dgdPs, 'ps', 3)}</dd>
              </Fragment>
            ))}
            <dt>Equivalent coefficient of the whole route</dt>
            <dd class="num">{formatQuantity(r.route.equivalentCoefficientPsPerSqrtKm, 'ps/√km', 3)}</dd>
          </dl>
          <ShortProse text="PMD is the mean of a delay that wanders with temperature, strain and wavelength. The instantaneous delay passes three times its mean only about four times in a hundred thousand, so a route is judged by its mean against the signal's tolerance." />
        </ResultCard>
      )}
      <ResultCard title="Link design values of the fiber categories">
        <DataTable
          caption={`PMDQ (M = ${PMDQ_SECTIONS_M} cable sections, Q = ${formatPercent(PMDQ_PROBABILITY_Q, 2)})`}
          rows={PMDQ_BY_CATEGORY}
          rowKey={(q) => q.category}
          columns={[
            { label: 'Category (recommendation)', cell: (q) => `${q.category} (${q.recommendation})` },
            { label: 'PMDQ', cell: (q) => formatQuantity(q.pmdqPsPerSqrtKm, 'ps/√km', 2), num: true },
          ]}
        />
      </ResultCard>
    </CalcScreen>
  );
}
