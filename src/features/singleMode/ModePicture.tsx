// Intensity picture of one LP mode across the fiber end: a grid of grey cells, |ψ(r) cos(lφ)|²,
// with the core boundary drawn and axes in units of the core radius. Grey levels are the text
// colour at varying opacity, so the picture follows the light or dark theme; a few hundred
// rectangles render quickly on a phone.
import { useMemo } from 'preact/hooks';
import { lpIntensityGrid, type LPMode } from '../../physics';

export interface ModePictureProps {
  mode: LPMode;
  /** Cells per side (default 41). */
  cells?: number;
  /** Half-width of the picture in core radii (default 1.6). */
  extentOverA?: number;
}

const SIZE = 300;
const PAD = { left: 44, bottom: 40, top: 10, right: 10 };
const TICKS = [-1.5, -1, -0.5, 0, 0.5, 1, 1.5];

export function ModePicture({ mode, cells = 41, extentOverA = 1.6 }: ModePictureProps) {
  const grid = useMemo(() => lpIntensityGrid(mode, cells, extentOverA), [mode.l, mode.m, mode.u, mode.w, cells, extentOverA]);
  const inner = SIZE - PAD.left - PAD.right;
  const cell = inner / cells;
  const toX = (xOverA: number) => PAD.left + ((xOverA + extentOverA) / (2 * extentOverA)) * inner;
  const toY = (yOverA: number) => PAD.top + ((extentOverA - yOverA) / (2 * extentOverA)) * inner;
  const name = `LP${mode.l}${mode.m}`;
  const lobes = mode.l === 0 ? `${mode.m} ring${mode.m > 1 ? 's' : ''} (a bright centre${mode.m > 1 ? ' and rings around it' : ''})` : `${2 * mode.l} bright lobes around the axis, ${mode.m} deep`;
  return (
    <figure class="plot mode-picture">
      <svg
        viewBox={`0 0 ${SIZE} ${SIZE}`}
        role="img"
        aria-label={`Intensity of ${name} across the fiber end: ${lobes}. Axes in core radii; the circle is the core boundary.`}
        style={{ maxWidth: '360px' }}
      >
        <g fill="currentColor" shape-rendering="crispEdges">
          {grid.map((value, i) =>
            value < 0.01 ? null : (
              <rect
                key={i}
                x={(PAD.left + (i % cells) * cell).toFixed(2)}
                y={(PAD.top + Math.floor(i / cells) * cell).toFixed(2)}
                width={(cell + 0.05).toFixed(2)}
                height={(cell + 0.05).toFixed(2)}
                fill-opacity={value.toFixed(2)}
              />
            ),
          )}
        </g>
        <circle cx={toX(0)} cy={toY(0)} r={(inner / (2 * extentOverA)).toFixed(2)} class="plot-marker" fill="none" />
        <rect x={PAD.left} y={PAD.top} width={inner} height={inner} fill="none" class="plot-grid" />
        {TICKS.filter((t) => Math.abs(t) <= extentOverA).map((t) => (
          <g key={t}>
            <text x={toX(t)} y={SIZE - PAD.bottom + 16} text-anchor="middle" class="plot-tick">{t}</text>
            <text x={PAD.left - 6} y={toY(t) + 4} text-anchor="end" class="plot-tick">{t}</text>
          </g>
        ))}
        <text x={PAD.left + inner / 2} y={SIZE - 6} text-anchor="middle" class="plot-label">x / core radius</text>
        <text x={12} y={PAD.top + inner / 2} text-anchor="middle" class="plot-label" transform={`rotate(-90 12 ${PAD.top + inner / 2})`}>y / core radius</text>
      </svg>
      <figcaption>
        <span class="plot-title">{name} intensity (denser shading = more light), cos {mode.l}φ orientation</span>
      </figcaption>
    </figure>
  );
}
