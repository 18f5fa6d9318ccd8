// Intensity picture of one LP mode across the fiber end, |ψ(r) cos(lφ)|², with the core boundary
// drawn and axes in units of the core radius. The intensity is a small greyscale image used as a
// mask over a rectangle in the text colour: the browser scales it with smooth (bilinear)
// interpolation, so the picture is smooth at phone size and on paper, follows the light or dark
// theme, and prints as grey levels.
import { useMemo } from 'preact/hooks';
import { lpIntensityGrid, type LPMode } from '../../physics';
import { lpName } from '../../ui/format';
import { greyBmpDataUrl } from '../../ui/greyImage';

export interface ModePictureProps {
  mode: LPMode;
  /** Samples per side (default 72); the browser interpolates between them. */
  cells?: number;
  /** Half-width of the picture in core radii (default 1.6). */
  extentOverA?: number;
}

const SIZE = 300;
const PAD = { left: 58, bottom: 40, top: 10, right: 12 };
const TICKS = [-1.5, -1, -0.5, 0, 0.5, 1, 1.5];

export function ModePicture({ mode, cells = 72, extentOverA = 1.6 }: ModePictureProps) {
  const grid = useMemo(() => lpIntensityGrid(mode, cells, extentOverA), [mode.l, mode.m, mode.u, mode.w, cells, extentOverA]);
  const href = useMemo(() => greyBmpDataUrl({ levels: grid, width: cells, height: cells }), [grid, cells]);
  const inner = SIZE - PAD.left - PAD.right;
  const toX = (xOverA: number) => PAD.left + ((xOverA + extentOverA) / (2 * extentOverA)) * inner;
  const toY = (yOverA: number) => PAD.top + ((extentOverA - yOverA) / (2 * extentOverA)) * inner;
  const name = lpName(mode.l, mode.m);
  const maskId = `mode-mask-${mode.l}-${mode.m}`;
  const lobes = mode.l === 0 ? `${mode.m} ring${mode.m > 1 ? 's' : ''} (a bright centre${mode.m > 1 ? ' and rings around it' : ''})` : `${2 * mode.l} bright lobes around the axis, ${mode.m} deep`;
  return (
    <figure class="plot mode-picture">
      <svg viewBox={`0 0 ${SIZE} ${SIZE}`} role="img" aria-label={`Intensity of ${name} across the fiber end: ${lobes}. Axes in core radii; the circle is the core boundary.`}>
        <mask id={maskId} maskUnits="userSpaceOnUse" x={PAD.left} y={PAD.top} width={inner} height={inner}>
          <image href={href} x={PAD.left} y={PAD.top} width={inner} height={inner} preserveAspectRatio="none" style={{ imageRendering: 'auto' }} />
        </mask>
        <rect x={PAD.left} y={PAD.top} width={inner} height={inner} fill="currentColor" mask={`url(#${maskId})`} />
        <circle cx={toX(0)} cy={toY(0)} r={(inner / (2 * extentOverA)).toFixed(2)} class="plot-marker" fill="none" />
        <rect x={PAD.left} y={PAD.top} width={inner} height={inner} fill="none" class="plot-grid" />
        {TICKS.filter((t) => Math.abs(t) <= extentOverA).map((t) => (
          <g key={t}>
            <text x={toX(t)} y={SIZE - PAD.bottom + 16} text-anchor="middle" class="plot-tick">{t}</text>
            <text x={PAD.left - 6} y={toY(t) + 4} text-anchor="end" class="plot-tick">{t}</text>
          </g>
        ))}
        <text x={PAD.left + inner / 2} y={SIZE - 6} text-anchor="middle" class="plot-label">x / core radius</text>
        <text x={18} y={PAD.top + inner / 2} text-anchor="middle" class="plot-label" transform={`rotate(-90 18 ${PAD.top + inner / 2})`}>y / core radius</text>
      </svg>
      <figcaption>
        <span class="plot-title">{name} intensity (denser shading = more light), cos {mode.l}φ orientation</span>
      </figcaption>
    </figure>
  );
}
