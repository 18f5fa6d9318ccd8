// Single-mode check: is this fiber single-mode at this wavelength? V-number, verdict, distance to the
// LP11 cutoff, the guided LP modes with their vector families, a b–V diagram and a mode picture.
import { useState } from 'preact/hooks';
import { NumberField, OPERATING_WAVELENGTHS_NM } from '../../ui/NumberField';
import { need, useQuantity } from '../../ui/useQuantity';
import { useResult, cardError } from '../../ui/useResult';
import { ResultCard } from '../../ui/ResultCard';
import { CalcScreen, ShortProse, type Headline } from '../../ui/CalcScreen';
import { DataTable } from '../../ui/DataTable';
import { LinePlot } from '../../ui/Plot';
import { formatNumber, formatQuantity, lpName, withUnit } from '../../ui/format';
import type { ReportSpec } from '../../ui/copyText';
import { useFiberPicker } from '../../ui/FiberPicker';
import { InputError, LP11_CUTOFF_V, lpBvCurve, lpCutoffV, singleModeCheck, type LPMode, type SingleModeCheck } from '../../physics';
import { ModePicture } from './ModePicture';

/** LP families drawn on the b–V diagram: the first five to appear as V grows (one line style each). */
const DIAGRAM_FAMILIES: [number, number][] = [[0, 1], [1, 1], [2, 1], [0, 2], [3, 1]];
/** The mode table lists this many modes; the rest are counted. */
const TABLE_ROWS = 40;

const name = (m: { l: number; m: number }) => lpName(m.l, m.m);

export default function Screen() {
  const picker = useFiberPicker({ id: 'single-mode', label: 'Fiber type', kinds: ['single-mode', 'multimode'], defaultCategory: 'G.652.D' });
  const wavelength = useQuantity('wavelengthNm', 'wavelength', '1310');
  const [chosen, setChosen] = useState<string>('');
  const fiber = picker.fiber;

  const state = useResult(() => {
    if (!fiber) throw new InputError('fiber', undefined, 'a fiber type', picker.error ?? 'pick a fiber type');
    const wavelengthNm = need(wavelength);
    return { ...singleModeCheck({ coreRadiusUm: fiber.coreRadiusUm, na: fiber.na, wavelengthNm }), wavelengthNm };
  }, [fiber, picker.error, wavelength.text]);
  const r = state.result;

  const shown: LPMode | undefined = r && (r.modes.find((m) => name(m) === chosen) ?? r.modes.find((m) => m.l === 1 && m.m === 1) ?? r.modes[0]);
  const labelCutoff = fiber?.cutoffWavelengthNm;
  // The label's measured cutoff decides in practice: above it LP11 is stripped within metres,
  // even where the equivalent step-index model still guides it weakly.
  const verdict = !r
    ? { tone: 'info' as const, words: '', practical: false }
    : r.singleMode
      ? { tone: 'ok' as const, words: 'Single-mode: only LP01 is guided', practical: false }
      : labelCutoff !== undefined && r.wavelengthNm > labelCutoff
        ? { tone: 'ok' as const, words: 'Single-mode in practice: above the cutoff on the label', practical: true }
        : { tone: 'warn' as const, words: `Not single-mode: ${r.lpModeCount} LP modes are guided`, practical: false };

  const headline: Headline | undefined = r && {
    label: `V at ${withUnit(formatNumber(r.wavelengthNm, 6), 'nm')}`,
    value: formatNumber(r.v, 4),
    verdict: verdict.words,
    tone: verdict.tone,
  };

  const report: ReportSpec | undefined =
    r &&
    fiber && {
      title: 'Single-mode check',
      inputs: [
        ['Fiber type', fiber.name],
        ['Core radius (equivalent step index)', `${formatNumber(fiber.coreRadiusUm, 4)} µm`],
        ['NA', formatNumber(r.na, 4)],
        ['Wavelength', `${formatNumber(r.wavelengthNm, 6)} nm`],
      ],
      outputs: [
        ['V-number', formatNumber(r.v, 4)],
        ['Verdict', verdict.words],
        ['Theoretical LP11 cutoff wavelength', `${formatNumber(r.lp11CutoffWavelengthNm, 5)} nm`],
        ['Guided LP modes', `${r.lpModeCount} (${r.modes.slice(0, 12).map(name).join(', ')}${r.lpModeCount > 12 ? ', …' : ''})`],
        ['Vector mode families', String(r.vectorFamilyCount)],
        ['All modes with degeneracy', String(r.totalModeCount)],
        ['Summary', r.summary],
      ],
      assumptions: ['Weakly guiding step-index fiber, LP modes (Gloge 1971); single-mode below V = 2.405.', ...fiber.notes],
    };

  return (
    <CalcScreen
      headline={headline}
      status={{ stale: state.stale, error: cardError(state, [wavelength.argument]) }}
      report={report}
      inputsTitle="Fiber and wavelength"
      inputs={
        <>
          {picker.element}
          <div class="form">
            <NumberField q={wavelength} label="Wavelength" unit="nm" quickPicks={OPERATING_WAVELENGTHS_NM} calc={state} />
          </div>
        </>
      }
      how={{
        formula: 'V = 2π a NA / λ; LP modes from u J_{l−1}(u)/J_l(u) = −w K_{l−1}(w)/K_l(w), u² + w² = V², b = w²/V²; LP_lm is cut off where J_{l−1}(V) = 0',
        source: 'Gloge 1971 (weakly guiding fibers); Bessel functions and zeros checked against Abramowitz & Stegun Tables 9.1, 9.5, 9.8',
        assumptions: [
          'Step-index core of radius a; a fiber type given by its label is replaced by its equivalent step-index core.',
          'Weak guidance (core and cladding indices close): modes are grouped into LP modes.',
          'Single-mode below V = 2.405, the first zero of J₀ (common practice).',
        ],
        validity: 'V from 0.1 to 300. Below V ≈ 1 the single mode spreads far into the cladding and bends easily strip it.',
      }}
    >
      <ResultCard title="Why, and the modes" stale={state.stale}>
        {r && (
          <>
            {verdict.practical && (
              <ShortProse
                text={`The label's ${fiber?.cutoffKind === 'cable' ? 'cable' : 'fiber'} cutoff (${withUnit(String(labelCutoff), 'nm')}) is below ${withUnit(formatNumber(r.wavelengthNm, 6), 'nm')}. In theory higher modes are still guided here, but so weakly (LP11: b = ${formatNumber(r.modes[1]?.b, 2)}) that they are lost within metres. That is what a measured cutoff means.`}
              />
            )}
            <ShortProse text={verdict.practical ? `In theory (step-index model): ${r.summary}` : r.summary} />
            <dl class="kv">
              <dt>Distance to the LP11 cutoff</dt>
              <dd>
                <span class="num">{withUnit(formatNumber(Math.abs(r.relativeDistanceToCutoff) * 100, 3), '%')}</span> {r.relativeDistanceToCutoff <= 0 ? 'below' : 'above'} V = 2.405 (
                <span class="num">{formatQuantity(Math.abs(r.wavelengthMarginNm), 'nm')}</span> {r.wavelengthMarginNm >= 0 ? 'above' : 'below'} the cutoff wavelength)
              </dd>
              <dt>Theoretical LP11 cutoff wavelength</dt>
              <dd class="num">{formatQuantity(r.lp11CutoffWavelengthNm, 'nm', 5)}</dd>
              {labelCutoff !== undefined && (
                <>
                  <dt>Cutoff on the label</dt>
                  <dd>
                    <span class="num">{withUnit(String(labelCutoff), 'nm')}</span> ({fiber?.cutoffKind === 'cable' ? 'cable cutoff' : 'fiber cutoff'}): a measured cutoff, below the theoretical one.
                    {r.wavelengthNm > labelCutoff ? ' Above it, the fiber counts as single-mode in practice.' : ' At or below it, LP11 can carry light.'}
                  </dd>
                </>
              )}
              <dt>Counts</dt>
              <dd>
                {r.lpModeCount} LP mode{r.lpModeCount === 1 ? '' : 's'}, {r.vectorFamilyCount} vector mode famil{r.vectorFamilyCount === 1 ? 'y' : 'ies'}, {r.totalModeCount} modes with both polarizations and orientations
              </dd>
            </dl>
            {fiber?.profile === 'graded' && (
              <p class="note">
                This fiber has a graded core; the check treats it as step index with the same core and NA. A parabolic core guides about half as many modes (Gloge & Marcatili 1973).
              </p>
            )}
            <DataTable
              caption="Guided modes, most tightly bound first"
              rows={r.modes.slice(0, TABLE_ROWS)}
              rowKey={(m) => name(m)}
              columns={[
                { label: 'LP mode', cell: (m) => name(m), num: true },
                { label: 'Exact modes it stands for', cell: (m) => m.vectorModes.join(', ') },
                { label: 'b', cell: (m) => `${formatNumber(m.b, 4)}${m.nearCutoff ? ' (at cutoff)' : ''}`, num: true },
                { label: 'Cutoff V', cell: (m) => (m.cutoffV === 0 ? 'none' : formatNumber(m.cutoffV, 5)), num: true },
                { label: 'Modes', cell: (m) => m.degeneracy, num: true },
              ]}
            />
            {r.modes.length > TABLE_ROWS && <p class="note">… and {r.modes.length - TABLE_ROWS} more LP modes.</p>}
          </>
        )}
      </ResultCard>

      <BvDiagram r={r} stale={state.stale} />

      <ResultCard title="What a mode looks like across the core" stale={state.stale}>
        {r && shown && (
          <>
            <div class="form">
              <div class="field">
                <label for="sm-mode">Mode to show</label>
                <select id="sm-mode" value={name(shown)} onChange={(e) => setChosen((e.currentTarget as HTMLSelectElement).value)}>
                  {r.modes.slice(0, TABLE_ROWS).map((m) => (
                    <option key={name(m)} value={name(m)}>{name(m)} ({m.vectorModes.join(', ')})</option>
                  ))}
                </select>
              </div>
            </div>
            <ModePicture mode={shown} />
          </>
        )}
      </ResultCard>

    </CalcScreen>
  );
}

/**
 * The diagram's V range: 6, 9 or 12, the first that shows the fiber's V with a third to spare. A few fixed
 * ranges, each computed once while the app is open (`bvCurves`), so typing a wavelength key by key (1, 13, 131 nm give
 * huge V) does not solve the curves again on every key.
 */
function diagramVMax(v: number | undefined): number {
  return [6, 9, 12].find((top) => v === undefined || 1.3 * v <= top) ?? 12;
}

const bvCurveCache = new Map<number, { name: string; points: [number, number][] }[]>();

function bvCurves(vMax: number): { name: string; points: [number, number][] }[] {
  let curves = bvCurveCache.get(vMax);
  if (!curves) {
    curves = DIAGRAM_FAMILIES.map(([l, m]) => ({ name: lpName(l, m), points: lpBvCurve(l, m, vMax, 80) })).filter((s) => s.points.length > 1);
    bvCurveCache.set(vMax, curves);
  }
  return curves;
}

/**
 * The b–V diagram with this fiber's V marked. Its curves are computed here, when the details band draws
 * the card (after the headline, see CalcScreen), not in the screen's own render.
 */
function BvDiagram({ r, stale }: { r: SingleModeCheck | undefined; stale: boolean }) {
  const vMax = diagramVMax(r?.v);
  const diagram = useResult(() => bvCurves(vMax), [vMax]);
  return (
    <ResultCard title="Where this fiber sits: the b–V diagram" stale={stale || diagram.stale} error={diagram.error}>
      {r && diagram.result && (
        <>
          <LinePlot
            title="Normalized propagation constant b of the first LP modes against V"
            xLabel="V-number"
            yLabel="b"
            xRange={[0, vMax]}
            yRange={[0, 1]}
            series={diagram.result}
            markers={[
              { x: r.v, label: `this fiber: V = ${formatNumber(r.v, 3)}` },
              { x: LP11_CUTOFF_V, label: 'LP11 cutoff 2.405' },
              { x: lpCutoffV(2, 1), label: 'LP21, LP02 cutoff 3.832' },
            ]}
            points={r.modes.filter((m) => DIAGRAM_FAMILIES.some(([l, mm]) => l === m.l && mm === m.m)).map((m) => ({ x: r.v, y: m.b, label: name(m) }))}
          />
          <ShortProse text="Each curve starts at its cutoff (b = 0) and rises toward 1 as V grows. A mode is guided when its curve starts left of the V marker." />
        </>
      )}
    </ResultCard>
  );
}
