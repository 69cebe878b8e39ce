/**
 * A histogram of the outcomes of a tolerance run as a standalone SVG: one figure (e.g. the peak
 * field at the part) over many runs with randomly drawn component values. Bins come from
 * d3-array's `bin()` with thresholds at the ticks of a nice d3-scale domain over the values
 * themselves (about 20 bins, however far away the limit is); the limit is drawn
 * as a labelled rule, bars beyond it are hatched (not only coloured), and the count, median and
 * the 5 % / 95 % quantiles (d3-array `quantile`, R-7 linear interpolation) are written out.
 */
import { bin, quantile } from 'd3-array';
import { scaleLinear } from 'd3-scale';
import { formatPlain, formatQuantity } from './quantity.js';
import { bottomAxis, leftAxis } from './svg/axis.js';
import { el, svgRoot, text, textWidth } from './svg/svg.js';
import { FONT_SMALL, FONT_TITLE, INK, MUTED, OKABE_ITO } from './svg/style.js';

export interface HistogramInput {
  /** One value per run, SI (NaN: run not computed; counted apart). */
  values: readonly number[];
  /** e.g. "peak field at the part". */
  name: string;
  /** SI unit, e.g. "A/m". */
  unit: string;
  /** A limit: `min` means values below it fail (a required field), `max` values above it (a rating). */
  limit?: { value: number; label: string; kind: 'min' | 'max' };
  title?: string;
}

export interface HistogramOptions {
  width?: number;
  height?: number;
  /** Approximate number of bins (default 20). */
  bins?: number;
  id?: string;
}

export interface HistogramSummary {
  n: number;
  notComputed: number;
  median: number;
  q05: number;
  q95: number;
  /** Runs on the wrong side of the limit (0 without a limit). */
  beyond: number;
}

/** Count, quantiles and the number of runs beyond the limit. */
export function histogramSummary(input: HistogramInput): HistogramSummary {
  const v = input.values.filter(Number.isFinite).slice().sort((a, b) => a - b);
  const lim = input.limit;
  const beyond = lim ? v.filter((x) => (lim.kind === 'min' ? x < lim.value : x > lim.value)).length : 0;
  return {
    n: v.length,
    notComputed: input.values.length - v.length,
    median: quantile(v, 0.5) ?? Number.NaN,
    q05: quantile(v, 0.05) ?? Number.NaN,
    q95: quantile(v, 0.95) ?? Number.NaN,
    beyond,
  };
}

export function histogramSvg(input: HistogramInput, options: HistogramOptions = {}): string {
  const W = options.width ?? 760;
  const H = options.height ?? 400;
  const id = options.id ?? 'hist';
  const values = input.values.filter(Number.isFinite);
  const s = histogramSummary(input);
  const x0 = 86;
  const x1 = W - 24;
  const yTop = 74;
  const yBottom = H - 56;

  let lo = values.length ? Math.min(...values) : 0;
  let hi = values.length ? Math.max(...values) : 1;
  if (input.limit && Number.isFinite(input.limit.value)) {
    lo = Math.min(lo, input.limit.value);
    hi = Math.max(hi, input.limit.value);
  }
  if (!(hi > lo)) {
    const pad = lo !== 0 ? Math.abs(lo) * 0.01 : 1;
    lo -= pad;
    hi += pad;
  }
  const nBins = options.bins ?? 20;
  // bin edges at nice ticks of the values' own range (a limit far from the values widens the
  // axis, not the bins), plus one at the limit so no bar straddles it
  const vLo = values.length ? Math.min(...values) : lo;
  const vHi = values.length ? Math.max(...values) : hi;
  const binScale = scaleLinear().domain(vHi > vLo ? [vLo, vHi] : [lo, hi]).nice(nBins);
  const [bLo, bHi] = binScale.domain();
  // a limit outside the values gets some room, so its rule does not sit on the axis line
  const room = input.limit && (input.limit.value <= bLo || input.limit.value >= bHi) ? 0.03 * (hi - lo) : 0;
  const x = scaleLinear()
    .domain([Math.min(lo - room, bLo), Math.max(hi + room, bHi)])
    .range([x0, x1])
    .nice(nBins);
  const edges = binScale.ticks(nBins);
  const limValue = input.limit?.value;
  if (limValue !== undefined && limValue > bLo && limValue < bHi && !edges.includes(limValue)) {
    edges.push(limValue);
    edges.sort((a, b) => a - b);
  }
  const bins = bin()
    .domain([bLo, bHi])
    .thresholds(edges)(values);
  const maxCount = Math.max(1, ...bins.map((b) => b.length));
  const y = scaleLinear().domain([0, maxCount * 1.12]).range([yBottom, yTop]).nice(5);

  const body: string[] = [el('rect', { x: 0, y: 0, width: W, height: H, fill: '#ffffff' })];
  body.push(text(x0, 22, input.title ?? `${input.name}: ${s.n} runs`, { 'font-size': FONT_TITLE, 'font-weight': 'bold', fill: INK }));
  body.push(
    el('defs', {}, [
      el('pattern', { id: `${id}-hatch`, width: 6, height: 6, patternUnits: 'userSpaceOnUse', patternTransform: 'rotate(45)' }, [
        el('rect', { x: 0, y: 0, width: 6, height: 6, fill: OKABE_ITO.vermillion }),
        el('line', { x1: 0, y1: 0, x2: 0, y2: 6, stroke: '#ffffff', 'stroke-width': 2 }),
      ]),
    ]),
  );
  body.push(leftAxis(y, { name: 'runs', unit: '', ticks: 5 }, x0, x1));
  body.push(bottomAxis(x, { name: input.name, unit: input.unit }, yBottom, []));

  const lim = input.limit;
  const isBeyond = (b: { x0?: number; x1?: number }) =>
    lim ? (lim.kind === 'min' ? (b.x1 ?? 0) <= lim.value : (b.x0 ?? 0) >= lim.value) : false;
  const bars: string[] = [];
  for (const b of bins) {
    if (b.length === 0 || b.x0 === undefined || b.x1 === undefined) continue;
    const bx = x(b.x0);
    const bw = Math.max(0.5, x(b.x1) - x(b.x0) - 1);
    const by = y(b.length);
    bars.push(
      el('rect', {
        x: bx + 0.5,
        y: by,
        width: bw,
        height: yBottom - by,
        fill: isBeyond(b) ? `url(#${id}-hatch)` : OKABE_ITO.blue,
        stroke: INK,
        'stroke-width': 0.5,
        class: isBeyond(b) ? 'bar bar-beyond' : 'bar',
        'data-count': b.length,
        'data-x0': b.x0,
        'data-x1': b.x1,
      }),
    );
  }
  body.push(el('g', { class: 'bars' }, bars));

  // quantile marks under the axis line
  const marks: string[] = [];
  for (const [q, label] of [[s.q05, '5 %'], [s.median, 'median'], [s.q95, '95 %']] as const) {
    if (!Number.isFinite(q)) continue;
    marks.push(el('line', { x1: x(q), x2: x(q), y1: yTop, y2: yBottom, stroke: MUTED, 'stroke-dasharray': label === 'median' ? '6 3' : '2 3', class: 'quantile' }));
    marks.push(text(x(q), yTop - 4, label, { 'text-anchor': 'middle', 'font-size': FONT_SMALL, fill: MUTED }));
  }
  body.push(el('g', { class: 'quantiles' }, marks));

  if (lim && Number.isFinite(lim.value)) {
    const lx = x(lim.value);
    body.push(el('line', { x1: lx, x2: lx, y1: yTop - 14, y2: yBottom, stroke: INK, 'stroke-width': 2, class: 'limit' }));
    const lt = `${lim.label} ${formatQuantity(lim.value, input.unit)}`;
    const right = lx + 6 + textWidth(lt, FONT_SMALL) <= x1;
    body.push(text(right ? lx + 6 : lx - 6, yTop - 16, lt, { 'text-anchor': right ? 'start' : 'end', 'font-size': FONT_SMALL, 'font-weight': 'bold', fill: INK, class: 'limit-label' }));
  }

  const pct = (k: number) => (s.n > 0 ? `${formatPlain((100 * k) / s.n)} %` : 'n/a');
  const summary =
    `${s.n} runs · median ${formatQuantity(s.median, input.unit)} · 5 % to 95 %: ${formatQuantity(s.q05, input.unit)} to ${formatQuantity(s.q95, input.unit)}` +
    (lim ? ` · beyond the limit (hatched bars): ${s.beyond} (${pct(s.beyond)})` : '') +
    (s.notComputed ? ` · not computed: ${s.notComputed}` : '');
  body.push(text(x0, 42, summary, { 'font-size': FONT_SMALL, fill: INK, class: 'summary' }));

  const desc = `Histogram of ${input.name} over ${s.n} runs. ${summary}.`;
  return svgRoot(W, H, input.title ?? `${input.name} histogram`, desc, body, id);
}
