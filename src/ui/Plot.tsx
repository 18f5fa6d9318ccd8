// Small SVG plots of our own. Series differ by dash pattern and marker shape as well as
// colour, so a grey printout and a colour-blind reader see the same thing.
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

const W = 640;
const H = 360;
const PAD = { left: 64, right: 16, top: 16, bottom: 52 };
const DASHES = ['', '8 5', '2 4', '12 4 2 4', '4 4'];

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

/** A line plot with labelled axes, legend, optional vertical markers and labelled points. */
export function LinePlot({ title, xLabel, yLabel, series, markers = [], points = [], logX, logY, xRange, yRange }: LinePlotProps) {
  const clean = series.map((s) => ({ ...s, points: finitePoints(s, logX, logY) }));
  const all = clean.flatMap((s) => s.points);
  const tx = (v: number) => (logX ? Math.log10(v) : v);
  const ty = (v: number) => (logY ? Math.log10(v) : v);
  const [x0, x1] = xRange ? [tx(xRange[0]), tx(xRange[1])] : extent(all.map((p) => tx(p[0])), [0, 1]);
  const [y0, y1] = yRange ? [ty(yRange[0]), ty(yRange[1])] : extent(all.map((p) => ty(p[1])), [0, 1]);
  const px = (v: number) => PAD.left + ((tx(v) - x0) / (x1 - x0)) * (W - PAD.left - PAD.right);
  const py = (v: number) => H - PAD.bottom - ((ty(v) - y0) / (y1 - y0)) * (H - PAD.top - PAD.bottom);
  const xTicks = niceTicks(x0, x1, 6, logX);
  const yTicks = niceTicks(y0, y1, 5, logY);
  const inX = (v: number) => tx(v) >= x0 && tx(v) <= x1;
  const inY = (v: number) => ty(v) >= y0 && ty(v) <= y1;
  return (
    <figure class="plot">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`${title}. ${yLabel} against ${xLabel}.`} preserveAspectRatio="xMidYMid meet">
        <rect x={PAD.left} y={PAD.top} width={W - PAD.left - PAD.right} height={H - PAD.top - PAD.bottom} class="plot-area" />
        {xTicks.map((t) => (
          <g key={`x${t}`}>
            <line x1={px(t)} x2={px(t)} y1={PAD.top} y2={H - PAD.bottom} class="plot-grid" />
            <text x={px(t)} y={H - PAD.bottom + 18} text-anchor="middle" class="plot-tick">{formatNumber(t, 3)}</text>
          </g>
        ))}
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={PAD.left} x2={W - PAD.right} y1={py(t)} y2={py(t)} class="plot-grid" />
            <text x={PAD.left - 6} y={py(t) + 5} text-anchor="end" class="plot-tick">{formatNumber(t, 3)}</text>
          </g>
        ))}
        <text x={(PAD.left + W - PAD.right) / 2} y={H - 8} text-anchor="middle" class="plot-label">{xLabel}</text>
        <text x={14} y={(PAD.top + H - PAD.bottom) / 2} text-anchor="middle" class="plot-label" transform={`rotate(-90 14 ${(PAD.top + H - PAD.bottom) / 2})`}>{yLabel}</text>
        {markers.filter((m) => inX(m.x)).map((m, i) => (
          <g key={`m${i}`}>
            <line x1={px(m.x)} x2={px(m.x)} y1={PAD.top} y2={H - PAD.bottom} class="plot-marker" />
            <text x={px(m.x) + 4} y={PAD.top + 14 + (i % 3) * 14} class="plot-marker-label">{m.label}</text>
          </g>
        ))}
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
        {points.filter((p) => inX(p.x) && inY(p.y)).map((p, i) => (
          <g key={`p${i}`}>
            <circle cx={px(p.x)} cy={py(p.y)} r={6} class="plot-point" />
            <text x={px(p.x) + 9} y={py(p.y) - 8} class="plot-point-label">{p.label}</text>
          </g>
        ))}
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

/** Vertical bars with the value written on each, so the numbers survive a grey printout. */
export function BarChart({ title, xLabel, yLabel, bars, formatValue = (v) => formatNumber(v, 3) }: BarChartProps) {
  const clean = bars.filter((b) => Number.isFinite(b.value));
  const maxV = Math.max(1e-12, ...clean.map((b) => b.value));
  const yTicks = niceTicks(0, maxV, 5, false);
  const top = Math.max(maxV, yTicks[yTicks.length - 1] ?? maxV);
  const plotW = W - PAD.left - PAD.right;
  const slot = plotW / Math.max(1, clean.length);
  const py = (v: number) => H - PAD.bottom - (v / top) * (H - PAD.top - PAD.bottom);
  const labelEvery = Math.max(1, Math.ceil(clean.length / 16));
  return (
    <figure class="plot">
      <svg viewBox={`0 0 ${W} ${H}`} role="img" aria-label={`${title}. ${yLabel} for each ${xLabel}.`}>
        <rect x={PAD.left} y={PAD.top} width={plotW} height={H - PAD.top - PAD.bottom} class="plot-area" />
        {yTicks.map((t) => (
          <g key={`y${t}`}>
            <line x1={PAD.left} x2={W - PAD.right} y1={py(t)} y2={py(t)} class="plot-grid" />
            <text x={PAD.left - 6} y={py(t) + 5} text-anchor="end" class="plot-tick">{formatValue(t)}</text>
          </g>
        ))}
        {clean.map((b, i) => {
          const x = PAD.left + i * slot + slot * 0.15;
          const w = slot * 0.7;
          return (
            <g key={`${b.label}-${i}`}>
              <rect x={x} y={py(b.value)} width={w} height={Math.max(0, H - PAD.bottom - py(b.value))} class="plot-bar" />
              {/* A value label is written only where it fits its slot (about 8.5 px a character at 15 px). */}
              {formatValue(b.value).length * 8.5 <= slot && <text x={x + w / 2} y={py(b.value) - 4} text-anchor="middle" class="plot-tick">{formatValue(b.value)}</text>}
              {i % labelEvery === 0 && <text x={x + w / 2} y={H - PAD.bottom + 18} text-anchor="middle" class="plot-tick">{b.label}</text>}
            </g>
          );
        })}
        <text x={(PAD.left + W - PAD.right) / 2} y={H - 8} text-anchor="middle" class="plot-label">{xLabel}</text>
        <text x={14} y={(PAD.top + H - PAD.bottom) / 2} text-anchor="middle" class="plot-label" transform={`rotate(-90 14 ${(PAD.top + H - PAD.bottom) / 2})`}>{yLabel}</text>
      </svg>
      <figcaption><span class="plot-title">{title}</span></figcaption>
    </figure>
  );
}
