// Reflection and return loss: a reading shown both ways (reflectance, negative dB; return loss, positive dB),
// against the typical figure of a polish; glass faces and gaps from Fresnel and the etalon; the ORL of a link.
import { useState } from 'preact/hooks';
import { NumberField } from '../../ui/NumberField';
import { need, useQuantity, shownValue } from '../../ui/useQuantity';
import { cardError, useResult } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { formatDb, formatPercent, formatQuantity } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import {
  backscatterReturnLoss,
  gapReflection,
  INDEX_AIR,
  INDEX_MATCHING_GEL,
  linkReturnLoss,
  ModelError,
  modeFieldDiameterUm,
  POLISH_TYPICAL,
  rayleighScatteringDbPerKm,
  reflectionFromDb,
  typicalReflections,
  type Polish,
  type Reflection,
} from '../../physics';

/** Below this share a reflection is shown as "none" rather than as a meaningless −200 dB. */
const NONE_FRACTION = 1e-12;

function reflectanceText(r: Reflection): string {
  return r.fraction <= NONE_FRACTION ? 'none' : formatDb(r.reflectanceDb, 1);
}
function returnLossText(r: Reflection): string {
  return r.fraction <= NONE_FRACTION ? 'none' : formatDb(r.returnLossDb, 1);
}

export default function Screen() {
  const reading = useQuantity('reflectanceDb', 'plain', '-55');
  const [polish, setPolish] = useState<Polish>('UPC');
  const fiberIndex = useQuantity('fiberIndex', 'plain', '1.468');
  const [medium, setMedium] = useState<'air' | 'gel'>('air');
  const gap = useQuantity('gapUm', 'size', '0.3');
  const picker = useFiberPicker({ id: 'orl-fiber', label: 'Fiber of the link', shortLabel: 'Fiber', kinds: ['single-mode'], defaultCategory: 'G.652.D' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1550');
  const length = useQuantity('lengthKm', 'length', '10');
  const attenuation = useQuantity('attenuationDbPerKm', 'plain', '0.2');
  const nearDb = useQuantity('nearReflectanceDb', 'plain', '-50');
  const farDb = useQuantity('farReflectanceDb', 'plain', '-50');

  const state = useResult(() => {
    const r = reflectionFromDb(need(reading));
    const typical = POLISH_TYPICAL.find((p) => p.polish === polish)!;
    const gapR = gapReflection({ fiberIndex: need(fiberIndex), mediumIndex: medium === 'air' ? INDEX_AIR : INDEX_MATCHING_GEL, gapUm: need(gap), wavelengthNm: need(wavelength) });
    return { r, typical, gapR, table: typicalReflections({ fiberIndex: need(fiberIndex) }) };
  }, [reading.value, reading.failure, polish, fiberIndex.value, fiberIndex.failure, medium, gap.value, gap.failure, wavelength.value, wavelength.failure]);

  const link = useResult(() => {
    const fiber = picker.fiber;
    if (!fiber) throw new ModelError(picker.error ?? 'Choose the fiber of the link above.', 'fiber choice');
    const w = need(wavelength);
    const mfdUm = modeFieldDiameterUm({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm: w, definition: 'petermann2' }).mfdUm;
    const bs = backscatterReturnLoss({ mfdUm, wavelengthNm: w, scatteringDbPerKm: rayleighScatteringDbPerKm({ wavelengthNm: w }), attenuationDbPerKm: need(attenuation), lengthKm: need(length) });
    const lossToFar = need(attenuation) * need(length);
    const orl = linkReturnLoss({
      events: [
        { reflectanceDb: need(nearDb), lossBeforeDb: 0 },
        { reflectanceDb: need(farDb), lossBeforeDb: lossToFar },
      ],
      backscatterReturnLossDb: bs.returnLossDb,
    });
    return { bs, orl, mfdUm, lossToFar };
  }, [picker.fiber, picker.error, wavelength.value, wavelength.failure, attenuation.value, attenuation.failure, length.value, length.failure, nearDb.value, nearDb.failure, farDb.value, farDb.failure]);

  const argumentFor: Record<string, string> = { 'events[0].reflectanceDb': nearDb.argument, 'events[1].reflectanceDb': farDb.argument, scatteringDbPerKm: attenuation.argument };
  const linkCalc = { errorArgument: link.errorArgument === undefined ? undefined : argumentFor[link.errorArgument] ?? link.errorArgument, fault: link.fault };
  const fieldArgs = [reading.argument, fiberIndex.argument, gap.argument, wavelength.argument, length.argument, attenuation.argument, ...Object.keys(argumentFor)];
  const s = state.result;
  const l = link.result;
  const better = s ? s.r.reflectanceDb <= s.typical.reflectanceDb : false;

  const headline: Headline | undefined = s && {
    label: 'Reflectance',
    value: formatDb(s.r.reflectanceDb, 1),
    verdict: `= return loss ${formatDb(s.r.returnLossDb, 1)}; ${better ? 'within' : 'worse than'} the typical ${s.typical.polish} figure (${formatDb(s.typical.reflectanceDb, 0)})`,
    tone: better ? 'ok' : 'warn',
    more: l ? [{ label: 'Link ORL', value: formatDb(l.orl.orlDb, 1), verdict: `return loss of the whole link; backscatter gives ${formatPercent(l.orl.backscatterShare, 0)} of it` }] : [],
  };

  const report: ReportSpec | undefined = s && {
    title: 'Reflection and return loss',
    inputs: [
      ['Reading', shownValue(reading, 'dB')],
      ['Compared with', s.typical.name],
      ['Fiber index at the face', shownValue(fiberIndex, '')],
      ['Gap', `${shownValue(gap, 'µm')} of ${medium === 'air' ? 'air' : 'index-matching gel'}`],
      ['Link', `${picker.fiber?.name ?? ''}, ${shownValue(length, 'km')} at ${shownValue(attenuation, 'dB/km')}, ${shownValue(wavelength, 'nm')}`],
      ['Reflectance at the near and far ends', `${shownValue(nearDb, 'dB')} and ${shownValue(farDb, 'dB')}`],
    ],
    outputs: [
      ['Reflectance (negative dB)', formatDb(s.r.reflectanceDb, 1)],
      ['Return loss (positive dB)', formatDb(s.r.returnLossDb, 1)],
      [`Typical ${s.typical.polish} pair`, `${formatDb(s.typical.reflectanceDb, 0)} (${s.typical.source})`],
      ['Gap reflectance at this width', reflectanceText(s.gapR.atGap!)],
      ['Gap reflectance, worst width', reflectanceText(s.gapR.maximum)],
      ...(l
        ? ([
            ['Backscatter return loss of the fiber', formatDb(l.bs.returnLossDb, 1)],
            ['Link ORL', formatDb(l.orl.orlDb, 1)],
          ] as [string, string][])
        : []),
    ],
    assumptions: [
      'Reflectance = 10·log10(reflected/incident), negative; return loss = the same number positive (IEC 61300-3-6).',
      'Gap as a two-face etalon (Airy formula), plane waves: valid for gaps well under the mode’s Rayleigh range.',
      'Backscatter from the Gaussian-mode capture fraction (Brinkmeyer 1980) and a typical Rayleigh coefficient of 0.9 dB·µm⁴/km.',
    ],
  };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, fieldArgs) }}
      report={report}
      inputsTitle="A reflection, a gap and a link"
      inputs={
        <>
          <div class="form">
            <NumberField q={reading} label="Reflection as read (either sign)" unit="dB" signed example="such as −55 or 55" calc={state} help="Meters show reflectance as a negative number and return loss as a positive one; both mean the same here." />
            <div class="field">
              <label for="refl-polish">Compare with a typical</label>
              <select id="refl-polish" value={polish} onChange={(e) => setPolish((e.currentTarget as HTMLSelectElement).value as Polish)}>
                {POLISH_TYPICAL.map((p) => (
                  <option key={p.polish} value={p.polish}>
                    {p.name}
                  </option>
                ))}
              </select>
            </div>
            <NumberField q={fiberIndex} label="Glass index at the end face" unit="" quickPicks={[1.444, 1.468]} calc={state} />
            <div class="field">
              <label for="refl-medium">Between two faces</label>
              <select id="refl-medium" value={medium} onChange={(e) => setMedium((e.currentTarget as HTMLSelectElement).value as 'air' | 'gel')}>
                <option value="air">Air (n = 1.0)</option>
                <option value="gel">Index-matching gel (n ≈ 1.46)</option>
              </select>
            </div>
            <NumberField q={gap} label="Gap between the faces" unit="µm" quickPicks={[0, 0.3, 1]} calc={state} help="0 when the faces touch." />
          </div>
          {picker.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={[1310, 1550, 1625]} calc={state} />
            <NumberField q={length} label="Length of the link" unit="km" quickPicks={[1, 10, 40]} calc={linkCalc} />
            <NumberField q={attenuation} label="Fiber attenuation" unit="dB/km" quickPicks={[0.2, 0.35]} calc={linkCalc} help="The fiber's own figure at this wavelength: about 0.2 at 1550 nm, 0.35 at 1310 nm on standard fiber (typical)." />
            <NumberField q={nearDb} label="Reflectance of the connector at the near end" unit="dB" signed calc={linkCalc} />
            <NumberField q={farDb} label="Reflectance at the far end" unit="dB" signed calc={linkCalc} help="An open, flat-cleaved end reflects about −14 dB." />
          </div>
        </>
      }
      how={{
        formula:
          'Face: R = ((n₁ − n₂)/(n₁ + n₂))². Gap (etalon): R(δ) = F sin²(δ/2)/(1 + F sin²(δ/2)), F = 4R/(1 − R)², δ = 4πn·s/λ; from 0 to 4R/(1 + R)². Backscatter of a length: S·α_s·(1 − e^(−2αL))/(2α), S = 3/(2(nkw)²). Link ORL = −10·log10(Σ R_i·10^(−2A_i/10) + backscatter).',
        source: 'Fresnel and Airy formulas, Born & Wolf 1999 (§1.5, §7.6.1); Brinkmeyer 1980 (capture fraction); Personick 1977 (backscatter); IEC 61300-3-6 (return loss, positive)',
        assumptions: [
          'Typical figures by polish are the trade’s usual figures, not a standard limit: the component standard that applies sets the grade.',
          'Each reflection pays the fiber loss before it twice (there and back).',
        ],
        validity: 'Normal incidence for flat faces; an angled face returns far less than the flat-face figure.',
      }}
    >
      {s && (
        <ResultCard title="Reflectance and return loss side by side" stale={state.stale}>
          <DataTable
            caption="Faces, gaps and polishes"
            rows={[...s.table, { label: `Your gap of ${formatQuantity(gap.value, 'µm', 6)}`, reflection: s.gapR.atGap!, source: 'Airy etalon at this width and wavelength' }]}
            rowKey={(x) => x.label}
            columns={[
              { label: 'What', cell: (x) => x.label },
              { label: 'Reflectance', cell: (x) => reflectanceText(x.reflection), num: true },
              { label: 'Return loss', cell: (x) => returnLossText(x.reflection), num: true },
            ]}
          />
          <ShortProse text="Reflectance is the reflected share in dB, a negative number; return loss is the same thing with the sign turned, a positive number. A larger return loss, or a more negative reflectance, means less light sent back." />
        </ResultCard>
      )}
      <ResultCard title="Return loss of the link" stale={link.stale} error={cardError(link, fieldArgs)}>
        {l && (
          <dl class="kv">
            <dt>Backscatter of the fiber alone</dt>
            <dd class="num">{formatDb(l.bs.returnLossDb, 1)}</dd>
            <dt>Backscatter of an endless fiber (the limit)</dt>
            <dd class="num">{formatDb(l.bs.limitDb, 1)}</dd>
            <dt>Length where it is within 0.1 dB of the limit</dt>
            <dd class="num">{formatQuantity(l.bs.nearLimitKm, 'km', 3)}</dd>
            <dt>Share of the returned light: near end, far end, backscatter</dt>
            <dd>
              <span class="num">{formatPercent(l.orl.shares[0], 1)}</span>, <span class="num">{formatPercent(l.orl.shares[1], 1)}</span>, <span class="num">{formatPercent(l.orl.backscatterShare, 1)}</span>
            </dd>
          </dl>
        )}
      </ResultCard>
    </CalcScreen>
  );
}
