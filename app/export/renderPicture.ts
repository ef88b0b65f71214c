import { pathState } from '../../src/path/pathState';
import type { Charge } from '../../src/physics/charge';
import { colourAtPosition, MASKED_COLOUR, paintValues, scaleTicks } from '../field/colourScale';
import type { DisplayedMap } from '../field/displayedMap';
import { lightConeShells, shellSpacing } from '../field/lightConeShells';
import { formatLength } from '../format/lengthUnit';
import { formatSI } from '../format/siFormat';
import type { Probe } from '../store/probesSlice';
import { SHELL_COUNT } from '../view/ShellLines';
import { toSlice } from '../view/sliceCoordinates';
import { scaleBarLength } from '../view/viewGeometry';

export type PictureBackground = 'light' | 'dark';

export interface PictureRequest {
  shown: DisplayedMap;
  charges: readonly Charge[];
  probes: readonly Probe[];
  /** Lines under the title: charges, path kinds, key parameters. */
  caption: readonly string[];
  title: string;
  /** Width of the whole picture, pixels; the height follows from the slice's shape. */
  width: number;
  background: PictureBackground;
  shells: boolean;
}

const THEMES = {
  dark: { page: '#121419', text: '#e4e7eb', muted: '#98a1ad', path: '#e8f1ff', shell: '#9ef0c4' },
  light: { page: '#ffffff', text: '#15181d', muted: '#4b5563', path: '#111827', shell: '#0f766e' },
} as const;

/** Margins left (axis) and right (colour bar) of the map, pixels in a 1200-pixel picture. */
const LEFT_MARGIN = 90;
const RIGHT_MARGIN = 220;

/** Width of the map within a picture `width` pixels wide: the rest holds axes and colour bar. */
export function plotWidthOf(width: number): number {
  return width * (1 - (LEFT_MARGIN + RIGHT_MARGIN) / 1200);
}

/**
 * The map with its colour bar and units, axes, a scale bar, the time and a caption, drawn
 * afresh at the asked size on a 2D canvas (not a screenshot scaled up). Returns the canvas.
 */
export function renderPicture(request: PictureRequest): HTMLCanvasElement {
  const { shown, width } = request;
  const theme = THEMES[request.background];
  const { spec, fields } = shown.map;
  const u = width / 1200; // type and lines scale with the picture
  const font = (size: number) => `${Math.round(size * u)}px system-ui, sans-serif`;
  const left = LEFT_MARGIN * u;
  const top = (70 + 22 * request.caption.length) * u;
  const bottom = 70 * u;
  const plotWidth = plotWidthOf(width);
  const plotHeight = (plotWidth * spec.height) / spec.width;
  const height = Math.round(top + plotHeight + bottom);
  const canvas = document.createElement('canvas');
  canvas.width = width;
  canvas.height = height;
  const ctx = canvas.getContext('2d');
  if (ctx === null) throw new Error('this browser gives no 2D canvas for the picture');
  ctx.fillStyle = theme.page;
  ctx.fillRect(0, 0, width, height);

  // Title, caption and time.
  ctx.fillStyle = theme.text;
  ctx.font = `600 ${font(26)}`;
  ctx.fillText(request.title, left, 38 * u);
  ctx.font = font(17);
  ctx.fillStyle = theme.muted;
  for (let k = 0; k < request.caption.length; k++) {
    ctx.fillText(request.caption[k], left, (64 + 22 * k) * u);
  }
  ctx.fillStyle = theme.text;
  ctx.textAlign = 'right';
  ctx.font = `600 ${font(20)}`;
  ctx.fillText(`t = ${formatSI(spec.time, 's', 4)}`, left + plotWidth, 38 * u);
  ctx.textAlign = 'left';

  // The map: one cell per grid point, no smoothing the data did not have.
  const cells = document.createElement('canvas');
  cells.width = fields.nx;
  cells.height = fields.ny;
  const cellContext = cells.getContext('2d');
  if (cellContext === null) throw new Error('this browser gives no 2D canvas for the picture');
  const rgba = new Uint8ClampedArray(4 * fields.nx * fields.ny);
  if (shown.scale)
    paintValues(shown.quantity.values, fields.mask, shown.scale, rgba as unknown as Uint8Array);
  // Grid row 0 is the bottom of the slice; image row 0 is the top.
  const flipped = new ImageData(fields.nx, fields.ny);
  for (let j = 0; j < fields.ny; j++) {
    flipped.data.set(
      rgba.subarray(4 * fields.nx * j, 4 * fields.nx * (j + 1)),
      4 * fields.nx * (fields.ny - 1 - j),
    );
  }
  cellContext.putImageData(flipped, 0, 0);
  ctx.imageSmoothingEnabled = false;
  ctx.drawImage(cells, left, top, plotWidth, plotHeight);
  const toPixel = (a: number, b: number): [number, number] => [
    left + (a / spec.width + 0.5) * plotWidth,
    top + (0.5 - b / spec.height) * plotHeight,
  ];

  ctx.save();
  ctx.beginPath();
  ctx.rect(left, top, plotWidth, plotHeight);
  ctx.clip();
  if (request.shells) {
    ctx.strokeStyle = theme.shell;
    ctx.lineWidth = 1.2 * u;
    const spacing = shellSpacing(spec);
    for (const { path } of request.charges) {
      for (const shell of lightConeShells(path, spec, spec.time, spacing, SHELL_COUNT)) {
        if (shell.cut === null) continue;
        const [x, y] = toPixel(shell.cut.a, shell.cut.b);
        ctx.beginPath();
        ctx.arc(x, y, (shell.cut.radius / spec.width) * plotWidth, 0, 2 * Math.PI);
        ctx.stroke();
      }
    }
  }
  ctx.strokeStyle = theme.path;
  ctx.lineWidth = 1.5 * u;
  const state = pathState();
  for (const { path, charge } of request.charges) {
    ctx.beginPath();
    for (let i = 0; i < path.count; i++) {
      const [x, y] = toPixel(...toSlice(spec, path.x[i], path.y[i], path.z[i]));
      if (i === 0) ctx.moveTo(x, y);
      else ctx.lineTo(x, y);
    }
    ctx.stroke();
    path.stateAt(spec.time, state);
    const [x, y] = toPixel(...toSlice(spec, state.px, state.py, state.pz));
    ctx.fillStyle = charge < 0 ? '#46d2ff' : '#ff7a59';
    ctx.beginPath();
    ctx.arc(x, y, 6 * u, 0, 2 * Math.PI);
    ctx.fill();
  }
  for (const probe of request.probes) {
    const [x, y] = toPixel(...toSlice(spec, ...probe.position));
    ctx.strokeStyle = '#ffd166';
    ctx.lineWidth = 2.5 * u;
    ctx.beginPath();
    ctx.arc(x, y, 8 * u, 0, 2 * Math.PI);
    ctx.stroke();
    ctx.fillStyle = '#ffd166';
    ctx.font = font(15);
    ctx.fillText(probe.name, x + 11 * u, y - 8 * u);
  }
  ctx.restore();

  // A frame round the map, a scale bar and the slice it shows.
  ctx.strokeStyle = theme.muted;
  ctx.lineWidth = 1 * u;
  ctx.strokeRect(left, top, plotWidth, plotHeight);
  ctx.fillStyle = theme.text;
  ctx.font = font(15);
  ctx.textAlign = 'center';
  const bar = scaleBarLength(spec.width);
  const barPixels = (bar / spec.width) * plotWidth;
  const barY = top + plotHeight + 40 * u;
  ctx.fillRect(left + plotWidth - barPixels, barY, barPixels, 4 * u);
  ctx.fillText(formatLength(bar), left + plotWidth - barPixels / 2, barY + 22 * u);
  ctx.textAlign = 'left';
  ctx.fillText(
    `slice ${formatLength(spec.width)} × ${formatLength(spec.height)} centred at (${spec.center.map((c) => formatLength(c)).join(', ')})`,
    left,
    barY + 4 * u,
  );

  drawColourBar(ctx, request, left + plotWidth + 40 * u, top, 28 * u, plotHeight, u, theme.text);
  return canvas;
}

function drawColourBar(
  ctx: CanvasRenderingContext2D,
  { shown }: PictureRequest,
  x: number,
  y: number,
  barWidth: number,
  barHeight: number,
  u: number,
  text: string,
): void {
  const { scale, quantity } = shown;
  ctx.fillStyle = text;
  ctx.font = `600 ${Math.round(17 * u)}px system-ui, sans-serif`;
  ctx.fillText(`${quantity.label} (${quantity.unit})`, x, y - 12 * u);
  if (scale === null) return;
  for (let row = 0; row < Math.ceil(barHeight); row++) {
    ctx.fillStyle = colourAtPosition(scale.scheme, 1 - row / barHeight);
    ctx.fillRect(x, y + row, barWidth, 1.5);
  }
  ctx.font = `${Math.round(14 * u)}px system-ui, sans-serif`;
  ctx.fillStyle = text;
  for (const tick of scaleTicks(scale)) {
    const ty = y + (1 - tick.position) * barHeight;
    ctx.fillRect(x + barWidth, ty, 6 * u, 1.5 * u);
    ctx.fillText(
      formatSI(tick.value + quantity.offset, quantity.unit, 2),
      x + barWidth + 10 * u,
      ty + 5 * u,
    );
  }
  ctx.fillStyle = MASKED_COLOUR;
  ctx.fillRect(x, y + barHeight + 16 * u, 14 * u, 14 * u);
  ctx.fillStyle = text;
  ctx.fillText('on a charge', x + 20 * u, y + barHeight + 28 * u);
  ctx.fillText(`${scale.scale} scale`, x, y + barHeight + 50 * u);
}
