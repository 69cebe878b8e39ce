/**
 * A 2-D map of a sweep as a standalone SVG: a grid of cells over two varied fields, each cell
 * coloured by its value (e.g. the peak field at the part) on a colour-blind-safe sequential
 * scale (cividis: Nuñez, Anderton & Renslow, PLoS ONE 2018; or viridis), a contour line at a
 * required level, and the cells where every limit holds hatched and outlined (cell by cell: a
 * sweep knows only its grid points, so the outline claims nothing between them).
 *
 * Contours: d3-contour's marching squares with linear interpolation between cell centres, so the
 * level line of a field that is linear between neighbouring cells is placed exactly. The map's
 * geometry matches d3-contour's coordinates: cell (ix, iy) spans [ix, ix+1] × [iy, iy+1] and its
 * value sits at the centre (ix + 0.5, iy + 0.5). Axes come from d3-scale (one polylinear scale
 * from each varied field's values to the cell centres, so uneven steps are read correctly).
 * Colour is never the only cue: cells carry their value when they are large enough, the
 * colour bar has ticks, the level line is labelled and the feasible region is hatched.
 */
import { scaleLinear, scaleSequential } from 'd3-scale';
import { interpolateCividis, interpolateViridis } from 'd3-scale-chromatic';
import { contours } from 'd3-contour';
import { formatQuantity } from './quantity.js';
import { axisPrefix, bottomAxis, leftAxis, tickLabel } from './svg/axis.js';
import { el, svgRoot, text, textWidth } from './svg/svg.js';
import { FONT, FONT_SMALL, FONT_TITLE, INK, MUTED } from './svg/style.js';

export interface MapAxis {
  /** Quantity name, e.g. "capacitance". */
  name: string;
  /** SI unit, e.g. "F". */
  unit: string;
  /** The swept values, ascending, SI. */
  values: readonly number[];
}

export interface MapPlotInput {
  x: MapAxis;
  y: MapAxis;
  /** value[iy][ix] (NaN: not computed). */
  value: readonly (readonly number[])[];
  /** e.g. "peak field at the part". */
  valueName: string;
  /** e.g. "A/m". */
  valueUnit: string;
  /** Level drawn as a contour line, e.g. the required field. */
  level?: { value: number; label: string };
  /** feasible[iy][ix]: every limit holds at that point. */
  feasible?: readonly (readonly boolean[])[];
  title?: string;
}

export interface MapPlotOptions {
  width?: number;
  height?: number;
  /** Sequential colour scheme (default cividis). */
  scheme?: 'cividis' | 'viridis';
  /** Id prefix, unique per page (default "map"). */
  id?: string;
  /** Print the value in each cell: 'auto' (default) when cells are large enough. */
  cellLabels?: 'auto' | boolean;
}

type Ring = [number, number][];

/** A scale from a swept value to the pixel centre of its cell. */
function cellScale(values: readonly number[], first: number, step: number) {
  if (values.length === 1) {
    const v = values[0];
    const d = v !== 0 ? Math.abs(v) * 0.1 : 1;
    return scaleLinear().domain([v - d, v + d]).range([first - step / 2, first + step / 2]);
  }
  return scaleLinear()
    .domain([...values])
    .range(values.map((_, i) => first + i * step));
}

/**
 * Path data of contour rings in pixels. With `interiorOnly`, only segments between cell centres
 * are kept (grid coordinates in [0.5, n − 0.5]): beyond the outer centres there is no data, and
 * d3-contour closes its rings along the grid's edge there, which is not where the level is.
 */
export function ringsToPath(rings: readonly Ring[], nx: number, ny: number, toPx: (g: [number, number]) => [number, number], interiorOnly: boolean): string {
  const eps = 1e-9;
  const inside = (p: [number, number]) => p[0] >= 0.5 - eps && p[0] <= nx - 0.5 + eps && p[1] >= 0.5 - eps && p[1] <= ny - 0.5 + eps;
  const fmt = (g: [number, number]) => {
    const p = toPx(g);
    return `${Math.round(p[0] * 10) / 10},${Math.round(p[1] * 10) / 10}`;
  };
  let d = '';
  for (const ring of rings) {
    if (!interiorOnly) {
      d += ring.map((g, i) => `${i === 0 ? 'M' : 'L'}${fmt(g)}`).join('') + 'Z';
      continue;
    }
    let pen = false;
    for (let i = 1; i < ring.length; i++) {
      if (inside(ring[i - 1]) && inside(ring[i])) {
        if (!pen) d += `M${fmt(ring[i - 1])}`;
        d += `L${fmt(ring[i])}`;
        pen = true;
      } else pen = false;
    }
  }
  return d;
}

export function mapPlotSvg(input: MapPlotInput, options: MapPlotOptions = {}): string {
  const W = options.width ?? 760;
  const H = options.height ?? 500;
  const id = options.id ?? 'map';
  const nx = input.x.values.length;
  const ny = input.y.values.length;
  if (nx === 0 || ny === 0) throw new Error('mapPlotSvg: empty grid');
  const at = (ix: number, iy: number) => input.value[iy]?.[ix] ?? Number.NaN;
  const legendTop = 40;
  const x0 = 86;
  const x1 = W - 150;
  const yTop = legendTop + 34;
  const yBottom = H - 56;
  const cw = (x1 - x0) / nx;
  const ch = (yBottom - yTop) / ny;
  const gx = (g: number) => x0 + g * cw;
  const gy = (g: number) => yBottom - g * ch;
  const toPx = (g: [number, number]): [number, number] => [gx(g[0]), gy(g[1])];

  // colour scale over the finite values
  const finite: number[] = [];
  for (let iy = 0; iy < ny; iy++) for (let ix = 0; ix < nx; ix++) if (Number.isFinite(at(ix, iy))) finite.push(at(ix, iy));
  const vmin = finite.length ? Math.min(...finite) : 0;
  const vmax = finite.length ? Math.max(...finite) : 1;
  const interp = options.scheme === 'viridis' ? interpolateViridis : interpolateCividis;
  const colour = scaleSequential(interp).domain(vmax > vmin ? [vmin, vmax] : [vmin - 1, vmax + 1]);
  const valuePrefix = axisPrefix([vmin, vmax], input.valueUnit);

  const body: string[] = [el('rect', { x: 0, y: 0, width: W, height: H, fill: '#ffffff' })];
  body.push(text(x0, 22, input.title ?? `${input.valueName} over ${input.x.name} and ${input.y.name}`, { 'font-size': FONT_TITLE, 'font-weight': 'bold', fill: INK }));
  body.push(
    el('defs', {}, [
      // two-tone hatch: readable over both the dark and the light end of the scale
      el('pattern', { id: `${id}-hatch`, width: 9, height: 9, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)' }, [
        el('line', { x1: 0, y1: 0, x2: 0, y2: 9, stroke: '#ffffff', 'stroke-width': 3 }),
        el('line', { x1: 0, y1: 0, x2: 0, y2: 9, stroke: INK, 'stroke-width': 1.2 }),
      ]),
    ]),
  );

  // cells
  const labels = options.cellLabels ?? 'auto';
  const cellCaption = (v: number) => tickLabel(Number(v.toPrecision(3)), valuePrefix.factor);
  const showLabels =
    labels === true ||
    (labels === 'auto' && cw >= 38 && ch >= 16 && finite.every((v) => textWidth(cellCaption(v), FONT_SMALL) + 4 <= cw));
  const cells: string[] = [];
  for (let iy = 0; iy < ny; iy++) {
    for (let ix = 0; ix < nx; ix++) {
      const v = at(ix, iy);
      const x = gx(ix);
      const y = gy(iy + 1);
      if (Number.isFinite(v)) {
        cells.push(el('rect', { x, y, width: cw + 0.3, height: ch + 0.3, fill: colour(v), class: 'cell' }));
        if (showLabels) {
          const t = vmax > vmin ? (v - vmin) / (vmax - vmin) : 0.5;
          cells.push(text(x + cw / 2, y + ch / 2 + 3.5, cellCaption(v), { 'text-anchor': 'middle', 'font-size': FONT_SMALL, fill: t > 0.55 ? INK : '#ffffff', class: 'cell-label' }));
        }
      } else {
        cells.push(el('rect', { x, y, width: cw, height: ch, fill: '#ffffff', stroke: MUTED, 'stroke-width': 0.5, class: 'cell cell-missing' }));
        cells.push(el('path', { d: `M${x + 3},${y + 3}L${x + cw - 3},${y + ch - 3}M${x + cw - 3},${y + 3}L${x + 3},${y + ch - 3}`, stroke: MUTED, 'stroke-width': 0.8 }));
      }
    }
  }
  body.push(el('g', { class: 'cells' }, cells));

  // feasible region: the cells where every limit holds, hatched, and the boundary between
  // them and the other cells (or the grid's edge) drawn as a dashed outline
  let feasibleCount = 0;
  if (input.feasible) {
    const ok = (ix: number, iy: number) => ix >= 0 && iy >= 0 && ix < nx && iy < ny && input.feasible![iy]?.[ix] === true;
    const hatch: string[] = [];
    let outline = '';
    const seg = (a: [number, number], b: [number, number]) => {
      const p = toPx(a);
      const q = toPx(b);
      outline += `M${Math.round(p[0] * 10) / 10},${Math.round(p[1] * 10) / 10}L${Math.round(q[0] * 10) / 10},${Math.round(q[1] * 10) / 10}`;
    };
    for (let iy = 0; iy < ny; iy++) {
      for (let ix = 0; ix < nx; ix++) {
        if (!ok(ix, iy)) continue;
        feasibleCount++;
        hatch.push(el('rect', { x: gx(ix), y: gy(iy + 1), width: cw, height: ch, fill: `url(#${id}-hatch)`, 'fill-opacity': 0.6 }));
        if (!ok(ix - 1, iy)) seg([ix, iy], [ix, iy + 1]);
        if (!ok(ix + 1, iy)) seg([ix + 1, iy], [ix + 1, iy + 1]);
        if (!ok(ix, iy - 1)) seg([ix, iy], [ix + 1, iy]);
        if (!ok(ix, iy + 1)) seg([ix, iy + 1], [ix + 1, iy + 1]);
      }
    }
    if (feasibleCount > 0) {
      body.push(el('g', { class: 'feasible-cells' }, hatch));
      body.push(el('path', { d: outline, fill: 'none', stroke: INK, 'stroke-width': 2, 'stroke-dasharray': '6 3', 'stroke-linecap': 'square', class: 'feasible-outline' }));
    }
  }

  // level contour
  let levelDrawn = false;
  if (input.level && Number.isFinite(input.level.value)) {
    const flat = new Array<number>(nx * ny);
    for (let iy = 0; iy < ny; iy++) for (let ix = 0; ix < nx; ix++) flat[ix + iy * nx] = at(ix, iy);
    const [c] = contours().size([nx, ny]).thresholds([input.level.value])(flat);
    const rings = c.coordinates.flat() as Ring[];
    const d = ringsToPath(rings, nx, ny, toPx, true);
    if (/L/.test(d)) {
      levelDrawn = true;
      body.push(el('path', { d, fill: 'none', stroke: '#ffffff', 'stroke-width': 4.5, class: 'level-casing' }));
      body.push(el('path', { d, fill: 'none', stroke: INK, 'stroke-width': 2, class: 'level-line' }));
      // label at the middle of the longest interior run
      const runs = d.split('M').filter(Boolean).map((r) => r.split('L').map((p) => p.split(',').map(Number) as [number, number]));
      const longest = runs.reduce((a, b) => (b.length > a.length ? b : a));
      const mid = longest[Math.floor(longest.length / 2)];
      const label = `${input.level.label} ${formatQuantity(input.level.value, input.valueUnit)}`;
      const lw = textWidth(label, FONT);
      const lx = Math.min(Math.max(mid[0] + 6, x0 + 2), x1 - lw - 2);
      body.push(text(lx, Math.max(mid[1] - 6, yTop + FONT), label, { fill: INK, stroke: '#ffffff', 'stroke-width': 3.5, 'paint-order': 'stroke', 'font-weight': 'bold', class: 'level-label' }));
    }
  }

  // frame and axes
  body.push(el('rect', { x: x0, y: yTop, width: x1 - x0, height: yBottom - yTop, fill: 'none', stroke: INK }));
  const xs = cellScale(input.x.values, x0 + cw / 2, cw);
  const ys = cellScale(input.y.values, yBottom - ch / 2, -ch);
  body.push(bottomAxis(xs, { name: input.x.name, unit: input.x.unit, ticks: Math.min(8, Math.max(2, nx)) }, yBottom, []));
  body.push(leftAxis(ys, { name: input.y.name, unit: input.y.unit, ticks: Math.min(6, Math.max(2, ny)) }, x0, x0));

  // colour bar with ticks
  const barX = x1 + 28;
  const barW = 16;
  const stops = Array.from({ length: 11 }, (_, k) => el('stop', { offset: `${k * 10}%`, 'stop-color': interp(k / 10) }));
  body.push(el('defs', {}, el('linearGradient', { id: `${id}-bar`, x1: 0, y1: 1, x2: 0, y2: 0 }, stops)));
  body.push(el('rect', { x: barX, y: yTop, width: barW, height: yBottom - yTop, fill: `url(#${id}-bar)`, stroke: INK, 'stroke-width': 0.6 }));
  const bar = scaleLinear().domain(colour.domain()).range([yBottom, yTop]);
  for (const t of bar.ticks(6)) {
    body.push(el('line', { x1: barX + barW, x2: barX + barW + 4, y1: bar(t), y2: bar(t), stroke: INK }));
    body.push(text(barX + barW + 6, bar(t) + 3.5, tickLabel(t, valuePrefix.factor), { fill: INK }));
  }
  if (input.level && Number.isFinite(input.level.value) && input.level.value >= bar.domain()[0] && input.level.value <= bar.domain()[1]) {
    const yl = bar(input.level.value);
    body.push(el('line', { x1: barX - 4, x2: barX + barW + 4, y1: yl, y2: yl, stroke: INK, 'stroke-width': 2 }));
  }
  const barTitle = `${input.valueName} (${valuePrefix.unit})`;
  const bty = (yTop + yBottom) / 2;
  const btx = barX + barW + 50;
  body.push(text(btx, bty, barTitle, { transform: `rotate(-90 ${btx} ${Math.round(bty * 10) / 10})`, 'text-anchor': 'middle', fill: MUTED }));

  // key
  const key: string[] = [];
  let kx = x0;
  const ky = legendTop + 4;
  if (input.level) {
    key.push(el('line', { x1: kx, x2: kx + 22, y1: ky, y2: ky, stroke: INK, 'stroke-width': 2 }));
    const s = levelDrawn
      ? `${input.level.label} ${formatQuantity(input.level.value, input.valueUnit)}`
      : `${input.level.label} ${formatQuantity(input.level.value, input.valueUnit)} (not reached in this range)`;
    key.push(text(kx + 28, ky + 4, s, { fill: INK, 'font-size': FONT_SMALL }));
    kx += 28 + textWidth(s, FONT_SMALL) + 24;
  }
  if (input.feasible) {
    key.push(el('rect', { x: kx, y: ky - 7, width: 22, height: 14, fill: `url(#${id}-hatch)`, stroke: INK, 'stroke-width': 1.5, 'stroke-dasharray': '6 3' }));
    const s = feasibleCount > 0 ? `every limit holds (${feasibleCount} of ${nx * ny} points)` : 'no point meets every limit';
    key.push(text(kx + 28, ky + 4, s, { fill: INK, 'font-size': FONT_SMALL }));
    kx += 28 + textWidth(s, FONT_SMALL) + 24;
  }
  if (finite.length < nx * ny) {
    key.push(text(kx, ky + 4, `× not computed (${nx * ny - finite.length})`, { fill: MUTED, 'font-size': FONT_SMALL }));
  }
  body.push(el('g', { class: 'key' }, key));

  const desc =
    `Map of ${input.valueName} over ${input.x.name} (${nx} values) and ${input.y.name} (${ny} values), ` +
    `from ${formatQuantity(vmin, input.valueUnit)} to ${formatQuantity(vmax, input.valueUnit)}.` +
    (input.level ? ` Line: ${input.level.label} ${formatQuantity(input.level.value, input.valueUnit)}.` : '') +
    (input.feasible ? ` Hatched: every limit holds at ${feasibleCount} of ${nx * ny} points.` : '');
  return svgRoot(W, H, input.title ?? `${input.valueName} map`, desc, body, id);
}
