// Small SVG plots of our own. Series differ by dash pattern and marker shape as well as
// colour, so a grey printout and a colour-blind reader see the same thing.
//
// The drawing is laid out for the width it is shown at: the SVG's viewBox is as wide, in user
// units, as the figure is in CSS pixels, so text drawn at 13 px is 13 px on a phone and on a
// laptop alike (a fixed viewBox would shrink it to 6 px on a 360 px phone). Margins are sized from
// the tick labels actually drawn, and long axis labels take two lines, so nothing is clipped.
import type { RefObject } from 'preact';
import { useLayoutEffect, useRef, useState } from 'preact/hooks';
import { formatNumber } from './format';
import { niceTicks } from './ticks';

export interface Series {
  name: string;
  points: [x: number, y: number][];
  dashed?: boolean;
}

export interface Marker {
  x: number;
  label: string;
}

export interface PointMark {
  x: number;
  y: number;
  label: string;
}

export interface LinePlotProps {
  title: string;
  xLabel: string;
  yLabel: string;
  series: Series[];
  markers?: Marker[];
  points?: PointMark[];
  logX?: boolean;
  logY?: boolean;
  /** Fixed axis ranges; otherwise taken from the data. */
  xRange?: [number, number];
  yRange?: [number, number];
}

/** Width drawn before the figure has been measured (and in a test without layout). */
const DEFAULT_W = 640;
/** Narrowest and widest drawings: below this a phone scrolls, above it the plot stops growing. */
const MIN_W = 240;
const MAX_W = 760;
/** Font sizes (CSS px, = user units), the same as in styles.css (.plot-tick, .plot-label). */
export const PLOT_TICK_PX = 13;
export const PLOT_LABEL_PX = 14;
/** Average glyph advance as a share of the font size, generous, for sizing margins: ticks (digits ≈ 0.55) and bold labels. */
const TICK_EM = 0.62;
const LABEL_EM = 0.68;
const DASHES = ['', '8 5', '2 4', '12 4 2 4', '4 4'];

const textWidth = (s: string, px: number) => s.length * px * (px >= PLOT_LABEL_PX ? LABEL_EM : TICK_EM);
/** Centre of a text `width` wide, moved only as far as needed to keep it inside 0…W. */
const keepInside = (centre: number, width: number, W: number) => Math.min(Math.max(centre, width / 2 + 2), W - width / 2 - 2);

/** The figure's content width in CSS pixels, followed as the window or the layout changes. */
function useFigureWidth(): [RefObject<HTMLElement>, number] {
  const ref = useRef<HTMLElement>(null);
  const [width, setWidth] = useState(DEFAULT_W);
  useLayoutEffect(() => {
    const el = ref.current;
    if (!el || typeof ResizeObserver === 'undefined') return;
    // The observer reports the width it has already laid out: reading clientWidth here instead would force
    // a layout of the whole page in the middle of an update (20 ms a key on a slow phone). It also reports
    // once as soon as it starts observing, before the first paint, so the first drawing is at the real width.
    const ro = new ResizeObserver((entries) => {
      const w = Math.round(entries[entries.length - 1]!.contentRect.width);
      if (w > 0) setWidth(Math.min(MAX_W, Math.max(MIN_W, w)));
    });
    ro.observe(el);
    return () => ro.disconnect();
  }, []);
  return [ref, width];
}

/** An axis label in one line, or as many as it needs to stay inside `room` pixels, broken only between words. */
function splitLabel(label: string, room: number): string[] {
  if (textWidth(label, PLOT_LABEL_PX) <= room) return [label];
  const lines: string[] = [];
  let line = '';
  for (const word of label.split(' ')) {
    const joined = line ? `${line} ${word}` : word;
    if (line && textWidth(joined, PLOT_LABEL_PX) > room) {
      lines.push(line);
      line = word;
    } else line = joined;
  }
  if (line) lines.push(line);
  return lines;
}

/** Tick text: a decade on a log axis is written 10⁻⁶, short enough for a phone. */
const SUPERSCRIPT: Record<string, string> = { '-': '⁻', '0': '⁰', '1': '¹', '2': '²', '3': '³', '4': '⁴', '5': '⁵', '6': '⁶', '7': '⁷', '8': '⁸', '9': '⁹' };
export function tickText(v: number, log?: boolean): string {
  if (log && v > 0) {
    const k = Math.round(Math.log10(v));
    if (Math.abs(v / 10 ** k - 1) < 1e-9 && (k < -2 || k > 4)) return `10${String(k).replace(/./g, (c) => SUPERSCRIPT[c] ?? c)}`;
  }
  return formatNumber(v, 3);
}

/** Linear ticks thinned until their labels fit side by side along `room` pixels. */
function fittingTicks(lo: number, hi: number, want: number, log: boolean | undefined, room: number, fmt: (v: number) => string): number[] {
  for (let n = want; n >= 2; n--) {
    const ticks = niceTicks(lo, hi, n, log);
    const widest = Math.max(0, ...ticks.map((t) => textWidth(fmt(t), PLOT_TICK_PX)));
    if (ticks.length <= 1 || (ticks.length * (widest + 10) <= room)) return ticks;
  }
  const ticks = niceTicks(lo, hi, 2, log);
  return ticks.length > 2 ? [ticks[0]!, ticks[ticks.length - 1]!] : ticks;
}

interface Frame {
  W: number;
  H: number;
  pad: { left: number; right: number; top: number; bottom: number };
  xLines: string[];
  yLines: string[];
}

/** Margins and height for a drawing `W` wide whose y tick labels are `yTickTexts`. */
function frameFor(W: number, xLabel: string, yLabel: string, yTickTexts: string[], lastXTickText: string): Frame {
  const widestYTick = Math.max(10, ...yTickTexts.map((t) => textWidth(t, PLOT_TICK_PX)));
  const right = Math.ceil(Math.max(12, textWidth(lastXTickText, PLOT_TICK_PX) / 2 + 4));
  const xLines = splitLabel(xLabel, W - 8);
  const top = 12;
  const bottom = 8 + PLOT_TICK_PX + 8 + xLines.length * (PLOT_LABEL_PX + 4) + 2;
  let H = Math.round(Math.min(380, Math.max(260, W * 0.62)));
  // The rotated y label runs along the plot's height: more lines if it would not fit in one,
  // and a taller plot if a single word would not.
  let yLines = splitLabel(yLabel, H - top - bottom - 8);
  const need = Math.max(...yLines.map((l) => textWidth(l, PLOT_LABEL_PX))) + 8;
  if (need > H - top - bottom) {
    H = Math.ceil(need + top + bottom);
    yLines = splitLabel(yLabel, H - top - bottom - 8);
  }
  const left = Math.ceil(yLines.length * (PLOT_LABEL_PX + 4) + 8 + widestYTick + 6);
  return { W, H, pad: { left, right, top, bottom }, xLines, yLines };
}

/** The two axis labels: x under the ticks, y rotated along the left edge. */
function AxisLabels({ f }: { f: Frame }) {
  const { W, H, pad, xLines, yLines } = f;
  const cx = keepInside((pad.left + W - pad.right) / 2, Math.max(...xLines.map((l) => textWidth(l, PLOT_LABEL_PX))), W);
  const cy = keepInside((pad.top + H - pad.bottom) / 2, Math.max(...yLines.map((l) => textWidth(l, PLOT_LABEL_PX))), H);
  const xFirst = H - 6 - (xLines.length - 1) * (PLOT_LABEL_PX + 4);
  return (
    <>
      <text x={cx} y={xFirst} text-anchor="middle" class="plot-label">
        {xLines.map((l, i) => (
          <tspan key={i} x={cx} dy={i === 0 ? 0 : PLOT_LABEL_PX + 4}>{l}</tspan>
        ))}
      </text>
      <text x={PLOT_LABEL_PX + 2} y={cy} text-anchor="middle" class="plot-label" transform={`rotate(-90 ${PLOT_LABEL_PX + 2} ${cy})`}>
        {yLines.map((l, i) => (
          <tspan key={i} x={PLOT_LABEL_PX + 2} dy={i === 0 ? 0 : PLOT_LABEL_PX + 4}>{l}</tspan>
        ))}
      </text>
    </>
  );
}

function finitePoints(s: Series, logX?: boolean, logY?: boolean): [number, number][] {
  return s.points.filter(([x, y]) => Number.isFinite(x) && Number.isFinite(y) && (!logX || x > 0) && (!logY || y > 0));
}

function extent(values: number[], fallback: [number, number]): [number, number] {
  if (values.length === 0) return fallback;
  let lo = Math.min(...values);
  let hi = Math.max(...values);
  if (lo === hi) {
    const d = lo === 0 ? 1 : Math.abs(lo) * 0.1;
    lo -= d;
    hi += d;
  }
  return [lo, hi];
}

/** A label beside a point or marker line, on whichever side keeps it inside the drawing. */
function sideLabel(x: number, label: string, f: Frame, px: number): { x: number; anchor: 'start' | 'end' } {
  const w = textWidth(label, px);
  return x + 4 + w <= f.W - 2 ? { x: x + 4, anchor: 'start' } : { x: Math.max(w + 2, x - 4), anchor: 'end' };
}

/** A line plot with labelled axes, legend, optional vertical markers and labelled points. */
export function LinePlot({ title, xLabel, yLabel, series, markers = [], points = [], logX, logY, xRange, yRange }: LinePlotProps) {
  const [ref, W] = useFigureWidth();
  const clean = series.map((s) => ({ ...s, points: finitePoints(s, logX, logY) }));
  const all = clean.flatMap((s) => s.points);
  const tx = (v: number) => (logX ? Math.log10(v) : v);
  const ty = (v: number) => (logY ? Math.log10(v) : v);
  const [x0, x1] = xRange ? [tx(xRange[0]), tx(xRange[1])] : extent(all.map((p) => tx(p[0])), [0, 1]);
  const [y0, y1] = yRange ? [ty(yRange[0]), ty(yRange[1])] : extent(all.map((p) => ty(p[1])), [0, 1]);
  const yTicks = niceTicks(y0, y1, 5, logY);
  const yTexts = yTicks.map((t) => tickText(t, logY));
  // First pass with a guessed right margin, to know how much room the x ticks have.
  const guess = frameFor(W, xLabel, yLabel, yTexts, '');
  const xTicks = fittingTicks(x0, x1, 6, logX, W - guess.pad.left - guess.pad.right, (t) => tickText(t, logX));
  const f = frameFor(W, xLabel, yLabel, yTexts, xTicks.length ? tickText(xTicks[xTicks.length - 1]!, logX) : '');
  const { H, pad } = f;
  const px = (v: number) => pad.left + ((tx(v) - x0) / (x1 - x0)) * (W - pad.left - pad.right);
  const py = (v: number) => H - pad.bottom - ((ty(v) - y0) / (y1 - y0)) * (H - pad.top - pad.bottom);
  const inX = (v: number) => tx(v) >= x0 && tx(v) <= x1;
  const inY = (v: number) => ty(v) >= y0 && ty(v) <= y1;
  return (
    <figure class="plot" ref={ref}>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`${title}. ${yLabel} against ${xLabel}.`} preserveAspectRatio="xMidYMid meet">
        <rect x={pad.left} y={pad.top} width={W - pad.left - pad.right} height={H - pad.top - pad.bottom} class="plot-area" />
        {xTicks.map((t) => (
          <g key={`x${t}`}>
            <line x1={px(t)} x2={px(t)} y1={pad.top} y2={H - pad.bottom} class="plot-grid" />
            <text x={keepInside(px(t), textWidth(tickText(t, logX), PLOT_TICK_PX), W)} y={H - pad.bottom + 8 + PLOT_TICK_PX} text-anchor="middle" class="plot-tick">
              {tickText(t, logX)}
            </text>
          </g>
        ))}
        {yTicks.map((t, i) => (
          <g key={`y${t}`}>
            <line x1={pad.left} x2={W - pad.right} y1={py(t)} y2={py(t)} class="plot-grid" />
            <text x={pad.left - 6} y={py(t) + PLOT_TICK_PX * 0.35} text-anchor="end" class="plot-tick">{yTexts[i]}</text>
          </g>
        ))}
        <AxisLabels f={f} />
        {markers.filter((m) => inX(m.x)).map((m, i) => {
          const at = sideLabel(px(m.x), m.label, f, PLOT_TICK_PX);
          return (
            <g key={`m${i}`}>
              <line x1={px(m.x)} x2={px(m.x)} y1={pad.top} y2={H - pad.bottom} class="plot-marker" />
              <text x={at.x} y={pad.top + PLOT_TICK_PX + 2 + (i % 3) * (PLOT_TICK_PX + 3)} text-anchor={at.anchor} class="plot-marker-label">{m.label}</text>
            </g>
          );
        })}
        {clean.map((s, i) =>
          s.points.length > 1 ? (
            <polyline
              key={s.name}
              class={`plot-line plot-line-${i % DASHES.length}`}
              points={s.points.filter(([x, y]) => inX(x) && inY(y)).map(([x, y]) => `${px(x).toFixed(1)},${py(y).toFixed(1)}`).join(' ')}
              stroke-dasharray={s.dashed ? '8 5' : DASHES[i % DASHES.length]}
            />
          ) : null,
        )}
        {points.filter((p) => inX(p.x) && inY(p.y)).map((p, i) => {
          const at = sideLabel(px(p.x) + 5, p.label, f, PLOT_TICK_PX);
          return (
            <g key={`p${i}`}>
              <circle cx={px(p.x)} cy={py(p.y)} r={6} class="plot-point" />
              <text x={at.x} y={Math.max(pad.top + PLOT_TICK_PX, py(p.y) - 8)} text-anchor={at.anchor} class="plot-point-label">{p.label}</text>
            </g>
          );
        })}
      </svg>
      <figcaption>
        <span class="plot-title">{title}</span>
        {clean.length > 1 && (
          <ul class="plot-legend">
            {clean.map((s, i) => (
              <li key={s.name}>
                <svg viewBox="0 0 36 10" width="36" height="10" aria-hidden="true">
                  <line x1="0" y1="5" x2="36" y2="5" class={`plot-line plot-line-${i % DASHES.length}`} stroke-dasharray={s.dashed ? '8 5' : DASHES[i % DASHES.length]} />
                </svg>
                {s.name}
              </li>
            ))}
          </ul>
        )}
      </figcaption>
    </figure>
  );
}

export interface Bar {
  label: string;
  value: number;
}

export interface BarChartProps {
  title: string;
  xLabel: string;
  yLabel: string;
  bars: Bar[];
  /** Value shown on each bar, e.g. as percent. */
  formatValue?: (v: number) => string;
}

/** Vertical bars with the value written on each where it fits, so the numbers survive a grey printout. */
export function BarChart({ title, xLabel, yLabel, bars, formatValue = (v) => formatNumber(v, 3) }: BarChartProps) {
  const [ref, W] = useFigureWidth();
  const clean = bars.filter((b) => Number.isFinite(b.value));
  const maxV = Math.max(1e-12, ...clean.map((b) => b.value));
  const yTicks = niceTicks(0, maxV, 5, false);
  const top = Math.max(maxV, yTicks[yTicks.length - 1] ?? maxV);
  const f = frameFor(W, xLabel, yLabel, yTicks.map(formatValue), '');
  const { H, pad } = f;
  const plotW = W - pad.left - pad.right;
  const slot = plotW / Math.max(1, clean.length);
  const py = (v: number) => H - pad.bottom - (v / top) * (H - pad.top - pad.bottom);
  const widestLabel = Math.max(1, ...clean.map((b) => textWidth(b.label, PLOT_TICK_PX)));
  const labelEvery = Math.max(1, Math.ceil((widestLabel + 6) / slot));
  return (
    <figure class="plot" ref={ref}>
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`${title}. ${yLabel} for each ${xLabel}.`}>
        <rect x={pad.left} y={pad.top} width={plotW} height={H - pad.top - pad.bottom} class="plot-area" />
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={pad.left} x2={W - pad.right} y1={py(t)} y2={py(t)} class="plot-grid" />
            <text x={pad.left - 6} y={py(t) + PLOT_TICK_PX * 0.35} text-anchor="end" class="plot-tick">{formatValue(t)}</text>
          </g>
        ))}
        {clean.map((b, i) => {
          const x = pad.left + i * slot + slot * 0.15;
          const w = slot * 0.7;
          const value = formatValue(b.value);
          return (
            <g key={`${b.label}-${i}`}>
              <rect x={x} y={py(b.value)} width={w} height={Math.max(0, H - pad.bottom - py(b.value))} class="plot-bar" />
              {/* A value is written on its bar only where it fits the bar's slot. */}
              {textWidth(value, PLOT_TICK_PX) + 2 <= slot && (
                <text x={keepInside(x + w / 2, textWidth(value, PLOT_TICK_PX), W)} y={Math.max(pad.top + PLOT_TICK_PX, py(b.value) - 4)} text-anchor="middle" class="plot-tick">
                  {value}
                </text>
              )}
              {i % labelEvery === 0 && (
                <text x={keepInside(x + w / 2, textWidth(b.label, PLOT_TICK_PX), W)} y={H - pad.bottom + 8 + PLOT_TICK_PX} text-anchor="middle" class="plot-tick">
                  {b.label}
                </text>
              )}
            </g>
          );
        })}
        <AxisLabels f={f} />
      </svg>
      <figcaption><span class="plot-title">{title}</span></figcaption>
    </figure>
  );
}
